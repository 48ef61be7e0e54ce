/**
 * The sheet's live document in PostgreSQL: `sheets.yjs_state` (the compacted state) plus the
 * `sheet_updates` log appended since. The log is the durable record of every edit; compaction
 * folds it into the state.
 */
import type { DataSource, EntityManager } from 'typeorm';
import * as Y from 'yjs';
import type { CollabLogger } from './collabMetrics';
import { SheetGoneError, SheetLockedError, type LoggedUpdate, type RoomPersistence, type SheetLockState } from './roomPersistence';
import { docFromSheetContent, sheetContentFromDoc, type SheetFileContent } from './sheetDoc';

/** PostgreSQL's code for a foreign-key violation: the log row's sheet is gone. */
const FOREIGN_KEY_VIOLATION = '23503';

/**
 * Serializes compaction (and first-time initialization) of one sheet across transactions and
 * processes. The text is namespaced so the key does not collide with other advisory locks.
 */
const LOCK_SHEET = `SELECT pg_advisory_xact_lock(hashtextextended('sheaf.sheet-doc:' || $1::text, 0))`;

interface StoredSheet {
  yjs_state: Buffer | null;
  content: SheetFileContent;
  title: string;
  status: string;
}

/**
 * The append, in one statement so the status check and the insert cannot be split by a
 * submission: nothing is stored while the sheet is in check; the first update stored for an
 * approved sheet sends it back to draft for its next revision, with an audit event naming who.
 */
const APPEND_UPDATES = `
  WITH target AS (
    SELECT status FROM sheets WHERE id = $1
  ), stored AS (
    INSERT INTO sheet_updates (sheet_id, update, user_id)
    SELECT $1, entry.update, entry.user_id FROM unnest($2::bytea[], $3::uuid[]) AS entry(update, user_id)
    WHERE NOT EXISTS (SELECT 1 FROM target WHERE status = 'in-check')
    RETURNING 1
  ), reopened AS (
    UPDATE sheets SET status = 'draft', updated_at = now()
    WHERE id = $1 AND status = 'approved'
    RETURNING id, organization_id, revision
  ), audited AS (
    INSERT INTO audit_events (action, actor_user_id, organization_id, subject, details)
    SELECT 'sheet.reopened', $4::uuid, organization_id, id::text,
           jsonb_build_object('sheetId', id, 'from', 'approved', 'to', 'draft', 'revision', revision + 1)
    FROM reopened
    RETURNING 1
  )
  SELECT (SELECT count(*) FROM stored)::int AS stored`;

export class PostgresSheetPersistence implements RoomPersistence {
  constructor(
    private readonly dataSource: DataSource,
    private readonly logger: CollabLogger,
  ) {}

  /**
   * Read the state and every log row in one transaction under the sheet's lock, so a compaction
   * cannot fold and delete rows between the two reads. A sheet never co-edited before gets its
   * state built from `content` and stored first.
   */
  async load(sheetId: string): Promise<{ state: Uint8Array; logRows: number; title: string; lock: SheetLockState }> {
    return this.dataSource.transaction(async (manager) => {
      await manager.query(LOCK_SHEET, [sheetId]);
      const sheet = await this.readSheet(manager, sheetId);
      const rows: Array<{ update: Buffer }> = await manager.query(
        `SELECT update FROM sheet_updates WHERE sheet_id = $1 ORDER BY id`,
        [sheetId],
      );
      if (sheet.yjs_state === null) {
        const initial = Y.encodeStateAsUpdate(docFromSheetContent(sheet.content));
        await manager.query(`UPDATE sheets SET yjs_state = $2 WHERE id = $1`, [sheetId, Buffer.from(initial)]);
        sheet.yjs_state = Buffer.from(initial);
      }
      const doc = this.docFromStored(sheetId, sheet, rows.map((row) => row.update));
      const state = Y.encodeStateAsUpdate(doc);
      doc.destroy();
      return { state, logRows: rows.length, title: sheet.title, lock: sheet.status === 'in-check' ? 'in-check' : 'editable' };
    });
  }

  /** One INSERT for the whole batch; resolves once committed. See APPEND_UPDATES for the status rules. */
  async append(sheetId: string, updates: readonly LoggedUpdate[]): Promise<void> {
    if (updates.length === 0) return;
    let rows: Array<{ stored: number }>;
    try {
      rows = await this.dataSource.query(APPEND_UPDATES, [
        sheetId,
        updates.map(({ update }) => asBuffer(update)),
        updates.map(({ userId }) => userId),
        updates.find(({ userId }) => userId !== null)?.userId ?? null,
      ]);
    } catch (error) {
      if (isForeignKeyViolation(error)) throw new SheetGoneError(sheetId);
      throw error;
    }
    if ((rows[0]?.stored ?? 0) === 0) throw new SheetLockedError(sheetId);
  }

  /**
   * Fold the log into `sheets.yjs_state` and refresh `sheets.content` from it, in one transaction
   * under the sheet's lock, reading everything from the database (never from a room's memory).
   * `DELETE ... RETURNING` reads and removes exactly the same rows: an append that commits while
   * this runs is neither folded nor deleted, and waits for the next compaction.
   *
   * The title written into `content` is `sheets.title`: the title block belongs to the REST API,
   * and the room brings the document's `meta.title` in line with it (see SheetRoom).
   */
  async compact(sheetId: string): Promise<{ foldedRows: number; title: string | null }> {
    return this.dataSource.transaction(async (manager) => {
      await manager.query(LOCK_SHEET, [sheetId]);
      let sheet: StoredSheet;
      try {
        sheet = await this.readSheet(manager, sheetId);
      } catch (error) {
        // Deleted: its log went with it (ON DELETE CASCADE).
        if (error instanceof SheetGoneError) return { foldedRows: 0, title: null };
        throw error;
      }
      // The structured result: TypeORM's plain one for a DELETE is [rows, rowCount].
      const runner = manager.queryRunner;
      if (runner === undefined) throw new Error('compact: the transaction has no query runner');
      const deleted = await runner.query(`DELETE FROM sheet_updates WHERE sheet_id = $1 RETURNING id, update`, [sheetId], true);
      const rows = (deleted.records as Array<{ id: string; update: Buffer }>).sort((a, b) =>
        compareBigintText(a.id, b.id),
      );
      if (rows.length === 0 && sheet.yjs_state !== null) return { foldedRows: 0, title: sheet.title };
      const doc = this.docFromStored(sheetId, sheet, rows.map((row) => row.update));
      const state = Buffer.from(Y.encodeStateAsUpdate(doc));
      const content = { ...sheetContentFromDoc(doc), title: sheet.title };
      doc.destroy();
      await manager.query(`UPDATE sheets SET yjs_state = $2, content = $3::jsonb, updated_at = now() WHERE id = $1`, [
        sheetId,
        state,
        JSON.stringify(content),
      ]);
      return { foldedRows: rows.length, title: sheet.title };
    });
  }

  private async readSheet(manager: EntityManager, sheetId: string): Promise<StoredSheet> {
    const rows: StoredSheet[] = await manager.query(`SELECT yjs_state, content, title, status FROM sheets WHERE id = $1 FOR UPDATE`, [
      sheetId,
    ]);
    const sheet = rows[0];
    if (sheet === undefined) throw new SheetGoneError(sheetId);
    return sheet;
  }

  /**
   * The stored state with the log applied in order. A row that Yjs cannot apply is logged and
   * skipped rather than making the sheet unloadable; the room checks every update before it is
   * stored, so this is a last line of defence.
   */
  private docFromStored(sheetId: string, sheet: StoredSheet, updates: readonly Buffer[]): Y.Doc {
    const doc = sheet.yjs_state === null ? docFromSheetContent(sheet.content) : new Y.Doc();
    if (sheet.yjs_state !== null) Y.applyUpdate(doc, sheet.yjs_state);
    for (const [index, update] of updates.entries()) {
      try {
        Y.applyUpdate(doc, update);
      } catch (error) {
        this.logger.error({ err: error, sheetId, logIndex: index }, 'skipped an update log row that does not apply');
      }
    }
    return doc;
  }
}

function asBuffer(bytes: Uint8Array): Buffer {
  return Buffer.isBuffer(bytes) ? bytes : Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
}

function isForeignKeyViolation(error: unknown): boolean {
  const code = (error as { code?: unknown; driverError?: { code?: unknown } } | null)?.code ??
    (error as { driverError?: { code?: unknown } } | null)?.driverError?.code;
  return code === FOREIGN_KEY_VIOLATION;
}

/** Order of two bigint ids as PostgreSQL sends them (decimal strings). */
function compareBigintText(a: string, b: string): number {
  return a.length - b.length || (a < b ? -1 : a > b ? 1 : 0);
}
