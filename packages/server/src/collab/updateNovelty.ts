import * as Y from 'yjs';

interface DeleteRange {
  clock: number;
  len: number;
}

/**
 * True when an update (already cut down to what the document lacks with `Y.diffUpdate`) would
 * change nothing: it carries no new items, and every deletion in it is one the document already
 * has. `Y.diffUpdate` drops known items but keeps the whole delete set, so a client that
 * reconnects sends its past deletions again; storing them would grow the log for nothing and
 * would count as an edit (an approved sheet would start its next revision on a mere reconnect).
 */
export function changesNothing(doc: Y.Doc, update: Uint8Array): boolean {
  const { structs, ds } = Y.decodeUpdate(update);
  if (structs.length > 0) return false;
  if (ds.clients.size === 0) return true;
  // Sorted and merged ranges per client, straight from the document's structs.
  const known = Y.createDeleteSetFromStructStore(doc.store).clients as Map<number, DeleteRange[]>;
  for (const [client, ranges] of ds.clients as Map<number, DeleteRange[]>) {
    const deleted = known.get(client) ?? [];
    for (const range of ranges) if (!covered(deleted, range)) return false;
  }
  return true;
}

/** Whether `range` lies inside one of the sorted, merged `ranges`. */
function covered(ranges: readonly DeleteRange[], range: DeleteRange): boolean {
  let low = 0;
  let high = ranges.length - 1;
  while (low <= high) {
    const middle = (low + high) >> 1;
    const candidate = ranges[middle]!;
    if (range.clock < candidate.clock) high = middle - 1;
    else if (range.clock >= candidate.clock + candidate.len) low = middle + 1;
    else return range.clock + range.len <= candidate.clock + candidate.len;
  }
  return false;
}
