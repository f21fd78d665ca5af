import type { ReactNode } from "react";
import type { Annotations, TimelineEntry } from "../../../../shared/review/timeline.ts";
import { durationWords, localTime } from "../lib/review-words.ts";
import { AnswerView, answerWords } from "./timeline-answer.tsx";

export const entryAnchor = (key: string) => `entry-${key}`;

interface EntryProps {
  entry: TimelineEntry;
  /** Where each photo sits among the session's photos, by attachment id. */
  photoNumber: (attachmentId: string) => number;
  photoCount: number;
  onOpenPhoto: (index: number) => void;
  stillOpen: boolean;
}

const card = "flex flex-col gap-3 rounded-xl border-2 bg-raised px-5 py-4 focus-visible:outline-3";
const time = (iso: string) => <time dateTime={iso}>{localTime(iso, true)}</time>;

/** One step of the timeline, with everything the tech did there. */
export function TimelineEntryView({ entry, photoNumber, photoCount, onOpenPhoto, stillOpen }: EntryProps) {
  const id = entryAnchor(entry.key);
  const titleId = `${id}-title`;
  switch (entry.kind) {
    case "step":
      return (
        <li id={id} tabIndex={-1} aria-labelledby={titleId} className={`${card} ${entry.undone ? "border-dashed border-line-strong" : "border-line-strong"}`}>
          <div className="flex flex-wrap items-baseline justify-between gap-x-4">
            <h3 id={titleId} className="text-xl font-semibold">
              {entry.title}
            </h3>
            <p className="text-ink-muted tabular-figures">
              Reached {time(entry.reachedAt)}
              {entry.seconds !== null && <> · {durationWords(entry.seconds)} on the step</>}
            </p>
          </div>
          {entry.cautions.map((c) => (
            <p key={`${c.signal}-${c.at}`}>
              <span className="rounded border-2 border-ink px-1.5 font-bold tracking-wide">{c.signal}</span> caution acknowledged at {time(c.at)}
            </p>
          ))}
          {entry.answer && <AnswerView answer={entry.answer} />}
          {entry.changedFrom && (
            <p>
              <span className="text-ink-muted">Changed from </span>
              <del className="decoration-2">{answerWords(entry.changedFrom)}</del>
            </p>
          )}
          {entry.undone && <p className="font-semibold">Taken back: the tech later went back, so this answer no longer stands.</p>}
          {entry.left?.by === "back" && <p>Went back to the step before at {time(entry.left.at)}.</p>}
          {entry.left?.by === "restart" && <p>Started the check again from the first step at {time(entry.left.at)}.</p>}
          {entry.left === null && stillOpen && <p className="font-semibold">The session stands here: the tech has not answered this step yet.</p>}
          <Extras annotations={entry} photoNumber={photoNumber} photoCount={photoCount} onOpenPhoto={onOpenPhoto} />
        </li>
      );
    case "finding":
      return (
        <li id={id} tabIndex={-1} aria-labelledby={titleId} className={`${card} border-accent`}>
          <p className="font-semibold text-ink-muted">Finding</p>
          <h3 id={titleId} className="text-2xl font-semibold">
            {entry.title}
          </h3>
          <p>
            {entry.certainty === "confirmed" ? "Confirmed" : "Likely"}, reached at {time(entry.reachedAt)}
          </p>
          {entry.takenBackAt && <p className="font-semibold">Taken back: the tech went back from this finding at {time(entry.takenBackAt)}.</p>}
          <Extras annotations={entry} photoNumber={photoNumber} photoCount={photoCount} onOpenPhoto={onOpenPhoto} />
        </li>
      );
    case "abandoned":
      return (
        <li id={id} tabIndex={-1} aria-labelledby={titleId} className={`${card} border-dashed border-line-strong`}>
          <h3 id={titleId} className="text-xl font-semibold">
            Abandoned here
          </h3>
          <p>{entry.reason ? <>The tech's reason: “{entry.reason}”</> : "The tech gave no reason."}</p>
        </li>
      );
    case "unreadable":
      return (
        <li id={id} tabIndex={-1} aria-labelledby={titleId} className={`${card} border-problem bg-problem-soft`}>
          <h3 id={titleId} className="text-xl font-semibold">
            The log cannot be read past event {entry.index + 1}
          </h3>
          <p>{entry.reason}</p>
        </li>
      );
  }
}

function Extras({ annotations, photoNumber, photoCount, onOpenPhoto }: { annotations: Annotations } & Pick<EntryProps, "photoNumber" | "photoCount" | "onOpenPhoto">): ReactNode {
  const { notes, photos } = annotations;
  if (notes.length === 0 && photos.length === 0) return null;
  return (
    <>
      {notes.map((note) => (
        <figure key={note.at + note.text} className="flex flex-col gap-1 border-l-4 border-line-strong pl-4">
          <figcaption className="text-base text-ink-muted">Note at {time(note.at)}</figcaption>
          <blockquote className="text-lg whitespace-pre-line">{note.text}</blockquote>
        </figure>
      ))}
      {photos.length > 0 && (
        <ul className="flex flex-wrap gap-3" aria-label="Photos">
          {photos.map((photo) => {
            const index = photoNumber(photo.attachmentId);
            return (
              <li key={photo.attachmentId}>
                <button type="button" onClick={() => onOpenPhoto(index)} className="block size-24 overflow-hidden rounded-lg border-2 border-line-strong bg-sunken">
                  <img src={`/api/attachments/${encodeURIComponent(photo.attachmentId)}/thumb`} alt={`Photo ${index + 1} of ${photoCount}, taken at ${localTime(photo.at)}`} className="size-full object-cover" />
                </button>
              </li>
            );
          })}
        </ul>
      )}
    </>
  );
}
