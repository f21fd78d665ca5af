// Flow authoring from both sides: the senior tech in the editor, the apprentice's sessions through the API.
import { expect } from "vitest";
import { v7 as uuidv7 } from "uuid";
import type { APIRequestContext, BrowserContext, Locator, Page } from "playwright-core";
import { demoUsers } from "../../../server/db/seed/demo.ts";
import type { Role } from "../../../shared/schemas/users.ts";
import type { CreateWorkOrderRequest } from "../../../shared/schemas/work-orders.ts";
import type { SessionDetail, SessionEventBody } from "../../../shared/schemas/sessions.ts";

export function demoUser(role: Role) {
  const user = demoUsers.find((u) => u.role === role);
  if (!user) throw new Error(`the demo shop has nobody with the role ${role}`);
  return user;
}

/** Signs a demo person in through the API; every page of the context shares the cookie. */
export async function signInAs(context: BrowserContext, baseUrl: string, role: Role): Promise<void> {
  const { email, password } = demoUser(role);
  const response = await context.request.post(`${baseUrl}/api/auth/sign-in`, { headers: { origin: baseUrl }, data: { email, password } });
  expect(response.status(), await response.text()).toBe(200);
}

export interface AppendResult {
  stored: boolean;
  currentStepId: string;
}

/** What the apprentice's tablet sends: a work order, a session on a flow, its events one by one. */
export class BenchApi {
  private readonly seqs = new Map<string, number>();

  constructor(
    private readonly request: APIRequestContext,
    private readonly baseUrl: string,
  ) {}

  private async post<T>(path: string, data: unknown, status: number): Promise<T> {
    const response = await this.request.post(`${this.baseUrl}${path}`, { headers: { origin: this.baseUrl }, data });
    expect(response.status(), `POST ${path}: ${await response.text()}`).toBe(status);
    return (await response.json()) as T;
  }

  /** Checks a unit in and starts a session on the flow's latest published version. */
  async startSession(intake: CreateWorkOrderRequest, flowId: string): Promise<SessionDetail> {
    const { id } = await this.post<{ id: string }>("/api/work-orders", intake, 201);
    const session = await this.post<SessionDetail>(`/api/work-orders/${id}/sessions`, { flowId }, 201);
    this.seqs.set(session.id, session.events.length);
    return session;
  }

  /** Saves the session's next event, as a tablet numbers them. */
  async append(sessionId: string, event: SessionEventBody): Promise<AppendResult> {
    const seq = (this.seqs.get(sessionId) ?? 0) + 1;
    const result = await this.post<AppendResult>(`/api/sessions/${sessionId}/events`, { id: uuidv7(), seq, recordedAt: new Date().toISOString(), event }, 201);
    this.seqs.set(sessionId, seq);
    return result;
  }

  async session(sessionId: string): Promise<SessionDetail> {
    const response = await this.request.get(`${this.baseUrl}/api/sessions/${sessionId}`);
    expect(response.status(), await response.text()).toBe(200);
    return (await response.json()) as SessionDetail;
  }
}

/** The editor's problems panel, its summary line and one button per problem. */
export function problemsPanel(page: Page) {
  const region = page.getByRole("region", { name: "Problems", exact: true });
  return {
    region,
    summary: (): Promise<string> => region.getByRole("status").innerText(),
    buttons: (): Locator => region.getByRole("button"),
  };
}

/** The texts of every problem the panel lists, in its order. */
export async function listedProblems(page: Page): Promise<string[]> {
  return (await problemsPanel(page).buttons().allInnerTexts()).map((text) => text.replace(/\s+/g, " ").trim());
}

/** Switches the editor between its two views and waits for the view's own landmark. */
export async function showView(page: Page, view: "Steps and form" | "Graph"): Promise<void> {
  const button = page.getByRole("group", { name: "View" }).getByRole("button", { name: view, exact: true });
  await button.click();
  await expect.poll(() => button.getAttribute("aria-pressed")).toBe("true");
  const landmark = view === "Graph" ? page.getByRole("region", { name: "Flow map" }) : page.getByRole("navigation", { name: "Steps" });
  await landmark.waitFor({ state: "visible" });
}

/** Text to match as it stands inside a regular expression. */
export const literal = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");

/** A step's box on the flow map, by its title; its name ends in the state it shows. */
export function mapNode(page: Page, title: string): Locator {
  return page.getByRole("region", { name: "Flow map" }).getByRole("button", { name: new RegExp(`^${literal(title)}, `) });
}

/** As `settled`, but the map's boxes and pane keep their placing transforms for good, so they do not count. */
export async function settledAroundMap(page: Page): Promise<void> {
  await page.waitForFunction(() => {
    const moving = [...document.querySelectorAll<HTMLElement>("[style]")].some((el) => {
      if (el.closest(".react-flow")) return false;
      const style = getComputedStyle(el);
      return Number(style.opacity) < 1 || (el.style.transform !== "" && el.style.transform !== "none");
    });
    return !moving && document.getAnimations().every((a) => a.playState !== "running");
  });
}
