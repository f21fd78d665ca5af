import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { meAnswers, renderApp, signedInAs, stubApi } from "../render-app.tsx";

const apprentice = meAnswers(signedInAs("apprentice"));

async function press(user: ReturnType<typeof userEvent.setup>, keys: string[]) {
  const keypad = screen.getByRole("group", { name: "Keypad" });
  for (const key of keys) await user.click(within(keypad).getByRole("button", { name: key }));
}
const result = (title: string) => screen.getByRole("region", { name: title });

describe("the bench calculators", () => {
  it("opens on the premix and gives the oil for the fuel typed on the keypad, at a tapped ratio", async () => {
    stubApi(apprentice);
    renderApp("/bench/calculators");
    await screen.findByRole("heading", { level: 1, name: "Bench calculators" }, { timeout: 5000 });
    expect(screen.getByRole("button", { name: "2-stroke premix" })).toHaveAttribute("aria-pressed", "true");
    // A fuel calculator says how to handle fuel safely.
    expect(screen.getByText(/Fuel is highly flammable/)).toBeInTheDocument();
    const user = userEvent.setup();
    await press(user, ["1"]);
    // Source: 128 US fl oz in a US gallon (NIST SP 811, B.8): 128 / 50 = 2.56; 3785.41 mL / 50 = 75.7.
    expect(result("2-stroke oil to add")).toHaveTextContent("2.56 US fl oz");
    expect(result("2-stroke oil to add")).toHaveTextContent("76 mL");
    await user.click(screen.getByRole("button", { name: "40:1" }));
    expect(result("2-stroke oil to add")).toHaveTextContent("3.20 US fl oz");
    await user.click(within(screen.getByRole("group", { name: "Unit" })).getByRole("button", { name: /^L$/ }));
    expect(result("2-stroke oil to add")).toHaveTextContent("25 mL");
  });

  it("types the ratio on the keypad once its field is chosen, and says beside it what is wrong", async () => {
    stubApi(apprentice);
    renderApp("/bench/calculators?calc=premix");
    const ratio = await screen.findByRole("textbox", { name: /Ratio/ }, { timeout: 5000 });
    const user = userEvent.setup();
    await user.click(ratio);
    await press(user, ["Clear", "Change sign", "3"]);
    expect(ratio).toHaveValue("-3");
    expect(ratio).toHaveAccessibleDescription("The ratio must be more than zero.");
  });

  it("turns a plug gap in inches into millimetres, and torque into the other units", async () => {
    stubApi(apprentice);
    const { router } = renderApp("/bench/calculators");
    await screen.findByRole("heading", { level: 1, name: "Bench calculators" }, { timeout: 5000 });
    const user = userEvent.setup();
    await user.click(screen.getByRole("button", { name: "Plug and coil gaps" }));
    expect(router.state.location.search).toBe("?calc=gap");
    // The address changes first; the keypad to type on is the gap calculator's, once it shows.
    await screen.findByRole("heading", { level: 2, name: "Plug and coil gaps" });
    await press(user, ["0", "Decimal point", "0", "3", "0"]);
    // Source: NIST SP 811, B.8: 1 in = 25.4 mm exactly, so 0.030 in = 0.762 mm.
    expect(result("The same in")).toHaveTextContent("0.76 mm");

    await user.click(screen.getByRole("button", { name: "Torque" }));
    await screen.findByRole("heading", { level: 2, name: "Torque" });
    await user.click(within(screen.getByRole("group", { name: "Unit" })).getByRole("button", { name: /N·m/ }));
    await press(user, ["1", "0"]);
    // Source: NIST SP 811, B.8: 1 lbf·ft = 1.355 818 N·m and 1 lbf·in = 0.112 984 8 N·m; 10 N·m = 7.4 lbf·ft = 89 lbf·in.
    expect(result("The same in")).toHaveTextContent("7.4 lbf·ft");
    expect(result("The same in")).toHaveTextContent("89 lbf·in");
    expect(screen.getByText(/Tighten to the figure/)).toBeInTheDocument();
  });
});
