import type { Database } from "../../../server/db/client.ts";
import { buildUser } from "../../factories/users.ts";
import type { TestApp } from "./test-app.ts";
import type { Role } from "../../../shared/schemas/users.ts";

/** A new user of the role, and an agent signed in as them. */
export async function signedInAs(t: TestApp, role: Role) {
  const user = await buildUser(t.ctx.db as Database, { role });
  const agent = t.agent();
  const res = await agent.post("/api/auth/sign-in").send({ email: user.email, password: user.password });
  if (res.status !== 200) throw new Error(`sign-in as ${role} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { user, agent };
}
