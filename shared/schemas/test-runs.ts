// A test run after the repair: the five checks, passed or not, and who ran it.
import { z } from "zod";
import { testRunCheckIds } from "../work-orders/moves.ts";

const yesNo = (what: string) => z.boolean({ error: `Answer yes or no: ${what}.` });

export const testRunChecksSchema = z.object({
  throttleReturns: yesNo("does the throttle return to idle"),
  stopSwitchStops: yesNo("does the stop switch stop the engine"),
  steadyIdle: yesNo("does it idle steadily"),
  attachmentStillAtIdle: yesNo("does the cutting attachment stay still at idle"),
  runsUnderLoad: yesNo("does it run under load"),
});

export const recordTestRunRequestSchema = z.object({
  checks: testRunChecksSchema,
  note: z.string().trim().max(1000, { error: "Use at most 1000 characters." }).default(""),
});
export type RecordTestRunRequest = z.input<typeof recordTestRunRequestSchema>;

export const testRunSchema = z.object({
  id: z.string(),
  checks: z.record(z.enum(testRunCheckIds), z.boolean()),
  passed: z.boolean(),
  note: z.string(),
  by: z.object({ id: z.string(), name: z.string() }).nullable(),
  at: z.string(),
});
export type TestRun = z.infer<typeof testRunSchema>;
