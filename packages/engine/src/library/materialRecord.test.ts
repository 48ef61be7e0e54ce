import { describe, expect, it } from 'vitest';
import { findMaterial } from '../kinds/materials';
import { makeSheet, num, okOf } from '../test/makeSheet';
import { checkMaterialValues, materialRecordSchema, materialsLookupOf, toEngineMaterial, unconfirmedKeys, type MaterialRecord } from './materialRecord';

const steel: MaterialRecord = {
  id: 'lug-plate-s355',
  name: 'Lug plate steel (demo)',
  category: 'carbon-steel',
  notes: '',
  properties: {
    Sy: { value: '355 MPa', basis: 'minimum', source: 'Demo mill certificate, invented' },
    Sut: { value: '470 MPa', basis: 'minimum', source: 'Demo mill certificate, invented' },
    E: { value: '210 GPa', basis: 'typical', source: 'Demo handbook, invented' },
    nu: { value: '0.3', basis: 'typical', source: 'Demo handbook, invented' },
  },
};

describe('library material records', () => {
  it('accepts a well-formed material and finds no problem in its values', () => {
    expect(materialRecordSchema.parse(steel)).toEqual(steel);
    expect(checkMaterialValues(steel)).toEqual([]);
  });

  it('rejects a key with capitals, a missing source and an unknown basis, naming each field', () => {
    const result = materialRecordSchema.safeParse({
      ...steel,
      id: 'Lug Plate',
      properties: { Sy: { value: '355 MPa', basis: 'guessed', source: '' } },
    });
    expect(result.success).toBe(false);
    const paths = result.error!.issues.map((i) => i.path.join('.')).sort();
    expect(paths).toEqual(['id', 'properties.Sy.basis', 'properties.Sy.source']);
  });

  it('names the field when a value has the wrong dimension, does not parse, or is out of range', () => {
    const problems = checkMaterialValues({
      properties: {
        Sy: { value: '355 kN', basis: 'minimum', source: 'x x x' },
        phi: { value: '30', basis: 'typical', source: 'x x x' },
        nu: { value: '0.6', basis: 'typical', source: 'x x x' },
        E: { value: 'two hundred GPa', basis: 'typical', source: 'x x x' },
        c: { value: '-5 kPa', basis: 'typical', source: 'x x x' },
      },
    });
    // In the library's property order: Sy, Sut, Suc, c, phi, E, nu.
    expect(problems.map((p) => p.field)).toEqual([
      'properties.Sy.value',
      'properties.c.value',
      'properties.phi.value',
      'properties.E.value',
      'properties.nu.value',
    ]);
    const byField = Object.fromEntries(problems.map((p) => [p.field, p.message]));
    expect(byField['properties.Sy.value']).toMatch(/expected a stress .* got a force/);
    expect(byField['properties.phi.value']).toMatch(/write the unit: deg or rad/);
    expect(byField['properties.nu.value']).toMatch(/less than 0.5/);
    expect(byField['properties.c.value']).toMatch(/zero or positive/);
    expect(byField['properties.E.value']).toMatch(/^properties\.E\.value: /);
  });

  it('needs at least one property', () => {
    expect(checkMaterialValues({ properties: {} })).toEqual([
      { field: 'properties', message: 'properties: give at least one value (Sy, Sut, Suc, c, phi, E or nu)' },
    ]);
  });

  it('gives the evaluator the values and one source line grouped by source and basis', () => {
    const material = toEngineMaterial(steel);
    expect(material).toEqual({
      name: 'Lug plate steel (demo)',
      Sy: '355 MPa',
      Sut: '470 MPa',
      E: '210 GPa',
      nu: '0.3',
      source: 'Sy, Sut (minimum): Demo mill certificate, invented; E, nu (typical): Demo handbook, invented',
    });
  });

  it('feeds a criterion cell through a lookup built from records', () => {
    const lookup = materialsLookupOf([steel]);
    expect(findMaterial(lookup, 'lug-plate-s355')?.Sy).toBe('355 MPa');
    const ev = makeSheet(
      [
        { kind: 'stress', name: 'S', sx: '100 MPa', sy: '0 MPa', txy: '0 MPa' },
        { kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', material: 'lug-plate-s355' },
      ],
      lookup,
    );
    // Uniaxial 100 MPa against Sy = 355 MPa: factor 3.55 (common practice, no source).
    expect(num(okOf(ev, 'C'), 'factor')).toBeCloseTo(3.55, 10);
  });

  it('keeps the mark of a value whose source could not be confirmed, and rejects a mark that is not true or false', () => {
    const marked: MaterialRecord = {
      ...steel,
      properties: { ...steel.properties, E: { ...steel.properties.E!, confirmed: false }, Sy: { ...steel.properties.Sy!, confirmed: true } },
    };
    expect(materialRecordSchema.parse(marked).properties.E).toEqual({ value: '210 GPa', basis: 'typical', source: 'Demo handbook, invented', confirmed: false });
    expect(unconfirmedKeys(marked)).toEqual(['E']);
    expect(unconfirmedKeys(marked, ['Sy', 'Sut'])).toEqual([]);
    expect(unconfirmedKeys(steel)).toEqual([]);

    const bad = materialRecordSchema.safeParse({ ...steel, properties: { Sy: { ...steel.properties.Sy, confirmed: 'no' } } });
    expect(bad.success).toBe(false);
    expect(bad.error!.issues.map((i) => i.path.join('.'))).toEqual(['properties.Sy.confirmed']);
  });

  it('says in the evaluator’s source line which values could not be confirmed', () => {
    const marked: MaterialRecord = {
      ...steel,
      properties: { ...steel.properties, nu: { ...steel.properties.nu!, confirmed: false } },
    };
    expect(toEngineMaterial(marked).source).toBe(
      'Sy, Sut (minimum): Demo mill certificate, invented; E (typical): Demo handbook, invented; nu (typical; source not confirmed): Demo handbook, invented',
    );
  });
});
