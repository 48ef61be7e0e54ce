import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { SheetDetail } from '../api/types';
import { meAs, ORG_ID, sheets } from '../test/fixtures';
import { mockFetch } from '../test/mockFetch';
import { renderApp } from '../test/renderApp';

const lug: SheetDetail = {
  ...sheets[0]!,
  content: {
    format: 'sheaf-sheet',
    version: 1,
    title: 'Lifting lug, weld toe',
    cells: [
      { id: 'k2', kind: 'quantity', name: 'F', expr: '18 kN' },
      { id: 'k4', kind: 'stress', name: 'S', sx: 'F / A', sy: '0 MPa', txy: '22 MPa' },
    ],
  },
};

describe('SheetPage', () => {
  it('shows the title block and the cells as stored', async () => {
    mockFetch({
      'GET /api/auth/me': { body: meAs('checker') },
      [`GET /api/sheets/${lug.id}`]: { body: { sheet: lug, role: 'checker' } },
      [`GET /api/orgs/${ORG_ID}/projects`]: {
        body: {
          projects: [
            {
              id: lug.projectId,
              name: 'Gantry beam',
              code: 'GBL',
              createdAt: lug.updatedAt,
              sheetCount: 1,
            },
          ],
        },
      },
      'GET /api/orgs/0b7e1d2c-8a9f-4e3d-b2c1-a0f9e8d7c6b5/projects': { body: { projects: [] } },
    });
    renderApp(`/sheets/${lug.id}`);

    const block = await screen.findByRole('region', { name: 'Title block' });
    expect(within(block).getByRole('heading', { name: 'Lifting lug, weld toe' })).toBeTruthy();
    expect(within(block).getByText('GBL-001')).toBeTruthy();
    expect(within(block).getByText('Gantry beam')).toBeTruthy();
    // The status, as shape and word ("Approved" is also the label of a signature box).
    expect(block.querySelector('svg[data-shape="approved"]')?.parentElement?.textContent).toBe(
      'Approved',
    );
    expect(await within(block).findByText('Hoist Works')).toBeTruthy();
    for (const label of ['Prepared', 'Checked', 'Approved', 'Rev.', 'Calc no.']) {
      expect(within(block).getAllByText(label).length).toBeGreaterThan(0);
    }

    const cells = screen.getByRole('region', { name: /Cells/ });
    const items = within(cells).getAllByRole('listitem');
    expect(items).toHaveLength(2);
    expect(within(items[1]!).getByText('F / A')).toBeTruthy();
    expect(within(items[1]!).getByText('22 MPa')).toBeTruthy();
  });
});
