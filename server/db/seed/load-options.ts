// The load data's shape: about two years of a busy shop, 100,000 sessions by fifteen techs for
// thousands of customers, made by the demo's own generator.
import path from "node:path";
import { projectRoot } from "../../flows/builtin.ts";
import { firstNames, lastNames, type TechSpec } from "./history-cast.ts";
import type { HistoryOptions } from "./history.ts";

export const loadDataDir = () => path.resolve(process.env.LOAD_DATA_DIR || path.join(projectRoot(), "data-load"));
export const LOAD_SESSIONS = 100_000;

/** Thirteen more techs beside the demo's two, every one invented. */
export function loadTechs(): TechSpec[] {
  return Array.from({ length: 13 }, (_, i) => {
    const first = firstNames[(i * 7 + 3) % firstNames.length]!;
    const last = lastNames[(i * 11 + 5) % lastNames.length]!;
    const email = `${first}.${last}`.toLowerCase().replace(/[^a-z.]+/g, "");
    return { email: `${email}@kettlecreek.example`, name: `${first} ${last}`, role: i % 4 === 0 ? "senior_tech" : "apprentice", unitSystem: i % 5 === 2 ? "metric" : "imperial", password: "bench-load-tech", share: 0.7 + (i % 3) * 0.2 };
  });
}

export const loadHistory: Partial<HistoryOptions> = {
  seed: 20_240_601,
  days: 730,
  sessions: LOAD_SESSIONS,
  extraTechs: loadTechs(),
  openSessions: 8,
  waitingForDiagnosis: 12,
  returnRate: 0.04,
  returnedPerTech: undefined,
  minWaitingPerTech: 3,
  minFlaggedWaitingPerTech: 1,
  newCustomerShare: 0.35,
  jobsPerBatch: 2000,
};

