import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { canonicalJson, contentSha256 } from './canonicalContent';

describe('canonical content', () => {
  it('sorts keys at every depth and keeps array order', () => {
    const a = { version: 1, format: 'sheaf-sheet', cells: [{ kind: 'quantity', id: 'q1', expr: '18 kN', name: 'P' }] };
    expect(canonicalJson(a)).toBe('{"cells":[{"expr":"18 kN","id":"q1","kind":"quantity","name":"P"}],"format":"sheaf-sheet","version":1}');
    const reordered = { cells: [{ name: 'P', expr: '18 kN', id: 'q1', kind: 'quantity' }], format: 'sheaf-sheet', version: 1 };
    expect(contentSha256(reordered)).toBe(contentSha256(a));
  });

  it('hashes the UTF-8 bytes of the canonical text (checked against a second hash of the same text)', () => {
    const content = { title: 'Pulley hub, σ at the bore', cells: [] };
    const expected = createHash('sha256').update(Buffer.from('{"cells":[],"title":"Pulley hub, σ at the bore"}', 'utf8')).digest('hex');
    expect(contentSha256(content)).toBe(expected);
    expect(contentSha256({ ...content, title: 'Pulley hub' })).not.toBe(expected);
  });
});
