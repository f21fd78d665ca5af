import type { Person } from "../../../shared/schemas/people.ts";
import { json, type FakeRoute } from "../render-app.tsx";

export function person(overrides: Partial<Person> = {}): Person {
  return {
    id: "0190f0c0-0000-7000-8000-0000000000a1",
    email: "rosa@shop.example",
    name: "Rosa Lindqvist",
    role: "shop_lead",
    active: true,
    status: "active",
    unitSystem: "imperial",
    invitedAt: null,
    joinedAt: null,
    lastSignInAt: "2026-11-30T08:15:00.000Z",
    inviteExpiresAt: null,
    ...overrides,
  };
}

export const peopleAnswers =
  (people: Person[]): FakeRoute =>
  ({ url, method }) =>
    url === "/api/users" && method === "GET" ? json({ people }) : undefined;

export const answer =
  (match: { url: string | RegExp; method: string }, reply: (body: unknown) => Response): FakeRoute =>
  ({ url, method, body }) =>
    method === match.method && (typeof match.url === "string" ? url === match.url : match.url.test(url)) ? reply(body) : undefined;
