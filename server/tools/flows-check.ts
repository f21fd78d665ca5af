// flows:check — validates every built-in section and flow; exits 1 on any error (warnings pass).
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { basename, join, relative } from "node:path";
import { fileURLToPath } from "node:url";
import type { Problem } from "../../shared/flow/problems.ts";
import type { SectionDefinition } from "../../shared/flow/schema.ts";
import { validateFlow, validateSection } from "../../shared/flow/validate.ts";

export interface FileProblem extends Problem {
  file: string;
}

export interface FolderReport {
  flows: number;
  sections: number;
  problems: FileProblem[];
}

function jsonFiles(dir: string): string[] {
  return existsSync(dir) ? readdirSync(dir).filter((f) => f.endsWith(".json")).sort().map((f) => join(dir, f)) : [];
}

function readJson(path: string): { ok: true; value: unknown } | { ok: false; message: string } {
  try {
    return { ok: true, value: JSON.parse(readFileSync(path, "utf8")) };
  } catch (e) {
    return { ok: false, message: `not valid JSON: ${e instanceof Error ? e.message : String(e)}` };
  }
}

const idOf = (v: unknown) => (typeof v === "object" && v !== null && typeof (v as { id?: unknown }).id === "string" ? (v as { id: string }).id : null);

/** Checks a flows folder (flows/*.json plus flows/sections/*.json) and reports per file. */
export function checkFlowsFolder(dir: string): FolderReport {
  const problems: FileProblem[] = [];
  const at = (path: string) => relative(dir, path) || basename(path);
  const report = (path: string, p: Omit<Problem, "severity">, severity: Problem["severity"] = "error") => problems.push({ file: at(path), severity, ...p });

  const sectionFiles = jsonFiles(join(dir, "sections"));
  const sections: unknown[] = [];
  const seen = new Map<string, string>();
  const loaded = sectionFiles.map((path) => ({ path, json: readJson(path) }));
  for (const { path, json } of loaded) {
    if (!json.ok) {
      report(path, { stepId: null, code: "schema_invalid", message: json.message });
      continue;
    }
    const id = idOf(json.value);
    if (id !== null && seen.has(id)) report(path, { stepId: null, code: "schema_invalid", message: `section id "${id}" is already used by ${seen.get(id)}` });
    else if (id !== null) seen.set(id, at(path));
    if (id !== null && `${id}.json` !== basename(path)) report(path, { stepId: null, code: "schema_invalid", message: `the file of section "${id}" should be named ${id}.json` }, "warning");
    sections.push(json.value);
  }
  // Unchecked as yet: the validators read a library entry only when it is called, and check it then.
  const library = sections as SectionDefinition[];
  for (const { path, json } of loaded) {
    if (json.ok) for (const p of validateSection(json.value, library).problems) problems.push({ file: at(path), ...p });
  }

  const flowFiles = jsonFiles(dir);
  for (const path of flowFiles) {
    const json = readJson(path);
    if (!json.ok) {
      report(path, { stepId: null, code: "schema_invalid", message: json.message });
      continue;
    }
    for (const p of validateFlow(json.value, library).problems) problems.push({ file: at(path), ...p });
  }
  return { flows: flowFiles.length, sections: sectionFiles.length, problems };
}

export function formatReport(report: FolderReport): { lines: string[]; failed: boolean } {
  const lines = report.problems.map((p) => `${p.severity === "error" ? "ERROR  " : "warning"}  ${p.file}  ${p.stepId ?? "-"}  ${p.code}  ${p.message}`);
  const errors = report.problems.filter((p) => p.severity === "error").length;
  const warnings = report.problems.length - errors;
  const counted = `${report.flows} flow${report.flows === 1 ? "" : "s"} and ${report.sections} section${report.sections === 1 ? "" : "s"}`;
  const verdict = errors > 0 ? `${errors} failing, ${warnings} warning${warnings === 1 ? "" : "s"}` : `all pass${warnings > 0 ? ` with ${warnings} warning${warnings === 1 ? "" : "s"}` : ""}`;
  lines.push(`flows:check: ${counted} checked; ${verdict}`);
  return { lines, failed: errors > 0 };
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const dir = process.argv[2] ?? fileURLToPath(new URL("../../flows/", import.meta.url));
  const { lines, failed } = formatReport(checkFlowsFolder(dir));
  for (const line of lines) console.log(line);
  process.exitCode = failed ? 1 : 0;
}
