import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The check-and-approval workflow: who prepared a sheet and who checks it, notes on cells, and
 * issued revisions. An issued revision never changes: a trigger refuses every UPDATE, DELETE and
 * TRUNCATE of `revisions`, whoever sends it, so the guarantee does not rest on the API alone.
 * Whether a revision is superseded is not stored on it: a newer revision of the same sheet says so.
 */
export class CheckAndApproval1796163000000 implements MigrationInterface {
  name = 'CheckAndApproval1796163000000';

  async up(db: QueryRunner): Promise<void> {
    await db.query(`
      ALTER TABLE sheets
        ADD COLUMN prepared_by_user_id uuid REFERENCES users(id) ON DELETE SET NULL,
        ADD COLUMN checker_user_id uuid REFERENCES users(id) ON DELETE SET NULL,
        ADD COLUMN submitted_at timestamptz`);

    await db.query(`
      CREATE TABLE revisions (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        -- No cascade: a sheet with issued revisions cannot be deleted.
        sheet_id uuid NOT NULL REFERENCES sheets(id),
        organization_id uuid NOT NULL REFERENCES organizations(id),
        number integer NOT NULL CHECK (number >= 1),
        title varchar(200) NOT NULL,
        calc_number varchar(40) NOT NULL,
        content jsonb NOT NULL,
        results jsonb NOT NULL,
        content_sha256 char(64) NOT NULL CHECK (content_sha256 ~ '^[0-9a-f]{64}$'),
        prepared_by_user_id uuid NOT NULL REFERENCES users(id),
        prepared_by_name varchar(120) NOT NULL,
        prepared_at timestamptz NOT NULL,
        checked_by_user_id uuid NOT NULL REFERENCES users(id),
        checked_by_name varchar(120) NOT NULL,
        checked_at timestamptz NOT NULL,
        approved_by_user_id uuid NOT NULL REFERENCES users(id),
        approved_by_name varchar(120) NOT NULL,
        approved_at timestamptz NOT NULL DEFAULT now(),
        override_reason text,
        open_notes_at_approval integer NOT NULL DEFAULT 0 CHECK (open_notes_at_approval >= 0),
        CONSTRAINT revisions_sheet_number_key UNIQUE (sheet_id, number),
        -- Nobody approves a sheet they prepared.
        CONSTRAINT revisions_not_self_approved CHECK (approved_by_user_id <> prepared_by_user_id),
        CONSTRAINT revisions_override_explained CHECK (open_notes_at_approval = 0 OR override_reason IS NOT NULL)
      )`);

    await db.query(`
      CREATE FUNCTION revisions_refuse_change() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF TG_OP = 'TRUNCATE' THEN
          RAISE EXCEPTION 'issued revisions cannot be removed (TRUNCATE refused)' USING ERRCODE = 'restrict_violation';
        END IF;
        RAISE EXCEPTION 'revision % of sheet % is issued and cannot be changed (% refused)', OLD.number, OLD.sheet_id, TG_OP
          USING ERRCODE = 'restrict_violation';
      END
      $$`);
    await db.query(`
      CREATE TRIGGER revisions_immutable BEFORE UPDATE OR DELETE ON revisions
        FOR EACH ROW EXECUTE FUNCTION revisions_refuse_change()`);
    await db.query(`
      CREATE TRIGGER revisions_no_truncate BEFORE TRUNCATE ON revisions
        FOR EACH STATEMENT EXECUTE FUNCTION revisions_refuse_change()`);

    await db.query(`
      CREATE TABLE notes (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        sheet_id uuid NOT NULL REFERENCES sheets(id) ON DELETE CASCADE,
        cell_id varchar(64) NOT NULL,
        -- A reply points at the thread's first note; threads are one level deep.
        parent_id uuid REFERENCES notes(id) ON DELETE CASCADE,
        author_user_id uuid REFERENCES users(id) ON DELETE SET NULL,
        body text NOT NULL CHECK (length(body) BETWEEN 1 AND 4000),
        revision integer NOT NULL CHECK (revision >= 1),
        mentions uuid[] NOT NULL DEFAULT '{}',
        created_at timestamptz NOT NULL DEFAULT now(),
        resolved_at timestamptz,
        resolved_by_user_id uuid REFERENCES users(id) ON DELETE SET NULL,
        -- A thread is resolved as a whole, on its first note.
        CONSTRAINT notes_replies_not_resolved CHECK (parent_id IS NULL OR resolved_at IS NULL)
      )`);
    await db.query(`CREATE INDEX notes_sheet_idx ON notes (sheet_id, created_at)`);
    await db.query(`CREATE INDEX notes_parent_idx ON notes (parent_id) WHERE parent_id IS NOT NULL`);
    await db.query(`CREATE INDEX notes_open_idx ON notes (sheet_id) WHERE parent_id IS NULL AND resolved_at IS NULL`);

    // A sheet's history reads its workflow and note events from the audit log.
    await db.query(
      `CREATE INDEX audit_events_sheet_idx ON audit_events ((details ->> 'sheetId'), occurred_at) WHERE details ? 'sheetId'`,
    );
  }

  async down(db: QueryRunner): Promise<void> {
    await db.query(`DROP INDEX IF EXISTS audit_events_sheet_idx`);
    await db.query(`DROP TABLE IF EXISTS notes`);
    // Dropping the table removes its triggers; the rows go with it, which only a migration may do.
    await db.query(`DROP TABLE IF EXISTS revisions`);
    await db.query(`DROP FUNCTION IF EXISTS revisions_refuse_change()`);
    await db.query(`
      ALTER TABLE sheets
        DROP COLUMN IF EXISTS submitted_at,
        DROP COLUMN IF EXISTS checker_user_id,
        DROP COLUMN IF EXISTS prepared_by_user_id`);
  }
}
