import type { PublicUser } from "../../shared/schemas/users.ts";
import { forbidden } from "../lib/errors.ts";

/** A record a policy can look at: who owns it, when ownership matters. */
export interface OwnedRecord {
  ownerId?: string | null;
}

type Policy = (user: PublicUser, record: OwnedRecord | null) => boolean;

// Deny by default: an action missing here is refused for everyone.
const policies: Record<string, Policy> = {
  "user.change_own_password": (user, record) => record?.ownerId === user.id,
  "user.manage": (user) => user.role === "shop_lead",
  "settings.read": () => true,
  "settings.update": (user) => user.role === "shop_lead",
};

export type Action = keyof typeof policies;

export function can(user: PublicUser, action: string, record: OwnedRecord | null = null): boolean {
  const policy = policies[action];
  return policy ? policy(user, record) : false;
}

export function authorize(user: PublicUser, action: string, record: OwnedRecord | null = null): void {
  if (!can(user, action, record)) throw forbidden();
}
