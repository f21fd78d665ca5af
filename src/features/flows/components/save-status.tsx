import type { SaveStatus } from "../lib/use-draft-editor.ts";

const words: Record<SaveStatus, string> = {
  saved: "All changes saved",
  unsaved: "Unsaved changes, kept on this computer",
  saving: "Saving…",
  failed: "Not saved",
  conflict: "Not saved: someone else saved this draft",
};

/** Where the working copy stands: saved, waiting to save, saving, or held back. */
export function SaveStatusLine({ status, failure }: { status: SaveStatus; failure: string | null }) {
  const trouble = status === "failed" || status === "conflict";
  return (
    <p role="status" className={`flex items-center gap-2 font-semibold ${trouble ? "text-problem" : "text-ink-muted"}`}>
      <span aria-hidden="true" className={`size-3 rounded-full ${status === "saved" ? "bg-accent" : trouble ? "bg-problem" : "border-2 border-line-strong"}`} />
      <span>
        {words[status]}
        {status === "failed" && failure && `: ${failure} Your changes are kept on this computer; Benchpath tries again shortly.`}
      </span>
    </p>
  );
}
