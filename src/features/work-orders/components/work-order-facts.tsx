import type { ReactNode } from "react";
import { equipmentKindLabels, type CompressionRelease } from "../../../../shared/equipment.ts";
import { tankContentLabels, type WorkOrderDetail } from "../../../../shared/schemas/work-orders.ts";

const releaseWords: Record<CompressionRelease, string> = { yes: "Fitted", no: "Not fitted", unknown: "Not known" };
const notGiven = <span className="text-ink-muted">Not given</span>;

function orNot(value: string | number | null | undefined, unit?: string): ReactNode {
  if (value === null || value === undefined || value === "") return notGiven;
  return unit ? `${value} ${unit}` : String(value);
}

function Facts({ title, id, rows }: { title: string; id: string; rows: [string, ReactNode][] }) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-3">
      <h2 id={id} className="text-2xl font-semibold">
        {title}
      </h2>
      <dl className="grid grid-cols-[10rem_minmax(0,1fr)] gap-x-5 gap-y-2">
        {rows.map(([term, value]) => (
          <div key={term} className="contents">
            <dt className="text-ink-muted">{term}</dt>
            <dd className="min-w-0 font-medium break-words tabular-figures">{value}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}

export function WorkOrderFacts({ workOrder }: { workOrder: WorkOrderDetail }) {
  const { customer, unit } = workOrder;
  return (
    <div className="flex flex-col gap-7">
      <Facts id="facts-complaint" title="The complaint" rows={[
        ["Customer says", <q key="q">{workOrder.complaint}</q>],
        ["Already tried", orNot(workOrder.alreadyTried)],
        ["In the tank", tankContentLabels[workOrder.tankContents]],
      ]} />
      <Facts id="facts-unit" title="Unit and engine" rows={[
        ["Kind", equipmentKindLabels[unit.equipmentKind]],
        ["Make and model", `${unit.make} ${unit.model}`],
        ["Engine model", orNot(unit.engineModel)],
        ["Type or spec", orNot(unit.engineType)],
        ["Engine serial", orNot(unit.engineSerial)],
        ["Cycle", `${unit.cycle}-stroke`],
        ["Displacement", orNot(unit.displacementCc, "cc")],
        ["Compression release", releaseWords[unit.compressionRelease ?? "unknown"]],
        ["Hour meter", orNot(unit.hours, "h")],
      ]} />
      <Facts id="facts-customer" title="Customer" rows={[
        ["Name", customer.name],
        ["Phone", customer.phone ? <a key="p" href={`tel:${customer.phone}`} className="inline-flex min-h-12 items-center underline decoration-2 underline-offset-4">{customer.phone}</a> : notGiven],
        ["E-mail", orNot(customer.email)],
      ]} />
    </div>
  );
}
