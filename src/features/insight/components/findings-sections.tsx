import { equipmentKindLabels } from "../../../../shared/equipment.ts";
import type { InsightResponse } from "../../../../shared/schemas/insight.ts";
import { formatMinutes, roundMinutes } from "../lib/format.ts";
import { InsightBars } from "./insight-bars.tsx";
import { InsightSection } from "./insight-section.tsx";
import type { Column } from "./insight-table.tsx";

type Range = { from: string; to: string };
type ByFlow = InsightResponse["findingsByFlow"][number];
type ByEquipment = InsightResponse["findingsByEquipment"][number];
type Time = InsightResponse["timeToFinding"][number];

const count = (n: number) => n.toLocaleString("en-GB");

const byFlowColumns: Column<ByFlow>[] = [
  { header: "Flow", text: (r) => r.flowTitle, csv: (r) => r.flowTitle },
  { header: "Finding", text: (r) => r.findingTitle, csv: (r) => r.findingTitle },
  { header: "Sessions", text: (r) => count(r.count), csv: (r) => r.count, numeric: true },
];

export function FindingsByFlow({ rows, range }: { rows: ByFlow[]; range: Range }) {
  return (
    <InsightSection
      id="findings-per-flow"
      title="Findings per flow"
      intro="What completed checks ended on, flow by flow, most frequent first."
      caption="Completed sessions per flow and finding"
      columns={byFlowColumns}
      rows={rows}
      rowKey={(r) => `${r.flowId} ${r.findingStepId}`}
      range={range}
      charts={
        <InsightBars
          label="Bar chart of the findings per flow; the table below has the same figures."
          series={[{ key: "count", name: "Sessions", colour: "accent" }]}
          rows={rows.map((r) => ({ label: `${r.findingTitle} (${r.flowTitle})`, count: r.count, valueText: count(r.count) }))}
        />
      }
    />
  );
}

const byEquipmentColumns: Column<ByEquipment>[] = [
  { header: "Equipment", text: (r) => equipmentKindLabels[r.equipmentKind], csv: (r) => equipmentKindLabels[r.equipmentKind] },
  { header: "Finding", text: (r) => r.findingTitle, csv: (r) => r.findingTitle },
  { header: "Sessions", text: (r) => count(r.count), csv: (r) => r.count, numeric: true },
];

export function FindingsByEquipment({ rows, range }: { rows: ByEquipment[]; range: Range }) {
  return (
    <InsightSection
      id="findings-per-equipment"
      title="Findings per kind of equipment"
      intro="The same findings by the kind of machine they were found on."
      caption="Completed sessions per kind of equipment and finding"
      columns={byEquipmentColumns}
      rows={rows}
      rowKey={(r) => `${r.equipmentKind} ${r.findingTitle}`}
      range={range}
      charts={
        <InsightBars
          label="Bar chart of the findings per kind of equipment; the table below has the same figures."
          series={[{ key: "count", name: "Sessions", colour: "accent" }]}
          rows={rows.map((r) => ({ label: `${equipmentKindLabels[r.equipmentKind]}: ${r.findingTitle}`, count: r.count, valueText: count(r.count) }))}
        />
      }
    />
  );
}

const timeColumns: Column<Time>[] = [
  { header: "Flow", text: (r) => r.flowTitle, csv: (r) => r.flowTitle },
  { header: "Completed sessions", text: (r) => count(r.completed), csv: (r) => r.completed, numeric: true },
  { header: "Median time to a finding", csvHeader: "Median minutes to a finding", text: (r) => formatMinutes(r.medianMinutes), csv: (r) => roundMinutes(r.medianMinutes), numeric: true },
];

export function TimeToFinding({ rows, range }: { rows: Time[]; range: Range }) {
  return (
    <InsightSection
      id="time-to-finding"
      title="Time to a finding"
      intro="From starting a check to reaching its finding, the middle value of the completed sessions of each flow."
      caption="Median time from start to finding per flow"
      columns={timeColumns}
      rows={rows}
      rowKey={(r) => r.flowId}
      range={range}
      charts={
        <InsightBars
          label="Bar chart of the median time to a finding per flow; the table below has the same figures."
          unit="min"
          series={[{ key: "minutes", name: "Median minutes", colour: "accent" }]}
          rows={rows.map((r) => ({ label: r.flowTitle, minutes: Math.round(r.medianMinutes), valueText: formatMinutes(r.medianMinutes) }))}
        />
      }
    />
  );
}
