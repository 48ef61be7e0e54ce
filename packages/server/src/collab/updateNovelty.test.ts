import { describe, expect, it } from 'vitest';
import * as Y from 'yjs';
import { changesNothing } from './updateNovelty';

/** Two replicas of one text; `server` has everything `client` had at the last sync. */
function replicas(text: string): { client: Y.Doc; server: Y.Doc } {
  const client = new Y.Doc();
  client.getText('t').insert(0, text);
  const server = new Y.Doc();
  Y.applyUpdate(server, Y.encodeStateAsUpdate(client));
  return { client, server };
}

/** What a reconnecting client sends: its state, cut down to what the server lacks. */
const syncStep2 = (client: Y.Doc, server: Y.Doc) => Y.diffUpdate(Y.encodeStateAsUpdate(client), Y.encodeStateVector(server));

describe('changesNothing', () => {
  it('sees a reconnect after deletions the server already has as no change', () => {
    const { client, server } = replicas('18 kN');
    client.getText('t').delete(0, 2);
    Y.applyUpdate(server, syncStep2(client, server));
    expect(server.getText('t').toString()).toBe(' kN');
    // The delete set travels again on every reconnect.
    const again = syncStep2(client, server);
    expect(Y.decodeUpdate(again).ds.clients.size).toBe(1);
    expect(changesNothing(server, again)).toBe(true);
  });

  it('sees a new deletion, even inside text with older deletions, as a change', () => {
    const { client, server } = replicas('18 kN at 30 deg');
    client.getText('t').delete(0, 2);
    Y.applyUpdate(server, syncStep2(client, server));
    client.getText('t').delete(5, 3);
    expect(changesNothing(server, syncStep2(client, server))).toBe(false);
    Y.applyUpdate(server, syncStep2(client, server));
    expect(changesNothing(server, syncStep2(client, server))).toBe(true);
  });

  it('sees new text as a change, and an empty update as none', () => {
    const { client, server } = replicas('18 kN');
    client.getText('t').insert(5, ' LC2');
    expect(changesNothing(server, syncStep2(client, server))).toBe(false);
    expect(changesNothing(server, Y.encodeStateAsUpdate(new Y.Doc()))).toBe(true);
  });
});
