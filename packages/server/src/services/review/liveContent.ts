import type { Request } from 'express';
import type { DataSource } from 'typeorm';
import type { SheetContentV1 } from '@sheaf/engine/api';
import type { CollabServer } from '../../collab/CollabServer';

/** The co-editing server of the app serving this request (set by startServer), if any. */
export function collabOf(req: Request): CollabServer | undefined {
  return req.app.locals.collab as CollabServer | undefined;
}

/**
 * A sheet's content as the people editing it see it now: the open room's document when there is
 * one (everything in it is already stored), else the stored content, which the last compaction
 * brought up to date. The title is always the sheet's own (the title block belongs to the API).
 */
export async function liveSheetContent(
  dataSource: DataSource,
  collab: CollabServer | undefined,
  sheetId: string,
): Promise<SheetContentV1> {
  const rows: Array<{ content: SheetContentV1; title: string }> = await dataSource.query(
    `SELECT content, title FROM sheets WHERE id = $1`,
    [sheetId],
  );
  const stored = rows[0];
  if (stored === undefined) throw new Error(`sheet ${sheetId} vanished while being read`);
  const room = collab === undefined ? undefined : await collab.loadedRoom(sheetId);
  if (room !== undefined) await room.flush();
  const live = collab === undefined ? null : await collab.liveContent(sheetId);
  return { ...((live as SheetContentV1 | null) ?? stored.content), title: stored.title };
}
