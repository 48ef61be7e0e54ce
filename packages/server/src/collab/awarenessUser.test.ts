import { describe, expect, it } from 'vitest';
import { Awareness, applyAwarenessUpdate, encodeAwarenessUpdate as encodeWithYProtocols } from 'y-protocols/awareness';
import * as Y from 'yjs';
import { awarenessUserOf, stampAwarenessEntries } from './awarenessUser';
import { decodeAwarenessUpdate, encodeAwarenessUpdate } from './messages';

const ada = awarenessUserOf({ id: '7b0c2a1e-0000-4000-8000-000000000001', name: 'Ada' });

describe('awarenessUserOf', () => {
  it('give a user the same colour every time, and a hex colour', () => {
    expect(awarenessUserOf({ id: ada.id, name: 'renamed' }).colour).toBe(ada.colour);
    expect(ada).toEqual({ id: ada.id, name: 'Ada', colour: expect.stringMatching(/^#[0-9a-f]{6}$/) });
  });

  it('spread users over several colours', () => {
    const colours = new Set(Array.from({ length: 40 }, (_, index) => awarenessUserOf({ id: `user-${index}`, name: '' }).colour));
    expect(colours.size).toBeGreaterThanOrEqual(6);
  });
});

describe('stampAwarenessEntries', () => {
  it('overwrite a forged user, keep the other fields, and keep a null (left) state', () => {
    const stamped = stampAwarenessEntries(
      [
        { clientId: 11, clock: 3, state: { user: { id: 'someone-else', name: 'Mallory' }, cursor: { cell: 'q1', anchor: 4 } } },
        { clientId: 12, clock: 9, state: null },
        { clientId: 13, clock: 1, state: 'not an object' },
      ],
      ada,
      () => true,
    );
    expect(stamped).toEqual([
      { clientId: 11, clock: 3, state: { user: ada, cursor: { cell: 'q1', anchor: 4 } } },
      { clientId: 12, clock: 9, state: null },
      { clientId: 13, clock: 1, state: { user: ada } },
    ]);
  });

  it('drop entries for client ids the connection may not claim', () => {
    const stamped = stampAwarenessEntries(
      [
        { clientId: 1, clock: 1, state: {} },
        { clientId: 2, clock: 1, state: {} },
      ],
      ada,
      (clientId) => clientId === 2,
    );
    expect(stamped.map((entry) => entry.clientId)).toEqual([2]);
  });
});

describe('awareness update encoding', () => {
  it('decode what y-protocols encodes, and encode what y-protocols applies', () => {
    const doc = new Y.Doc();
    const source = new Awareness(doc);
    source.setLocalState({ cursor: 5, user: { name: 'typed by the client' } });
    const entries = decodeAwarenessUpdate(encodeWithYProtocols(source, [doc.clientID]));
    expect(entries).toEqual([{ clientId: doc.clientID, clock: 1, state: { cursor: 5, user: { name: 'typed by the client' } } }]);

    const target = new Awareness(new Y.Doc());
    applyAwarenessUpdate(target, encodeAwarenessUpdate(stampAwarenessEntries(entries, ada, () => true)), 'test');
    expect(target.getStates().get(doc.clientID)).toEqual({ cursor: 5, user: ada });
    source.destroy();
    target.destroy();
  });
});
