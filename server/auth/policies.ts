import type { PublicUser, Role } from "../../shared/schemas/users.ts";
import { forbidden } from "../lib/errors.ts";

/** A record a policy can look at: who owns it, when ownership matters; for a flow, whether it is published and retired. */
export interface OwnedRecord {
  ownerId?: string | null;
  published?: boolean;
  retired?: boolean;
}

const intakeRoles: readonly Role[] = ["apprentice", "senior_tech", "shop_lead"];
const benchRoles: readonly Role[] = ["apprentice", "senior_tech", "shop_lead"];
const flowEditorRoles: readonly Role[] = ["senior_tech", "shop_lead"];

type Policy = (user: PublicUser, record: OwnedRecord | null) => boolean;

// Deny by default: an action missing here is refused for everyone.
const policies: Record<string, Policy> = {
  "user.change_own_password": (user, record) => record?.ownerId === user.id,
  "user.manage": (user) => user.role === "shop_lead",
  "settings.read": () => true,
  "settings.update": (user) => user.role === "shop_lead",
  "work_order.read": () => true,
  "work_order.create": (user) => intakeRoles.includes(user.role),
  "work_order.update": (user) => intakeRoles.includes(user.role),
  "session.create": (user) => benchRoles.includes(user.role),
  // Only the tech running a session adds to it or finishes it.
  "session.append": (user, record) => record?.ownerId === user.id,
  "session.read": (user, record) => record?.ownerId === user.id || user.role === "senior_tech" || user.role === "shop_lead",
  "session.abandon": (user, record) => record?.ownerId === user.id || user.role === "shop_lead",
  // The shop lead signs off completed sessions; a tech sees the flags on their own.
  "session.review": (user) => user.role === "shop_lead",
  "session.flags": (user, record) => record?.ownerId === user.id || user.role === "shop_lead",
  // The whole review queue; a tech's own list is narrowed to their sessions by the service.
  "review.list_all": (user) => user.role === "shop_lead",
  // The shop's figures over a date range: the shop lead's alone.
  "insight.read": (user) => user.role === "shop_lead",
  // What the shop sent and the built-in sink received: the shop lead's.
  "mail.read": (user) => user.role === "shop_lead",
  // Estimates: every tech and the shop lead read, price and send them (the customer answers by link, without an account).
  "estimate.read": (user) => benchRoles.includes(user.role),
  "estimate.edit": (user) => benchRoles.includes(user.role),
  "estimate.send": (user) => benchRoles.includes(user.role),
  // Everyone reads flows; apprentices only published, unretired ones (and never a draft: drafts need flow.edit).
  "flow.read": (user, record) => flowEditorRoles.includes(user.role) || record === null || (record.published === true && record.retired !== true),
  // Create, save drafts, publish, retire, import.
  "flow.edit": (user) => flowEditorRoles.includes(user.role),
};

export type Action = keyof typeof policies;

export function can(user: PublicUser, action: string, record: OwnedRecord | null = null): boolean {
  const policy = policies[action];
  return policy ? policy(user, record) : false;
}

export function authorize(user: PublicUser, action: string, record: OwnedRecord | null = null): void {
  if (!can(user, action, record)) throw forbidden();
}
