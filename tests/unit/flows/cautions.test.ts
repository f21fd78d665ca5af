// Safety panels the built-in flows must carry, found by scanning each step's own words, so an edit cannot drop one.
import { describe, expect, it } from "vitest";
import type { CompiledStep } from "../../../shared/flow/compile.ts";
import type { SignalWord } from "../../../shared/flow/schema.ts";
import { actionSteps, compiled, flowFiles, stepText } from "./flow-fixtures.ts";

const flows = flowFiles.map((file) => [file, compiled(file)] as const);

const FUEL = /\b(fuel|petrol|gasoline|premix)\b/i;
const AEROSOL = /\b(aerosol|cleaner|spray)\b/i;
const IGNITION = /\b(spark|ignition|tester)\b/i;
const SPARK_TEST = /\btester\b/i;
// Starting actions: the engine turns over and may catch.
const STARTING = /\b(try(ing)? to start|start the engine|start it|pull(ing)? the (starter|rope|cord))\b/i;
// Of those, the ones meant to leave the engine running.
const RUNNING = /\b(try(ing)? to start|start the engine|start it)\b/i;
const BY_HAND = /\bby hand\b/i;
const HOT_PARTS = /\b(muffler|exhaust port)\b/i;

const serious: SignalWord[] = ["DANGER", "WARNING"];
const cautionsOf = (step: CompiledStep) => step.cautions ?? [];
const hasCaution = (step: CompiledStep, signals: readonly SignalWord[], text: RegExp) =>
  cautionsOf(step).some((c) => signals.includes(c.signal) && text.test(c.text ?? ""));
const performed = (step: CompiledStep) => step.kind === "instruction" || step.kind === "reading";

describe.each(flows)("cautions in %s", (_file, flow) => {
  const steps = actionSteps(flow);

  it("every step that handles fuel, aerosol cleaner, the ignition or starting carries a caution", () => {
    // Source: references.md section 4 (ANSI Z535.4 panels; fuel, aerosol and ignition hazards at the bench).
    const bare = steps.filter((s) => {
      const text = stepText(s);
      const touches = performed(s) ? FUEL.test(text) || AEROSOL.test(text) || IGNITION.test(text) || STARTING.test(text) : STARTING.test(text) || /\bspray\b/i.test(text);
      return touches && cautionsOf(s).length === 0;
    });
    expect(bare.map((s) => s.id)).toEqual([]);
  });

  it("fuel steps warn of fire and keep ignition sources away", () => {
    // Source: references.md section 4 — fuel at least 10 ft (3 m) from ignition sources (OSHA 29 CFR 1910.266(e)(2)).
    const missing = steps.filter((s) => performed(s) && FUEL.test(stepText(s)) && !hasCaution(s, serious, /fire|flame|flammable|alight/i));
    expect(missing.map((s) => s.id)).toEqual([]);
    const distance = steps.filter((s) => hasCaution(s, serious, /3 m \(10 ft\)/));
    expect(distance.length).toBeGreaterThan(0);
  });

  it("aerosol steps say extremely flammable and ask for eye protection", () => {
    // Source: references.md section 4 — aerosol cleaners are extremely flammable and pressurised (GHS H222, H229);
    // eye protection against liquid chemicals (29 CFR 1910.133(a)(1)).
    const aerosol = steps.filter((s) => performed(s) && AEROSOL.test(stepText(s)));
    expect(aerosol.length).toBeGreaterThan(0);
    for (const step of aerosol) {
      expect(hasCaution(step, serious, /extremely flammable/i), step.id).toBe(true);
      expect(hasCaution(step, ["WARNING", "CAUTION"], /glasses|goggles/i), step.id).toBe(true);
    }
  });

  it("the spray step warns 2-stroke owners off starting fluid as a NOTICE", () => {
    // Common practice (no published source; disputed in the trade): starting fluid strips a 2-stroke's lubrication.
    // Source: references.md section 4 — NOTICE is for harm to the machine, not to people.
    const spray = flow.steps["prime/spray"]!;
    expect(hasCaution(spray, ["NOTICE"], /starting fluid/i)).toBe(true);
    expect(hasCaution(spray, ["NOTICE"], /2-stroke/i)).toBe(true);
  });

  it("spark tests use an insulated tester and name the voltage", () => {
    // Common practice (no published source, references.md section 4): ignition output is tens of kilovolts; test with
    // an insulated inline tester, never by holding a lead.
    const tests = steps.filter((s) => performed(s) && SPARK_TEST.test(stepText(s)));
    expect(tests.length).toBeGreaterThanOrEqual(4);
    for (const step of tests) {
      expect(hasCaution(step, serious, /insulated/i), step.id).toBe(true);
      expect(hasCaution(step, serious, /tens of thousands of volts/i), step.id).toBe(true);
    }
  });

  it("every start keeps people clear of what the engine drives, and every run warns of carbon monoxide", () => {
    // Source: references.md section 4 / trade.md safety — the cutting attachment may turn as the engine catches;
    // carbon monoxide: never run an engine indoors.
    const starts = steps.filter((s) => STARTING.test(stepText(s)));
    expect(starts.length).toBeGreaterThan(5);
    expect(starts.filter((s) => !cautionsOf(s).some((c) => /clear/i.test(c.text ?? ""))).map((s) => s.id)).toEqual([]);
    const runs = starts.filter((s) => RUNNING.test(stepText(s)));
    expect(runs.filter((s) => !hasCaution(s, serious, /carbon monoxide/i)).map((s) => s.id)).toEqual([]);
  });

  it("turning the engine by hand comes after the plug cap or lead is off", () => {
    // Source: references.md section 4 — disconnect the spark plug lead before working on a blade or cutting head.
    const byHand = steps.filter((s) => BY_HAND.test(stepText(s)));
    expect(byHand.length).toBeGreaterThan(0);
    const missing = byHand.filter((s) => !hasCaution(s, serious, /(cap off the spark plug|spark plug lead)/i));
    expect(missing.map((s) => s.id)).toEqual([]);
  });

  it("work at the muffler or exhaust port warns that it is hot", () => {
    // Source: trade.md, "Safety to show" — hot mufflers.
    const missing = steps.filter((s) => performed(s) && HOT_PARTS.test(stepText(s)) && !hasCaution(s, ["WARNING", "CAUTION"], /hot|burn/i));
    expect(missing.map((s) => s.id)).toEqual([]);
  });

  it("signal words keep their ANSI Z535.4 meanings", () => {
    // Source: references.md section 4 — DANGER for the most extreme hazards; NOTICE for practices not related to
    // personal injury.
    for (const step of steps) {
      for (const caution of cautionsOf(step)) {
        expect(caution.text?.trim(), `${step.id} ${caution.signal}`).toBeTruthy();
        if (caution.signal === "NOTICE") expect(caution.text, step.id).not.toMatch(/injur|burn|kill|cut|fire/i);
        if (caution.signal === "DANGER") expect(caution.text, step.id).toMatch(/carbon monoxide|blade/i);
      }
      const texts = cautionsOf(step).map((c) => c.text);
      expect(new Set(texts).size, `${step.id} repeats a panel`).toBe(texts.length);
    }
  });

  it("defers to the equipment's manual, at the start and wherever a maker's figure matters", () => {
    // Source: references.md section 4 and trade.md — always defer to the equipment's own manual.
    const firstSteps = Object.values(flow.steps).slice(0, 2);
    expect(firstSteps.some((s) => /manual/i.test(stepText(s)) || cautionsOf(s).some((c) => /manual/i.test(c.text ?? "")))).toBe(true);
    const figures = steps.filter((s) => /\b(torque|clearances?|ratio|test pressure|figure|gap)\b/i.test(stepText(s)));
    expect(figures.length).toBeGreaterThan(5);
    expect(figures.filter((s) => !/manual/i.test(stepText(s))).map((s) => s.id)).toEqual([]);
    for (const step of steps.filter((s) => s.kind === "reading")) expect(stepText(step), step.id).toMatch(/manual/i);
  });
});
