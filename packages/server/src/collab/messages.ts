/**
 * The websocket messages of the y-websocket protocol, as the server reads and writes them.
 * Every message starts with a varuint type; sync messages carry a y-protocols sync sub-type.
 */
import * as decoding from 'lib0/decoding';
import * as encoding from 'lib0/encoding';
import * as awarenessProtocol from 'y-protocols/awareness';
import * as syncProtocol from 'y-protocols/sync';
import type * as Y from 'yjs';
import { COLLAB_MESSAGE, type SavingState } from '@sheaf/sheet-doc';

export const MESSAGE_SYNC = 0;
export const MESSAGE_AWARENESS = 1;
export const MESSAGE_AUTH = 2;
export const MESSAGE_QUERY_AWARENESS = 3;

/** A message from a client, decoded just far enough for the server to decide what to do with it. */
export type ClientMessage =
  | { type: 'sync-step-1'; stateVector: Uint8Array }
  | { type: 'sync-step-2'; update: Uint8Array }
  | { type: 'update'; update: Uint8Array }
  | { type: 'awareness'; update: Uint8Array }
  | { type: 'query-awareness' };

/** Decode a client's message; throws on a malformed or unknown one (the caller closes the socket). */
export function decodeClientMessage(data: Uint8Array): ClientMessage {
  const decoder = decoding.createDecoder(data);
  const type = decoding.readVarUint(decoder);
  switch (type) {
    case MESSAGE_SYNC: {
      const syncType = decoding.readVarUint(decoder);
      const payload = decoding.readVarUint8Array(decoder);
      if (syncType === syncProtocol.messageYjsSyncStep1) return { type: 'sync-step-1', stateVector: payload };
      if (syncType === syncProtocol.messageYjsSyncStep2) return { type: 'sync-step-2', update: payload };
      if (syncType === syncProtocol.messageYjsUpdate) return { type: 'update', update: payload };
      throw new Error(`unknown sync message type ${syncType}`);
    }
    case MESSAGE_AWARENESS:
      return { type: 'awareness', update: decoding.readVarUint8Array(decoder) };
    case MESSAGE_QUERY_AWARENESS:
      return { type: 'query-awareness' };
    default:
      throw new Error(`unknown message type ${type}`);
  }
}

export function syncStep1Message(doc: Y.Doc): Uint8Array {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, MESSAGE_SYNC);
  syncProtocol.writeSyncStep1(encoder, doc);
  return encoding.toUint8Array(encoder);
}

/** Sync step 2: what `doc` has that a peer with `stateVector` lacks. */
export function syncStep2Message(doc: Y.Doc, stateVector: Uint8Array): Uint8Array {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, MESSAGE_SYNC);
  syncProtocol.writeSyncStep2(encoder, doc, stateVector);
  return encoding.toUint8Array(encoder);
}

/** The room's saving state (`COLLAB_MESSAGE.saving`, see @sheaf/sheet-doc). */
export function savingMessage(state: SavingState): Uint8Array {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, COLLAB_MESSAGE.saving);
  encoding.writeVarUint(encoder, state);
  return encoding.toUint8Array(encoder);
}

export function updateMessage(update: Uint8Array): Uint8Array {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, MESSAGE_SYNC);
  syncProtocol.writeUpdate(encoder, update);
  return encoding.toUint8Array(encoder);
}

/** An awareness message with the states of `clientIds` (removed clients are sent as null). */
export function awarenessMessage(awareness: awarenessProtocol.Awareness, clientIds: number[]): Uint8Array {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, MESSAGE_AWARENESS);
  encoding.writeVarUint8Array(encoder, awarenessProtocol.encodeAwarenessUpdate(awareness, clientIds));
  return encoding.toUint8Array(encoder);
}

/** One entry of an awareness update: a client's state at a clock (null: the client left). */
export interface AwarenessEntry {
  clientId: number;
  clock: number;
  state: unknown;
}

/** The entries of an encoded awareness update (the y-protocols wire layout). */
export function decodeAwarenessUpdate(update: Uint8Array): AwarenessEntry[] {
  const decoder = decoding.createDecoder(update);
  const count = decoding.readVarUint(decoder);
  const entries: AwarenessEntry[] = [];
  for (let index = 0; index < count; index++) {
    const clientId = decoding.readVarUint(decoder);
    const clock = decoding.readVarUint(decoder);
    const state: unknown = JSON.parse(decoding.readVarString(decoder));
    entries.push({ clientId, clock, state });
  }
  return entries;
}

export function encodeAwarenessUpdate(entries: readonly AwarenessEntry[]): Uint8Array {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, entries.length);
  for (const entry of entries) {
    encoding.writeVarUint(encoder, entry.clientId);
    encoding.writeVarUint(encoder, entry.clock);
    encoding.writeVarString(encoder, JSON.stringify(entry.state));
  }
  return encoding.toUint8Array(encoder);
}
