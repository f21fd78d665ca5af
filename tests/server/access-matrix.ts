import type { Role } from "../../shared/schemas/users.ts";

export type Who = "anonymous" | Role;

export interface AccessRow {
  method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  /** The route as registered, e.g. /api/work-orders/:id */
  route: string;
  /** The concrete path requested; defaults to the route. */
  path?: string;
  body?: unknown;
  /** Whether the request ends the caller's session (the test signs in again afterwards). */
  endsSession?: boolean;
  expect: Record<Who, number>;
}

const everyone = (status: number): Record<Who, number> => ({ anonymous: status, apprentice: status, senior_tech: status, shop_lead: status });
const signedIn = (status: number): Record<Who, number> => ({ anonymous: 401, apprentice: status, senior_tech: status, shop_lead: status });

/** Every /api route, with the status each kind of caller must get. A new route needs a row here. */
export const accessMatrix: AccessRow[] = [
  { method: "GET", route: "/api/health", expect: everyone(200) },
  { method: "POST", route: "/api/auth/sign-in", body: { email: "nobody@bench.test", password: "wrong" }, expect: everyone(401) },
  { method: "POST", route: "/api/auth/sign-out", endsSession: true, expect: signedIn(204) },
  { method: "GET", route: "/api/auth/me", expect: signedIn(200) },
  // Signed-in callers get as far as validation; the anonymous caller is stopped before it.
  { method: "POST", route: "/api/auth/password", body: {}, expect: signedIn(400) },
];
