import "server-only";
import { hash, verify } from "@node-rs/argon2";

/** argon2id with the OWASP Password Storage Cheat Sheet's minimum (m = 19 MiB, t = 2, p = 1). */
const OPTIONS = { memoryCost: 19456, timeCost: 2, parallelism: 1, outputLen: 32 } as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, OPTIONS);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

/** A real hash of a random string, verified against when the e-mail is unknown so timing reveals nothing. */
let dummyHash: Promise<string> | undefined;
export function dummyPasswordHash(): Promise<string> {
  dummyHash ??= hashPassword(crypto.randomUUID());
  return dummyHash;
}
