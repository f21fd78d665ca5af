import { fireEvent, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { beforeEach, describe, expect, it, vi } from "vitest";
import type { Problem } from "../../../shared/flow/problems.ts";
import { FlowGraph } from "../../../src/features/flows/components/flow-graph.tsx";

// jsdom measures nothing: React Flow asks for ResizeObserver and reads the zoom from DOMMatrixReadOnly.
class ResizeObserverStub {
  constructor(private callback: ResizeObserverCallback) {}
  observe(target: Element) {
    this.callback([{ target } as ResizeObserverEntry], this as unknown as ResizeObserver);
  }
  unobserve() {}
  disconnect() {}
}
class DOMMatrixStub {
  m22: number;
  constructor(transform?: string) {
    const scale = transform?.match(/scale\(([\d.]+)\)/)?.[1];
    this.m22 = scale === undefined ? 1 : Number(scale);
  }
}

beforeEach(() => {
  vi.stubGlobal("ResizeObserver", ResizeObserverStub);
  vi.stubGlobal("DOMMatrixReadOnly", DOMMatrixStub);
});

// A draft in progress: the "no" option points at a step that has not been written yet.
const definition = {
  formatVersion: 1,
  id: "no-start-draft",
  title: "Will not start",
  start: "spark",
  steps: {
    spark: {
      kind: "choice",
      title: "Is there a spark at the plug?",
      options: [
        { value: "yes", label: "Strong spark", next: "fuel" },
        { value: "no", label: "No spark", next: "coil-test" },
      ],
    },
    fuel: { kind: "instruction", title: "Check the fuel is fresh", next: "stale-fuel" },
    "stale-fuel": { kind: "finding", title: "Stale fuel", certainty: "likely", explanation: "Old fuel.", repairs: [] },
  },
};
const problems: Problem[] = [
  { stepId: "spark", code: "target_unknown", message: 'options[1].next goes to "coil-test", which is not a step', severity: "error" },
  { stepId: "stale-fuel", code: "finding_without_repairs", message: "this finding lists no repairs", severity: "warning" },
];

function renderGraph(selectedStepId: string | null = null, onSelect = vi.fn()) {
  render(
    <div style={{ width: 1000, height: 800 }}>
      <FlowGraph definition={definition} problems={problems} selectedStepId={selectedStepId} onSelect={onSelect} />
    </div>,
  );
  return { onSelect, map: screen.getByRole("region", { name: "Flow map" }) };
}

describe("FlowGraph", () => {
  it("draws a box per step with its kind, title and state in words, and marks the start", () => {
    const { map } = renderGraph();
    const spark = within(map).getByRole("button", { name: "Is there a spark at the plug?, choice, start step: 1 error" });
    expect(within(spark).getByText("Choice")).toBeInTheDocument();
    expect(within(spark).getByText("Start")).toBeInTheDocument();
    expect(within(map).getByRole("button", { name: "Check the fuel is fresh, instruction: No problems" })).toBeInTheDocument();
    expect(within(map).getByRole("button", { name: "Stale fuel, finding: 1 warning" })).toBeInTheDocument();
  });

  it("shows a step's error on its box", () => {
    const { map } = renderGraph();
    const spark = within(map).getByRole("button", { name: /Is there a spark/ });
    expect(within(spark).getByText("1 error")).toBeInTheDocument();
    expect(spark).toHaveAccessibleDescription('options[1].next goes to "coil-test", which is not a step');
  });

  it("draws the target nobody wrote as a missing step", () => {
    const { map } = renderGraph();
    const missing = within(map).getByRole("note", { name: 'Missing step "coil-test"' });
    expect(within(missing).getByText("No step has this id")).toBeInTheDocument();
  });

  it("labels the ways out of a choice with the option labels", () => {
    const { map } = renderGraph();
    expect(within(map).getByText("Strong spark")).toBeInTheDocument();
    expect(within(map).getByText("No spark")).toBeInTheDocument();
  });

  it("calls onSelect with the step id when a box is tapped or pressed, and shows which one is picked", async () => {
    const user = userEvent.setup();
    const { onSelect, map } = renderGraph("fuel");
    // A plain click: the map's pan handler reads mousedown's view, which jsdom's synthetic pointer leaves empty.
    fireEvent.click(within(map).getByRole("button", { name: /Stale fuel/ }));
    expect(onSelect).toHaveBeenLastCalledWith("stale-fuel");
    within(map).getByRole("button", { name: /Is there a spark/ }).focus();
    await user.keyboard("{Enter}");
    expect(onSelect).toHaveBeenLastCalledWith("spark");
    expect(within(map).getByRole("button", { name: /Check the fuel is fresh/ })).toHaveAttribute("aria-pressed", "true");
    expect(within(map).getByRole("button", { name: /Stale fuel/ })).toHaveAttribute("aria-pressed", "false");
  });

  it("offers zoom buttons big enough for a finger", () => {
    const { map } = renderGraph();
    for (const name of ["Zoom in", "Zoom out", "Whole flow"]) {
      expect(within(map).getByRole("button", { name })).toHaveClass("min-h-12", "min-w-12");
    }
  });

  it("does not crash on a half-written draft", () => {
    render(
      <div style={{ width: 800, height: 600 }}>
        <FlowGraph definition={{ start: 3, steps: { a: { next: 5 }, b: null, c: { kind: "choice", title: "Which?", options: "none" } } }} problems={[]} selectedStepId={null} onSelect={() => {}} />
      </div>,
    );
    expect(screen.getAllByRole("button", { name: /Untitled step, no kind yet/ })).toHaveLength(2);
    expect(screen.getByRole("button", { name: "Which?, choice: No problems" })).toBeInTheDocument();
    expect(screen.getByText("Next step not chosen")).toBeInTheDocument();
  });

  it("says so when the draft has no steps at all", () => {
    render(<FlowGraph definition={{ title: "New flow" }} problems={[]} selectedStepId={null} onSelect={() => {}} />);
    expect(screen.getByText(/This flow has no steps yet/)).toBeInTheDocument();
  });
});
