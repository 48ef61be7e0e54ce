import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { LibraryMaterial } from '@sheaf/engine/api';
import { FrozenMaterialsList } from './FrozenMaterialsList';
import { MaterialsTable } from './MaterialsTable';

const rock: LibraryMaterial = {
  id: 'weathered-sandstone',
  name: 'Weathered sandstone, rock mass',
  category: 'rock',
  notes: '',
  builtin: true,
  updatedAt: null,
  properties: {
    c: { value: '100 kPa', basis: 'typical', source: 'Rock slope book, ch. 4 (from memory). Not confirmed', confirmed: false },
    phi: { value: '32 deg', basis: 'typical', source: 'Rock slope book, ch. 4 (from memory). Not confirmed', confirmed: false },
  },
};
const sand: LibraryMaterial = {
  id: 'dense-sand',
  name: 'Dense sand, drained',
  category: 'soil',
  notes: '',
  builtin: true,
  updatedAt: null,
  properties: {
    c: { value: '0 kPa', basis: 'typical', source: 'Geotechnical tables, Table 7.8', confirmed: true },
    phi: { value: '38 deg', basis: 'typical', source: 'Geotechnical tables, Table 7.8', confirmed: true },
  },
};

describe('MaterialsTable', () => {
  it('marks each unconfirmed value and its source line, and explains the mark', () => {
    render(<MaterialsTable materials={[rock, sand]} />);
    const rockRows = screen.getByText('Weathered sandstone, rock mass').closest('tbody') as HTMLElement;
    const sandRows = screen.getByText('Dense sand, drained').closest('tbody') as HTMLElement;
    // c and phi in the value columns, and their shared source line.
    expect(within(rockRows).getAllByText('source not confirmed')).toHaveLength(3);
    expect(within(sandRows).queryByText('source not confirmed')).toBeNull();
    expect(screen.getByText(/marks a value whose source could not be confirmed/)).toBeTruthy();
  });
});

describe('FrozenMaterialsList', () => {
  it('keeps the caution of unconfirmed values in the materials frozen into a revision', () => {
    render(<FrozenMaterialsList materials={{ 'weathered-sandstone': rock, 'dense-sand': sand }} />);
    const notes = screen.getAllByRole('note');
    expect(notes).toHaveLength(1);
    expect(notes[0]?.textContent).toMatch(/Cohesion c, Friction angle phi were not confirmed against the published source named beside them\. Verify them against the specification or the material certificate before relying on a result\./);
  });
});
