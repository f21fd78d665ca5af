// The built-in check flows shipped in flows/*.json, resolved with their sections from flows/sections.
import { existsSync, readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { resolveSections } from "../../shared/flow/compile.ts";
import { FlowInvalidError } from "../../shared/flow/problems.ts";
import type { FlowDefinition, SectionDefinition } from "../../shared/flow/schema.ts";

export class BuiltInFlowError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "BuiltInFlowError";
  }
}

/** The folder holding package.json: the sources (server/flows) and the bundle (dist/server) sit at different depths. */
export function projectRoot(from = path.dirname(fileURLToPath(import.meta.url))): string {
  for (let dir = from; ; dir = path.dirname(dir)) {
    if (existsSync(path.join(dir, "package.json")) && existsSync(path.join(dir, "flows"))) return dir;
    if (path.dirname(dir) === dir) throw new BuiltInFlowError(`Benchpath cannot find its flows folder above ${from}.`);
  }
}

export const flowsFolder = () => path.join(projectRoot(), "flows");

function readJson(file: string): unknown {
  try {
    return JSON.parse(readFileSync(file, "utf8"));
  } catch (e) {
    throw new BuiltInFlowError(`The built-in flow file ${file} is not valid JSON: ${e instanceof Error ? e.message : String(e)}`);
  }
}

const jsonFiles = (dir: string) => (existsSync(dir) ? readdirSync(dir).filter((f) => f.endsWith(".json")).sort().map((f) => path.join(dir, f)) : []);

let cached: { dir: string; flows: FlowDefinition[] } | null = null;
let cachedSections: { dir: string; sections: SectionDefinition[] } | null = null;

/** The shop's section library (flows/sections/*.json) as read, for validating drafts; unchecked here, the validator names what is wrong. */
export function loadBuiltInSections(dir = flowsFolder()): SectionDefinition[] {
  if (cachedSections?.dir === dir) return cachedSections.sections;
  const sections = jsonFiles(path.join(dir, "sections")).map(readJson) as SectionDefinition[];
  cachedSections = { dir, sections };
  return sections;
}

/** Every built-in flow, validated and with its sections embedded; throws BuiltInFlowError naming the file and its problems. */
export function loadBuiltInFlows(dir = flowsFolder()): FlowDefinition[] {
  if (cached?.dir === dir) return cached.flows;
  const sections = loadBuiltInSections(dir);
  const flows = jsonFiles(dir).map((file) => {
    try {
      return resolveSections(readJson(file), sections);
    } catch (e) {
      if (!(e instanceof FlowInvalidError)) throw e;
      const problems = e.problems.filter((p) => p.severity === "error").map((p) => `  - ${p.stepId ? `step "${p.stepId}": ` : ""}${p.message}`);
      throw new BuiltInFlowError(`The built-in flow ${path.basename(file)} is not valid:\n${problems.join("\n")}`);
    }
  });
  cached = { dir, flows };
  return flows;
}
