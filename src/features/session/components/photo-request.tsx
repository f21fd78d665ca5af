import { useId, useState } from "react";
import type { PhotoRequest as PhotoAsk } from "../../../../shared/flow/schema.ts";
import type { PhotoRecord } from "../../../../shared/flow/session-log.ts";
import { FieldError } from "../../../components/ui/field-error.tsx";
import { buttonClasses } from "../../../components/ui/button.tsx";
import { PhotoThumb } from "./photo-thumb.tsx";

interface PhotoRequestProps {
  ask: PhotoAsk;
  taken: readonly PhotoRecord[];
  /** Keeps and queues the picture; answers why it was refused, or null. */
  onTake: (photo: File) => Promise<string | null>;
}

/** Take a photo with the tablet's camera; it is kept on the tablet and sent in the session's save line. */
export function PhotoRequest({ ask, taken, onTake }: PhotoRequestProps) {
  const inputId = useId();
  const [busy, setBusy] = useState(false);
  const [refusal, setRefusal] = useState<string | null>(null);
  const required = ask.requirement === "required";
  // Until a needed photo is in, taking it is the step's main action.
  const main = required && taken.length === 0;
  return (
    <section aria-label="Photo" className="flex max-w-[70ch] flex-col gap-3 rounded-lg border-2 border-line-strong bg-raised px-5 py-4">
      <p className="text-lg font-semibold">
        {ask.prompt}
        <span className="ml-2 text-base font-normal text-ink-muted">{required ? "(needed before you go on)" : "(if you can)"}</span>
      </p>
      {taken.length > 0 && (
        <div className="flex flex-wrap items-center gap-3">
          {taken.map((p) => (
            <PhotoThumb key={p.attachmentId} attachmentId={p.attachmentId} />
          ))}
          <p className="text-base">✓ {taken.length === 1 ? "1 photo kept" : `${taken.length} photos kept`} for this step.</p>
        </div>
      )}
      <label htmlFor={inputId} className={`${buttonClasses({ variant: main ? "primary" : "secondary", size: main ? "main" : "regular" })} self-start ${busy ? "opacity-70" : ""}`}>
        {busy ? "Keeping the photo…" : taken.length > 0 ? "Take another photo" : "Take the photo"}
      </label>
      <input
        id={inputId}
        type="file"
        accept="image/*"
        capture="environment"
        className="sr-only"
        disabled={busy}
        aria-describedby={refusal ? `${inputId}-error` : undefined}
        onChange={(e) => {
          const file = e.target.files?.[0];
          e.target.value = "";
          if (!file) return;
          setBusy(true);
          void onTake(file).then((why) => {
            setRefusal(why);
            setBusy(false);
          });
        }}
      />
      {refusal && <FieldError id={`${inputId}-error`} message={refusal} />}
    </section>
  );
}
