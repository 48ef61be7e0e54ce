import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { SheetDetail } from '../../../api/types';
import { meAs, ORG_ID, OTHER_ORG_ID, sheets } from '../../../test/fixtures';
import { mockFetch } from '../../../test/mockFetch';
import { renderApp } from '../../../test/renderApp';

const PROJECT_ID = sheets[0]!.projectId;

const valid = {
  format: 'sheaf-sheet',
  version: 1,
  title: 'Pulley hub, bore edge',
  unitSystem: 'SI',
  cells: [
    { id: 'c1', kind: 'stress', name: 'S', sx: '60 MPa', sy: '-90 MPa', txy: '25 MPa' },
    { id: 'c2', kind: 'criterion', name: 'C', of: 'S', theory: 'modified-mohr', strength: { Sut: '210 MPa', Suc: '750 MPa' }, required: '2' },
  ],
};

function serve() {
  const created: SheetDetail = { ...sheets[0]!, id: 'aaaaaaaa-0000-4000-8000-0000000000ff', title: valid.title, content: valid as SheetDetail['content'] };
  return mockFetch({
    'GET /api/auth/me': { body: meAs('engineer') },
    [`GET /api/projects/${PROJECT_ID}/sheets`]: { body: { sheets: [] } },
    [`GET /api/orgs/${ORG_ID}/projects`]: {
      body: { projects: [{ id: PROJECT_ID, name: 'Gantry beam', code: 'GBL', createdAt: created.updatedAt, sheetCount: 0 }] },
    },
    [`GET /api/orgs/${OTHER_ORG_ID}/projects`]: { body: { projects: [] } },
    'GET /api/auth/csrf': { body: { token: 't0k3n' } },
    [`POST /api/projects/${PROJECT_ID}/sheets`]: { status: 201, body: { sheet: created } },
    [`GET /api/sheets/${created.id}`]: { body: { sheet: created, role: 'engineer' } },
  });
}

function pick(input: HTMLElement, text: string, name: string) {
  const file = new File([text], name, { type: 'application/json' });
  fireEvent.change(input, { target: { files: [file] } });
}

describe('ImportSheetForm', () => {
  it('lists every problem of an invalid file with its JSON path and creates nothing', async () => {
    const fetch = serve();
    renderApp(`/projects/${PROJECT_ID}`);
    const input = await screen.findByLabelText('Sheet file', {}, { timeout: 30_000 });
    const broken = {
      ...valid,
      cells: [
        { id: 'c1', kind: 'stress', name: 'S', sx: 60, sy: '-90 MPa', txy: '25 MPa' },
        { id: 'c2', kind: 'criterion', name: 'C', of: 'S', theory: 'modified-mohr', strength: { Sut: '210 MPa' }, colour: 'red' },
      ],
    };
    pick(input, JSON.stringify(broken), 'hub.sheet.json');

    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('hub.sheet.json was not imported')).toBeTruthy();
    const problems = within(within(alert).getByRole('list', { name: 'Problems in the file' })).getAllByRole('listitem');
    expect(problems.map((item) => item.textContent)).toEqual([
      'cells[0].sx: must be a string (an expression such as "120 MPa")',
      'cells[1]: unknown field "colour"',
    ]);
    expect(fetch.to('POST', `/api/projects/${PROJECT_ID}/sheets`)).toHaveLength(0);
  }, 60_000);

  it('says so for a file that is not JSON', async () => {
    const fetch = serve();
    renderApp(`/projects/${PROJECT_ID}`);
    pick(await screen.findByLabelText('Sheet file', {}, { timeout: 30_000 }), '{"format": "sheaf-sheet",', 'half.json');
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByRole('listitem').textContent).toMatch(/^JSON: /);
    expect(fetch.to('POST', `/api/projects/${PROJECT_ID}/sheets`)).toHaveLength(0);
  }, 60_000);

  it('creates the sheet from a valid file, with its title and content, and opens it', async () => {
    const fetch = serve();
    const { router } = renderApp(`/projects/${PROJECT_ID}`);
    pick(await screen.findByLabelText('Sheet file', {}, { timeout: 30_000 }), JSON.stringify(valid), 'hub.sheet.json');
    await screen.findByRole('region', { name: 'Title block' }, { timeout: 30_000 });
    const [post] = fetch.to('POST', `/api/projects/${PROJECT_ID}/sheets`);
    expect(post?.body).toEqual({ title: 'Pulley hub, bore edge', content: valid });
    expect(router.state.location.pathname).toBe('/sheets/aaaaaaaa-0000-4000-8000-0000000000ff');
  }, 60_000);
});
