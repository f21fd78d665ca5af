import { useId, useState } from "react";
import { useMutation } from "@tanstack/react-query";
import type { PhotoRequest as PhotoAsk } from "../../../../shared/flow/schema.ts";
import { FieldError } from "../../../components/ui/field-error.tsx";
import { buttonClasses } from "../../../components/ui/button.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { uploadSessionPhoto } from "../api/upload-photo.ts";

interface PhotoRequestProps {
  sessionId: string;
  stepId: string;
  ask: PhotoAsk;
  taken: number;
  onUploaded: (attachmentId: string) => string | null;
}

function problemWords(error: unknown): string {
  if (isApiRequestError(error, "offline") || isApiRequestError(error, "unreachable")) return "No connection: the photo was not sent. Take it again when the connection is back.";
  if (isApiRequestError(error)) return error.message;
  return "The photo could not be sent. Try again.";
}

/** Take a photo with the tablet's camera; it is sent at once and then named in the session. */
export function PhotoRequest({ sessionId, stepId, ask, taken, onUploaded }: PhotoRequestProps) {
  const inputId = useId();
  const [refusal, setRefusal] = useState<string | null>(null);
  const upload = useMutation({
    mutationFn: (photo: File) => uploadSessionPhoto({ sessionId, stepId, photo }),
    onSuccess: (photo) => setRefusal(onUploaded(photo.id)),
  });
  const error = refusal ?? (upload.isError ? problemWords(upload.error) : null);
  const required = ask.requirement === "required";
  return (
    <section aria-label="Photo" className="flex max-w-[70ch] flex-col gap-3 rounded-lg border-2 border-line-strong bg-raised px-5 py-4">
      <p className="text-lg font-semibold">
        {ask.prompt}
        <span className="ml-2 text-base font-normal text-ink-muted">{required ? "(needed before you go on)" : "(if you can)"}</span>
      </p>
      {taken > 0 && <p className="text-base">✓ {taken === 1 ? "1 photo kept" : `${taken} photos kept`} for this step.</p>}
      <label htmlFor={inputId} className={`${buttonClasses({ variant: "secondary" })} self-start ${upload.isPending ? "opacity-70" : ""}`}>
        {upload.isPending ? "Sending the photo…" : taken > 0 ? "Take another photo" : "Take the photo"}
      </label>
      <input
        id={inputId}
        type="file"
        accept="image/*"
        capture="environment"
        className="sr-only"
        disabled={upload.isPending}
        onChange={(e) => {
          const file = e.target.files?.[0];
          e.target.value = "";
          if (file) upload.mutate(file);
        }}
      />
      {error && <FieldError id={`${inputId}-error`} message={error} />}
    </section>
  );
}
