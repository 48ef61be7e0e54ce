import { cellText, docFromSheetContent, type SheetFileContent } from '@sheaf/sheet-doc';
import { act, screen, within } from '@testing-library/react';
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { Awareness } from 'y-protocols/awareness';
import * as Y from 'yjs';
import type { SheetDetail } from '../api/types';
import type { ConnectionSnapshot, SheetConnection } from '../collab/createSheetConnection';
import { deferSelectionChange } from '../features/sheet/testing/deferSelectionChange';
import { meAs, ORG_ID, OTHER_ORG_ID, sheets } from '../test/fixtures';
import { mockFetch } from '../test/mockFetch';
import { renderApp } from '../test/renderApp';

/** Stand-ins for the websocket connection: the test decides when the live copy arrives. */
const opened: FakeConnection[] = [];
interface FakeConnection extends SheetConnection {
  arrive(content: SheetFileContent): void;
}

vi.mock('../collab/createSheetConnection', async (importOriginal) => {
  const original = await importOriginal<typeof import('../collab/createSheetConnection')>();
  return {
    ...original,
    createSheetConnection(): SheetConnection {
      const doc = new Y.Doc();
      const awareness = new Awareness(doc);
      const listeners = new Set<() => void>();
      let snapshot: ConnectionSnapshot = { state: { kind: 'connecting' }, synced: false };
      const connection: FakeConnection = {
        doc,
        awareness,
        subscribe(listener) {
          listeners.add(listener);
          return () => listeners.delete(listener);
        },
        getSnapshot: () => snapshot,
        destroy: () => awareness.destroy(),
        arrive(content) {
          Y.applyUpdate(doc, Y.encodeStateAsUpdate(docFromSheetContent(content)));
          snapshot = { state: { kind: 'live' }, synced: true };
          for (const listener of listeners) listener();
        },
      };
      opened.push(connection);
      return connection;
    },
  };
});

const content: SheetFileContent = {
  format: 'sheaf-sheet',
  version: 1,
  title: 'Lifting lug, weld toe',
  unitSystem: 'SI',
  cells: [
    { id: 'k2', kind: 'quantity', name: 'load', expr: '18 kN' },
    { id: 'k4', kind: 'stress', name: 'S', sx: 'load / (40 mm * 12 mm)', sy: '0 MPa', txy: '22 MPa' },
  ],
};
const lug: SheetDetail = { ...sheets[0]!, content: content as SheetDetail['content'] };

function serve(role: 'engineer' | 'checker') {
  mockFetch({
    'GET /api/auth/me': { body: meAs(role) },
    [`GET /api/sheets/${lug.id}`]: { body: { sheet: lug, role } },
    [`GET /api/orgs/${ORG_ID}/projects`]: {
      body: { projects: [{ id: lug.projectId, name: 'Gantry beam', code: 'GBL', createdAt: lug.updatedAt, sheetCount: 1 }] },
    },
    [`GET /api/orgs/${OTHER_ORG_ID}/projects`]: { body: { projects: [] } },
  });
}

const sx = () => document.querySelector('#cell-k4 [data-value="sx"] [data-number]')?.textContent;

let restoreSelectionChange: () => void;
beforeAll(() => {
  restoreSelectionChange = deferSelectionChange();
});
afterAll(() => restoreSelectionChange());
beforeEach(() => {
  opened.length = 0;
});

describe('SheetPage', () => {
  it('shows the title block, then the sheet as last saved, evaluated, until the live copy arrives', async () => {
    serve('checker');
    renderApp(`/sheets/${lug.id}`);

    const block = await screen.findByRole('region', { name: 'Title block' }, { timeout: 30_000 });
    expect(within(block).getByRole('heading', { name: 'Lifting lug, weld toe' })).toBeTruthy();
    expect(within(block).getByText('GBL-001')).toBeTruthy();
    expect(await within(block).findByText('Hoist Works')).toBeTruthy();

    expect(document.querySelector('[data-connection="connecting"]')?.textContent).toMatch(/Connecting…/);
    // 18 kN / 480 mm² = 37.5 MPa, from the saved content, before any connection.
    expect(sx()).toBe('37.5');
    expect(document.querySelector('[data-live]')?.getAttribute('data-live')).toBe('false');
  }, 60_000);

  it('prints as a draft: the not-issued mark and the title block head every page, the notes rail stays off paper', async () => {
    serve('engineer');
    renderApp(`/sheets/${lug.id}`);
    const block = await screen.findByRole('region', { name: 'Title block' }, { timeout: 30_000 });
    const head = block.closest('thead');
    expect(head).not.toBeNull();
    // The sheet has issued revision 2; the live copy is not it.
    expect(head!.querySelector('[data-not-issued]')?.textContent).toMatch(/^Not issued — draft.*The calculation of record is revision 2/);
    expect(screen.getByRole('complementary', { name: 'Notes' }).closest('.no-print')).not.toBeNull();
    const margins = document.querySelector('style[data-print-margins]')?.textContent ?? '';
    expect(margins).toContain('@top-center { content: "Not issued — draft"');
    expect(margins).toMatch(/@bottom-left \{ content: "GBL-001 · live sheet, not issued · printed \d{4}-\d\d-\d\d \d\d:\d\d"/);
  }, 60_000);

  it('gives a checker the live sheet read-only: no controls, results follow remote edits', async () => {
    serve('checker');
    renderApp(`/sheets/${lug.id}`);
    await screen.findByRole('region', { name: 'Title block' }, { timeout: 30_000 });
    await vi.waitFor(() => expect(opened).toHaveLength(1));
    act(() => opened[0]!.arrive(content));

    await vi.waitFor(() => expect(document.querySelector('[data-live]')?.getAttribute('data-live')).toBe('true'));
    expect(document.querySelector('[data-connection="live"]')?.textContent).toMatch(/Read-only/);
    const cells = screen.getByRole('region', { name: 'Cells' });
    expect(within(cells).queryByRole('button', { name: /Add cell|Delete|Duplicate|Drag/ })).toBeNull();
    expect(within(screen.getByRole('main')).queryByRole('button', { name: 'Rename' })).toBeNull();

    act(() => cellText(opened[0]!.doc, 'k2', 'expr')!.insert(0, '2 * '));
    expect(sx()).toBe('75');
  }, 60_000);

  it('gives an engineer the editing controls once the live copy is there', async () => {
    serve('engineer');
    renderApp(`/sheets/${lug.id}`);
    await screen.findByRole('region', { name: 'Title block' }, { timeout: 30_000 });
    await vi.waitFor(() => expect(opened).toHaveLength(1));
    // Before the live copy: read-only, so nothing typed can be lost.
    expect(screen.queryByRole('button', { name: /Add cell/ })).toBeNull();
    act(() => opened[0]!.arrive(content));
    expect(await screen.findByRole('button', { name: /Add cell/ })).toBeTruthy();
    expect(document.querySelector('[data-connection]')).toBeNull();
    expect(screen.getByRole('button', { name: 'Rename' })).toBeTruthy();
  }, 60_000);
});
