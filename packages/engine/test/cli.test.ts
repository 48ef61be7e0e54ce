/** The CLI, spawned as a user runs it (bin/sheaf.mjs through tsx), on the examples and on bad input. */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const here = dirname(fileURLToPath(import.meta.url));
const bin = resolve(here, '../bin/sheaf.mjs');
const examples = resolve(here, '../../../examples');
const scratch = mkdtempSync(join(tmpdir(), 'sheaf-cli-'));

function sheaf(...args: string[]): { status: number | null; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, [bin, ...args], { encoding: 'utf8', timeout: 120_000 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

function write(name: string, content: unknown): string {
  const path = join(scratch, name);
  writeFileSync(path, typeof content === 'string' ? content : JSON.stringify(content));
  return path;
}

const sheetWith = (cells: unknown[]) => ({ format: 'sheaf-sheet', version: 1, title: 'CLI test', unitSystem: 'SI', cells });

describe('sheaf eval', () => {
  it('prints every named cell of an example and exits 0', () => {
    const r = sheaf('eval', join(examples, 'lifting-lug-weld-toe.sheaf.json'), '--units', 'US');
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/^Gantry beam lifting lug, weld toe at section A-A {2}\(US units\)/);
    expect(r.stdout).toMatch(/\nS +stress +sx = 18\.987 ksi/);
    expect(r.stdout).toMatch(/\nvonMises +criterion +equivalent = .* pass = pass/);
    expect(r.stdout).toContain('15 named cells, 0 with errors');
  }, 180_000);

  it('--json: SI base numbers, factor null with unbounded: true for an infinite factor', () => {
    const path = write('hydro.json', sheetWith([
      { id: 'a', kind: 'stress', name: 'H', sx: '-5 MPa', sy: '-5 MPa', txy: '0 MPa', sz: '-5 MPa' },
      { id: 'b', kind: 'criterion', name: 'C', of: 'H', theory: 'von-mises', strength: { Sy: '250 MPa' } },
      { id: 'c', kind: 'quantity', name: 'Q', expr: '2 MPa + 1 m' },
      { id: 'd', kind: 'principal', name: 'P', of: 'H' },
    ]));
    const r = sheaf('eval', path, '--json');
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.cells.C.values).toMatchObject({ factor: null, unbounded: true, pass: true });
    expect(out.cells.P.values.s1).toBe(-5e6);
    expect(out.cells.Q).toEqual({ kind: 'quantity', error: { code: 'unit-mismatch', message: 'expr: Units do not match' } });
  }, 180_000);

  it('materials come from --materials', () => {
    const file = join(examples, 'hoist-drive-shaft.sheaf.json');
    const without = sheaf('eval', file, '--json');
    expect(JSON.parse(without.stdout).cells.vonMises.error.code).toBe('unknown-material');
    const withList = sheaf('eval', file, '--json', '--materials', join(examples, 'materials.json'));
    expect(JSON.parse(withList.stdout).cells.vonMises.values.pass).toBe(true);
  }, 180_000);

  it('an invalid file exits 1 with a message naming the field', () => {
    const path = write('bad.json', sheetWith([
      { id: 'a', kind: 'quantity', name: 'F', expr: '18 kN' },
      { id: 'b', kind: 'quantity', name: 'A', expr: '480 mm^2' },
      { id: 'c', kind: 'note', text: 'x' },
      { id: 'd', kind: 'stress', name: 'S', sx: 37.5, sy: '0 MPa', txy: '22 MPa' },
    ]));
    const r = sheaf('eval', path);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('cells[3].sx: must be a string');
  }, 180_000);

  it('bad usage exits 2', () => {
    const none = sheaf();
    expect(none.status).toBe(2);
    expect(none.stderr).toContain('sheaf: no command given');
    const units = sheaf('eval', join(examples, 'lifting-lug-weld-toe.sheaf.json'), '--units', 'metric');
    expect(units.status).toBe(2);
    expect(units.stderr).toContain('--units must be SI or US');
    expect(sheaf('eval', join(scratch, 'missing.json')).stderr).toContain('cannot read sheet');
  }, 180_000);
});

describe('sheaf batch', () => {
  const rows = ['sx,sy,txy', '80,-40,25', '0,40,45', '', '-40,-60,15', '120,10,60'];
  const csv = write('points.csv', rows.join('\n'));

  it('prints count, minimum factor, worst row and failing rows', () => {
    const r = sheaf('batch', csv, '--theory', 'von-mises', '--Sy', '250', '--required', '2');
    expect(r.status).toBe(0);
    // Row 3 (120, 10, 60 MPa): σ' = sqrt(120² - 120·10 + 10² + 3·60²) = 155.24 MPa, n = 1.6104.
    expect(r.stdout).toContain('count: 4');
    expect(r.stdout).toContain('minimum factor: 1.6104');
    expect(r.stdout).toContain('worst row: 3 (0-based data row; line 6 of the file)');
    expect(r.stdout).toContain('failing (factor < 2): 1');
  }, 180_000);

  it('--json, strengths with units, US numbers', () => {
    const r = sheaf('batch', csv, '--theory', 'coulomb-mohr', '--Sut', '31ksi', '--Suc', '109 ksi', '--unit', 'ksi', '--json');
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out).toMatchObject({ count: 4, worstRow: 3, failing: 3, required: 1 });
    // Row 3 in ksi: p1,2 = 65 ± sqrt(55² + 60²) = 146.39, -16.39; 1/n = 146.39/31 + 16.39/109.
    expect(out.minFactor).toBeCloseTo(1 / (146.3941 / 31 + 16.3941 / 109), 4);
  }, 180_000);

  it('bad CSV exits 1 naming line and column; bad options exit 2', () => {
    const bad = write('bad.csv', 'sx,sy,txy\n1,2,3\n4,five,6\n');
    const r = sheaf('batch', bad, '--theory', 'tresca', '--Sy', '250');
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('line 3, column sy: "five" is not a number');
    const missing = sheaf('batch', csv, '--theory', 'tresca');
    expect(missing.status).toBe(2);
    expect(missing.stderr).toContain('--theory tresca needs --Sy');
    expect(sheaf('batch', csv, '--theory', 'tresca', '--Sy', '250 mm').stderr).toContain('--Sy: expected a stress');
  }, 180_000);
});
