import { hash, verify } from "@node-rs/argon2";

/**
 * argon2id with the first parameter set OWASP's Password Storage Cheat Sheet lists
 * (m = 19 MiB, t = 2, p = 1). The encoded hash carries its parameters, so they can be raised later
 * without breaking existing accounts.
 */
const options = {
  algorithm: 2, // Algorithm.Argon2id (a const enum, which isolatedModules cannot import)
  memoryCost: 19_456,
  timeCost: 2,
  parallelism: 1,
} as const;

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

let dummyHash: Promise<string> | undefined;
/**
 * Spends the same work as a real check when the account does not exist, so response time does not
 * tell an attacker which e-mails are registered.
 */
export async function burnPasswordCheck(password: string): Promise<void> {
  dummyHash ??= hashPassword("not-a-real-account-password");
  await verifyPassword(await dummyHash, password);
}
