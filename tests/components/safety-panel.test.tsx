import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it, vi } from "vitest";
import { SafetyPanel } from "../../src/components/ui/safety-panel.tsx";

describe("SafetyPanel", () => {
  it("shows WARNING with the safety alert symbol", () => {
    render(
      <SafetyPanel signal="warning" onAcknowledge={() => {}}>
        Fuel vapour can ignite. Work at least 10 ft from any flame or spark.
      </SafetyPanel>,
    );
    const panel = screen.getByRole("region", { name: "WARNING" });
    expect(within(panel).getByRole("img", { name: "Safety alert symbol" })).toBeInTheDocument();
    expect(within(panel).getByText(/Fuel vapour can ignite/)).toBeInTheDocument();
  });

  it("shows NOTICE without the safety alert symbol and asks for no acknowledgement", () => {
    render(<SafetyPanel signal="notice">Drain the fuel before storing the unit.</SafetyPanel>);
    const panel = screen.getByRole("region", { name: "NOTICE" });
    expect(within(panel).queryByRole("img")).not.toBeInTheDocument();
    expect(within(panel).queryByRole("button")).not.toBeInTheDocument();
  });

  it("shows CAUTION with the symbol", () => {
    render(<SafetyPanel signal="caution">The muffler stays hot after running.</SafetyPanel>);
    const panel = screen.getByRole("region", { name: "CAUTION" });
    expect(within(panel).getByRole("img", { name: "Safety alert symbol" })).toBeInTheDocument();
  });

  it("requires DANGER to be acknowledged, once", async () => {
    const onAcknowledge = vi.fn();
    render(
      <SafetyPanel signal="danger" title="Never run a generator indoors" onAcknowledge={onAcknowledge}>
        Exhaust carbon monoxide can kill in minutes.
      </SafetyPanel>,
    );
    const panel = screen.getByRole("region", { name: "DANGER" });
    expect(within(panel).getByRole("img", { name: "Safety alert symbol" })).toBeInTheDocument();
    expect(onAcknowledge).not.toHaveBeenCalled();

    const user = userEvent.setup();
    await user.click(within(panel).getByRole("button", { name: "Read and understood" }));
    expect(onAcknowledge).toHaveBeenCalledTimes(1);
    expect(within(panel).queryByRole("button", { name: "Read and understood" })).not.toBeInTheDocument();
    expect(within(panel).getByRole("status")).toHaveTextContent("You have read this and will work with care.");
    // Read once, the text folds under its band and can be opened again.
    expect(screen.queryByText("Exhaust carbon monoxide can kill in minutes.")).not.toBeVisible();
    await user.click(within(panel).getByRole("button", { name: "Show the text" }));
    expect(screen.getByText("Exhaust carbon monoxide can kill in minutes.")).toBeVisible();
    expect(within(panel).getByRole("button", { name: "Fold the text away" })).toHaveAttribute("aria-expanded", "true");
    expect(onAcknowledge).toHaveBeenCalledTimes(1);
  });

  it("shows an earlier acknowledgement as done", () => {
    render(
      <SafetyPanel signal="warning" acknowledged onAcknowledge={() => {}}>
        Disconnect the spark plug lead first.
      </SafetyPanel>,
    );
    expect(screen.queryByRole("button", { name: "Read and understood" })).not.toBeInTheDocument();
    expect(screen.getByRole("status")).toBeInTheDocument();
  });
});
