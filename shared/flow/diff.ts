// A structural comparison of two flow definitions: what the history screen and the editor's
// conflict view show. Either side may be an unfinished draft, so nothing here assumes the schema.

/** One difference at a path such as `title`, `cautions[1].text` or `options[yes].next`; undefined means absent. */
export interface Change {
  path: string;
  before: unknown;
  after: unknown;
}

export interface StepDiff {
  stepId: string;
  /** The step's title on the newer side (else the older), for naming it. */
  title: string;
  /** Everything that is not a way out of the step. */
  fields: Change[];
  /** The ways out: next targets, options, bands and the evaluation's targets. */
  branches: Change[];
}

export interface FlowDiff {
  /** True when nothing at all differs. */
  same: boolean;
  /** The envelope: title, summary, what it applies to, start. */
  flow: Change[];
  added: Array<{ stepId: string; step: unknown }>;
  removed: Array<{ stepId: string; step: unknown }>;
  /** A step that only changed its id: removed under one id and added, word for word, under another. */
  renamed: Array<{ from: string; to: string }>;
  changed: StepDiff[];
  /** Embedded sections by id. */
  sections: { added: string[]; removed: string[]; changed: string[] };
}

type Dict = Record<string, unknown>;
const isRecord = (v: unknown): v is Dict => typeof v === "object" && v !== null && !Array.isArray(v);
const recordOf = (v: unknown): Dict => (isRecord(v) ? v : {});
const own = (o: Dict, k: string) => (Object.prototype.hasOwnProperty.call(o, k) ? o[k] : undefined);

/** Deep equality of JSON values; object keys in any order, arrays in order. */
export function sameValue(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (Array.isArray(a) || Array.isArray(b)) {
    if (!Array.isArray(a) || !Array.isArray(b) || a.length !== b.length) return false;
    return a.every((item, i) => sameValue(item, b[i]));
  }
  if (!isRecord(a) || !isRecord(b)) return Number.isNaN(a) && Number.isNaN(b);
  const keys = Object.keys(a).filter((k) => a[k] !== undefined);
  if (keys.length !== Object.keys(b).filter((k) => b[k] !== undefined).length) return false;
  return keys.every((k) => sameValue(a[k], own(b, k)));
}

/** Keys of both, the older side's order first. */
function unionKeys(a: Dict, b: Dict): string[] {
  const keys = Object.keys(a);
  for (const k of Object.keys(b)) if (!Object.prototype.hasOwnProperty.call(a, k)) keys.push(k);
  return keys;
}

const join = (path: string, key: string) => (path === "" ? key : `${path}.${key}`);

/** Leaf differences: objects by key, lists of objects by position, anything else whole. */
function compareValues(before: unknown, after: unknown, path: string, out: Change[]): void {
  if (sameValue(before, after)) return;
  if (isRecord(before) && isRecord(after)) {
    for (const k of unionKeys(before, after)) compareValues(own(before, k), own(after, k), join(path, k), out);
    return;
  }
  const objectList = (v: unknown) => Array.isArray(v) && v.some(isRecord);
  if (Array.isArray(before) && Array.isArray(after) && (objectList(before) || objectList(after))) {
    for (let i = 0; i < Math.max(before.length, after.length); i++) compareValues(before[i], after[i], `${path}[${i}]`, out);
    return;
  }
  out.push({ path, before, after });
}

/** Options keyed by their value when every value is a distinct string, else by position. */
function optionsByKey(list: unknown): Map<string, unknown> {
  const items = Array.isArray(list) ? list : [];
  const values = items.map((o) => (isRecord(o) && typeof o.value === "string" ? o.value : null));
  const byValue = values.every((v) => v !== null) && new Set(values).size === values.length;
  return new Map(items.map((o, i) => [byValue ? values[i]! : `#${i}`, o]));
}

function compareOptions(before: unknown, after: unknown, out: Change[]): void {
  const a = optionsByKey(before);
  const b = optionsByKey(after);
  for (const key of unionKeys(Object.fromEntries(a), Object.fromEntries(b))) {
    const x = a.get(key);
    const y = b.get(key);
    const path = `options[${key}]`;
    if (x === undefined || y === undefined || !isRecord(x) || !isRecord(y)) {
      if (!sameValue(x, y)) out.push({ path, before: x, after: y });
      continue;
    }
    for (const k of unionKeys(x, y)) if (!sameValue(own(x, k), own(y, k))) out.push({ path: `${path}.${k}`, before: own(x, k), after: own(y, k) });
  }
  const order = (m: Map<string, unknown>, other: Map<string, unknown>) => [...m.keys()].filter((k) => other.has(k));
  const kept = order(a, b);
  if (kept.join("\u0000") !== order(b, a).join("\u0000")) out.push({ path: "options", before: kept, after: order(b, a) });
}

function compareBands(before: unknown, after: unknown, out: Change[]): void {
  const a = Array.isArray(before) ? before : before === undefined ? [] : null;
  const b = Array.isArray(after) ? after : after === undefined ? [] : null;
  if (a === null || b === null) {
    out.push({ path: "bands", before, after });
    return;
  }
  for (let i = 0; i < Math.max(a.length, b.length); i++) {
    const x: unknown = a[i];
    const y: unknown = b[i];
    if (!isRecord(x) || !isRecord(y)) {
      if (!sameValue(x, y)) out.push({ path: `bands[${i}]`, before: x, after: y });
      continue;
    }
    // A bound is one thing to a reader ("from 0.25, inclusive"), so it is compared whole.
    for (const k of unionKeys(x, y)) if (!sameValue(own(x, k), own(y, k))) out.push({ path: `bands[${i}].${k}`, before: own(x, k), after: own(y, k) });
  }
}

const BRANCH_KEYS = new Set(["next", "options", "bands", "evaluation"]);

export function diffStep(stepId: string, before: unknown, after: unknown): StepDiff {
  const x = recordOf(before);
  const y = recordOf(after);
  const fields: Change[] = [];
  const branches: Change[] = [];
  for (const k of unionKeys(x, y)) {
    if (!BRANCH_KEYS.has(k)) compareValues(own(x, k), own(y, k), k, fields);
  }
  if (!sameValue(own(x, "next"), own(y, "next"))) branches.push({ path: "next", before: own(x, "next"), after: own(y, "next") });
  if (!sameValue(own(x, "options"), own(y, "options"))) compareOptions(own(x, "options"), own(y, "options"), branches);
  if (!sameValue(own(x, "bands"), own(y, "bands"))) compareBands(own(x, "bands"), own(y, "bands"), branches);
  const ex = own(x, "evaluation");
  const ey = own(y, "evaluation");
  if (!sameValue(ex, ey)) {
    if (isRecord(ex) && isRecord(ey)) compareValues(ex, ey, "evaluation", branches);
    else branches.push({ path: "evaluation", before: ex, after: ey });
  }
  const title = typeof y.title === "string" ? y.title : typeof x.title === "string" ? x.title : stepId;
  return { stepId, title, fields, branches };
}

const ENVELOPE_SKIP = new Set(["steps", "sections"]);

/** What changed from `before` to `after` (older to newer, or theirs to mine). */
export function diffFlows(before: unknown, after: unknown): FlowDiff {
  const a = recordOf(before);
  const b = recordOf(after);
  const flow: Change[] = [];
  for (const k of unionKeys(a, b)) if (!ENVELOPE_SKIP.has(k)) compareValues(own(a, k), own(b, k), k, flow);

  const stepsA = recordOf(a.steps);
  const stepsB = recordOf(b.steps);
  let added = Object.keys(stepsB).filter((id) => own(stepsA, id) === undefined).map((stepId) => ({ stepId, step: stepsB[stepId] }));
  let removed = Object.keys(stepsA).filter((id) => own(stepsB, id) === undefined).map((stepId) => ({ stepId, step: stepsA[stepId] }));
  const renamed: FlowDiff["renamed"] = [];
  for (const gone of removed) {
    const twin = added.find((candidate) => sameValue(candidate.step, gone.step));
    if (!twin) continue;
    renamed.push({ from: gone.stepId, to: twin.stepId });
    added = added.filter((candidate) => candidate !== twin);
  }
  removed = removed.filter((gone) => !renamed.some((r) => r.from === gone.stepId));

  const changed: StepDiff[] = [];
  for (const id of Object.keys(stepsB)) {
    const old = own(stepsA, id);
    if (old === undefined || sameValue(old, stepsB[id])) continue;
    changed.push(diffStep(id, old, stepsB[id]));
  }

  const sectionsA = recordOf(a.sections);
  const sectionsB = recordOf(b.sections);
  const sections = {
    added: Object.keys(sectionsB).filter((id) => own(sectionsA, id) === undefined),
    removed: Object.keys(sectionsA).filter((id) => own(sectionsB, id) === undefined),
    changed: Object.keys(sectionsB).filter((id) => own(sectionsA, id) !== undefined && !sameValue(sectionsA[id], sectionsB[id])),
  };
  const same =
    flow.length === 0 &&
    added.length === 0 &&
    removed.length === 0 &&
    renamed.length === 0 &&
    changed.length === 0 &&
    sections.added.length + sections.removed.length + sections.changed.length === 0;
  return { same, flow, added, removed, renamed, changed, sections };
}
