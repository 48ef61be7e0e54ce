/**
 * Builders for the check-workflow tests: sheets with content, submitted for check and approved
 * through the same services the routes use (the routes themselves are exercised by the tests).
 */
import type { DataSource } from 'typeorm';
import type { SheetContentV1 } from '@sheaf/engine/api';
import { approveSheet } from '../../src/services/review/approveSheet';
import { createNote, setThreadResolved } from '../../src/services/review/notes';
import { submitForCheck } from '../../src/services/review/workflowTransitions';
import { createSheet } from '../../src/services/sheets';
import type { Team } from './fixtures';

/** The lifting lug at the weld toe (our demo scenario): Sy = 250 MPa, required factor 1.5. */
export function lugContent(lever = '35 mm'): SheetContentV1 {
  return {
    format: 'sheaf-sheet',
    version: 1,
    title: 'Lifting lug, weld toe',
    unitSystem: 'SI',
    cells: [
      { id: 'n1', kind: 'note', text: 'Load case LC2: sling force 18 kN at 30 degrees.' },
      { id: 'q1', kind: 'quantity', name: 'P', expr: '18 kN' },
      { id: 'q2', kind: 'quantity', name: 'e', expr: lever },
      { id: 's1', kind: 'stress', name: 'S', sx: 'P * cos(30 deg) / (40 mm * 12 mm) + P * sin(30 deg) * e / (12 mm * (40 mm)^2 / 6)', sy: '0 MPa', txy: 'P * sin(30 deg) / (40 mm * 12 mm)' },
      { id: 'c1', kind: 'criterion', name: 'DE', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
    ],
  };
}

/** A sheet with the lug's content, made by the team's engineer. */
export async function lugSheetIn(dataSource: DataSource, team: Team, title = 'Lug at the weld toe', content = lugContent()): Promise<string> {
  const sheet = await createSheet(dataSource, team.project, { title, content, createdByUserId: team.users.engineer.id });
  return sheet.id;
}

/** A lug sheet prepared by `preparerId` and in check with `checkerId`. */
export async function sheetInCheck(dataSource: DataSource, team: Team, checkerId: string, preparerId = team.users.engineer.id): Promise<string> {
  const sheetId = await lugSheetIn(dataSource, team);
  await submitForCheck(dataSource, undefined, sheetId, { userId: preparerId }, { checkerUserId: checkerId });
  return sheetId;
}

/** A lug sheet with revision 1 issued: prepared by the engineer, checked and approved by the checker. */
export async function approvedSheet(dataSource: DataSource, team: Team): Promise<string> {
  const sheetId = await sheetInCheck(dataSource, team, team.users.checker.id);
  await approveSheet(dataSource, undefined, sheetId, { userId: team.users.checker.id }, {});
  return sheetId;
}

/** A note thread on cell `cellId` by `authorId`, resolved when asked. Returns its id. */
export async function noteOn(dataSource: DataSource, sheetId: string, authorId: string, options: { cellId?: string; resolved?: boolean; body?: string } = {}): Promise<string> {
  const cellId = options.cellId ?? 's1';
  const created = await createNote(dataSource, sheetId, { userId: authorId }, { cellId, body: options.body ?? 'Check the section modulus.' }, new Map([[cellId, null]]));
  if (options.resolved) await setThreadResolved(dataSource, sheetId, created.thread.id, { userId: authorId }, true);
  return created.thread.id;
}
