import { hash, verify } from '@node-rs/argon2';

// argon2id (the library's default algorithm) with the commonly recommended minimum cost:
// 19 MiB of memory, 2 passes, 1 lane.
const OPTIONS = { memoryCost: 19_456, timeCost: 2, parallelism: 1 } as const;

/** A PHC-format argon2id hash of the password. */
export function hashPassword(password: string): Promise<string> {
  return hash(password, OPTIONS);
}

let dummyHash: Promise<string> | undefined;

/**
 * Checks a password against a stored hash. With no hash (no such account, or a provider-only
 * account) it still spends the time of one verification, so timing does not reveal which.
 */
export async function verifyPassword(storedHash: string | null | undefined, password: string): Promise<boolean> {
  if (!storedHash) {
    dummyHash ??= hashPassword('sheaf-timing-equalizer');
    await verify(await dummyHash, password).catch(() => false);
    return false;
  }
  try {
    return await verify(storedHash, password);
  } catch {
    return false;
  }
}
