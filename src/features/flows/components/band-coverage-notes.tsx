// What the band line says in words: how its end marks read, and each gap, overlap or empty band.
import { formatInterval } from "../../../../shared/flow/bands.ts";
import type { Band } from "../../../../shared/flow/schema.ts";
import { describeRegion, type CoverageRegion } from "./band-line.ts";

export function EndsKey() {
  return (
    <p className="flex flex-wrap items-center gap-x-5 gap-y-1 text-sm text-ink-muted">
      <span className="inline-flex items-center gap-2">
        <svg viewBox="0 0 20 20" className="size-5" aria-hidden="true"><circle cx="10" cy="10" r="6" strokeWidth="3" className="fill-ink stroke-ink" /></svg>
        End value included
      </span>
      <span className="inline-flex items-center gap-2">
        <svg viewBox="0 0 20 20" className="size-5" aria-hidden="true"><circle cx="10" cy="10" r="6" strokeWidth="3" className="fill-raised stroke-ink" /></svg>
        End value not included
      </span>
      <span className="inline-flex items-center gap-2">
        <svg viewBox="0 0 20 20" className="size-5" aria-hidden="true"><path d="M2 10h12M11 5l6 5-6 5z" strokeWidth="3" className="fill-ink stroke-ink" /></svg>
        No end
      </span>
    </p>
  );
}

interface ListProps {
  regions: CoverageRegion[];
  bands: readonly Band[];
  unit: string;
  otherIssues: string[];
}

export function CoverageList({ regions, bands, unit, otherIssues }: ListProps) {
  if (regions.length === 0 && otherIssues.length === 0) {
    return <p className="font-semibold">The bands cover every value exactly once.</p>;
  }
  return (
    <ul aria-label="Coverage problems" className="m-0 flex list-none flex-col gap-1 p-0">
      {regions.map((r, i) => (
        <li key={`r${i}`} className="text-problem">
          <span className="font-semibold">{describeRegion(r, bands, unit)}</span>
          <span className="tabular-figures text-ink-muted"> — {formatInterval(r.from, r.to, unit)}</span>
        </li>
      ))}
      {otherIssues.map((message, i) => (
        <li key={`o${i}`} className="text-problem">
          {message.charAt(0).toUpperCase() + message.slice(1)}
        </li>
      ))}
    </ul>
  );
}
