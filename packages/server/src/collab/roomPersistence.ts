/** The contract between a room and the database (implemented by sheetPersistence.ts). */

/** The sheet does not exist (any more): deleted while its room was open, say. */
export class SheetGoneError extends Error {
  override name = 'SheetGoneError';
  constructor(readonly sheetId: string) {
    super(`sheet ${sheetId} does not exist`);
  }
}

/**
 * The sheet is in check: nobody may change it until the checker returns it. Thrown by `append`
 * for updates that reached the log's door after the sheet went into check.
 */
export class SheetLockedError extends Error {
  override name = 'SheetLockedError';
  constructor(readonly sheetId: string) {
    super(`sheet ${sheetId} is in check and read-only until the checker returns it`);
  }
}

/**
 * The room cannot store edits right now (the database is unreachable and the edits waiting in
 * memory reached their bound): it is read-only until storing works again.
 */
export class SavingPausedError extends Error {
  override name = 'SavingPausedError';
  constructor(readonly sheetId: string) {
    super(`sheet ${sheetId} cannot be saved right now: the database is not reachable; try again shortly`);
  }
}

/** The workflow status of a sheet, as far as co-editing cares: in check means read-only for all. */
export type SheetLockState = 'editable' | 'in-check';

/** What a room needs from the database. */
export interface RoomPersistence {
  /**
   * The sheet's stored state with every logged update applied, how many log rows that took, and
   * the sheet's title (`sheets.title`) and whether it is in check. Throws SheetGoneError when
   * there is no such sheet.
   */
  load(sheetId: string): Promise<{ state: Uint8Array; logRows: number; title: string; lock: SheetLockState }>;
  /**
   * Append updates to the log, in order, in one statement. Resolves once they are committed;
   * throws SheetGoneError when the sheet was deleted and SheetLockedError (storing nothing) when
   * it is in check. The first update stored for an approved sheet starts its next revision: the
   * sheet goes back to draft in the same statement.
   */
  append(sheetId: string, updates: readonly LoggedUpdate[]): Promise<void>;
  /**
   * Fold the log into the stored state (reading both from the database, not from the room).
   * Also gives the sheet's title then, or null when the sheet is gone.
   */
  compact(sheetId: string): Promise<{ foldedRows: number; title: string | null }>;
}

export interface LoggedUpdate {
  update: Uint8Array;
  userId: string | null;
}
