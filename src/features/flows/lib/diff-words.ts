// A structural comparison in words, for people: "Answer “no” leads to “check” (was “dead”)".
import { formatInterval } from "../../../../shared/flow/bands.ts";
import type { Bound } from "../../../../shared/flow/schema.ts";
import type { Change } from "../../../../shared/flow/diff.ts";

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);
const isBound = (v: unknown): v is Bound => isRecord(v) && typeof v.value === "number" && typeof v.inclusive === "boolean";

/** A value short enough for one line. */
export function valueWords(value: unknown): string {
  if (value === undefined) return "nothing";
  if (value === null) return "unbounded";
  if (typeof value === "string") return value === "" ? "empty" : `“${value.length > 160 ? `${value.slice(0, 157)}…` : value}”`;
  if (typeof value === "number" || typeof value === "boolean") return String(value);
  if (isBound(value)) return `${value.value}${value.inclusive ? " (included)" : " (not included)"}`;
  if (Array.isArray(value)) return value.length === 0 ? "none" : value.map(valueWords).join(", ");
  if (isRecord(value)) {
    if (typeof value.label === "string" && typeof value.next === "string") {
      const range = "from" in value && "to" in value ? ` ${formatInterval((value.from as Bound | null) ?? null, (value.to as Bound | null) ?? null, "").trim()}` : "";
      return `“${value.label}”${range} → ${value.next || "nowhere"}`;
    }
    if (typeof value.title === "string") return `“${value.title}”`;
    if (typeof value.signal === "string") return `${value.signal}: ${valueWords(value.text)}`;
    if (typeof value.requirement === "string") return `${value.requirement}: ${valueWords(value.prompt)}`;
    return JSON.stringify(value);
  }
  return String(value);
}

const fieldWords: Record<string, string> = {
  title: "title",
  summary: "summary",
  body: "what to do and why",
  misleads: "how this can mislead",
  photo: "photo",
  prompt: "what to photograph",
  requirement: "requirement",
  minSeconds: "shortest plausible time",
  quantity: "quantity",
  unit: "unit",
  certainty: "certainty",
  explanation: "explanation",
  labourHours: "labour hours",
  parts: "parts",
  followUp: "follow-up checks",
  section: "section",
  kind: "kind",
  appliesTo: "applies to",
  equipment: "equipment",
  cycle: "engine cycle",
  start: "starts at",
  signal: "signal word",
  text: "text",
  label: "label",
  value: "value",
  verdict: "verdict",
  from: "start",
  to: "end",
  evaluation: "evaluation",
  cautions: "safety panels",
  repairs: "repairs",
  bands: "bands",
  options: "order of the answers",
  formatVersion: "format version",
  id: "id",
};

const listItems: Record<string, string> = { bands: "band", cautions: "safety panel", repairs: "repair" };

/** The change's place in plain words: `options[no].next` → "Answer “no”, leads to". */
export function pathWords(path: string): string {
  const tokens = path.match(/[^.[\]]+|\[[^\]]*\]/g) ?? [];
  const words: string[] = [];
  for (let i = 0; i < tokens.length; i++) {
    const token = tokens[i]!;
    const key = tokens[i + 1]?.startsWith("[") ? tokens[i + 1]!.slice(1, -1) : null;
    if (key !== null) i++;
    if (token === "options" && key !== null) words.push(key.startsWith("#") ? `answer ${Number(key.slice(1)) + 1}` : `answer “${key}”`);
    else if (key !== null && listItems[token]) words.push(`${listItems[token]} ${Number(key) + 1}`);
    else if (token === "evaluation" && tokens[i + 1] === "next" && tokens[i + 2]) {
      words.push(`when ${tokens[i + 2]}, goes to`);
      i += 2;
    } else if (token === "next") words.push(words.length === 0 ? "goes to" : "leads to");
    else words.push(`${fieldWords[token] ?? token}${key !== null ? ` ${key}` : ""}`);
  }
  const joined = words.join(", ");
  return joined.charAt(0).toUpperCase() + joined.slice(1);
}

export function changeWords(change: Change): string {
  if (change.before === undefined) return `${pathWords(change.path)}: added ${valueWords(change.after)}`;
  if (change.after === undefined) return `${pathWords(change.path)}: removed (was ${valueWords(change.before)})`;
  return `${pathWords(change.path)}: ${valueWords(change.before)} → ${valueWords(change.after)}`;
}
