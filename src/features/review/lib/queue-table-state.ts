// The queue's address as TanStack Table state, and back: the server pages, sorts and filters.
import type { ColumnFiltersState } from "@tanstack/react-table";
import type { FilterParam, Filters } from "./queue-params.ts";

/** Columns filtered on one parameter each; the started column takes the date range. */
const columnParams = { tech: "techId", flow: "flowId", finding: "findingStepId", unit: "equipmentKind", flags: "flagged", reviewState: "reviewState" } as const satisfies Record<string, FilterParam>;

export interface DateRange {
  from?: string;
  to?: string;
}

export function columnFiltersOf(filters: Filters): ColumnFiltersState {
  const state: ColumnFiltersState = [];
  for (const [id, param] of Object.entries(columnParams)) {
    const value = filters[param];
    if (value !== undefined) state.push({ id, value });
  }
  if (filters.from !== undefined || filters.to !== undefined) state.push({ id: "startedAt", value: { from: filters.from, to: filters.to } satisfies DateRange });
  return state;
}

/** Every column's parameter, undefined for a column without a filter, so a filter taken off leaves the address too. */
export function filtersOfColumns(state: ColumnFiltersState): Filters {
  const byId = new Map(state.map((f) => [f.id, f.value]));
  const text = (value: unknown) => (typeof value === "string" && value !== "" ? value : undefined);
  const filters: Filters = {};
  for (const [id, param] of Object.entries(columnParams)) filters[param] = text(byId.get(id));
  const range = (byId.get("startedAt") ?? {}) as DateRange;
  filters.from = text(range.from);
  filters.to = text(range.to);
  return filters;
}
