import { hash, verify } from "@node-rs/argon2";

// argon2id with the OWASP minimum: 19 MiB, 2 passes, 1 lane (Argon2id is the package's default algorithm).
const options = { memoryCost: 19456, timeCost: 2, parallelism: 1, outputLen: 32 } as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, options);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

let dummyHash: Promise<string> | null = null;
/** Spends the same time as a real check, so an unknown e-mail is not told apart by timing. */
export async function burnPasswordCheck(password: string): Promise<void> {
  dummyHash ??= hashPassword("benchpath-timing-equaliser");
  await verifyPassword(await dummyHash, password);
}
