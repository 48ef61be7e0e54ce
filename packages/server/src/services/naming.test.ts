import { describe, expect, it } from 'vitest';
import { seedUuid } from '../db/seedDemo';
import { slugify } from './organizations';
import { codeFromName } from './projects';
import { formatCalcNumber } from './sheets';
import { hashToken, newToken } from './tokens';

describe('names Sheaf derives', () => {
  it('makes URL slugs from organization names', () => {
    expect(slugify('Northgate Lifting Ltd.')).toBe('northgate-lifting-ltd');
    expect(slugify('  Ørsted & Søn Kranbau  ')).toBe('rsted-s-n-kranbau');
    expect(slugify('Crème Brûlée Hoists')).toBe('creme-brulee-hoists');
    expect(slugify('***')).toBe('organization');
    expect(slugify('x'.repeat(100))).toHaveLength(60);
  });

  it('makes project codes from initials', () => {
    expect(codeFromName('Hoist drive shaft')).toBe('HDS');
    expect(codeFromName('Gantry beam lifting lug, rev 2')).toBe('GBLLR2');
    expect(codeFromName('Pad')).toBe('PAD');
    expect(codeFromName('x')).toBe('XXX');
  });

  it('pads calc numbers to three digits', () => {
    expect(formatCalcNumber('GBL', 7)).toBe('GBL-007');
    expect(formatCalcNumber('GBL', 1234)).toBe('GBL-1234');
  });

  it('derives stable RFC 9562 UUIDs for seed keys', () => {
    const id = seedUuid('northgate-lifting/built-in/lifting-lug');
    expect(id).toBe(seedUuid('northgate-lifting/built-in/lifting-lug'));
    expect(id).not.toBe(seedUuid('northgate-lifting/built-in/hoist-shaft'));
    expect(id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-8[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
  });

  it('keeps only a hash of link tokens', () => {
    const { token, tokenHash } = newToken();
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(tokenHash).toBe(hashToken(token));
    expect(tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(newToken().token).not.toBe(token);
  });
});
