import type { CompiledFlow } from "../../../../shared/flow/compile.ts";

/** The steps taken so far, oldest first, with the current one named last. */
export function PathTrail({ compiled, path }: { compiled: CompiledFlow; path: readonly string[] }) {
  const earlier = path.slice(0, -1);
  // Only the latest few fit at arm's length; the count says how many came before.
  const shown = earlier.slice(-2);
  const hidden = earlier.length - shown.length;
  return (
    <nav aria-label="Steps so far" className="min-w-0">
      <ol className="flex items-center gap-x-2 overflow-hidden text-base whitespace-nowrap text-ink-muted">
        <li className="tabular-figures">Step {path.length}</li>
        {hidden > 0 && <li aria-label={`${hidden} steps before these`}>· {hidden} before</li>}
        {shown.map((id, index) => (
          <li key={`${index}-${id}`} className="min-w-0 max-w-[32ch] truncate">
            <span aria-hidden="true">› </span>
            {compiled.steps[id]?.title ?? id}
          </li>
        ))}
      </ol>
    </nav>
  );
}
