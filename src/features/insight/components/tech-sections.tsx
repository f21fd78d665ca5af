import type { InsightResponse } from "../../../../shared/schemas/insight.ts";
import { formatShare, sharePercent } from "../lib/format.ts";
import { InsightBars } from "./insight-bars.tsx";
import { InsightSection } from "./insight-section.tsx";
import type { Column } from "./insight-table.tsx";

type Range = { from: string; to: string };
type Tech = InsightResponse["techs"][number];

const count = (n: number) => n.toLocaleString("en-GB");

const sessionColumns: Column<Tech>[] = [
  { header: "Tech", text: (r) => r.techName, csv: (r) => r.techName },
  { header: "Sessions started", text: (r) => count(r.sessions), csv: (r) => r.sessions, numeric: true },
  { header: "Completed", text: (r) => count(r.completed), csv: (r) => r.completed, numeric: true },
  { header: "Not finished", text: (r) => count(r.sessions - r.completed), csv: (r) => r.sessions - r.completed, numeric: true },
];

export function SessionsPerTech({ rows, range }: { rows: Tech[]; range: Range }) {
  return (
    <InsightSection
      id="sessions-per-tech"
      title="Sessions per tech"
      intro="Checks each tech started in the range, and how many reached a finding. Not finished counts those still open and those given up."
      caption="Sessions started and completed per tech"
      columns={sessionColumns}
      rows={rows}
      rowKey={(r) => r.techId}
      range={range}
      charts={
        <InsightBars
          label="Bar chart of the sessions per tech; the table below has the same figures."
          series={[
            { key: "completed", name: "Completed", colour: "accent" },
            { key: "unfinished", name: "Not finished", colour: "grey" },
          ]}
          rows={rows.map((r) => ({ label: r.techName, completed: r.completed, unfinished: r.sessions - r.completed, valueText: `${count(r.sessions)} started` }))}
        />
      }
    />
  );
}

const reviewColumns: Column<Tech>[] = [
  { header: "Tech", text: (r) => r.techName, csv: (r) => r.techName },
  { header: "Reviewed", text: (r) => count(r.reviewed), csv: (r) => r.reviewed, numeric: true },
  { header: "Sent back", text: (r) => count(r.returned), csv: (r) => r.returned, numeric: true },
  { header: "Sent-back rate", csvHeader: "Sent-back rate (%)", text: (r) => formatShare(r.returnRate), csv: (r) => sharePercent(r.returnRate), numeric: true },
  { header: "Flags", text: (r) => count(r.flags), csv: (r) => r.flags, numeric: true },
  { header: "Flagged sessions", text: (r) => count(r.flaggedSessions), csv: (r) => r.flaggedSessions, numeric: true },
];

export function ReviewsPerTech({ rows, range }: { rows: Tech[]; range: Range }) {
  return (
    <InsightSection
      id="reviews-per-tech"
      title="Sent back and flagged, per tech"
      intro="Of each tech's reviewed sessions, how many the shop lead sent back; and the automatic flags on their completed sessions."
      caption="Reviews, sent-back rate and flags per tech"
      columns={reviewColumns}
      rows={rows}
      rowKey={(r) => r.techId}
      range={range}
      charts={
        <div className="grid min-w-0 gap-6 xl:grid-cols-2">
          <figure className="flex min-w-0 flex-col gap-2">
            <figcaption className="text-lg font-semibold">Sent-back rate</figcaption>
            <InsightBars
              label="Bar chart of the sent-back rate per tech; the table below has the same figures."
              unit="%"
              series={[{ key: "rate", name: "Sent-back rate", colour: "accent" }]}
              rows={rows.map((r) => ({ label: r.techName, rate: sharePercent(r.returnRate) ?? 0, valueText: formatShare(r.returnRate) }))}
            />
          </figure>
          <figure className="flex min-w-0 flex-col gap-2">
            <figcaption className="text-lg font-semibold">Flags on completed sessions</figcaption>
            <InsightBars
              label="Bar chart of the flags per tech; the table below has the same figures."
              series={[{ key: "flags", name: "Flags", colour: "grey" }]}
              rows={rows.map((r) => ({ label: r.techName, flags: r.flags, valueText: count(r.flags) }))}
            />
          </figure>
        </div>
      }
    />
  );
}
