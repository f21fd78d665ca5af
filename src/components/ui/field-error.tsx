import { ProblemGlyph } from "./problem-glyph.tsx";

/** A field's own message, placed right under it and named by its aria-describedby. */
export function FieldError({ id, message }: { id: string; message: string }) {
  return (
    <p id={id} className="flex items-start gap-2 font-medium text-problem">
      <ProblemGlyph className="mt-0.5 size-6 shrink-0" />
      <span>{message}</span>
    </p>
  );
}

/** Ids a control points at for its hint and error, in reading order. */
export function describedBy(...ids: (string | false | undefined)[]) {
  const given = ids.filter(Boolean).join(" ");
  return given === "" ? undefined : given;
}

/** Marks an answer check-in cannot go without; hidden from readers, who hear aria-required instead. */
export function NeededTag() {
  return (
    <span aria-hidden="true" className="ml-2 rounded border border-line-strong px-1.5 text-sm font-medium text-ink-muted">
      needed
    </span>
  );
}
