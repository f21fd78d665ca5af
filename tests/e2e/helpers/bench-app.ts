// Getting a tablet to the bench: signing in, checking a unit in, reading the server's copy and the tablet's storage.
import { expect } from "vitest";
import sharp from "sharp";
import type { BrowserContext, Page } from "playwright-core";
import { demoUsers } from "../../../server/db/seed/demo.ts";
import type { CreateWorkOrderRequest } from "../../../shared/schemas/work-orders.ts";
import type { AppendEventRequest, SessionDetail } from "../../../shared/schemas/sessions.ts";
import { seen } from "./bench-screen.ts";

export const apprentice = demoUsers.find((u) => u.role === "apprentice")!;

/** A small real JPEG: a colour gradient, so it is not one flat block. */
export async function makeJpeg(width = 320, height = 240): Promise<Buffer> {
  const pixels = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++)
    for (let x = 0; x < width; x++) pixels.set([Math.round((255 * x) / width), Math.round((255 * y) / height), 90], (y * width + x) * 3);
  return sharp(pixels, { raw: { width, height, channels: 3 } }).jpeg({ quality: 80 }).toBuffer();
}

/** Collects uncaught errors of every page of the context. */
export function watchPageErrors(context: BrowserContext): string[] {
  const errors: string[] = [];
  context.on("page", (page) => page.on("pageerror", (e) => errors.push(`${page.url()}: ${e.message}`)));
  return errors;
}

/** Waits until framer-motion's entrances have settled, so a screenshot shows the screen at rest. */
export async function settled(page: Page): Promise<void> {
  await page.waitForFunction(() => {
    const moving = [...document.querySelectorAll<HTMLElement>("[style]")].some((el) => {
      const style = getComputedStyle(el);
      return Number(style.opacity) < 1 || (el.style.transform !== "" && el.style.transform !== "none");
    });
    return !moving && document.getAnimations().every((a) => a.playState !== "running");
  });
}

export async function signInOnScreen(page: Page, baseUrl: string, onSignInPage?: () => Promise<void>): Promise<void> {
  await page.goto(`${baseUrl}/`);
  await page.waitForURL(/\/sign-in/);
  await seen(page.getByRole("button", { name: /^sign in$/i }), "the sign-in button");
  await onSignInPage?.();
  await page.getByLabel(/e-mail/i).fill(apprentice.email);
  await page.getByLabel(/^password$/i).fill(apprentice.password);
  await page.getByRole("button", { name: /^sign in$/i }).click();
  await page.waitForURL(/\/bench$/);
  await seen(page.getByRole("heading", { level: 1, name: "Bench" }), "the bench home");
}

/** Signs in through the API; the context's pages share the cookie. */
export async function signInByApi(context: BrowserContext, baseUrl: string): Promise<void> {
  const response = await context.request.post(`${baseUrl}/api/auth/sign-in`, { headers: { origin: baseUrl }, data: { email: apprentice.email, password: apprentice.password } });
  expect(response.status(), await response.text()).toBe(200);
}

/** An invented customer and a 2-stroke trimmer that will not start. */
export const trimmerIntake = {
  customer: { name: "Marta Quillby", phone: "555-0187", email: "marta.quillby@example.com" },
  unit: {
    equipmentKind: "string_trimmer",
    make: "Fieldline",
    model: "FT-260",
    engineModel: "FL26-2T",
    engineType: "A1",
    engineSerial: "FL2604418",
    cycle: 2,
    displacementCc: 25.4,
    compressionRelease: "no",
    hours: null,
  },
  complaint: "Pulls over easily but never catches, not even a cough.",
  alreadyTried: "New fuel from the station last week.",
  tankContents: "premix",
} satisfies CreateWorkOrderRequest;

export async function createWorkOrderByApi(page: Page, baseUrl: string, body: CreateWorkOrderRequest): Promise<string> {
  const response = await page.request.post(`${baseUrl}/api/work-orders`, { headers: { origin: baseUrl }, data: body });
  expect(response.status(), await response.text()).toBe(201);
  return ((await response.json()) as { id: string }).id;
}

export async function getSession(page: Page, baseUrl: string, sessionId: string): Promise<SessionDetail> {
  const response = await page.request.get(`${baseUrl}/api/sessions/${sessionId}`);
  expect(response.status(), await response.text()).toBe(200);
  return (await response.json()) as SessionDetail;
}

type StoredCache = {
  clientState: {
    mutations: { state: { status: string; variables?: { sessionId: string; request: AppendEventRequest } } }[];
    queries: { queryKey: unknown[]; state: { data?: { events?: unknown[] } } }[];
  };
};

/** The tablet's IndexedDB copy of the query cache, as the app last wrote it. */
async function storedCache(page: Page): Promise<StoredCache | null> {
  const raw = await page.evaluate(async () => {
    const request = <T>(r: IDBRequest<T>) => new Promise<T>((resolve, reject) => ((r.onsuccess = () => resolve(r.result)), (r.onerror = () => reject(r.error))));
    const db = await request(indexedDB.open("keyval-store"));
    try {
      if (!db.objectStoreNames.contains("keyval")) return null;
      return (await request(db.transaction("keyval").objectStore("keyval").get("benchpath-cache"))) as unknown;
    } finally {
      db.close();
    }
  });
  return typeof raw === "string" ? (JSON.parse(raw) as StoredCache) : null;
}

/** The session's saves still waiting in the tablet's storage, oldest first. */
export async function waitingInStorage(page: Page, sessionId: string): Promise<AppendEventRequest[]> {
  const mutations = (await storedCache(page))?.clientState.mutations ?? [];
  return mutations
    .filter((m) => m.state.status === "pending" && m.state.variables?.sessionId === sessionId)
    .map((m) => m.state.variables!.request)
    .sort((a, b) => a.seq - b.seq);
}

/** How many of the session's events the tablet's stored copy of the session holds, or null without one. */
export async function eventsInStoredSession(page: Page, sessionId: string): Promise<number | null> {
  const queries = (await storedCache(page))?.clientState.queries ?? [];
  const session = queries.find((q) => q.queryKey[0] === "sessions" && q.queryKey.includes(sessionId));
  return session?.state.data?.events?.length ?? null;
}

/** The session id in the address of the session screen. */
export function sessionIdOf(page: Page): string {
  const id = /\/bench\/sessions\/([^/?#]+)/.exec(page.url())?.[1];
  if (!id) throw new Error(`not on a session screen: ${page.url()}`);
  return decodeURIComponent(id);
}
