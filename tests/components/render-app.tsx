import { render } from "@testing-library/react";
import { QueryClient } from "@tanstack/react-query";
import { createMemoryRouter, RouterProvider } from "react-router";
import { vi } from "vitest";
import type { MeResponse } from "../../shared/schemas/auth.ts";
import type { Role } from "../../shared/schemas/users.ts";
import { AppProvider } from "../../src/app/provider.tsx";
import { createRoutes } from "../../src/app/router.tsx";

export type FakeRoute = (request: { url: string; method: string; body: unknown }) => Response | undefined;

/** Replaces fetch with a tiny fake server; unknown requests fail the test loudly. */
export function stubApi(...routes: FakeRoute[]) {
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = typeof input === "string" ? input : input instanceof URL ? input.pathname : input.url;
    const method = init?.method ?? "GET";
    const body: unknown = typeof init?.body === "string" ? JSON.parse(init.body) : undefined;
    for (const route of routes) {
      const response = route({ url, method, body });
      if (response) return response;
    }
    throw new Error(`No fake answer for ${method} ${url}`);
  });
  vi.stubGlobal("fetch", fetchMock);
  return fetchMock;
}

export function json(body: unknown, init: ResponseInit = {}) {
  return new Response(JSON.stringify(body), {
    status: 200,
    ...init,
    headers: { "content-type": "application/json", ...init.headers },
  });
}

export function signedInAs(role: Role, overrides: Partial<MeResponse["user"]> = {}): MeResponse {
  return {
    user: { id: `user-${role}`, email: `${role}@shop.example`, name: "Rosa Lindqvist", role, unitSystem: "imperial", ...overrides },
    shop: { name: "Millbrook Mower & Saw" },
  };
}

export function meAnswers(me: MeResponse | null): FakeRoute {
  return ({ url, method }) => {
    if (url !== "/api/auth/me" || method !== "GET") return undefined;
    return me ? json(me) : json({ error: { id: "unauthenticated", message: "Sign in first." } }, { status: 401 });
  };
}

export function renderApp(path: string) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const router = createMemoryRouter(createRoutes(queryClient), { initialEntries: [path] });
  const view = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...view, router, queryClient };
}
