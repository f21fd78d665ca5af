/** How the test can fool you: a quiet, labelled aside, kept apart from the safety panels. */
export function MisleadsNote({ text }: { text: string }) {
  return (
    <aside aria-label="How this can mislead" className="max-w-[70ch] rounded-lg border-l-4 border-line-strong bg-sunken px-5 py-3">
      <p className="text-base font-semibold">How this can mislead</p>
      <p className="text-base">{text}</p>
    </aside>
  );
}
