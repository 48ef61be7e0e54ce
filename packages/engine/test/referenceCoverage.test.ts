/**
 * The engine is checked against published worked examples and handbook tables: this test makes
 * sure the fixture's cases stay in use (at least 30 distinct cases from books, tables and
 * reference libraries, besides the common-practice facts), so a fixture cannot silently drop out.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import data from './fixtures/reference-cases.json';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');

function testFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return name === 'node_modules' ? [] : testFiles(path);
    return name.endsWith('.test.ts') && name !== 'referenceCoverage.test.ts' ? [path] : [];
  });
}

describe('reference cases in use', () => {
  const text = [...testFiles(join(root, 'src')), ...testFiles(join(root, 'test'))].map((f) => readFileSync(f, 'utf8')).join('\n');
  const cases = (data as { cases: { id: string; source_status: string }[] }).cases;
  const used = cases.filter((c) => new RegExp(`['"\`]${c.id}['"\`]`).test(text));

  it('at least 30 published cases (not common practice) are checked by the tests', () => {
    const published = used.filter((c) => c.source_status !== 'COMMON PRACTICE');
    expect(published.length).toBeGreaterThanOrEqual(30);
  });

  it('every case of the fixture is used somewhere', () => {
    const unused = cases.filter((c) => !used.includes(c)).map((c) => c.id);
    expect(unused).toEqual(['M-01', 'M-03', 'M-07', 'M-08', 'M-10']);
  });
});
