import { describe, expect, it } from 'vitest';
import { hashPassword, verifyPassword } from './passwords';

describe('password hashing', () => {
  it('stores argon2id hashes that verify only the right password', async () => {
    const hash = await hashPassword('sling angle thirty degrees');
    expect(hash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
    expect(await verifyPassword(hash, 'sling angle thirty degrees')).toBe(true);
    expect(await verifyPassword(hash, 'sling angle forty degrees')).toBe(false);
  });

  it('answers false for a missing or broken hash instead of throwing', async () => {
    expect(await verifyPassword(null, 'anything at all')).toBe(false);
    expect(await verifyPassword('not-a-hash', 'anything at all')).toBe(false);
  });
});
