import { useId, type ReactNode } from "react";
import { equipmentKinds } from "../../../../shared/equipment.ts";
import type { ReviewOptionsResponse } from "../../../../shared/schemas/review.ts";
import { SelectField } from "../../../components/ui/select-field.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import type { Filters } from "../lib/queue-params.ts";
import type { DateRange } from "../lib/queue-table-state.ts";
import { kindLabel, reviewStateChoices } from "../lib/review-words.ts";
import type { QueueTable } from "../lib/use-queue-table.ts";

interface QueueFiltersProps {
  table: QueueTable;
  filters: Filters;
  options: ReviewOptionsResponse | undefined;
  /** The server's word on a parameter, shown beside its control. */
  errors: Record<string, string>;
}

// A finding picked from the whole list names its flow too: the same step id can end more than one flow.
const findingValue = (flowId: string, stepId: string) => `${flowId} ${stepId}`;

/** Every filter but the search, each one a column filter of the table (the server does the filtering). */
export function QueueFilters({ table, filters, options, errors }: QueueFiltersProps) {
  const id = useId();
  const setColumn = (column: string, value: string) => table.getColumn(column)?.setFilterValue(value === "" ? undefined : value);
  const range: DateRange = { from: filters.from, to: filters.to };
  const setRange = (change: DateRange) => {
    const next = { ...range, ...change };
    table.getColumn("startedAt")?.setFilterValue(next.from || next.to ? next : undefined);
  };
  const flows = options?.flows ?? [];
  const flow = flows.find((f) => f.flowId === filters.flowId);
  const setFlow = (flowId: string) =>
    table.setColumnFilters((old) => [...old.filter((f) => f.id !== "flow" && f.id !== "finding"), ...(flowId === "" ? [] : [{ id: "flow", value: flowId }])]);
  const setFinding = (value: string) => {
    const [flowId, stepId] = value.split(" ");
    if (flow || stepId === undefined) return setColumn("finding", stepId ?? value);
    table.setColumnFilters((old) => [...old.filter((f) => f.id !== "flow" && f.id !== "finding"), { id: "flow", value: flowId }, { id: "finding", value: stepId }]);
  };
  const owner = (flow ? [flow] : flows).find((f) => f.findings.some((x) => x.stepId === filters.findingStepId));
  const findingSelected = filters.findingStepId === undefined ? "" : owner ? findingValue(owner.flowId, filters.findingStepId) : filters.findingStepId;
  return (
    <div className="grid gap-4 sm:grid-cols-2 md:grid-cols-3">
      <SelectField id={`${id}-tech`} label="Tech" value={filters.techId ?? ""} error={errors.techId} onChange={(e) => setColumn("tech", e.currentTarget.value)}>
        <option value="">Every tech</option>
        <KeptChoice value={filters.techId} known={options?.techs.some((t) => t.id === filters.techId)} />
        {options?.techs.map((tech) => (
          <option key={tech.id} value={tech.id}>
            {tech.name}
          </option>
        ))}
      </SelectField>
      <SelectField id={`${id}-flow`} label="Flow" value={filters.flowId ?? ""} error={errors.flowId} onChange={(e) => setFlow(e.currentTarget.value)}>
        <option value="">Every flow</option>
        <KeptChoice value={filters.flowId} known={flow !== undefined} />
        {flows.map((f) => (
          <option key={f.flowId} value={f.flowId}>
            {f.title}
          </option>
        ))}
      </SelectField>
      <SelectField id={`${id}-finding`} label="Finding" value={findingSelected} error={errors.findingStepId} onChange={(e) => setFinding(e.currentTarget.value)}>
        <option value="">Any finding</option>
        <KeptChoice value={filters.findingStepId} known={owner !== undefined} />
        {flow
          ? flow.findings.map((finding) => (
              <option key={finding.stepId} value={findingValue(flow.flowId, finding.stepId)}>
                {finding.title}
              </option>
            ))
          : flows.map((f) => (
              <optgroup key={f.flowId} label={f.title}>
                {f.findings.map((finding) => (
                  <option key={finding.stepId} value={findingValue(f.flowId, finding.stepId)}>
                    {finding.title}
                  </option>
                ))}
              </optgroup>
            ))}
      </SelectField>
      <SelectField id={`${id}-kind`} label="Equipment" value={filters.equipmentKind ?? ""} error={errors.equipmentKind} onChange={(e) => setColumn("unit", e.currentTarget.value)}>
        <option value="">Any equipment</option>
        <KeptChoice value={filters.equipmentKind} known={(equipmentKinds as readonly string[]).includes(filters.equipmentKind ?? "")} />
        {equipmentKinds.map((kind) => (
          <option key={kind} value={kind}>
            {kindLabel(kind)}
          </option>
        ))}
      </SelectField>
      <TextField id={`${id}-from`} label="Started from" type="date" value={filters.from ?? ""} error={errors.from} onChange={(e) => setRange({ from: e.currentTarget.value })} />
      <TextField id={`${id}-to`} label="Started up to" type="date" value={filters.to ?? ""} error={errors.to} onChange={(e) => setRange({ to: e.currentTarget.value })} />
      <SelectField id={`${id}-flagged`} label="Flags" value={filters.flagged ?? ""} error={errors.flagged} onChange={(e) => setColumn("flags", e.currentTarget.value)}>
        <option value="">Flagged or not</option>
        <KeptChoice value={filters.flagged} known={filters.flagged === "true" || filters.flagged === "false"} />
        <option value="true">Flagged only</option>
        <option value="false">Without flags</option>
      </SelectField>
      <SelectField id={`${id}-state`} label="Review" value={filters.reviewState ?? ""} error={errors.reviewState} onChange={(e) => setColumn("reviewState", e.currentTarget.value)}>
        <option value="">Any review state</option>
        <KeptChoice value={filters.reviewState} known={reviewStateChoices.some((c) => c.value === filters.reviewState)} />
        {reviewStateChoices.map((choice) => (
          <option key={choice.value} value={choice.value}>
            {choice.label}
          </option>
        ))}
      </SelectField>
    </div>
  );
}

/** A value from the address the lists do not offer (still loading, or typed by hand) stays chosen, as written. */
function KeptChoice({ value, known }: { value: string | undefined; known: boolean | undefined }): ReactNode {
  if (value === undefined || value === "" || known) return null;
  return <option value={value}>{value}</option>;
}
