import { QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import type { LibraryMaterial } from '@sheaf/engine/api';
import { createAppQueryClient } from '../../api/queryClient';
import { mockFetch } from '../../test/mockFetch';
import { MaterialPicker } from './MaterialPicker';

const ORG = '7c1f0e9a-3b2d-4c5e-8f6a-1b2c3d4e5f60';
const a36: LibraryMaterial = {
  id: 'astm-a36',
  name: 'ASTM A36 structural steel',
  category: 'carbon-steel',
  notes: '',
  builtin: true,
  updatedAt: null,
  properties: {
    Sy: { value: '250 MPa', basis: 'minimum', source: 'ASTM A36/A36M-19, Table 3' },
    Sut: { value: '400 MPa', basis: 'minimum', source: 'ASTM A36/A36M-19, Table 3' },
  },
};
const hubIron: LibraryMaterial = {
  id: 'hub-iron-demo',
  name: 'Pulley hub iron (demo)',
  category: 'cast-iron',
  notes: '',
  builtin: false,
  updatedAt: '2026-01-05T10:00:00.000Z',
  properties: {
    Sut: { value: '210 MPa', basis: 'typical', source: 'Demo foundry test bars, invented' },
    Suc: { value: '760 MPa', basis: 'typical', source: 'Demo foundry test bars, invented' },
  },
};

const ph17: LibraryMaterial = {
  id: 'ss-17-4ph-h1025',
  name: 'Stainless steel 17-4 PH, condition H1025',
  category: 'stainless-steel',
  notes: '',
  builtin: true,
  updatedAt: null,
  properties: {
    Sy: { value: '1000 MPa', basis: 'minimum', source: 'ASTM A564/A564M, H1025 (from memory). Not confirmed', confirmed: false },
    Sut: { value: '1070 MPa', basis: 'minimum', source: 'ASTM A564/A564M, H1025 (from memory). Not confirmed', confirmed: false },
    E: { value: '197 GPa', basis: 'typical', source: 'Producer data, checked', confirmed: true },
  },
};

function Harness({ initial, theory }: { initial?: string; theory: 'von-mises' | 'coulomb-mohr' }) {
  const [value, setValue] = useState<string | undefined>(initial);
  return (
    <>
      <MaterialPicker organizationId={ORG} value={value} onChange={setValue} theory={theory} />
      <output data-testid="chosen">{value ?? 'none'}</output>
    </>
  );
}

function renderPicker(initial: string | undefined, theory: 'von-mises' | 'coulomb-mohr') {
  mockFetch({ [`GET /api/orgs/${ORG}/materials`]: { body: { materials: [a36, hubIron, ph17] } } });
  return render(
    <QueryClientProvider client={createAppQueryClient()}>
      <Harness initial={initial} theory={theory} />
    </QueryClientProvider>,
  );
}

describe('MaterialPicker', () => {
  it('shows the values the theory uses with their basis and source', async () => {
    renderPicker('astm-a36', 'von-mises');
    expect(await screen.findByText('ASTM A36/A36M-19, Table 3')).toBeTruthy();
    expect(screen.getByText(/250 MPa/)).toBeTruthy();
    expect(screen.getByText('specification minimum')).toBeTruthy();
    // von Mises needs Sy only: Sut is not listed.
    expect(screen.queryByText(/400 MPa/)).toBeNull();
  });

  it('marks materials that lack what the theory needs, and changes the cell’s material', async () => {
    renderPicker(undefined, 'coulomb-mohr');
    const select = (await screen.findByLabelText('Material')) as HTMLSelectElement;
    await screen.findByRole('option', { name: /ASTM A36 structural steel — no Suc/ });
    fireEvent.change(select, { target: { value: 'hub-iron-demo' } });
    expect(screen.getByTestId('chosen').textContent).toBe('hub-iron-demo');
    expect(await screen.findByText(/760 MPa/)).toBeTruthy();
    expect(screen.getAllByText('Demo foundry test bars, invented')).toHaveLength(2);
  });

  it('says so when the cell names a material the library does not hold', async () => {
    renderPicker('gone-steel', 'von-mises');
    expect(await screen.findByText(/“gone-steel” is not in this organization’s materials library/)).toBeTruthy();
  });

  it('marks a material whose values for the check are not confirmed, and cautions under the values the check uses', async () => {
    renderPicker(undefined, 'von-mises');
    const select = (await screen.findByLabelText('Material')) as HTMLSelectElement;
    // von Mises takes Sy only: the option names Sy, not the other unconfirmed value Sut.
    expect(await screen.findByRole('option', { name: 'Stainless steel 17-4 PH, condition H1025 — Sy source not confirmed' })).toBeTruthy();
    expect(screen.getByRole('option', { name: 'ASTM A36 structural steel' })).toBeTruthy();
    expect(screen.queryByRole('note')).toBeNull();

    fireEvent.change(select, { target: { value: 'ss-17-4ph-h1025' } });
    const caution = await screen.findByRole('note');
    expect(caution.textContent).toMatch(/^Caution, source not confirmed: Yield strength Sy was not confirmed against the published source named beside it\. Verify it against the specification or the material certificate before relying on this check\.$/);
    expect(screen.getByText('source not confirmed')).toBeTruthy();
    expect(screen.getByText('unconfirmed')).toBeTruthy();
  });

  it('shows no caution for a material whose values are confirmed', async () => {
    renderPicker('astm-a36', 'von-mises');
    expect(await screen.findByText('ASTM A36/A36M-19, Table 3')).toBeTruthy();
    expect(screen.queryByRole('note')).toBeNull();
    expect(screen.queryByText('unconfirmed')).toBeNull();
  });
});
