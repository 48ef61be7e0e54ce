import { describe, expect, it } from 'vitest';
import { createEvaluator, machineOutput, readSheet } from '@sheaf/engine';
import { BUILT_IN_DEMO_SHEETS, DEMO_PROJECTS, projectForExample } from './demoSheets';

describe('built-in demo sheets', () => {
  it('has one sheet per demo project, each opening with the engineering caution', () => {
    expect(BUILT_IN_DEMO_SHEETS.map((s) => s.projectCode).sort()).toEqual(DEMO_PROJECTS.map((p) => p.code).sort());
    for (const demo of BUILT_IN_DEMO_SHEETS) {
      expect(demo.content.cells[0]).toMatchObject({ kind: 'note', text: expect.stringContaining('judgement of a qualified engineer') });
    }
  });

  it.each(BUILT_IN_DEMO_SHEETS.map((s) => [s.key, s] as const))('%s reads as format version 1 and evaluates without cell errors', (_key, demo) => {
    const read = readSheet(demo.content);
    if (!read.ok) throw new Error(read.errors.join('; '));
    const out = machineOutput(read.sheet.cells, createEvaluator(read.sheet).results);
    const errors = Object.entries(out.cells).filter(([, cell]) => 'error' in cell);
    expect(errors).toEqual([]);
    // Every demo ends with a criterion, named after its check, that passes its required factor of safety.
    const last = read.sheet.cells[read.sheet.cells.length - 1] as { kind: string; name: string; theory: string };
    expect(last.kind).toBe('criterion');
    expect(last.name).toBe(last.theory.replace(/-(\w)/g, (_, c: string) => c.toUpperCase()));
    expect(out.cells[last.name]).toMatchObject({ kind: 'criterion', values: { pass: true } });
  });

  it('files example files under the project their names point to', () => {
    expect(projectForExample('lifting-lug-weld.sheaf.json', '').code).toBe('GBL');
    expect(projectForExample('x.sheaf.json', 'Accumulator shell at the nozzle').code).toBe('HAS');
    expect(projectForExample('rosette-r2.sheaf.json', '').code).toBe('BLT');
    expect(projectForExample('unrelated.sheaf.json', 'Something else').code).toBe('GBL');
  });
});
