/**
 * The example sheets in /examples (our invented lifting-equipment firm) must read, evaluate
 * without a single cell error, and render their equations. Spot values are recomputed here by
 * hand from the sheets' inputs (common practice, no source); the demo materials list holds the
 * built-in library's values for the materials the library has (the app evaluates the seeded
 * examples with the library), and the others are checked against the tables they cite (M-xx).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import katex from 'katex';
import { describe, expect, it } from 'vitest';
import { readSheet } from '../src/format/readSheet';
import { MATERIAL_PROPERTY_KEYS, materialRecordSchema, materialsLookupOf, type MaterialRecord } from '../src/library/materialRecord';
import type { Material } from '../src/kinds/materials';
import { createEvaluator, type Evaluator } from '../src/sheet/createEvaluator';
import { machineOutput } from '../src/sheet/machineOutput';
import { evaluateExpression, isExpressionProblem } from '../src/units/expression';
import { caseTitle, refCase, siFactor } from './fixtures/cases';

const examplesDir = resolve(dirname(fileURLToPath(import.meta.url)), '../../../examples');
const materials = JSON.parse(readFileSync(join(examplesDir, 'materials.json'), 'utf8')) as Record<string, Material>;
const files = readdirSync(examplesDir).filter((f) => f.endsWith('.sheaf.json')).sort();

function load(file: string): Evaluator {
  const r = readSheet(readFileSync(join(examplesDir, file), 'utf8'));
  if (!r.ok) throw new Error(`${file}: ${r.errors.join('; ')}`);
  return createEvaluator(r.sheet, { materials });
}

function value(ev: Evaluator, name: string, key: string): number {
  const r = ev.resultByName(name);
  if (!r || !r.ok) throw new Error(`${name} failed`);
  return r.values[key] as number;
}

describe('example sheets', () => {
  it('there are six to eight of them', () => {
    expect(files.length).toBeGreaterThanOrEqual(6);
    expect(files.length).toBeLessThanOrEqual(8);
  });

  for (const file of files) {
    it(`${file}: every cell evaluates and every equation renders`, () => {
      const ev = load(file);
      for (const [id, r] of ev.results) {
        expect(r.ok, `${file} ${id}: ${r.ok ? '' : `${r.error.code} ${r.error.message}`}`).toBe(true);
        for (const system of ['SI', 'US'] as const) {
          const tex = ev.equation(id, system);
          if (tex) expect(() => katex.renderToString(tex, { throwOnError: true, displayMode: true }), `${id}: ${tex}`).not.toThrow();
        }
      }
      const out = machineOutput(ev.cells, ev.results);
      expect(JSON.parse(JSON.stringify(out))).toEqual(out);
    });
  }

  it('lifting lug: sx = P cosα / (b t) + P sinα e / (t b²/6), txy = P sinα / (b t)', () => {
    const ev = load('lifting-lug-weld-toe.sheaf.json');
    const P = 18e3;
    const a = Math.PI / 6;
    const sx = (P * Math.cos(a)) / (0.04 * 0.012) + (P * Math.sin(a) * 0.035) / ((0.012 * 0.04 ** 2) / 6);
    expect(value(ev, 'S', 'sx')).toBeCloseTo(sx, 3);
    expect(value(ev, 'S', 'txy')).toBeCloseTo((P * Math.sin(a)) / (0.04 * 0.012), 3);
    expect(value(ev, 'vonMises', 'factor')).toBeCloseTo(250e6 / Math.sqrt(sx ** 2 + 3 * 18.75e6 ** 2), 9);
  });

  it('accumulator: hoop pr/t = 36 ksi, axial 18 ksi, radial -3 ksi are the principal stresses', () => {
    const ev = load('accumulator-shell.sheaf.json');
    const ksi = siFactor('ksi');
    expect(value(ev, 'Pr', 's1') / ksi).toBeCloseTo(36, 9);
    expect(value(ev, 'Pr', 's2') / ksi).toBeCloseTo(18, 9);
    expect(value(ev, 'Pr', 's3') / ksi).toBeCloseTo(-3, 9);
  });

  it('foundation soil: σv = γz + qB²/(B+z)² = 86 kPa, K0 = 1 - sin 30° = 0.5', () => {
    const ev = load('foundation-soil.sheaf.json');
    expect(value(ev, 'sv', 'value')).toBeCloseTo(86e3, 6);
    expect(value(ev, 'Soil', 'sx')).toBeCloseTo(-43e3, 6);
    expect(value(ev, 'mohrCoulomb', 'factor')).toBeGreaterThan(1.5);
  });

  it('hoist shaft takes Sy from the materials list', () => {
    const ev = load('hoist-drive-shaft.sheaf.json');
    const r = ev.resultByName('vonMises');
    expect(r?.ok && r.criterion?.strength.Sy).toBe(370e6);
  });
});

const si = (text: string | number | undefined): number => {
  if (typeof text === 'number') return text;
  const q = evaluateExpression(String(text), new Map());
  if (isExpressionProblem(q)) throw new Error(q.message);
  return q.si;
};

describe('demo materials list follows the built-in library', () => {
  const library: MaterialRecord[] = (
    JSON.parse(readFileSync(join(examplesDir, '../library/materials/builtin-materials.json'), 'utf8')) as { materials: unknown[] }
  ).materials.map((m) => materialRecordSchema.parse(m));

  it('holds the library’s values for every material it shares with the library', () => {
    const shared = Object.keys(materials).filter((id) => library.some((m) => m.id === id));
    expect(shared).toEqual(['astm-a36', 'aisi-1018-cd', 'al-6061-t6', 'gray-iron-astm30']);
    for (const id of shared) {
      const record = library.find((m) => m.id === id) as MaterialRecord;
      for (const key of MATERIAL_PROPERTY_KEYS) {
        const mine = materials[id]![key];
        const theirs = record.properties[key]?.value;
        expect(mine === undefined, `${id}.${key} present in one list only`).toBe(theirs === undefined);
        if (mine !== undefined) expect(si(mine), `${id}.${key}`).toBeCloseTo(si(theirs), 9);
      }
    }
  });

  for (const file of files) {
    it(`${file}: gives the same results with the built-in library as with the demo list (the app evaluates with the library)`, () => {
      const r = readSheet(readFileSync(join(examplesDir, file), 'utf8'));
      if (!r.ok) throw new Error(r.errors.join('; '));
      const withLibrary = createEvaluator(r.sheet, { materials: materialsLookupOf(library) });
      const withDemoList = load(file);
      expect(machineOutput(withLibrary.cells, withLibrary.results)).toEqual(machineOutput(withDemoList.cells, withDemoList.results));
    });
  }
});

describe('demo materials the library does not hold, against the handbook tables they cite', () => {
  const checks: [string, string, [keyof Material, string][]][] = [
    ['aisi-4140-qt1100', 'M-05', [['Sy', 'Sy_ksi'], ['Sut', 'Sut_ksi'], ['E', 'E_ksi'], ['nu', 'nu']]],
    ['gray-iron-astm20', 'M-09', [['Sut', 'ASTM20_Sut_MPa'], ['Suc', 'ASTM20_Suc_MPa'], ['E', 'ASTM20_E_GPa'], ['nu', 'ASTM20_nu']]],
  ];
  for (const [id, caseId, pairs] of checks) {
    const c = refCase(caseId);
    it(`${id}: ${caseTitle(c)}`, () => {
      const m = materials[id]!;
      expect(m.source.length).toBeGreaterThan(10);
      for (const [key, expectedKey] of pairs) {
        const e = c.expected[expectedKey]!;
        expect(si(m[key] as string | number) / siFactor(e.unit), `${id}.${String(key)}`).toBeCloseTo(e.value as number, 6);
      }
    });
  }
});
