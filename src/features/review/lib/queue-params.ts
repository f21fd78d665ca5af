// The queue's whole state lives in the address, under the API's own parameter names.
import { reviewSorts, type ReviewSort } from "../../../../shared/schemas/review.ts";

export const filterParams = ["techId", "flowId", "findingStepId", "equipmentKind", "from", "to", "flagged", "reviewState", "search"] as const;
export type FilterParam = (typeof filterParams)[number];
export type Filters = Partial<Record<FilterParam, string>>;

export const pageSizes = [10, 25, 50, 100] as const;
export const DEFAULT_PAGE_SIZE = 25;

export interface QueueView {
  page: number;
  pageSize: number;
  sort: ReviewSort;
  order: "asc" | "desc";
  filters: Filters;
}

const wholeFrom1 = (text: string | null) => (text !== null && /^[1-9]\d*$/.test(text) ? Number(text) : null);

/** The address read for the controls; anything it cannot read shows as the default (the server still judges the address as written). */
export function readView(params: URLSearchParams): QueueView {
  const sort = params.get("sort");
  const filters: Filters = {};
  for (const name of filterParams) {
    const value = params.get(name);
    if (value !== null && value !== "") filters[name] = value;
  }
  return {
    page: wholeFrom1(params.get("page")) ?? 1,
    pageSize: wholeFrom1(params.get("pageSize")) ?? DEFAULT_PAGE_SIZE,
    sort: (reviewSorts as readonly string[]).includes(sort ?? "") ? (sort as ReviewSort) : "startedAt",
    order: params.get("order") === "asc" ? "asc" : "desc",
    filters,
  };
}

/** The request for the address: every parameter as written, in a fixed order, so one view is one cache entry. */
export function queueRequest(params: URLSearchParams): string {
  const sorted = new URLSearchParams([...params].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
  return sorted.toString();
}

/** The address with these filters changed (undefined or "" removes one), back on page 1. */
export function withFilters(params: URLSearchParams, changes: Filters): URLSearchParams {
  const next = new URLSearchParams(params);
  for (const [name, value] of Object.entries(changes)) {
    if (value === undefined || value === "") next.delete(name);
    else next.set(name, value);
  }
  next.set("page", "1");
  return next;
}

export function withSort(params: URLSearchParams, sort: ReviewSort, order: "asc" | "desc"): URLSearchParams {
  const next = new URLSearchParams(params);
  next.set("sort", sort);
  next.set("order", order);
  next.set("page", "1");
  return next;
}

/** A new page size starts again at page 1. */
export function withPage(params: URLSearchParams, page: number, pageSize: number): URLSearchParams {
  const next = new URLSearchParams(params);
  const sizeChanged = pageSize !== readView(params).pageSize;
  next.set("page", String(sizeChanged ? 1 : page));
  if (sizeChanged) next.set("pageSize", String(pageSize));
  return next;
}

/** Every filter gone; the sort and page size stay. */
export function withoutFilters(params: URLSearchParams): URLSearchParams {
  return withFilters(params, Object.fromEntries(filterParams.map((name) => [name, undefined])));
}

/** Filters set beyond the waiting view's own. */
export function extraFilterCount(filters: Filters): number {
  return Object.entries(filters).filter(([name, value]) => value !== undefined && !(name === "reviewState" && value === "waiting")).length;
}
