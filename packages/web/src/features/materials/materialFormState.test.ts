import { describe, expect, it } from 'vitest';
import { draftOf, recordOfDraft } from './materialFormState';

describe('material form state', () => {
  it('leaves out untouched properties and gives the record', () => {
    const draft = draftOf();
    draft.id = 'hub-iron-demo';
    draft.name = 'Hub iron (demo)';
    draft.category = 'cast-iron';
    draft.properties.Sut = { value: '210 MPa', basis: 'typical', source: 'Demo test bars, invented' };
    const result = recordOfDraft(draft);
    expect(result).toEqual({
      record: {
        id: 'hub-iron-demo',
        name: 'Hub iron (demo)',
        category: 'cast-iron',
        notes: '',
        properties: { Sut: { value: '210 MPa', basis: 'typical', source: 'Demo test bars, invented' } },
      },
    });
  });

  it('names each field at fault: a bad id, a value without a source, a value of the wrong dimension', () => {
    const draft = draftOf();
    draft.id = 'Hub Iron';
    draft.name = 'Hub iron';
    draft.properties.Sut = { value: '210 kN', basis: 'typical', source: '' };
    const first = recordOfDraft(draft);
    expect('errors' in first && Object.keys(first.errors).sort()).toEqual(['id', 'properties.Sut.source', 'properties.Sut.value']);

    draft.id = 'hub-iron';
    draft.properties.Sut = { value: '210 kN', basis: 'typical', source: 'Demo test bars' };
    const second = recordOfDraft(draft);
    expect('errors' in second && second.errors).toEqual({ 'properties.Sut.value': expect.stringMatching(/^expected a stress .* got a force/) });
  });
});
