import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { createEvaluator, diffRevisions, machineOutput, type RevisionSnapshot } from '@sheaf/engine';
import type { RevisionDiffResponse } from '@sheaf/engine/api';
import { RevisionDiffView } from './RevisionDiffView';

/** A revision as the server issues it: content and the engine's machine output of it. */
function issue(number: number, cells: RevisionSnapshot['content']['cells']): RevisionSnapshot {
  return { number, content: { cells, unitSystem: 'SI' }, results: machineOutput(cells, createEvaluator({ cells }).results) };
}

/** A hub check at 100 MPa against Sy 250 MPa (factor 2.5), then at 180 MPa (factor 1.39 < 1.5). */
const cells = (sx: string) => [
  { id: 's', kind: 'stress', name: 'S', sx, sy: '0 MPa', txy: '0 MPa' },
  { id: 'k', kind: 'criterion', name: 'K', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
];

describe('RevisionDiffView', () => {
  it('puts the check that now fails first, as shape and word, and lists inputs and results with units', () => {
    const diff = diffRevisions(issue(1, cells('100 MPa')), issue(2, [...cells('180 MPa'), { id: 'n', kind: 'note', text: 'Bore stress from the press fit.' }])) as RevisionDiffResponse['diff'];
    render(<RevisionDiffView diff={diff} fromLabel="revision 1" toLabel="revision 2" />);

    expect(screen.getByText('1 cell added, 0 removed, 1 changed; 6 result values moved; 1 check crossed between pass and fail.')).toBeTruthy();
    const crossings = screen.getByRole('region', { name: 'Checks that crossed between pass and fail' });
    const item = within(crossings).getByRole('listitem');
    expect(item.textContent).toBe('Now failsKwas pass, is fail — factor of safety 2.5 → 1.3889');
    expect(item.querySelector('svg rect')).toBeTruthy(); // the fail square, not colour alone

    const inputs = within(screen.getByRole('region', { name: 'Cells and inputs' })).getAllByRole('row').map((row) => row.textContent);
    expect(inputs).toEqual([
      'CellChangeFieldrevision 1revision 2',
      'noteid n+Addednew note cell, number 3',
      'Sid s~Changedsx100 MPa180 MPa',
    ]);

    const results = within(screen.getByRole('region', { name: 'Results that moved' }));
    const passRow = results.getByText('Pass → fail').closest('tr');
    expect(passRow?.textContent).toBe('KpassverdictpassfailPass → fail');
    const factorRow = results.getAllByRole('row').find((row) => row.textContent?.startsWith('Kfactor'));
    expect(factorRow?.textContent).toBe('Kfactorfactor of safety2.51.3889');
    const sxRow = results.getAllByRole('row').find((row) => row.textContent?.startsWith('Ssx'));
    expect(sxRow?.textContent).toBe('Ssxσx100 MPa180 MPa');
  });

  it('says so when two revisions do not differ', () => {
    const same = diffRevisions(issue(1, cells('100 MPa')), issue(2, cells('100 MPa'))) as RevisionDiffResponse['diff'];
    render(<RevisionDiffView diff={same} fromLabel="revision 1" toLabel="revision 2" />);
    expect(screen.getByText('No differences between revision 1 and revision 2.')).toBeTruthy();
    expect(screen.queryAllByRole('table')).toEqual([]);
  });
});
