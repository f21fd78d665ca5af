// The report's figures as text, said once for the print page and the PDF.
import type { CustomerReport, ReportLine, ReportOption, ReportReading } from "../schemas/report.ts";
import { formatMoney, formatQuantity, formatRate } from "../calc/money.ts";

const figure = (n: number) => String(Number(n.toPrecision(4)));

/** "62 psi (427.5 kPa)": as entered, then in the shop's units when they differ. */
export function readingText(reading: ReportReading): string {
  const entered = `${figure(reading.entered.value)} ${reading.entered.unitLabel}`;
  return reading.converted ? `${entered} (${figure(reading.converted.value)} ${reading.converted.unitLabel})` : entered;
}

/** The unit's facts as recorded at intake, label and value, leaving out what was not recorded. */
export function unitFacts(unit: CustomerReport["unit"]): [label: string, value: string][] {
  const facts: [string, string][] = [
    ["Kind", unit.kindLabel],
    ["Make", unit.make],
    ["Model", unit.model],
    ["Engine model", unit.engineModel],
    ["Engine type", unit.engineType],
    ["Engine serial", unit.engineSerial],
    ["Engine", `${unit.cycle}-stroke${unit.displacementCc === null ? "" : `, ${figure(unit.displacementCc)} cc`}`],
    ["Hours", unit.hours === null ? "" : figure(unit.hours)],
  ];
  return facts.filter(([, value]) => value.trim() !== "");
}

/** "Fernhill FT-25 string trimmer". */
export function unitTitle(unit: CustomerReport["unit"]): string {
  return `${unit.make} ${unit.model} ${unit.kindLabel.toLowerCase()}`;
}

export function lineQuantity(line: ReportLine): string {
  return line.kind === "labour" ? `${formatQuantity(line.quantity)} h` : formatQuantity(line.quantity);
}

/** The rows under an option's lines, as label and amount; the fee and its credit only when there are any. */
export function optionTotalRows(option: ReportOption, estimate: { currency: string; taxRateBasisPoints: number }): [label: string, amount: string][] {
  const money = (cents: number) => formatMoney(cents, estimate.currency);
  const rows: [string, string][] = [
    ["Parts", money(option.partsCents)],
    ["Labour", money(option.labourCents)],
  ];
  if (option.diagnosticFeeCents > 0) rows.push(["Diagnostic fee", money(option.diagnosticFeeCents)]);
  if (option.diagnosticCreditCents > 0) rows.push(["Diagnostic fee credited", money(-option.diagnosticCreditCents)]);
  rows.push(["Subtotal", money(option.subtotalCents)]);
  rows.push([`Tax ${formatRate(estimate.taxRateBasisPoints)} on ${money(option.taxableCents)}`, money(option.taxCents)]);
  return rows;
}

export function shopContact(shop: CustomerReport["shop"]): string[] {
  return [shop.address, shop.phone, shop.email].filter((s) => s.trim() !== "");
}
