// The shape of the invented history before any session is walked: which day each unit came in, who
// checked it, and what became of each check (completed, abandoned, left open; reviewed or waiting).
import { kinds } from "./history-cast.ts";
import { createRandom, type Random } from "./random.ts";

export interface ScheduleTech {
  id: string;
  share: number;
  /** The bench home of this tech stays tidy: no open sessions, at most one sent back. */
  tidy: boolean;
}

export interface ScheduleOptions {
  seed: number;
  now: number;
  days: number;
  sessions: number;
  kindsAvailable: ReadonlySet<number>;
  techs: readonly ScheduleTech[];
  openSessions: number;
  waitingForDiagnosis: number;
  /** Share of reviewed sessions sent back; or, when returnedPerTech is set, exactly that many recent ones per tech. */
  returnRate: number;
  returnedPerTech?: number;
  minWaitingPerTech: number;
  minFlaggedWaitingPerTech: number;
  newCustomerShare: number;
}

export type Outcome = "completed" | "abandoned" | "open";
export interface SessionSpec {
  tech: number;
  startedAt: number;
  outcome: Outcome;
  review: "approved" | "returned" | "waiting" | "none";
  /** Time from completion to the shop lead's sign-off. */
  reviewLag: number;
  rush: boolean;
  overnight: boolean;
}

export interface Job {
  intakeAt: number;
  kind: number;
  /** Who brings it in and which unit it is: a returning customer shares the key of an earlier job, and so may the unit. */
  customer: number;
  unit: number;
  /** The unit went home before anyone finished a check on it. */
  collected: boolean;
  sessions: SessionSpec[];
}

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
/** Kettle Creek keeps shop hours of 08:30 to 17:00 at UTC-5. */
const OPENS = 13.5 * HOUR;
const CLOSES = 22 * HOUR;
const weekday = [0.05, 1, 1, 1, 1, 1, 0.5];
/** Longest a check can take on the bench (with time to spare); one left overnight takes up to a day and a half. */
export const LONGEST_CHECK = 5 * HOUR;
export const LONGEST_OVERNIGHT = 36 * HOUR;

function cumulative(weights: number[]): number[] {
  let total = 0;
  return weights.map((w) => (total += w));
}

function pickIndex(cum: number[], rng: Random): number {
  const x = rng.next() * cum[cum.length - 1]!;
  let lo = 0;
  let hi = cum.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (cum[mid]! > x) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

const lagOf = (rng: Random) => (rng.chance(0.7) ? rng.between(2, 30) : rng.between(30, 100)) * HOUR;

/** A check that cannot be finished by now moves to the same hour of the day before. */
function newSession(o: ScheduleOptions, techCum: number[], startedAt: number, rng: Random): SessionSpec {
  const overnight = rng.chance(0.02);
  const longest = overnight ? LONGEST_OVERNIGHT : LONGEST_CHECK;
  while (startedAt > o.now - longest) startedAt -= DAY;
  const reviewLag = lagOf(rng);
  const review = startedAt + longest + reviewLag < o.now ? "approved" : "waiting";
  return { tech: pickIndex(techCum, rng), startedAt, outcome: "completed", review, reviewLag, rush: false, overnight };
}

export function schedule(o: ScheduleOptions): Job[] {
  const rng = createRandom(o.seed);
  const firstDay = Math.floor((o.now - o.days * DAY) / DAY) * DAY;
  const dayCount = Math.floor((o.now - firstDay) / DAY);
  const usable = kinds.map((k, i) => (o.kindsAvailable.has(i) ? k : null));
  const dayWeight = Array.from({ length: dayCount }, (_, d) => {
    const date = new Date(firstDay + d * DAY);
    return weekday[date.getUTCDay()]! * usable.reduce((sum, k) => sum + (k ? k.weight * k.season[date.getUTCMonth()]! : 0), 0);
  });
  const dayCum = cumulative(dayWeight);
  const techCum = cumulative(o.techs.map((t) => t.share));
  const days: number[] = [];
  for (let n = 0; n < o.sessions; n++) days.push(pickIndex(dayCum, rng));
  days.sort((a, b) => a - b);
  const jobs: Job[] = [];
  const keys = { customer: 0, unit: 0 };
  let count = 0;
  for (const d of days) {
    if (count >= o.sessions) break;
    const dayStart = firstDay + d * DAY;
    const month = new Date(dayStart).getUTCMonth();
    const first = newSession(o, techCum, dayStart + rng.between(OPENS, CLOSES - HOUR), rng);
    const kind = rng.weighted(usable.flatMap((k, i) => (k ? [[i, k.weight * k.season[month]!] as const] : [])));
    const intakeAt = first.startedAt - rng.between(0.3, rng.chance(0.6) ? 8 : 72) * HOUR;
    const before = jobs.length > 0 && !rng.chance(o.newCustomerShare) ? rng.pick(jobs) : null;
    const sameUnit = before !== null && rng.chance(0.3);
    const job: Job = {
      intakeAt,
      kind: sameUnit ? before.kind : kind,
      customer: before ? before.customer : keys.customer++,
      unit: sameUnit ? before.unit : keys.unit++,
      collected: false,
      sessions: [],
    };
    if (rng.chance(0.04)) {
      job.sessions.push({ ...first, outcome: "abandoned", review: "none", overnight: false });
      const again = newSession(o, techCum, first.startedAt + rng.between(3, 30) * HOUR, rng);
      // Otherwise it waits for someone to check it again.
      if (rng.chance(0.2)) job.collected = true;
      else if (again.startedAt > first.startedAt + LONGEST_CHECK) job.sessions.push(again);
    } else job.sessions.push(first);
    count += job.sessions.length;
    jobs.push(job);
  }
  settle(jobs, keys, o, rng);
  return jobs.sort((a, b) => a.intakeAt - b.intakeAt);
}

function settle(jobs: Job[], keys: { customer: number; unit: number }, o: ScheduleOptions, rng: Random) {
  // Checks still on the bench now, by anyone whose bench home may show them.
  jobs.sort((a, b) => a.intakeAt - b.intakeAt);
  const busy = jobs.filter((j) => !j.collected && j.sessions.length === 1 && !o.techs[j.sessions[0]!.tech]!.tidy).slice(-Math.max(o.openSessions * 4, 1));
  for (let n = 0; n < o.openSessions && busy.length > 0; n++) {
    const job = busy.splice(rng.int(0, busy.length - 1), 1)[0]!;
    const s = job.sessions[0]!;
    Object.assign(s, { outcome: "open", review: "none", rush: false, overnight: false, startedAt: o.now - rng.between(0.3, 3) * HOUR });
    job.intakeAt = Math.min(job.intakeAt, s.startedAt - rng.between(0.5, 20) * HOUR);
  }
  const completed = (tech: number) => jobs.flatMap((j) => j.sessions).filter((s) => s.tech === tech && s.outcome === "completed").sort((a, b) => b.startedAt - a.startedAt);
  o.techs.forEach((tech, t) => {
    const own = completed(t);
    // A backlog for the shop lead: each tech's latest checks wait for review.
    for (const s of own.slice(0, o.minWaitingPerTech)) s.review = "waiting";
    own.filter((s) => s.review === "waiting").slice(0, o.minFlaggedWaitingPerTech).forEach((s) => (s.rush = true));
    const reviewed = own.filter((s) => s.review === "approved");
    if (o.returnedPerTech !== undefined) {
      const recent = reviewed.filter((s) => s.startedAt > o.now - 30 * DAY);
      for (const s of (recent.length > 0 ? recent : reviewed).slice(0, tech.tidy ? Math.min(1, o.returnedPerTech) : o.returnedPerTech)) s.review = "returned";
    } else for (const s of reviewed) if (rng.chance(o.returnRate)) s.review = "returned";
  });
  for (let n = 0; n < o.waitingForDiagnosis; n++) {
    jobs.push({ intakeAt: o.now - rng.between(0.5, 20) * HOUR, kind: rng.pick([...o.kindsAvailable]), customer: keys.customer++, unit: keys.unit++, collected: false, sessions: [] });
  }
}
