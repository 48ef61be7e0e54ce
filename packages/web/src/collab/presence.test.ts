import { describe, expect, it } from 'vitest';
import { peersOf, peopleOf } from './presence';

function fakeAwareness(clientID: number, states: Record<number, Record<string, unknown>>) {
  return { clientID, getStates: () => new Map(Object.entries(states).map(([k, v]) => [Number(k), v])) };
}

describe('peersOf', () => {
  it('lists the other stamped clients with the cell they are in, sorted by name', () => {
    const awareness = fakeAwareness(1, {
      1: { user: { id: 'me', name: 'Eamon Reyes', colour: '#1f6fb4' }, cell: 'c2' },
      7: { user: { id: 'u2', name: 'Chandra Patel', colour: '#b4451f' }, cell: 'c4', cursor: {} },
      3: { user: { id: 'u3', name: 'Olivia Marsh', colour: '#2e8540' } },
      9: { cursor: null },
    });
    expect(peersOf(awareness as never)).toEqual([
      { clientId: 7, user: { id: 'u2', name: 'Chandra Patel', colour: '#b4451f' }, cell: 'c4' },
      { clientId: 3, user: { id: 'u3', name: 'Olivia Marsh', colour: '#2e8540' }, cell: null },
    ]);
  });

  it('groups two copies of one person', () => {
    const awareness = fakeAwareness(1, {
      4: { user: { id: 'u2', name: 'Chandra Patel', colour: '#b4451f' }, cell: 'c4' },
      5: { user: { id: 'u2', name: 'Chandra Patel', colour: '#b4451f' }, cell: 'c1' },
    });
    expect(peopleOf(peersOf(awareness as never))).toEqual([
      { user: { id: 'u2', name: 'Chandra Patel', colour: '#b4451f' }, copies: 2, cells: ['c4', 'c1'] },
    ]);
  });
});
