import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meAs, ORG_ID, sheets } from '../test/fixtures';
import { mockFetch } from '../test/mockFetch';
import { renderApp } from '../test/renderApp';

const SHEETS = `/api/orgs/${ORG_ID}/sheets`;

describe('SheetsPage', () => {
  it('lists the organization’s sheets with calc number, link, and status as word and shape', async () => {
    mockFetch({
      'GET /api/auth/me': { body: meAs('engineer') },
      [`GET ${SHEETS}`]: { body: { sheets } },
    });
    renderApp('/sheets');

    const table = await screen.findByRole('table', { name: 'Sheets of Hoist Works' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);

    const [lug, shaft] = rows as [HTMLElement, HTMLElement];
    expect(within(lug).getByText('GBL-001')).toBeTruthy();
    expect(
      within(lug).getByRole('link', { name: 'Lifting lug, weld toe' }).getAttribute('href'),
    ).toBe(`/sheets/${sheets[0]?.id}`);
    expect(within(lug).getByText('Approved')).toBeTruthy();
    expect(lug.querySelector('svg[data-shape="approved"]')).not.toBeNull();

    expect(within(shaft).getByText('HDS-004')).toBeTruthy();
    expect(within(shaft).getByText('In check')).toBeTruthy();
    expect(shaft.querySelector('svg[data-shape="in-check"]')).not.toBeNull();
    expect(within(shaft).getByText('Hoist drive')).toBeTruthy();
  });

  it('sends the search text and the chosen status to the API', async () => {
    const server = mockFetch({
      'GET /api/auth/me': { body: meAs('viewer') },
      [`GET ${SHEETS}`]: (request) => {
        const params = new URL(request.path, 'http://x').searchParams;
        const q = params.get('q')?.toLowerCase();
        const status = params.get('status');
        return {
          body: {
            sheets: sheets.filter(
              (s) => (!q || s.title.toLowerCase().includes(q)) && (!status || s.status === status),
            ),
          },
        };
      },
    });
    const { router } = renderApp('/sheets');
    await screen.findByRole('table');

    fireEvent.click(screen.getByRole('radio', { name: 'In check' }));
    await waitFor(() => expect(router.state.location.search).toBe('?status=in-check'));
    await waitFor(() => expect(screen.getAllByRole('row')).toHaveLength(2));
    expect(
      screen.getByRole('link', { name: 'Hoist drive shaft, bending and torsion' }),
    ).toBeTruthy();

    fireEvent.change(screen.getByLabelText('Search'), { target: { value: 'lug' } });
    await screen.findByText(/No sheet matches “lug” with status In check/);
    expect(server.sent.map((r) => r.path)).toContain(`${SHEETS}?q=lug&status=in-check`);
  });

  it('shows the server’s answer when the list cannot be loaded', async () => {
    mockFetch({
      'GET /api/auth/me': { body: meAs('viewer') },
      [`GET ${SHEETS}`]: {
        status: 403,
        body: { error: { code: 'forbidden', message: 'not a member of this organization' } },
      },
    });
    renderApp('/sheets');
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Could not load the sheets (403 forbidden)');
    expect(alert.textContent).toContain('not a member of this organization');
  });

  it('lists the organization remembered from last time, not the first one', async () => {
    window.localStorage.setItem(
      'sheaf.organizationId',
      meAs('owner').memberships[1]!.organization.id,
    );
    const server = mockFetch({
      'GET /api/auth/me': { body: meAs('owner') },
      'GET /api/orgs/0b7e1d2c-8a9f-4e3d-b2c1-a0f9e8d7c6b5/sheets': { body: { sheets: [] } },
    });
    renderApp('/sheets');
    await screen.findByText('No sheets yet. Open a project to start the first one.');
    expect(screen.getByText('Calculation sheets of Pad & Pile')).toBeTruthy();
    expect(server.to('GET', SHEETS)).toHaveLength(0);
  });
});
