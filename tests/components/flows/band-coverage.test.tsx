import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it, vi } from "vitest";
import type { Band, Verdict } from "../../../shared/flow/schema.ts";
import { BandCoverage } from "../../../src/features/flows/components/band-coverage.tsx";

const band = (from: [number, boolean] | null, to: [number, boolean] | null, label: string, verdict: Verdict = "good"): Band => ({
  from: from && { value: from[0], inclusive: from[1] },
  to: to && { value: to[0], inclusive: to[1] },
  label,
  verdict,
  next: "next-step",
});

// Invented compression bands for a draft, written with a gap and an overlap on purpose.
const drafted = [
  band(null, [80, true], "Weak", "low"),
  band([90, false], [120, false], "Fair", "marginal"),
  band([110, true], [130, false], "Healthy", "good"),
  band([130, true], null, "Too high to trust", "implausible"),
];

describe("BandCoverage", () => {
  it("lists a gap and an overlap in words below the line", () => {
    render(<BandCoverage bands={drafted} unit="psi" />);
    const list = screen.getByRole("list", { name: "Coverage problems" });
    const items = within(list).getAllByRole("listitem").map((li) => li.textContent);
    expect(items).toEqual(["Gap from 80 to 90 psi: no band covers it — (80, 90] psi", 'Overlap from 110 to 120 psi: "Fair" and "Healthy" both cover it — [110, 120) psi']);
  });

  it("marks the gap and the overlap on the line itself", () => {
    const { container } = render(<BandCoverage bands={drafted} unit="psi" />);
    const marks = [...container.querySelectorAll("[data-region]")];
    expect(marks.map((m) => m.getAttribute("data-region"))).toEqual(["gap", "overlap"]);
    expect(marks.map((m) => m.textContent)).toEqual(["Gap", "Overlap"]);
    expect(marks[0]!.querySelector("rect")?.getAttribute("fill")).toMatch(/^url\(#.+-gap\)$/);
    expect(marks[1]!.querySelector("rect")?.getAttribute("fill")).toMatch(/^url\(#.+-overlap\)$/);
  });

  it("shows each band with its label and verdict word, and says when they cover every value once", () => {
    // Common practice (no published source): bands that meet at an edge, one side holding the edge value.
    const sound = [band(null, [90, false], "Weak", "low"), band([90, true], [130, false], "Healthy"), band([130, true], null, "Too high to trust", "implausible")];
    render(<BandCoverage bands={sound} unit="psi" />);
    expect(screen.getByText("Weak · Low")).toBeInTheDocument();
    expect(screen.getByText("Too high to trust · Not believable")).toBeInTheDocument();
    expect(screen.getByText("The bands cover every value exactly once.")).toBeInTheDocument();
    expect(screen.queryByRole("list", { name: "Coverage problems" })).not.toBeInTheDocument();
  });

  it("draws an included end filled and an excluded end hollow, and says which in words", () => {
    render(<BandCoverage bands={drafted} unit="psi" />);
    const fair = screen.getByRole("img", { name: 'Band "Fair", Marginal: from 90 psi (not included) to 120 psi (not included)' });
    const healthy = screen.getByRole("img", { name: 'Band "Healthy", Good: from 110 psi (included) to 130 psi (not included)' });
    const ends = (lane: Element) => [...lane.querySelectorAll("circle")].map((c) => [c.getAttribute("data-end"), c.getAttribute("class")]);
    expect(ends(fair)).toEqual([
      ["not-included", "fill-raised stroke-ink"],
      ["not-included", "fill-raised stroke-ink"],
    ]);
    expect(ends(healthy)).toEqual([
      ["included", "fill-ink stroke-ink"],
      ["not-included", "fill-raised stroke-ink"],
    ]);
  });

  it("draws an unbounded end as an arrow instead of an end mark", () => {
    render(<BandCoverage bands={drafted} unit="psi" />);
    const weak = screen.getByRole("img", { name: 'Band "Weak", Low: up to and including 80 psi' });
    const line = weak.querySelector("line")!;
    expect(line.getAttribute("marker-start")).toMatch(/^url\(#.+-arrow\)$/);
    expect(line.getAttribute("marker-end")).toBeNull();
    expect(weak.querySelectorAll("circle")).toHaveLength(1);
  });

  it("calls onPick with the band's index when a band is tapped or pressed", async () => {
    const user = userEvent.setup();
    const onPick = vi.fn();
    render(<BandCoverage bands={drafted} unit="psi" onPick={onPick} />);
    await user.click(screen.getByRole("button", { name: /Band "Healthy"/ }));
    expect(onPick).toHaveBeenLastCalledWith(2);
    screen.getByRole("button", { name: /Band "Weak"/ }).focus();
    await user.keyboard("{Enter}");
    expect(onPick).toHaveBeenLastCalledWith(0);
  });

  it("lists an empty band in the checker's words", () => {
    render(<BandCoverage bands={[band(null, [5, false], "Low"), band([9, true], [3, false], "Backwards"), band([5, true], null, "High")]} unit="psi" />);
    expect(screen.getByText('Band "Backwards" covers nothing: it runs from 9 to 3 psi')).toBeInTheDocument();
  });

  it("says so when there are no bands yet", () => {
    render(<BandCoverage bands={[]} unit="psi" />);
    expect(screen.getByText(/No bands yet/)).toBeInTheDocument();
  });
});
