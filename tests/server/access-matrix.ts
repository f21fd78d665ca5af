import type { Role } from "../../shared/schemas/users.ts";

export type Who = "anonymous" | Role;

/** Records made before the matrix runs: one session of each role's own, and one of another apprentice's. */
export interface AccessFixtures {
  workOrderId: string;
  ownSessionId: Record<Role, string>;
  foreignSessionId: string;
  /** A work order's intake photo, and a photo on the foreign session. */
  workOrderPhotoId: string;
  foreignPhotoId: string;
  /** A flow that has only a draft (never published): hidden from apprentices. */
  draftOnlyFlowId: string;
}
const own = (f: AccessFixtures, who: Who) => f.ownSessionId[who === "anonymous" ? "apprentice" : who];
/** A valid event for the session's first step that the flow refuses: it reaches the policy and the replay, and stores nothing. */
const forgedEvent = { id: "0190f0c0-0000-7000-8000-00000000f001", seq: 1, recordedAt: "2025-01-01T00:00:00.000Z", event: { type: "step.answer", stepId: "spark/flash", value: "every" } };

export interface AccessRow {
  method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  /** The route as registered, e.g. /api/work-orders/:id */
  route: string;
  /** The concrete path requested (or made from the fixtures and the caller); defaults to the route. */
  path?: string | ((f: AccessFixtures, who: Who) => string);
  body?: unknown;
  /** Whether the request ends the caller's session (the test signs in again afterwards). */
  endsSession?: boolean;
  expect: Record<Who, number>;
}

const everyone = (status: number): Record<Who, number> => ({ anonymous: status, apprentice: status, senior_tech: status, shop_lead: status });
const signedIn = (status: number): Record<Who, number> => ({ anonymous: 401, apprentice: status, senior_tech: status, shop_lead: status });
/** Flow editing: senior techs and the shop lead get `status`, an apprentice 403. */
const editors = (status: number): Record<Who, number> => ({ anonymous: 401, apprentice: 403, senior_tech: status, shop_lead: status });
const FLOW = "/api/flows/handheld-2-stroke-no-start";
const NO_ESTIMATE = "0190f0c0-0000-7000-8000-00000000e001";
const NO_TOKEN = "matrix-token-that-no-link-has-0000000000000";

/** Every /api route, with the status each kind of caller must get. A new route needs a row here. */
export const accessMatrix: AccessRow[] = [
  { method: "GET", route: "/api/health", expect: everyone(200) },
  { method: "POST", route: "/api/auth/sign-in", body: { email: "nobody@bench.test", password: "wrong" }, expect: everyone(401) },
  { method: "POST", route: "/api/auth/sign-out", endsSession: true, expect: signedIn(204) },
  { method: "GET", route: "/api/auth/me", expect: signedIn(200) },
  // Signed-in callers get as far as validation; the anonymous caller is stopped before it.
  { method: "POST", route: "/api/auth/password", body: {}, expect: signedIn(400) },

  { method: "GET", route: "/api/work-orders", expect: signedIn(200) },
  { method: "POST", route: "/api/work-orders", body: {}, expect: signedIn(400) },
  { method: "GET", route: "/api/work-orders/:id", path: (f) => `/api/work-orders/${f.workOrderId}`, expect: signedIn(200) },
  { method: "POST", route: "/api/work-orders/:id/sessions", path: (f) => `/api/work-orders/${f.workOrderId}/sessions`, body: {}, expect: signedIn(400) },
  // Without a file: every role gets past the policy to the missing photo.
  { method: "POST", route: "/api/work-orders/:id/intake-photo", path: (f) => `/api/work-orders/${f.workOrderId}/intake-photo`, expect: signedIn(400) },
  // The board: everyone reads it; the intake roles move tickets and record test runs (an empty body stops at validation).
  { method: "GET", route: "/api/work-orders/board", expect: signedIn(200) },
  { method: "POST", route: "/api/work-orders/:id/moves", path: (f) => `/api/work-orders/${f.workOrderId}/moves`, body: {}, expect: signedIn(400) },
  { method: "POST", route: "/api/work-orders/:id/moves", path: (f) => `/api/work-orders/${f.workOrderId}/moves`, body: { to: "picked_up", expectedFrom: "waiting_for_diagnosis" }, expect: signedIn(409) },
  { method: "POST", route: "/api/work-orders/:id/test-runs", path: (f) => `/api/work-orders/${f.workOrderId}/test-runs`, body: {}, expect: signedIn(400) },
  { method: "GET", route: "/api/work-orders/:id/report", path: (f) => `/api/work-orders/${f.workOrderId}/report`, expect: signedIn(200) },
  { method: "GET", route: "/api/work-orders/:id/report.pdf", path: (f) => `/api/work-orders/${f.workOrderId}/report.pdf`, expect: signedIn(200) },

  { method: "GET", route: "/api/sessions/:id", path: (f, who) => `/api/sessions/${own(f, who)}`, expect: signedIn(200) },
  { method: "GET", route: "/api/sessions/:id", path: (f) => `/api/sessions/${f.foreignSessionId}`, expect: { anonymous: 401, apprentice: 404, senior_tech: 200, shop_lead: 200 } },
  { method: "POST", route: "/api/sessions/:id/events", path: (f, who) => `/api/sessions/${own(f, who)}/events`, body: forgedEvent, expect: signedIn(422) },
  { method: "POST", route: "/api/sessions/:id/events", path: (f) => `/api/sessions/${f.foreignSessionId}/events`, body: forgedEvent, expect: signedIn(404) },
  { method: "POST", route: "/api/sessions/:id/complete", path: (f, who) => `/api/sessions/${own(f, who)}/complete`, expect: signedIn(422) },
  { method: "POST", route: "/api/sessions/:id/complete", path: (f) => `/api/sessions/${f.foreignSessionId}/complete`, expect: signedIn(404) },
  { method: "POST", route: "/api/sessions/:id/abandon", path: (f, who) => `/api/sessions/${own(f, who)}/abandon`, body: {}, expect: signedIn(400) },
  // Own open sessions were never returned; another's session is hidden from everyone but its tech.
  { method: "POST", route: "/api/sessions/:id/reopen", path: (f, who) => `/api/sessions/${own(f, who)}/reopen`, expect: signedIn(409) },
  { method: "POST", route: "/api/sessions/:id/reopen", path: (f) => `/api/sessions/${f.foreignSessionId}/reopen`, expect: signedIn(404) },
  // Review: only the shop lead signs off (and gets as far as the empty body); the flags are the lead's and the session's own tech's.
  { method: "POST", route: "/api/sessions/:id/review", path: (f, who) => `/api/sessions/${own(f, who)}/review`, body: {}, expect: { anonymous: 401, apprentice: 403, senior_tech: 403, shop_lead: 400 } },
  { method: "POST", route: "/api/sessions/:id/review", path: (f) => `/api/sessions/${f.foreignSessionId}/review`, body: { decision: "approve" }, expect: { anonymous: 401, apprentice: 403, senior_tech: 403, shop_lead: 409 } },
  { method: "GET", route: "/api/review/sessions", expect: signedIn(200) },
  { method: "GET", route: "/api/review/sessions", path: "/api/review/sessions?reviewState=pending", expect: signedIn(400) },
  { method: "GET", route: "/api/review/options", expect: signedIn(200) },
  { method: "GET", route: "/api/review/options", path: "/api/review/options?techId=x", expect: signedIn(400) },
  { method: "GET", route: "/api/review/sessions/:id/flags", path: (f, who) => `/api/review/sessions/${own(f, who)}/flags`, expect: signedIn(200) },
  { method: "GET", route: "/api/review/sessions/:id/flags", path: (f) => `/api/review/sessions/${f.foreignSessionId}/flags`, expect: { anonymous: 401, apprentice: 404, senior_tech: 404, shop_lead: 200 } },
  { method: "POST", route: "/api/sessions/:id/photos", path: (f, who) => `/api/sessions/${own(f, who)}/photos`, expect: signedIn(400) },
  { method: "POST", route: "/api/sessions/:id/photos", path: (f) => `/api/sessions/${f.foreignSessionId}/photos`, expect: signedIn(404) },
  { method: "GET", route: "/api/attachments/:id", path: (f) => `/api/attachments/${f.workOrderPhotoId}`, expect: signedIn(200) },
  { method: "GET", route: "/api/attachments/:id", path: (f) => `/api/attachments/${f.foreignPhotoId}`, expect: { anonymous: 401, apprentice: 404, senior_tech: 200, shop_lead: 200 } },
  { method: "GET", route: "/api/attachments/:id/thumb", path: (f) => `/api/attachments/${f.workOrderPhotoId}/thumb`, expect: signedIn(200) },
  { method: "GET", route: "/api/attachments/:id/thumb", path: (f) => `/api/attachments/${f.foreignPhotoId}/thumb`, expect: { anonymous: 401, apprentice: 404, senior_tech: 200, shop_lead: 200 } },
  // Last of the session rows: the shop lead really abandons the foreign session.
  { method: "POST", route: "/api/sessions/:id/abandon", path: (f) => `/api/sessions/${f.foreignSessionId}/abandon`, body: { reason: "Matrix check" }, expect: { anonymous: 401, apprentice: 404, senior_tech: 404, shop_lead: 200 } },

  { method: "GET", route: "/api/bench/home", expect: signedIn(200) },

  // Shop insight is the shop lead's; a tech is refused before the dates are read.
  { method: "GET", route: "/api/insight", path: "/api/insight?from=2026-01-01&to=2026-03-31", expect: { anonymous: 401, apprentice: 403, senior_tech: 403, shop_lead: 200 } },
  { method: "GET", route: "/api/insight", path: "/api/insight?from=2026-03-31&to=2026-01-01", expect: { anonymous: 401, apprentice: 403, senior_tech: 403, shop_lead: 400 } },

  // Mail: what the shop sent and what the built-in sink received are the shop lead's.
  { method: "GET", route: "/api/mail/outgoing", expect: { anonymous: 401, apprentice: 403, senior_tech: 403, shop_lead: 200 } },
  { method: "GET", route: "/api/mail/outgoing", path: "/api/mail/outgoing?limit=0", expect: { anonymous: 401, apprentice: 403, senior_tech: 403, shop_lead: 400 } },
  { method: "GET", route: "/api/mail/inbox", expect: { anonymous: 401, apprentice: 403, senior_tech: 403, shop_lead: 200 } },
  { method: "GET", route: "/api/mail/inbox/:id", path: "/api/mail/inbox/0190f0c0-0000-7000-8000-00000000a001", expect: { anonymous: 401, apprentice: 403, senior_tech: 403, shop_lead: 404 } },
  { method: "GET", route: "/api/mail/inbox/:id/attachments/:index", path: "/api/mail/inbox/0190f0c0-0000-7000-8000-00000000a001/attachments/0", expect: { anonymous: 401, apprentice: 403, senior_tech: 403, shop_lead: 404 } },

  // Shop settings: everyone signed in reads them; only the shop lead changes them (and gets as far as validation).
  { method: "GET", route: "/api/settings", expect: signedIn(200) },
  { method: "PUT", route: "/api/settings", body: {}, expect: { anonymous: 401, apprentice: 403, senior_tech: 403, shop_lead: 400 } },
  // People: the shop lead's; a tech is refused before the body is read. Each person sets their own units.
  { method: "GET", route: "/api/users", expect: { anonymous: 401, apprentice: 403, senior_tech: 403, shop_lead: 200 } },
  { method: "POST", route: "/api/users/invites", body: {}, expect: { anonymous: 401, apprentice: 403, senior_tech: 403, shop_lead: 400 } },
  { method: "POST", route: "/api/users/:id/invites", path: "/api/users/0190f0c0-0000-7000-8000-00000000b001/invites", expect: { anonymous: 401, apprentice: 403, senior_tech: 403, shop_lead: 404 } },
  { method: "PATCH", route: "/api/users/:id", path: "/api/users/0190f0c0-0000-7000-8000-00000000b001", body: { role: "apprentice" }, expect: { anonymous: 401, apprentice: 403, senior_tech: 403, shop_lead: 404 } },
  { method: "PUT", route: "/api/auth/me/units", body: {}, expect: signedIn(400) },
  // Public: the same answer for everyone, signed in or not.
  { method: "POST", route: "/api/auth/password-resets", body: { email: "nobody@bench.test" }, expect: everyone(202) },
  { method: "GET", route: "/api/public/password-links/:token", path: "/api/public/password-links/not-a-link-benchpath-sent-000", expect: everyone(404) },
  { method: "POST", route: "/api/public/password-links/:token", path: "/api/public/password-links/not-a-link-benchpath-sent-000", body: { password: "long-enough-password" }, expect: everyone(404) },
  // Estimates: every tech and the shop lead price and send them; each gets as far as validation or the missing record.
  { method: "GET", route: "/api/estimates", path: (f) => `/api/estimates?workOrderId=${f.workOrderId}`, expect: signedIn(200) },
  { method: "GET", route: "/api/estimates", expect: signedIn(400) },
  { method: "POST", route: "/api/estimates", body: {}, expect: signedIn(400) },
  { method: "GET", route: "/api/estimates/:id", path: `/api/estimates/${NO_ESTIMATE}`, expect: signedIn(404) },
  { method: "PUT", route: "/api/estimates/:id", path: `/api/estimates/${NO_ESTIMATE}`, body: {}, expect: signedIn(400) },
  { method: "POST", route: "/api/estimates/:id/revise", path: `/api/estimates/${NO_ESTIMATE}/revise`, expect: signedIn(404) },
  { method: "POST", route: "/api/estimates/:id/send", path: `/api/estimates/${NO_ESTIMATE}/send`, body: {}, expect: signedIn(400) },
  // The customer's link: open to everyone, the token being the key; an unknown one is 404 for all.
  { method: "GET", route: "/api/public/estimates/:token", path: `/api/public/estimates/${NO_TOKEN}`, expect: everyone(404) },
  { method: "POST", route: "/api/public/estimates/:token/decision", path: `/api/public/estimates/${NO_TOKEN}/decision`, body: { decision: "decline" }, expect: everyone(404) },

  // Flows: editors get as far as validation (or a missing draft), so nothing changes here.
  { method: "GET", route: "/api/flows", expect: signedIn(200) },
  { method: "POST", route: "/api/flows", body: {}, expect: editors(400) },
  { method: "POST", route: "/api/flows/import", body: [], expect: editors(400) },
  { method: "GET", route: "/api/flows/:id", path: FLOW, expect: signedIn(200) },
  { method: "GET", route: "/api/flows/:id", path: (f) => `/api/flows/${f.draftOnlyFlowId}`, expect: { anonymous: 401, apprentice: 404, senior_tech: 200, shop_lead: 200 } },
  { method: "PATCH", route: "/api/flows/:id", path: FLOW, body: {}, expect: editors(400) },
  { method: "GET", route: "/api/flows/:id/versions/:number", path: `${FLOW}/versions/1`, expect: signedIn(200) },
  { method: "POST", route: "/api/flows/:id/draft", path: `${FLOW}/draft`, body: { fromVersion: 0 }, expect: editors(400) },
  { method: "PUT", route: "/api/flows/:id/draft", path: `${FLOW}/draft`, body: {}, expect: editors(400) },
  { method: "DELETE", route: "/api/flows/:id/draft", path: `${FLOW}/draft`, expect: editors(404) },
  { method: "POST", route: "/api/flows/:id/publish", path: `${FLOW}/publish`, body: {}, expect: editors(400) },
  { method: "GET", route: "/api/flows/:id/export", path: `${FLOW}/export?version=1`, expect: signedIn(200) },
  { method: "GET", route: "/api/flows/:id/export", path: (f) => `/api/flows/${f.draftOnlyFlowId}/export?version=draft`, expect: { anonymous: 401, apprentice: 404, senior_tech: 200, shop_lead: 200 } },
  { method: "GET", route: "/api/flows/:id/export", path: `${FLOW}/export?version=draft`, expect: { anonymous: 401, apprentice: 403, senior_tech: 404, shop_lead: 404 } },
  { method: "GET", route: "/api/flows/:id/advice", path: `${FLOW}/advice`, expect: signedIn(200) },
];
