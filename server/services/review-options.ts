import { asc, desc, eq } from "drizzle-orm";
import type { AppContext } from "../context.ts";
import { diagnosticSessions, flows, flowVersions, users } from "../db/schema.ts";
import { can } from "../auth/policies.ts";
import { compiledVersion } from "./flows.ts";
import type { ReviewOptionsResponse } from "../../shared/schemas/review.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

const s = diagnosticSessions;

/**
 * The choices for the queue's filters, taken from the sessions the caller may list (a tech only
 * their own, as in the queue): every tech who ran one, and every flow one ran on with the findings
 * of those versions, by title. A finding renamed in a later version shows its newest title.
 */
export async function reviewOptions(ctx: Pick<AppContext, "db">, user: PublicUser): Promise<ReviewOptionsResponse> {
  const own = can(user, "review.list_all") ? undefined : eq(s.techId, user.id);
  const techs = await ctx.db.selectDistinct({ id: users.id, name: users.name }).from(s).innerJoin(users, eq(users.id, s.techId)).where(own).orderBy(asc(users.name), asc(users.id));
  const versions = await ctx.db
    .selectDistinct({ versionId: s.flowVersionId, flowId: flows.id, title: flows.title, number: flowVersions.number })
    .from(s)
    .innerJoin(flowVersions, eq(flowVersions.id, s.flowVersionId))
    .innerJoin(flows, eq(flows.id, flowVersions.flowId))
    .where(own)
    .orderBy(asc(flows.title), asc(flows.id), desc(flowVersions.number));
  const byFlow = new Map<string, ReviewOptionsResponse["flows"][number] & { seen: Set<string> }>();
  for (const version of versions) {
    let flow = byFlow.get(version.flowId);
    if (!flow) byFlow.set(version.flowId, (flow = { flowId: version.flowId, title: version.title, findings: [], seen: new Set() }));
    const compiled = await compiledVersion(ctx.db, version.versionId);
    for (const step of Object.values(compiled.steps)) {
      if (step.kind !== "finding" || flow.seen.has(step.id)) continue;
      flow.seen.add(step.id);
      flow.findings.push({ stepId: step.id, title: step.title });
    }
  }
  const byTitle = (a: { title: string }, b: { title: string }) => a.title.localeCompare(b.title, "en");
  return { techs, flows: [...byFlow.values()].map(({ seen: _seen, ...flow }) => ({ ...flow, findings: flow.findings.sort(byTitle) })) };
}
