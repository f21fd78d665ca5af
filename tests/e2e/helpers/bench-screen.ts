// Drives the session screen step by step from the flow's own data: titles, cautions, options, bands and photo asks.
import { expect } from "vitest";
import type { Locator, Page } from "playwright-core";
import { loadBuiltInFlows } from "../../../server/flows/builtin.ts";
import { compileFlow, type CompiledFlow, type CompiledStep } from "../../../shared/flow/compile.ts";
import { ACKNOWLEDGED_SIGNALS } from "../../../shared/flow/session-log.ts";
import type { SessionEventBody } from "../../../shared/schemas/sessions.ts";

export type Answer = { done: true } | { choose: string } | { read: { keys: string; unit: string } };

export interface Move {
  step: string;
  answer: Answer;
  /** Take a photo even where the step only asks for one "if you can". */
  photo?: boolean;
  /** Runs once the step is on screen, before anything is pressed. */
  arrived?: (screen: BenchScreen) => Promise<void>;
  /** Runs once the step's gates are met, just before it is answered. */
  ready?: (screen: BenchScreen) => Promise<void>;
  /** Runs while the verdict of a reading is shown. */
  verdict?: (screen: BenchScreen) => Promise<void>;
}

/** An event as the test entered it; a photo's attachment id is only known to the server. */
export type Entered = SessionEventBody | { type: "photo.attach"; stepId: string; attachmentId: unknown };

const verdictWords = { good: "Good", marginal: "Marginal", low: "Low", high: "High", implausible: "Not believable" } as const;

export function builtInFlow(id: string): CompiledFlow {
  const definition = loadBuiltInFlows().find((flow) => flow.id === id);
  if (!definition) throw new Error(`no built-in flow "${id}" in flows/`);
  return compileFlow(definition);
}

/** Waits for a locator to be visible, failing with words a person can act on. */
export async function seen(locator: Locator, what: string, timeout = 10_000): Promise<void> {
  try {
    await locator.first().waitFor({ state: "visible", timeout });
  } catch {
    throw new Error(`${what} was not on screen within ${timeout / 1000} s`);
  }
}

export class BenchScreen {
  /** Every event the test gave, in the order it gave them. */
  readonly entered: Entered[] = [];

  constructor(
    public page: Page,
    readonly flow: CompiledFlow,
    private readonly photo: Buffer,
  ) {}

  step(id: string): CompiledStep {
    const step = this.flow.steps[id];
    if (!step) throw new Error(`the flow ${this.flow.id} has no step "${id}"`);
    return step;
  }

  saveStatus(): Locator {
    return this.page.locator("[data-save-state]");
  }

  /** The "Step N" count at the head of the path trail. */
  async stepCount(): Promise<string> {
    return (await this.page.getByRole("navigation", { name: "Steps so far" }).getByRole("listitem").first().innerText()).trim();
  }

  async expectAt(id: string, timeout = 10_000): Promise<void> {
    const { title } = this.step(id);
    const heading = this.page.getByRole("heading", { level: 1, name: title, exact: true });
    try {
      await heading.waitFor({ state: "visible", timeout });
    } catch {
      const shown = await this.page.getByRole("heading", { level: 1 }).allInnerTexts();
      throw new Error(`expected the step "${id}" (${title}) within ${timeout / 1000} s, but the screen shows: ${shown.join(" | ") || "no heading"}`);
    }
  }

  async expectSaved(timeout = 15_000): Promise<void> {
    await expect.poll(() => this.saveStatus().innerText(), { timeout, message: "the save status never said Saved" }).toBe("Saved");
  }

  /** One panel per caution of the step, in the flow's words; DANGER and WARNING carry the acknowledgement. */
  async expectCautions(id: string): Promise<void> {
    const cautions = this.step(id).cautions ?? [];
    for (const signal of new Set(cautions.map((c) => c.signal))) {
      const texts = cautions.filter((c) => c.signal === signal).map((c) => c.text ?? "");
      const panels = this.page.getByRole("region", { name: signal, exact: true });
      expect(await panels.count(), `${signal} panels on ${id}`).toBe(texts.length);
      for (const [index, text] of texts.entries()) expect(await panels.nth(index).innerText()).toContain(text);
    }
  }

  /** Presses "Read and understood" once per DANGER and WARNING signal, most severe first. */
  async acknowledge(id: string): Promise<void> {
    const present = new Set((this.step(id).cautions ?? []).map((c) => c.signal));
    for (const signal of ACKNOWLEDGED_SIGNALS.filter((s) => present.has(s))) {
      const panels = this.page.getByRole("region", { name: signal, exact: true });
      await panels.first().getByRole("button", { name: "Read and understood" }).click();
      this.entered.push({ type: "caution.acknowledge", stepId: id, signal });
      // One acknowledgement covers every panel of that signal word on the step.
      await expect.poll(() => panels.getByText("You have read this and will work with care.").count(), { timeout: 5_000 }).toBe(await panels.count());
    }
    expect(await this.page.getByRole("button", { name: "Read and understood" }).count(), `acknowledgements left on ${id}`).toBe(0);
  }

  async takePhoto(id: string): Promise<void> {
    const ask = this.step(id).photo;
    if (!ask) throw new Error(`the step "${id}" asks for no photo`);
    const region = this.page.getByRole("region", { name: "Photo", exact: true });
    await seen(region.getByText(ask.prompt), `the photo request "${ask.prompt}"`);
    await region.locator('input[type="file"]').setInputFiles({ name: "unit.jpg", mimeType: "image/jpeg", buffer: this.photo });
    await seen(region.getByText("1 photo kept for this step."), "the note that the photo was kept", 15_000);
    this.entered.push({ type: "photo.attach", stepId: id, attachmentId: expect.any(String) });
  }

  private async record(id: string, keys: string, unit: string, move: Move): Promise<void> {
    const step = this.step(id);
    if (step.kind !== "reading") throw new Error(`the step "${id}" takes no reading`);
    const unitButton = this.page.getByRole("group", { name: "Unit" }).getByRole("button", { name: new RegExp(`^(✓ )?${unit}$`) });
    if ((await unitButton.getAttribute("aria-pressed")) !== "true") await unitButton.click();
    await expect.poll(() => unitButton.getAttribute("aria-pressed")).toBe("true");
    const keypad = this.page.getByRole("group", { name: "Keypad" });
    for (const key of keys) await keypad.getByRole("button", { name: key === "." ? "Decimal point" : key, exact: true }).click();
    expect(await this.page.getByLabel(/^Reading in /).inputValue(), "the keypad's entry").toBe(keys);
    await move.ready?.(this);
    await this.page.getByRole("button", { name: "Record the reading" }).click();
    const value = Number(keys);
    this.entered.push({ type: "step.record", stepId: id, value, unit });
    // The test enters readings in the step's own unit, so the band is read straight off the flow.
    const band = step.bands?.find((b) => (b.from === null || (b.from.inclusive ? value >= b.from.value : value > b.from.value)) && (b.to === null || (b.to.inclusive ? value <= b.to.value : value < b.to.value)));
    if (!band || unit !== step.unit) throw new Error(`the test reads bands in the step's unit; ${keys} ${unit} on "${id}" has none`);
    const card = this.page.getByRole("region", { name: "Reading recorded" });
    await seen(card, `the verdict of ${keys} ${unit}`);
    const text = await card.innerText();
    expect(text).toContain(`${value} ${unit}`);
    expect(text).toContain(verdictWords[band.verdict]);
    expect(text).toContain(band.label);
    await move.verdict?.(this);
    await card.getByRole("button", { name: "Go on to the next step" }).click();
  }

  /** Answers one step as the move says, checking on the way that the screen shows what the flow asks. */
  async play(move: Move): Promise<void> {
    const { step: id, answer } = move;
    const step = this.step(id);
    await this.expectAt(id);
    await this.expectCautions(id);
    await move.arrived?.(this);
    await this.acknowledge(id);
    if (step.photo && (step.photo.requirement === "required" || move.photo)) await this.takePhoto(id);
    if ("read" in answer) return this.record(id, answer.read.keys, answer.read.unit, move);
    await move.ready?.(this);
    if ("done" in answer) {
      if (step.kind !== "instruction") throw new Error(`the step "${id}" is a ${step.kind}, not an instruction`);
      await this.page.getByRole("button", { name: "I have done this" }).click();
      this.entered.push({ type: "step.answer", stepId: id, value: "done" });
      return;
    }
    if (step.kind !== "choice") throw new Error(`the step "${id}" is a ${step.kind}, not a choice`);
    const option = step.options.find((o) => o.value === answer.choose);
    if (!option) throw new Error(`the step "${id}" has no option "${answer.choose}"`);
    await this.page.getByRole("group", { name: "Answers" }).getByRole("button", { name: option.label, exact: true }).click();
    this.entered.push({ type: "step.answer", stepId: id, value: option.value });
  }

  async playAll(moves: readonly Move[]): Promise<void> {
    for (const move of moves) await this.play(move);
  }
}
