import argon2 from 'argon2';

/** argon2id with the OWASP Password Storage Cheat Sheet's minimum: 19 MiB memory, 2 passes, 1 lane. */
const OPTIONS = { type: argon2.argon2id, memoryCost: 19_456, timeCost: 2, parallelism: 1 } as const;

export const hashPassword = (password: string) => argon2.hash(password, OPTIONS);

export async function verifyPassword(hash: string, password: string): Promise<boolean> {
  try {
    return await argon2.verify(hash, password);
  } catch {
    return false;
  }
}

let dummyHash: Promise<string> | null = null;

/** Spend the same time as a real check when the account does not exist, so timing reveals nothing. */
export async function verifyAgainstNothing(password: string): Promise<void> {
  dummyHash ??= hashPassword('benchwright-timing-equaliser');
  await verifyPassword(await dummyHash, password);
}
