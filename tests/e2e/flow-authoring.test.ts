import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, viewports } from "./helpers/browser.ts";
import { startBuiltServer, type RunningServer } from "./helpers/server.ts";
import { snap } from "./helpers/screenshots.ts";
import { seen } from "./helpers/bench-screen.ts";
import { trimmerIntake, watchPageErrors } from "./helpers/bench-app.ts";
import { BenchApi, demoUser, listedProblems, literal, mapNode, problemsPanel, settledAroundMap, showView, signInAs } from "./helpers/flow-editor.ts";

const flowId = "handheld-2-stroke-no-start";
const flowTitle = "Handheld 2-stroke: will not start";
/** The flow's first step until now, where the new step hands over. */
const oldFirstTitle = "Put on safety glasses and hearing protection, and clear the bench of flames and sparks";
const newStep = { id: "read-tag", title: "Read the repair tag and ask about the last time it ran", body: "Note how long the unit stood, and whether it stopped suddenly or faded out." };
const note = "New first step: read the repair tag and ask how the unit stopped before making the bench safe.";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

for (const [orientation, viewport] of Object.entries(viewports)) {
  describe(`authoring a flow at ${viewport.width}x${viewport.height}`, () => {
    // Each size publishes its own version 2, so each gets a freshly seeded shop.
    let server: RunningServer;
    beforeAll(async () => {
      server = await startBuiltServer();
    });
    afterAll(async () => {
      await server?.stop();
    });

    it("adds a step with a dead end, sees and fixes it, tries and publishes it, and pins new sessions to the new version only", async () => {
      const apprenticeContext = await browser.newContext();
      const context = await browser.newContext({ viewport });
      const errors = watchPageErrors(context);
      try {
        // The earlier session: begun on version 1, its first caution acknowledged.
        await signInAs(apprenticeContext, server.url, "apprentice");
        // The demo's history ran this flow too: the list counts those sessions and the one begun here.
        const sessionsRun = async () => ((await (await apprenticeContext.request.get(`${server.url}/api/flows`)).json()) as { flows: { id: string; sessionCount: number }[] }).flows.find((f) => f.id === flowId)!.sessionCount;
        const historySessions = await sessionsRun();
        const bench = new BenchApi(apprenticeContext.request, server.url);
        const earlier = await bench.startSession(trimmerIntake, flowId);
        expect(earlier.flow.version).toBe(1);
        expect(earlier.currentStepId).toBe("prepare/protect");
        expect((await bench.append(earlier.id, { type: "caution.acknowledge", stepId: "prepare/protect", signal: "WARNING" })).stored).toBe(true);

        await signInAs(context, server.url, "senior_tech");
        const page = await context.newPage();
        page.setDefaultTimeout(10_000);
        const shot = async (screen: string) => {
          await settledAroundMap(page);
          await snap(page, `flows-${screen}-${orientation}`);
        };
        const problems = problemsPanel(page);

        await page.goto(`${server.url}/flows`);
        const row = page.getByRole("link", { name: new RegExp(`^${literal(flowTitle)}`) });
        await seen(row, "the flow's row in the list");
        const sessionCount = historySessions + 1;
        expect(await sessionsRun()).toBe(sessionCount);
        expect(await row.innerText()).toMatch(new RegExp(`Published\\s+Version 1[\\s\\S]*Draft\\s+None[\\s\\S]*Sessions run\\s+${sessionCount}\\b`));
        await shot("list");
        await row.click();
        await page.waitForURL(new RegExp(`/flows/${flowId}$`));
        await page.getByRole("button", { name: "Start a draft from version 1" }).click();
        await seen(page.getByRole("button", { name: "Publish…" }), "the draft editor");
        await expect.poll(problems.summary).toBe("No problems: the flow can be published.");
        await shot("editor");

        // A new instruction whose way on is not chosen yet: a dead end, and nothing leads to it.
        await page.getByRole("button", { name: "Add a step", exact: true }).click();
        const add = page.getByRole("form", { name: "Add a step" });
        await add.getByLabel("Kind").selectOption({ label: "Instruction" });
        await add.getByLabel("Id", { exact: true }).fill(newStep.id);
        await add.getByRole("button", { name: "Add the step" }).click();
        const editorTitle = page.getByRole("heading", { level: 2, name: "Untitled step" });
        await seen(editorTitle, "the new step's form");
        await page.getByRole("textbox", { name: "Title", exact: true }).fill(newStep.title);
        await page.getByRole("textbox", { name: "What to do and why", exact: true }).fill(newStep.body);
        await seen(page.getByRole("heading", { level: 2, name: newStep.title }), "the new step's title over its form");
        await expect.poll(problems.summary).toBe("3 errors");
        expect(await listedProblems(page)).toEqual([
          `Step “${newStep.id}”: next: a target is a step id (lowercase letters, digits, single hyphens) or "@continue" (error)`,
          `Step “${newStep.id}”: next goes to "", which is not a step (error)`,
          `Step “${newStep.id}”: no path from the start leads to this step (error)`,
        ]);
        expect(await page.getByRole("button", { name: "Publish…" }).isDisabled()).toBe(true);
        await seen(page.getByText("Publishing needs a draft without errors: 3 errors to fix."), "why publishing is blocked");
        const listed = page.getByRole("navigation", { name: "Steps" }).getByRole("button", { name: new RegExp(`^${literal(newStep.title)} Instruction · ${newStep.id} 3 errors$`) });
        await seen(listed, "the new step in the list, marked with its errors");
        // A problem's button opens its step from anywhere in the editor.
        await page.getByRole("navigation", { name: "Steps" }).getByRole("button", { name: /^Flow details/ }).click();
        await seen(page.getByRole("heading", { level: 2, name: "Flow details" }), "the flow's details form");
        await problems.buttons().nth(1).click();
        await seen(page.getByRole("heading", { level: 2, name: newStep.title }), "the step the problem is in");
        await shot("problems");

        await showView(page, "Graph");
        const node = mapNode(page, newStep.title);
        await seen(node, "the new step's box on the map");
        expect(await node.getAttribute("aria-label")).toBe(`${newStep.title}, instruction: 3 errors`);
        expect(await node.getAttribute("class")).toContain("border-problem");
        expect(await node.innerText()).toContain("3 errors");
        await seen(page.getByRole("region", { name: "Flow map" }).getByText("Next step not chosen"), "the box for the way on not chosen yet");
        await shot("graph-error");

        // The fix: the new step leads into the old first section, and the flow starts at it.
        await showView(page, "Steps and form");
        await page.getByRole("combobox", { name: "When done, go to" }).selectOption("prepare");
        await expect.poll(() => listedProblems(page)).toEqual([`Step “${newStep.id}”: no path from the start leads to this step (error)`]);
        await page.getByRole("navigation", { name: "Steps" }).getByRole("button", { name: /^Flow details/ }).click();
        await page.getByRole("combobox", { name: "The flow starts at" }).selectOption(newStep.id);
        await expect.poll(problems.summary).toBe("No problems: the flow can be published.");
        expect(await problems.buttons().count()).toBe(0);
        await page.getByRole("button", { name: "Save", exact: true }).click();
        await seen(page.getByText("All changes saved"), "the saved draft");
        await showView(page, "Graph");
        await seen(mapNode(page, newStep.title), "the fixed step on the map");
        expect(await mapNode(page, newStep.title).getAttribute("aria-label")).toBe(`${newStep.title}, instruction, start step: No problems`);
        expect(await page.getByRole("region", { name: "Flow map" }).getByText("Next step not chosen").count()).toBe(0);
        const saved = await context.request.get(`${server.url}/api/flows/${flowId}`);
        const draft = ((await saved.json()) as { draft: { definition: { start: string; steps: Record<string, { next?: string }> }; problems: unknown[] } }).draft;
        expect(draft.definition.start).toBe(newStep.id);
        expect(draft.definition.steps[newStep.id]?.next).toBe("prepare");
        expect(draft.problems).toEqual([]);

        // The trial run starts on the new step and goes on into the flow as it was.
        await page.getByRole("link", { name: "Try the draft" }).click();
        await seen(page.getByRole("heading", { level: 1, name: `Try “${flowTitle}”` }), "the trial run's page");
        await page.getByRole("button", { name: "Start the trial run" }).click();
        await seen(page.getByRole("heading", { level: 1, name: newStep.title, exact: true }), "the new step in the trial run");
        await seen(page.getByText(newStep.body), "the new step's instructions");
        await shot("trial");
        await page.getByRole("button", { name: "I have done this" }).click();
        await seen(page.getByRole("heading", { level: 1, name: oldFirstTitle, exact: true }), "the old first step after the new one");
        await page.getByRole("link", { name: "Back to the draft" }).first().click();
        await seen(page.getByRole("button", { name: "Publish…" }), "the draft editor again");

        await page.getByRole("button", { name: "Publish…" }).click();
        const dialog = page.getByRole("dialog", { name: "Publish this draft as version 2", exact: true });
        await dialog.getByRole("textbox", { name: "What changed in this version" }).fill(note);
        await shot("publish");
        await dialog.getByRole("button", { name: "Publish", exact: true }).click();
        await seen(page.getByText("Published version 2: new bench sessions start on it."), "the published version");
        await seen(page.getByRole("button", { name: "Start a draft from version 2" }), "the offer of a new draft");

        await page.getByRole("link", { name: "Versions and comparison" }).click();
        const rows = page.getByRole("table", { name: "Versions of this flow" }).getByRole("row");
        await expect.poll(() => rows.count()).toBe(3);
        const [, v2, v1] = (await rows.allInnerTexts()).map((text) => text.replace(/\s+/g, " ").trim());
        expect(v2).toMatch(new RegExp(`^2 ${demoUser("senior_tech").name} .+ ${literal(note)} 0 Export$`));
        expect(v1).toMatch(new RegExp(`^1 Came with Benchpath .+ ${sessionCount} Export$`));
        await shot("history");

        // New sessions start on version 2, at the new step; the earlier one stays on version 1.
        const later = await bench.startSession({ ...trimmerIntake, customer: { name: "Ilse Marrow", phone: "555-0171", email: "" } }, flowId);
        const laterDetail = await bench.session(later.id);
        expect(laterDetail.flow.version).toBe(2);
        expect(laterDetail.currentStepId).toBe(newStep.id);
        expect((laterDetail.definition as { steps: Record<string, { title: string; next: string }> }).steps[newStep.id]).toMatchObject({ title: newStep.title, next: "prepare" });
        const next = await bench.append(earlier.id, { type: "step.answer", stepId: "prepare/protect", value: "done" });
        expect(next).toMatchObject({ stored: true, currentStepId: "prepare/as-received" });
        const earlierDetail = await bench.session(earlier.id);
        expect(earlierDetail.flow.version).toBe(1);
        expect(earlierDetail.events.map((e) => e.event.type)).toEqual(["caution.acknowledge", "step.answer"]);
        expect(earlierDetail.currentStepId).toBe("prepare/as-received");
        expect((earlierDetail.definition as { steps: Record<string, unknown> }).steps[newStep.id]).toBeUndefined();
        expect(errors).toEqual([]);
      } finally {
        await context.close();
        await apprenticeContext.close();
      }
    });
  });
}
