import { createHash, randomBytes } from "node:crypto";

/** 160 bits from the system's CSPRNG, base64url: the only copy is in the cookie. */
export function newSessionToken(): string {
  return randomBytes(20).toString("base64url");
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

/** 256 bits, base64url, for a link sent by e-mail (estimate answers, invitations, resets); only its hash is stored. */
export function newLinkToken(): string {
  return randomBytes(32).toString("base64url");
}
