import { useQuery } from "@tanstack/react-query";
import type { CapturedMailSummary } from "../../../../shared/schemas/mail.ts";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { attachmentUrl, capturedMessageQueryOptions } from "../api/get-captured-message.ts";
import { localDayTime, sizeWords } from "../lib/mail-words.ts";

interface ReceivedMailProps {
  messages: CapturedMailSummary[];
  chosen: string | null;
  onChoose: (id: string) => void;
}

/** The built-in sink's inbox: pick a message to read its parts as the recipient would get them. */
export function ReceivedMail({ messages, chosen, onChoose }: ReceivedMailProps) {
  if (messages.length === 0) return <p className="rounded-xl border-2 border-dashed border-line-strong px-5 py-4">The sink has not received anything yet.</p>;
  return (
    <div className="grid min-w-0 gap-5 xl:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
      <ul aria-label="Received messages" className="flex max-h-[32rem] flex-col gap-2 overflow-y-auto">
        {messages.map((m) => {
          const on = m.id === chosen;
          return (
            <li key={m.id}>
              <button
                type="button"
                aria-pressed={on}
                onClick={() => onChoose(m.id)}
                className={"flex min-h-12 w-full flex-col gap-0.5 rounded-lg border-2 px-4 py-2 text-left " + (on ? "border-accent bg-accent-soft" : "border-line-strong bg-raised")}
              >
                <span className="font-semibold">{m.subject || "(no subject)"}</span>
                <span className="text-base [overflow-wrap:anywhere] text-ink-muted">
                  To {m.to.join(", ")} · {localDayTime(m.receivedAt)}
                  {m.attachments.length > 0 && ` · ${m.attachments.length} ${m.attachments.length === 1 ? "attachment" : "attachments"}`}
                </span>
              </button>
            </li>
          );
        })}
      </ul>
      {chosen ? <MessageView id={chosen} /> : <p className="text-ink-muted">Choose a message to read it.</p>}
    </div>
  );
}

function MessageView({ id }: { id: string }) {
  const message = useQuery(capturedMessageQueryOptions(id));
  if (message.isPending) return <p className="text-ink-muted">Opening the message…</p>;
  if (message.isError) return <FormProblem title="The message did not open.">{message.error.message}</FormProblem>;
  const m = message.data;
  return (
    <article aria-labelledby="message-subject" className="flex min-w-0 flex-col gap-4 rounded-xl border-2 border-line bg-raised px-5 py-4">
      <div className="flex flex-col gap-1">
        <h3 id="message-subject" className="text-xl font-semibold">
          {m.subject || "(no subject)"}
        </h3>
        <p className="text-base [overflow-wrap:anywhere] text-ink-muted">
          From {m.from} to {m.to.join(", ")}, received {localDayTime(m.receivedAt)}
        </p>
      </div>
      {m.html ? (
        <section aria-label="HTML part" className="flex flex-col gap-2">
          <h4 className="font-semibold">As the recipient sees it</h4>
          {/* No scripts, forms or same-origin access: the message is shown, never run. */}
          <iframe title={`The message “${m.subject}”`} sandbox="" srcDoc={m.html} className="h-96 w-full rounded-lg border-2 border-line bg-white" />
        </section>
      ) : null}
      <section aria-label="Text part" className="flex flex-col gap-2">
        <h4 className="font-semibold">Plain text</h4>
        <pre className="max-h-72 overflow-auto rounded-lg border-2 border-line bg-sunken px-4 py-3 font-sans text-base whitespace-pre-wrap [overflow-wrap:anywhere]">{m.text || "(no text part)"}</pre>
      </section>
      {m.attachments.length > 0 && (
        <section aria-label="Attachments" className="flex flex-col gap-2">
          <h4 className="font-semibold">Attachments</h4>
          <ul className="flex flex-col gap-2">
            {m.attachments.map((a) => (
              <li key={a.index}>
                <a href={attachmentUrl(m.id, a.index)} download={a.filename} className="font-semibold text-accent underline decoration-2 underline-offset-4">
                  {a.filename}
                </a>{" "}
                <span className="text-ink-muted">
                  ({a.contentType}, {sizeWords(a.size)})
                </span>
              </li>
            ))}
          </ul>
        </section>
      )}
    </article>
  );
}
