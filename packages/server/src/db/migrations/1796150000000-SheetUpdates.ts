import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The append-only Yjs update log of each sheet. The co-editing server appends every update here
 * before relaying it, and compaction folds the rows into `sheets.yjs_state` and deletes them.
 */
export class SheetUpdates1796150000000 implements MigrationInterface {
  name = 'SheetUpdates1796150000000';

  async up(db: QueryRunner): Promise<void> {
    await db.query(`ALTER TABLE sheets ADD COLUMN IF NOT EXISTS yjs_state bytea`);
    await db.query(`
      CREATE TABLE sheet_updates (
        id bigserial PRIMARY KEY,
        sheet_id uuid NOT NULL REFERENCES sheets(id) ON DELETE CASCADE,
        update bytea NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        user_id uuid REFERENCES users(id) ON DELETE SET NULL
      )`);
    // Loading and compaction read one sheet's rows in id order.
    await db.query(`CREATE INDEX sheet_updates_sheet_idx ON sheet_updates (sheet_id, id)`);
    // Deleting a user sets user_id to null; the index keeps that from scanning the whole log.
    await db.query(`CREATE INDEX sheet_updates_user_idx ON sheet_updates (user_id) WHERE user_id IS NOT NULL`);
  }

  async down(db: QueryRunner): Promise<void> {
    await db.query(`DROP TABLE IF EXISTS sheet_updates`);
  }
}
