import { Bar, BarChart, CartesianGrid, LabelList, XAxis, YAxis } from "recharts";
import { useElementWidth } from "../lib/use-element-width.ts";

export interface BarSeries {
  key: string;
  name: string;
  /** A theme token: the teal accent, or a warm grey beside it. */
  colour: "accent" | "grey";
}

export interface BarRow {
  label: string;
  /** The figure written at the end of the bar, as the table writes it. */
  valueText: string;
  [series: string]: string | number;
}

const fills = { accent: "var(--color-accent)", grey: "var(--color-line-strong)" } as const;
// Each bar has its name written above it, so long flow and finding names get the whole width.
const ROW_HEIGHT = 66;
const BAR_SIZE = 26;
const AXIS_HEIGHT = 36;
const VALUE_ROOM = 120;
const LABEL_PX = 18;

const clip = (text: string, width: number) => {
  const room = Math.max(8, Math.floor(width / (LABEL_PX * 0.52)));
  return text.length <= room ? text : `${text.slice(0, room - 1)}…`;
};

/**
 * Horizontal bars, one row per table row, drawn only once the space has a width (never in a
 * layout-less test browser, where the table beside it carries the figures).
 */
export function InsightBars({ rows, series, label, unit }: { rows: BarRow[]; series: BarSeries[]; label: string; unit?: string }) {
  const [ref, width] = useElementWidth<HTMLDivElement>();
  const height = rows.length * ROW_HEIGHT + AXIS_HEIGHT + 12;
  const last = series.at(-1)!.key;
  return (
    <div className="flex min-w-0 flex-col gap-2">
      {series.length > 1 && <Legend series={series} />}
      <div ref={ref} role="img" aria-label={label} className="w-full min-w-0" style={{ height }}>
      {width > 0 && (
        <BarChart width={width} height={height} data={rows} layout="vertical" margin={{ top: 12, right: VALUE_ROOM, bottom: 0, left: 4 }} accessibilityLayer={false} barCategoryGap={0}>
          <CartesianGrid horizontal={false} stroke="var(--color-line)" />
          <XAxis type="number" allowDecimals={false} height={AXIS_HEIGHT} tick={{ fontSize: 16, fill: "var(--color-ink-muted)" }} stroke="var(--color-line-strong)" tickFormatter={(v: number) => (unit === "%" ? `${v}%` : unit ? `${v} ${unit}` : String(v))} />
          <YAxis type="category" dataKey="label" hide />
          {series.map((s) => (
            <Bar key={s.key} dataKey={s.key} name={s.name} stackId="one" fill={fills[s.colour]} barSize={BAR_SIZE} isAnimationActive={false}>
              {s.key === series[0]!.key && (
                <LabelList
                  dataKey="label"
                  content={(props) => (
                    <text x={Number(props.x)} y={Number(props.y) - 9} fontSize={LABEL_PX} fill="var(--color-ink)">
                      {clip(String(props.value), width - 16)}
                    </text>
                  )}
                />
              )}
              {s.key === last && <LabelList dataKey="valueText" position="right" offset={10} fontSize={18} fontWeight={600} fill="var(--color-ink)" />}
            </Bar>
          ))}
        </BarChart>
        )}
      </div>
    </div>
  );
}

// The series named in words beside a swatch; the table beside the chart has every figure too.
function Legend({ series }: { series: BarSeries[] }) {
  return (
    <ul aria-hidden="true" className="flex flex-wrap gap-x-6 gap-y-1 text-base">
      {series.map((s) => (
        <li key={s.key} className="flex items-center gap-2">
          <span className={`inline-block size-4 rounded-sm ${s.colour === "accent" ? "bg-accent" : "bg-line-strong"}`} />
          {s.name}
        </li>
      ))}
    </ul>
  );
}
