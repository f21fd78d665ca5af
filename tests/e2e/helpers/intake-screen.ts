// The check-in form, filled the way the counter fills it: by the labels on screen.
import { expect } from "vitest";
import type { Page } from "playwright-core";
import { equipmentKindLabels } from "../../../shared/equipment.ts";
import { tankContentLabels, type CreateWorkOrderRequest } from "../../../shared/schemas/work-orders.ts";
import { seen } from "./bench-screen.ts";

type Intake = CreateWorkOrderRequest & { unit: { cycle: 2 | 4; compressionRelease: "yes" | "no" | "unknown" } };

const releaseWords = { yes: "Yes", no: "No", unknown: "Not known" } as const;

async function pick(page: Page, group: string, choice: string): Promise<void> {
  const radios = page.getByRole("radiogroup", { name: group });
  await radios.getByText(choice, { exact: true }).click();
  expect(await radios.getByRole("radio", { name: choice, exact: true }).isChecked(), `${group}: ${choice}`).toBe(true);
}

export function checkInButton(page: Page) {
  return page.getByRole("button", { name: "Check in", exact: true });
}

/** Sends the empty form and checks that each needed answer says what is missing, beside its field. */
export async function expectNeededAnswers(page: Page): Promise<void> {
  await checkInButton(page).click();
  const summary = page.getByRole("alert").filter({ hasText: "fixing before this unit can be checked in" });
  await seen(summary, "the summary of answers to fix");
  const besideFields: [string, string][] = [
    ["customer-name", "Enter the customer's name."],
    ["unit-equipmentKind", "Choose the kind of equipment."],
    ["unit-make", "Enter the make as printed on the unit."],
    ["unit-model", "Enter the model as printed on the unit."],
    ["unit-cycle", "Choose 2-stroke or 4-stroke."],
    ["complaint", "Write the complaint in the customer's words."],
    ["tankContents", "Choose what is in the tank."],
  ];
  expect(await summary.innerText()).toContain(`${besideFields.length} answers need fixing`);
  for (const [id, message] of besideFields) {
    const field = page.locator(`[id="${id}"]`);
    expect(await field.getAttribute("aria-invalid"), `${id} marked invalid`).toBe("true");
    expect(await field.getAttribute("aria-describedby"), `${id} points at its message`).toContain(`${id}-error`);
    expect((await page.locator(`[id="${id}-error"]`).innerText()).trim(), `message beside ${id}`).toBe(message);
  }
}

export async function fillIntake(page: Page, intake: Intake): Promise<void> {
  const { customer, unit } = intake;
  await page.getByRole("textbox", { name: "Customer's name", exact: true }).fill(customer.name);
  await page.getByRole("textbox", { name: "Phone", exact: true }).fill(customer.phone ?? "");
  await page.getByRole("textbox", { name: "E-mail", exact: true }).fill(customer.email ?? "");
  await pick(page, "What kind of equipment is it?", equipmentKindLabels[unit.equipmentKind]);
  await page.getByRole("textbox", { name: "Make", exact: true }).fill(unit.make);
  await page.getByRole("textbox", { name: "Model", exact: true }).fill(unit.model);
  await page.getByRole("textbox", { name: "Engine model", exact: true }).fill(unit.engineModel ?? "");
  await page.getByRole("textbox", { name: "Engine type or spec code", exact: true }).fill(unit.engineType ?? "");
  await page.getByRole("textbox", { name: "Engine serial number", exact: true }).fill(unit.engineSerial ?? "");
  await pick(page, "2-stroke or 4-stroke?", `${unit.cycle}-stroke`);
  await page.getByRole("textbox", { name: "Displacement in cc", exact: true }).fill(unit.displacementCc == null ? "" : String(unit.displacementCc));
  await pick(page, "Automatic compression release fitted?", releaseWords[unit.compressionRelease]);
  await page.getByRole("textbox", { name: "What the customer says is wrong", exact: true }).fill(intake.complaint);
  await page.getByRole("textbox", { name: "What they already tried", exact: true }).fill(intake.alreadyTried ?? "");
  await pick(page, "What is in the tank?", tankContentLabels[intake.tankContents]);
}
