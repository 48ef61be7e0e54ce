/** The contract between a room and the database (implemented by sheetPersistence.ts). */

/** The sheet does not exist (any more): deleted while its room was open, say. */
export class SheetGoneError extends Error {
  override name = 'SheetGoneError';
  constructor(readonly sheetId: string) {
    super(`sheet ${sheetId} does not exist`);
  }
}

/** What a room needs from the database. */
export interface RoomPersistence {
  /**
   * The sheet's stored state with every logged update applied, how many log rows that took, and
   * the sheet's title (`sheets.title`). Throws SheetGoneError when there is no such sheet.
   */
  load(sheetId: string): Promise<{ state: Uint8Array; logRows: number; title: string }>;
  /**
   * Append updates to the log, in order, in one statement. Resolves once they are committed;
   * throws SheetGoneError when the sheet was deleted.
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
