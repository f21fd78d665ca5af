// The words of the estimate e-mail, as plain text and as simple HTML that reads on a phone.
import { equipmentKindLabels } from "../../shared/equipment.ts";
import { escapeHtml } from "../mail/escape-html.ts";
import { formatMoney } from "../../shared/calc/money.ts";
import type { EstimateView } from "../../shared/schemas/estimates.ts";

export interface EstimateMessageParts {
  shop: { name: string; phone: string; email: string };
  workOrderNumber: number;
  unit: { equipmentKind: keyof typeof equipmentKindLabels; make: string; model: string };
  customerName: string;
  link: string;
  validUntil: Date;
}

const day = (d: Date) => new Intl.DateTimeFormat("en-US", { year: "numeric", month: "long", day: "numeric", timeZone: "UTC" }).format(d);

export function estimateSubject(parts: EstimateMessageParts): string {
  return `Your estimate from ${parts.shop.name} for work order ${parts.workOrderNumber}`;
}

export function estimateMessage(estimate: EstimateView, parts: EstimateMessageParts): { subject: string; text: string; html: string } {
  const unit = `${parts.unit.make} ${parts.unit.model} (${equipmentKindLabels[parts.unit.equipmentKind].toLowerCase()})`;
  const money = (cents: number) => formatMoney(cents, estimate.currency);
  const greeting = parts.customerName ? `Hello ${parts.customerName},` : "Hello,";
  const contact = [parts.shop.phone, parts.shop.email].filter(Boolean).join(" or ");
  const options = estimate.options.map((o, i) => ({ label: estimate.options.length > 1 ? `Option ${i + 1}: ${o.title}` : o.title, total: money(o.totals.totalCents), sentence: o.repairOrReplace?.sentence ?? null }));

  const text = [
    greeting,
    "",
    `We have looked at your ${unit}, work order ${parts.workOrderNumber}.`,
    estimate.findingTitle ? `What we found: ${estimate.findingTitle}.` : null,
    estimate.note ? `\n${estimate.note}` : null,
    "",
    ...options.flatMap((o) => [`${o.label} — ${o.total} including tax`, ...(o.sentence ? [`  ${o.sentence}`] : [])]),
    "",
    `See every line, and approve or decline, here (valid until ${day(parts.validUntil)}):`,
    parts.link,
    "",
    "Our report on the work order, with the readings we took, this estimate and the safety and warranty notes, is attached as a PDF.",
    contact ? `Questions? Call or write to us: ${contact}.` : null,
    parts.shop.name,
  ]
    .filter((line) => line !== null)
    .join("\n");

  const html = `<!doctype html><html><body style="font-family:sans-serif;font-size:16px;line-height:1.5;color:#23211e;max-width:560px">
<p style="font-size:20px;font-weight:bold">${escapeHtml(parts.shop.name)}</p>
<p>${escapeHtml(greeting)}</p>
<p>We have looked at your ${escapeHtml(unit)}, work order ${parts.workOrderNumber}.${estimate.findingTitle ? ` What we found: <strong>${escapeHtml(estimate.findingTitle)}</strong>.` : ""}</p>
${estimate.note ? `<p>${escapeHtml(estimate.note)}</p>` : ""}
<table style="border-collapse:collapse;width:100%">${options
    .map(
      (o) =>
        `<tr><td style="padding:8px 0;border-bottom:1px solid #d9d4cc">${escapeHtml(o.label)}${o.sentence ? `<br><span style="color:#5c5750">${escapeHtml(o.sentence)}</span>` : ""}</td><td style="padding:8px 0;border-bottom:1px solid #d9d4cc;text-align:right;white-space:nowrap"><strong>${escapeHtml(o.total)}</strong></td></tr>`,
    )
    .join("")}</table>
<p style="color:#5c5750">Totals include tax.</p>
<p><a href="${escapeHtml(parts.link)}" style="display:inline-block;background:#2b5f5b;color:#ffffff;padding:14px 24px;border-radius:8px;text-decoration:none;font-weight:bold">See the estimate and answer</a></p>
<p>Valid until ${escapeHtml(day(parts.validUntil))}. If the button does not work, open this address: ${escapeHtml(parts.link)}</p>
<p>Our report on the work order, with the readings we took, this estimate and the safety and warranty notes, is attached as a PDF.</p>
${contact ? `<p>Questions? Call or write to us: ${escapeHtml(contact)}.</p>` : ""}
<p>${escapeHtml(parts.shop.name)}</p>
</body></html>`;
  return { subject: estimateSubject(parts), text, html };
}
