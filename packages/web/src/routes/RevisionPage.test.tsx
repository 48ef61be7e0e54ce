import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { RevisionDetail } from '@sheaf/engine/api';
import { CONTENT_SHA, issuedRevision, SHEET, THREADS } from '../features/document/revisionFixture';
import { meAs, ORG_ID, OTHER_ORG_ID } from '../test/fixtures';
import { mockFetch } from '../test/mockFetch';
import { renderApp } from '../test/renderApp';

function serve(revision: RevisionDetail) {
  return mockFetch({
    'GET /api/auth/me': { body: meAs('viewer') },
    [`GET /api/sheets/${SHEET.id}`]: {
      body: { sheet: { ...SHEET, content: revision.content }, role: 'viewer' },
    },
    [`GET /api/sheets/${SHEET.id}/revisions/1`]: { body: { revision } },
    [`GET /api/sheets/${SHEET.id}/notes?revision=1`]: { body: { threads: THREADS } },
    [`GET /api/orgs/${ORG_ID}/projects`]: {
      body: { projects: [{ id: SHEET.projectId, name: 'Gantry beam', code: 'GBL', createdAt: SHEET.updatedAt, sheetCount: 1 }] },
    },
    [`GET /api/orgs/${OTHER_ORG_ID}/projects`]: { body: { projects: [] } },
  });
}

const cell = (id: string) => document.getElementById(`cell-${id}`)!;

// von Mises of σx = 18 kN / (40 mm × 12 mm) = 37.5 MPa with τxy = 22 MPa:
// √(37.5² + 3·22²) MPa (common practice, no source).
const vonMisesMPa = Math.sqrt(37.5 ** 2 + 3 * 22 ** 2);

describe('RevisionPage', () => {
  it('renders the revision as the issued calculation: title block, cells as the sheet draws them, checks, materials, notes', async () => {
    serve(issuedRevision());
    renderApp(`/sheets/${SHEET.id}/revisions/1`);
    const article = await screen.findByRole('article', { name: 'Revision 1 as issued' }, { timeout: 30_000 });

    // Title block: what, which revision, who signed, repeated on every printed page.
    const block = screen.getByRole('region', { name: 'Title block' });
    expect(block.closest('thead')).not.toBeNull();
    await waitFor(() => expect(block.textContent).toContain('Hoist Works'), { timeout: 30_000 });
    expect(block.textContent).toContain('GBL-001');
    expect(block.textContent).toMatch(/Prepared\s*Bruno Keel\s*2025-03-12/);
    expect(block.textContent).toMatch(/Checked\s*Alice Marsh\s*2025-03-14/);
    expect(block.textContent).toMatch(/Approved\s*Alice Marsh\s*2025-03-14/);
    expect(within(article).getByText(CONTENT_SHA)).toBeTruthy();
    expect(article.textContent).toContain('Results support, not replace, the judgement of a qualified engineer');
    expect(screen.queryByRole('alert')).toBeNull();

    // The note's math is typeset, not its source.
    expect(cell('n1').querySelector('.katex')).not.toBeNull();
    expect(cell('n1').textContent).not.toContain('$P');
    // Inputs as written, with units; the equation with the numbers in; the values in the sheet's units.
    expect(within(cell('q1')).getByRole('textbox', { name: 'value of P' }).textContent).toBe('18 kN');
    expect(cell('s1').querySelector('.equation .katex')).not.toBeNull();
    expect(cell('s1').querySelector('[data-value="sx"] [data-number]')?.textContent).toBe('37.5');
    expect(cell('s1').querySelector(`[data-figure-of="s1"] svg`)).not.toBeNull();
    // No editors and no choices to make: fields read as text.
    expect(document.querySelector('.cm-editor')).toBeNull();
    expect(within(article).queryAllByRole('combobox')).toEqual([]);
    expect(cell('c1').textContent).toContain('S — stress');
    expect(cell('c1').textContent).toContain('von Mises');

    // The check: the factor as issued, the verdict as shape and word, its envelope.
    expect(Number(cell('c1').querySelector('[data-value="factor"] [data-number]')?.textContent)).toBeCloseTo(250 / vonMisesMPa, 4);
    expect(cell('c1').querySelector('[data-verdict="pass"]')?.textContent).toBe('Pass');
    expect(cell('c1').querySelector('[data-figure-of="c1"] svg')).not.toBeNull();
    // The material check names the frozen material with its source and the unconfirmed mark.
    expect(cell('c2').textContent).toContain('Plate S355, our stock');
    expect(cell('c2').textContent).toContain('mill certificate 4471');
    expect(within(cell('c2')).getAllByText('unconfirmed').length).toBeGreaterThan(0);
    expect(Number(cell('c2').querySelector('[data-value="factor"] [data-number]')?.textContent)).toBeCloseTo(355 / vonMisesMPa, 4);
    // The point set: its rows as a short table, the worst in bold, and its summary values.
    const rows = within(cell('p1')).getByRole('table', { name: 'Points of the set, MPa' });
    expect(within(rows).getAllByRole('row')).toHaveLength(4);
    expect(rows.querySelector('[data-worst="true"]')?.textContent).toBe('1120-3542');
    expect(cell('p1').querySelector('[data-value="count"] [data-number]')?.textContent).toBe('3');

    // Every check in one table.
    const summary = within(screen.getByRole('region', { name: 'Summary of checks' }));
    const checks = summary.getAllByRole('row').slice(1).map((row) => row.textContent);
    expect(checks).toEqual([
      expect.stringMatching(/^4DEvon Mises \(distortion energy\)4\.67\d+1\.5Pass$/),
      expect.stringMatching(/^5MATvon Mises \(distortion energy\)6\.64\d+1\.5Pass$/),
      expect.stringMatching(/^6FEvon Mises \(distortion energy\)3 points, 0 below the required factor[\d.]+1\.5Pass$/),
    ]);

    // The materials as frozen, and the notes of the check with how they were resolved.
    expect(screen.getByRole('region', { name: 'Materials used' }).textContent).toContain('Plate S355, our stock');
    const notes = await screen.findByRole('region', { name: 'Notes on cell 5, MAT' }, { timeout: 30_000 });
    expect(notes.textContent).toContain('Yield strength of the stock plate: attach the certificate.');
    expect(notes.textContent).toContain('Certificate 4471 filed with the job.');
    expect(notes.textContent).toMatch(/Resolved by Alice Marsh/);
  }, 60_000);

  it('says loudly when the issued results cannot be reproduced, and shows the issued numbers', async () => {
    const revision = issuedRevision();
    const de = revision.results.cells.DE!;
    serve({ ...revision, results: { cells: { ...revision.results.cells, DE: { ...de, values: { ...de.values, factor: 9.99 } } } } });
    renderApp(`/sheets/${SHEET.id}/revisions/1`);
    const alert = await screen.findByRole('alert', {}, { timeout: 30_000 });
    expect(alert.textContent).toContain('Do not use this page as the issued calculation');
    expect(within(alert).getAllByRole('row').map((row) => row.textContent)).toEqual(['cellvalue (SI)issuednow', expect.stringMatching(/^DEfactor9\.994\.67/)]);
    expect(cell('c1').querySelector('[data-value="factor"] [data-number]')?.textContent).toBe('9.99');
  }, 60_000);

  it('marks a superseded revision and the override of open notes', async () => {
    serve(issuedRevision({ status: 'superseded', supersededAt: '2025-04-02T11:00:00.000Z', overrideReason: 'Certificate on its way; values conservative.', openNotesAtApproval: 1 }));
    renderApp(`/sheets/${SHEET.id}/revisions/1`);
    const issue = await screen.findByRole('note', { name: 'Issue' }, { timeout: 30_000 });
    expect(issue.textContent).toMatch(/superseded on 2025-04-02 \d\d:\d\d by revision 2/);
    expect(screen.getByRole('region', { name: 'Title block' }).textContent).toContain('Superseded');
    expect(screen.getByText(/Approved with 1 note still open/).textContent).toContain('Certificate on its way; values conservative.');
    const margins = document.querySelector('style[data-print-margins]')?.textContent ?? '';
    expect(margins).toContain('@top-center');
    expect(margins).toContain('counter(page)');
  }, 60_000);
});
