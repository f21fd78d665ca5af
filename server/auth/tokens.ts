import { createHash, randomBytes } from "node:crypto";

/** 160 bits from the system's CSPRNG, base64url: the only copy is in the cookie. */
export function newSessionToken(): string {
  return randomBytes(20).toString("base64url");
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
