// The e-mails that carry a one-time password link: an invitation to join the shop, or a reset.
import { escapeHtml } from "./escape-html.ts";
import type { OutgoingMessage } from "./mailer.ts";


interface LinkMail {
  to: string;
  name: string;
  shopName: string;
  link: string;
  userId: string;
  createdBy: string | null;
}

function html(lines: string[], link: string, button: string, after: string): string {
  return [
    `<div style="font-family: sans-serif; font-size: 16px; line-height: 1.5; color: #222">`,
    ...lines.map((l) => `<p>${escapeHtml(l)}</p>`),
    `<p><a href="${escapeHtml(link)}" style="display: inline-block; padding: 12px 20px; background: #1f5f5b; color: #fff; text-decoration: none; border-radius: 6px; font-weight: bold">${escapeHtml(button)}</a></p>`,
    `<p style="font-size: 14px; color: #555">Or copy this address into the browser: ${escapeHtml(link)}</p>`,
    `<p style="font-size: 14px; color: #555">${escapeHtml(after)}</p>`,
    `</div>`,
  ].join("\n");
}

export function inviteMail(m: LinkMail & { role: string; validDays: number }): OutgoingMessage {
  const lines = [`Hello ${m.name},`, `${m.shopName} has added you to Benchpath as ${m.role}. Choose a password to start.`];
  const after = `The link works once and for ${m.validDays} days. If you did not expect this, you can ignore this message.`;
  return {
    kind: "invite",
    to: m.to,
    subject: `Join ${m.shopName} on Benchpath`,
    text: [...lines, `Choose your password: ${m.link}`, after].join("\n\n"),
    html: html(lines, m.link, "Choose your password", after),
    fromName: m.shopName,
    recordType: "user",
    recordId: m.userId,
    createdBy: m.createdBy,
  };
}

export function resetMail(m: LinkMail & { validMinutes: number }): OutgoingMessage {
  const lines = [`Hello ${m.name},`, `Someone asked to reset your Benchpath password at ${m.shopName}. Choose a new one with the link below.`];
  const after = `The link works once and for ${m.validMinutes} minutes; using it signs you out everywhere. If you did not ask for this, ignore this message: your password stays as it is.`;
  return {
    kind: "password_reset",
    to: m.to,
    subject: `Reset your Benchpath password`,
    text: [...lines, `Choose a new password: ${m.link}`, after].join("\n\n"),
    html: html(lines, m.link, "Choose a new password", after),
    fromName: m.shopName,
    recordType: "user",
    recordId: m.userId,
    createdBy: m.createdBy,
  };
}
