// A reading's bands on a number line: one lane per band, and every gap or overlap marked and listed in words.
import { useId, useMemo } from "react";
import { checkBands } from "../../../../shared/flow/bands.ts";
import { isUnit, unitLabel } from "../../../../shared/calc/units.ts";
import type { Band, Bound, Verdict } from "../../../../shared/flow/schema.ts";
import type { BandCoverageProps } from "../lib/view-slots.ts";
import { axisTicks, coverageRegions, lineScale, percentAt, rangeWords, type LineScale } from "./band-line.ts";
import { CoverageList, EndsKey } from "./band-coverage-notes.tsx";

const verdictWords: Record<Verdict, string> = { good: "Good", marginal: "Marginal", low: "Low", high: "High", implausible: "Not believable" };

const LANE = 60;
const OPEN_LEFT = 1.5;
const OPEN_RIGHT = 98.5;
const pct = (n: number) => `${n}%`;

function EndMark({ bound, scale }: { bound: Bound; scale: LineScale }) {
  return (
    <circle
      cx={pct(percentAt(scale, bound.value))}
      cy={0}
      r={7}
      strokeWidth={3}
      data-end={bound.inclusive ? "included" : "not-included"}
      className={bound.inclusive ? "fill-ink stroke-ink" : "fill-raised stroke-ink"}
    />
  );
}

interface LaneProps {
  band: Band;
  index: number;
  scale: LineScale;
  unit: string;
  arrowId: string;
  onPick?: (index: number) => void;
}

function BandLane({ band, index, scale, unit, arrowId, onPick }: LaneProps) {
  const x1 = band.from ? percentAt(scale, band.from.value) : OPEN_LEFT;
  const x2 = band.to ? percentAt(scale, band.to.value) : OPEN_RIGHT;
  const empty = x2 < x1 || (x1 === x2 && !(band.from?.inclusive && band.to?.inclusive));
  const verdict = verdictWords[band.verdict] ?? band.verdict;
  const name = `Band "${band.label}", ${verdict}: ${rangeWords(band.from, band.to, unit)}${empty ? ", covers nothing" : ""}`;
  const pick = onPick ? () => onPick(index) : undefined;
  return (
    <g
      transform={`translate(0 ${index * LANE})`}
      role={pick ? "button" : "img"}
      aria-label={name}
      tabIndex={pick ? 0 : undefined}
      onClick={pick}
      onKeyDown={
        pick
          ? (e) => {
              if (e.key !== "Enter" && e.key !== " ") return;
              e.preventDefault();
              pick();
            }
          : undefined
      }
      className={`group outline-none ${pick ? "cursor-pointer" : ""}`}
    >
      <rect x="0" y="2" width="100%" height={LANE - 4} rx="6" className="fill-transparent group-hover:fill-sunken group-focus-visible:stroke-focus group-focus-visible:[stroke-width:3]" />
      <text x={pct(Math.min(85, Math.max(15, (x1 + x2) / 2)))} y={22} textAnchor="middle" className="fill-ink stroke-surface text-sm font-semibold [paint-order:stroke] [stroke-width:5]">
        {band.label} · {verdict}
        {empty ? " (covers nothing)" : ""}
      </text>
      <g transform="translate(0 42)">
        <line
          x1={pct(x1)}
          x2={pct(x2)}
          y1={0}
          y2={0}
          strokeWidth={6}
          strokeLinecap="butt"
          markerStart={band.from ? undefined : `url(#${arrowId})`}
          markerEnd={band.to ? undefined : `url(#${arrowId})`}
          className={empty ? "stroke-line-strong [stroke-dasharray:6_4]" : "stroke-ink"}
        />
        {band.from && <EndMark bound={band.from} scale={scale} />}
        {band.to && <EndMark bound={band.to} scale={scale} />}
      </g>
    </g>
  );
}

export function BandCoverage({ bands, unit, onPick }: BandCoverageProps) {
  const label = isUnit(unit) ? unitLabel(unit) : unit;
  const scale = useMemo(() => lineScale(bands), [bands]);
  const regions = useMemo(() => coverageRegions(bands), [bands]);
  // Gaps and overlaps are drawn from the regions; the checker's other findings are listed as it words them.
  const otherIssues = useMemo(() => checkBands([...bands], label).filter((i) => i.code === "band_empty" || i.code === "band_order"), [bands, label]);
  const ids = useId().replace(/[^a-zA-Z0-9_-]/g, "");
  const arrowId = `${ids}-arrow`;
  if (bands.length === 0) return <p className="text-ink-muted">No bands yet: add one to see it on the line.</p>;

  const lanesHeight = bands.length * LANE;
  const issueRow = regions.length > 0 ? 28 : 0;
  const axisY = lanesHeight + issueRow + 12;
  const ticks = axisTicks(bands, scale);
  const xOf = (b: Bound | null, open: number) => (b ? percentAt(scale, b.value) : open);
  return (
    <figure className="m-0 flex flex-col gap-3">
      <svg width="100%" height={axisY + 44} role="group" aria-label={`Bands on a number line, in ${label}`} className="overflow-visible">
        <defs>
          <marker id={arrowId} viewBox="0 0 10 10" refX="6" refY="5" markerWidth="3" markerHeight="3" orient="auto-start-reverse">
            <path d="M0 0L10 5L0 10z" className="fill-ink" />
          </marker>
          <pattern id={`${ids}-gap`} width="10" height="10" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <rect width="10" height="10" className="fill-problem-soft" />
            <line x1="0" y1="0" x2="0" y2="10" strokeWidth="4" className="stroke-problem" />
          </pattern>
          <pattern id={`${ids}-overlap`} width="12" height="12" patternUnits="userSpaceOnUse">
            <rect width="12" height="12" className="fill-problem-soft" />
            <path d="M0 0L12 12M12 0L0 12" strokeWidth="2" className="stroke-problem" />
          </pattern>
        </defs>
        {regions.map((r, i) => {
          const a = xOf(r.from, OPEN_LEFT);
          const b = xOf(r.to, OPEN_RIGHT);
          const point = a === b;
          return (
            <g key={i} data-region={r.kind} aria-hidden="true">
              {point ? (
                <line x1={pct(a)} x2={pct(a)} y1={0} y2={axisY} strokeWidth={4} className="stroke-problem [stroke-dasharray:4_3]" />
              ) : (
                <rect x={pct(a)} y={0} width={pct(b - a)} height={axisY} fill={`url(#${ids}-${r.kind})`} opacity={0.75} />
              )}
              <text x={pct((a + b) / 2)} y={lanesHeight + 20} textAnchor="middle" className="fill-problem stroke-surface text-sm font-semibold [paint-order:stroke] [stroke-width:5]">
                {r.kind === "gap" ? "Gap" : "Overlap"}
              </text>
            </g>
          );
        })}
        {bands.map((band, i) => (
          <BandLane key={i} band={band} index={i} scale={scale} unit={label} arrowId={arrowId} onPick={onPick} />
        ))}
        <g transform={`translate(0 ${axisY})`} aria-hidden="true">
          <line x1="0.5%" x2="99.5%" y1={0} y2={0} strokeWidth={2} markerStart={`url(#${arrowId})`} markerEnd={`url(#${arrowId})`} className="stroke-line-strong" />
          {ticks.map(({ value, x, labelled }) => (
            <g key={value}>
              <line x1={pct(x)} x2={pct(x)} y1={-6} y2={6} strokeWidth={2} className="stroke-line-strong" />
              {labelled && (
                <text x={pct(x)} y={26} textAnchor="middle" className="tabular-figures fill-ink text-sm">
                  {value}
                </text>
              )}
            </g>
          ))}
          <text x="100%" y={-10} textAnchor="end" className="fill-ink-muted text-sm">
            {label}
          </text>
        </g>
      </svg>
      <figcaption className="flex flex-col gap-2">
        <EndsKey />
        <CoverageList regions={regions} bands={bands} unit={label} otherIssues={otherIssues.map((i) => i.message)} />
      </figcaption>
    </figure>
  );
}
