import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { NoteThread } from '@sheaf/engine/api';
import { meAs } from '../../test/fixtures';
import { mockFetch } from '../../test/mockFetch';
import { CellNoteBadge } from './CellNoteBadge';
import { CellOpenNotesBadge, OpenNotesProvider } from './OpenNotesContext';
import { NotesRail } from './NotesRail';
import { alice, bruno, carla, renderWithClient, reviewState, SHEET_ID } from './reviewTestKit';
import { useOpenNotesByCell } from './useOpenNotesByCell';

function thread(id: string, cellId: string, body: string, overrides: Partial<NoteThread> = {}): NoteThread {
  return {
    id,
    cellId,
    author: carla,
    body,
    revision: 1,
    createdAt: '2025-03-14T09:05:00.000Z',
    mentions: [],
    status: 'open',
    resolvedAt: null,
    resolvedBy: null,
    replies: [],
    ...overrides,
  };
}

const ID = (n: number) => `44444444-4444-4444-8444-00000000000${n}`;
const cells = ['q1', 's1', 'c1'];
const labels = { q1: '1. P', s1: '2. S', c1: '3. DE' };

function checkerApi(threads: NoteThread[]) {
  let current = threads;
  return mockFetch({
    'GET /api/auth/me': { body: meAs('checker') },
    'GET /api/auth/csrf': { body: { token: 't' } },
    [`GET /api/sheets/${SHEET_ID}/review`]: { body: { review: reviewState({ can: { ...reviewState().can, createNotes: true, resolveNotes: true } }) } },
    [`GET /api/sheets/${SHEET_ID}/notes`]: () => ({ body: { threads: current } }),
    [`POST /api/sheets/${SHEET_ID}/notes/${ID(1)}/resolve`]: () => {
      const resolved = { ...current[0]!, status: 'resolved' as const, resolvedBy: carla, resolvedAt: '2025-03-15T08:00:00.000Z' };
      current = [resolved, ...current.slice(1)];
      return { body: { thread: resolved } };
    },
    [`POST /api/sheets/${SHEET_ID}/notes`]: (request) => {
      const body = request.body as { cellId: string; body: string; parentId?: string };
      if (body.parentId) {
        const parent = current.find((t) => t.id === body.parentId)!;
        const updated = { ...parent, replies: [...parent.replies, { ...parent, id: ID(9), author: bruno, body: body.body, replies: undefined } as never] };
        current = current.map((t) => (t.id === parent.id ? updated : t));
        return { status: 201, body: { thread: updated } };
      }
      const created = thread(ID(8), body.cellId, body.body);
      current = [...current, created];
      return { status: 201, body: { thread: created } };
    },
  });
}

describe('NotesRail', () => {
  it('groups threads by cell in the sheet\'s order, hiding resolved ones until asked', async () => {
    checkerApi([
      thread(ID(1), 'c1', 'Is 1.5 the required factor for this lug class?'),
      thread(ID(2), 'q1', 'Sling angle from the drawing?', { author: alice }),
      thread(ID(3), 's1', 'Bending stress checked.', { status: 'resolved', resolvedBy: carla, resolvedAt: '2025-03-15T08:00:00.000Z' }),
      thread(ID(4), 'gone', 'A cell since deleted.'),
    ]);
    renderWithClient(<NotesRail sheetId={SHEET_ID} cellIds={cells} cellLabels={labels} />);
    const rail = await screen.findByRole('complementary', { name: 'Notes' });
    await within(rail).findByText('Sling angle from the drawing?');
    const groups = within(rail).getAllByRole('region').map((g) => g.getAttribute('aria-label'));
    expect(groups).toEqual(['Notes on 1. P', 'Notes on 3. DE', 'Notes on gone']);
    expect(within(rail).getByText('3 open notes')).toBeTruthy();
    expect(within(rail).getByText('gone (no longer in the sheet)')).toBeTruthy();

    fireEvent.click(within(rail).getByLabelText('show 1 resolved'));
    expect(within(rail).getAllByRole('region').map((g) => g.getAttribute('aria-label'))).toEqual([
      'Notes on 1. P',
      'Notes on 2. S',
      'Notes on 3. DE',
      'Notes on gone',
    ]);
    expect(within(rail).getByText(/Resolved by Carla Quist/)).toBeTruthy();
  });

  it('resolves a thread, answers one, and writes a first note on a cell', async () => {
    const api = checkerApi([thread(ID(1), 'c1', 'Is 1.5 the required factor for this lug class?')]);
    renderWithClient(<NotesRail sheetId={SHEET_ID} cellIds={cells} cellLabels={labels} />);
    const group = await screen.findByRole('region', { name: 'Notes on 3. DE' });

    fireEvent.click(within(group).getByRole('button', { name: 'Reply' }));
    fireEvent.change(within(group).getByLabelText('Reply to Carla Quist'), { target: { value: 'Yes, class B lugs.' } });
    fireEvent.click(within(group).getByRole('button', { name: 'Reply' }));
    await within(group).findByText('Yes, class B lugs.');
    expect(api.to('POST', `/api/sheets/${SHEET_ID}/notes`)[0]?.body).toEqual({ cellId: 'c1', body: 'Yes, class B lugs.', parentId: ID(1) });

    fireEvent.click(within(group).getByRole('button', { name: 'Resolve' }));
    await screen.findByText('Every note is resolved.');
    expect(api.to('POST', `/api/sheets/${SHEET_ID}/notes/${ID(1)}/resolve`)).toHaveLength(1);

    fireEvent.change(screen.getByLabelText('Write a note on'), { target: { value: 's1' } });
    fireEvent.click(screen.getByRole('button', { name: 'Write' }));
    const s1 = await screen.findByRole('region', { name: 'Notes on 2. S' });
    fireEvent.change(within(s1).getByLabelText('New note on 2. S'), { target: { value: 'Z should use b squared. @Bruno' } });
    fireEvent.click(within(s1).getByRole('button', { name: 'Add note' }));
    await within(s1).findByText('Z should use b squared. @Bruno');
    expect(api.to('POST', `/api/sheets/${SHEET_ID}/notes`)[1]?.body).toEqual({ cellId: 's1', body: 'Z should use b squared. @Bruno' });
  });

  it('shows a past revision\'s notes read-only', async () => {
    mockFetch({
      'GET /api/auth/me': { body: meAs('checker') },
      [`GET /api/sheets/${SHEET_ID}/review`]: { body: { review: reviewState({ can: { ...reviewState().can, createNotes: true, resolveNotes: true } }) } },
      [`GET /api/sheets/${SHEET_ID}/notes?revision=1`]: { body: { threads: [thread(ID(1), 'c1', 'Old question', { status: 'resolved' })] } },
    });
    renderWithClient(<NotesRail sheetId={SHEET_ID} cellIds={cells} cellLabels={labels} revision={1} />);
    const rail = await screen.findByRole('complementary', { name: 'Notes made on revision 1' });
    await within(rail).findByText('Old question');
    expect(within(rail).queryAllByRole('button')).toEqual([]);
    expect(within(rail).queryByLabelText('Write a note on')).toBeNull();
  });
});

function Badges() {
  const open = useOpenNotesByCell(SHEET_ID);
  return (
    <ul>
      {cells.map((id) => (
        <li key={id}>
          {id}: <CellNoteBadge cellId={id} count={open.get(id) ?? 0} cellLabel={labels[id as keyof typeof labels]} />
        </li>
      ))}
    </ul>
  );
}

describe('useOpenNotesByCell and CellNoteBadge', () => {
  it('counts open threads per cell and marks only cells that have some, in shape and words', async () => {
    mockFetch({
      [`GET /api/sheets/${SHEET_ID}/notes`]: {
        body: {
          threads: [
            thread(ID(1), 'c1', 'a'),
            thread(ID(2), 'c1', 'b'),
            thread(ID(3), 'q1', 'c', { status: 'resolved' }),
            thread(ID(4), 's1', 'd'),
          ],
        },
      },
    });
    renderWithClient(<Badges />);
    const badge = await screen.findByRole('link', { name: '2 open notes on 3. DE' });
    expect(badge.getAttribute('href')).toBe('#notes-c1');
    expect(badge.querySelector('svg')).toBeTruthy();
    expect(screen.getByRole('link', { name: '1 open note on 2. S' })).toBeTruthy();
    expect(screen.getAllByRole('link')).toHaveLength(2);
  });
});

describe('OpenNotesProvider', () => {
  it('gives each cell inside it its badge, and nothing outside it', async () => {
    mockFetch({ [`GET /api/sheets/${SHEET_ID}/notes`]: { body: { threads: [thread(ID(1), 'c1', 'a')] } } });
    renderWithClient(
      <>
        <OpenNotesProvider sheetId={SHEET_ID}>
          <p>
            <CellOpenNotesBadge cellId="c1" cellLabel="DE" />
            <CellOpenNotesBadge cellId="q1" cellLabel="P" />
          </p>
        </OpenNotesProvider>
        <CellOpenNotesBadge cellId="c1" cellLabel="DE outside" />
      </>,
    );
    expect(await screen.findByRole('link', { name: '1 open note on DE' })).toBeTruthy();
    expect(screen.getAllByRole('link')).toHaveLength(1);
  });
});
