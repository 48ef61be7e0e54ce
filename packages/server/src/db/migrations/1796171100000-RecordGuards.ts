import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Issued revisions are read and added, never changed, by any role but their owner (the role
 * migrations run as). The app's role gets SELECT, INSERT, UPDATE and DELETE on every table the
 * owner creates (its default privileges, set up with the roles); here UPDATE, DELETE, TRUNCATE,
 * TRIGGER and REFERENCES on `revisions` are taken back from every role that holds them, whatever
 * its name, and every right on the migrations table. The trigger refusing UPDATE, DELETE and
 * TRUNCATE stays as the second line: only the owner could disable it.
 */
export class RecordGuards1796171100000 implements MigrationInterface {
  name = 'RecordGuards1796171100000';

  async up(db: QueryRunner): Promise<void> {
    await db.query(`REVOKE UPDATE, DELETE, TRUNCATE, TRIGGER, REFERENCES ON revisions FROM PUBLIC`);
    await db.query(`
      DO $$ DECLARE holder text; BEGIN
        FOR holder IN
          SELECT DISTINCT a.grantee::regrole::text FROM pg_class c, aclexplode(c.relacl) a
           WHERE c.oid = 'revisions'::regclass AND a.grantee <> c.relowner AND a.grantee <> 0
             AND a.privilege_type IN ('UPDATE', 'DELETE', 'TRUNCATE', 'TRIGGER', 'REFERENCES')
        LOOP
          EXECUTE format('REVOKE UPDATE, DELETE, TRUNCATE, TRIGGER, REFERENCES ON revisions FROM %s', holder);
        END LOOP;
        FOR holder IN
          SELECT DISTINCT a.grantee::regrole::text FROM pg_class c, aclexplode(c.relacl) a
           WHERE c.oid = 'migrations'::regclass AND a.grantee <> c.relowner AND a.grantee <> 0
        LOOP
          EXECUTE format('REVOKE ALL ON migrations FROM %s', holder);
        END LOOP;
      END $$`);
  }

  async down(): Promise<void> {
    // Rights are not handed back: run `npm run db:roles` to set the grants up again.
  }
}
