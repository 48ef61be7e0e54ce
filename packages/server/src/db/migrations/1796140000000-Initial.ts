import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The first schema: accounts, sessions, organizations and their members, invitations, password
 * resets, projects, sheets and the audit log. Roles and statuses are checked by the database as
 * well as by the API, so a bad value can never be stored.
 */
export class Initial1796140000000 implements MigrationInterface {
  name = 'Initial1796140000000';

  async up(db: QueryRunner): Promise<void> {
    await db.query(`
      CREATE TABLE users (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        email varchar(254) NOT NULL,
        name varchar(120) NOT NULL,
        password_hash text,
        email_verified_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT users_email_lower CHECK (email = lower(email))
      )`);
    await db.query(`CREATE UNIQUE INDEX users_email_key ON users (email)`);

    await db.query(`
      CREATE TABLE identities (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
        provider varchar(32) NOT NULL,
        provider_user_id varchar(128) NOT NULL,
        login varchar(128),
        email varchar(254),
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT identities_provider_key UNIQUE (provider, provider_user_id)
      )`);
    await db.query(`CREATE INDEX identities_user_idx ON identities (user_id)`);

    // The schema connect-pg-simple expects (its table.sql), under our table name.
    await db.query(`
      CREATE TABLE sessions (
        sid varchar(255) NOT NULL COLLATE "default" PRIMARY KEY,
        sess json NOT NULL,
        expire timestamp(6) NOT NULL
      )`);
    await db.query(`CREATE INDEX sessions_expire_idx ON sessions (expire)`);

    await db.query(`
      CREATE TABLE organizations (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        name varchar(120) NOT NULL,
        slug varchar(80) NOT NULL UNIQUE,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);

    await db.query(`
      CREATE TABLE memberships (
        organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
        user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
        role varchar(16) NOT NULL CHECK (role IN ('owner', 'engineer', 'checker', 'viewer')),
        created_at timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY (organization_id, user_id)
      )`);
    await db.query(`CREATE INDEX memberships_user_idx ON memberships (user_id)`);

    await db.query(`
      CREATE TABLE invitations (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
        email varchar(254) NOT NULL CHECK (email = lower(email)),
        role varchar(16) NOT NULL CHECK (role IN ('owner', 'engineer', 'checker', 'viewer')),
        token_hash char(64) NOT NULL UNIQUE,
        invited_by_user_id uuid REFERENCES users(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        expires_at timestamptz NOT NULL,
        accepted_at timestamptz,
        accepted_by_user_id uuid REFERENCES users(id) ON DELETE SET NULL
      )`);
    await db.query(`CREATE INDEX invitations_organization_idx ON invitations (organization_id)`);

    await db.query(`
      CREATE TABLE password_resets (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
        token_hash char(64) NOT NULL UNIQUE,
        created_at timestamptz NOT NULL DEFAULT now(),
        expires_at timestamptz NOT NULL,
        used_at timestamptz
      )`);
    await db.query(`CREATE INDEX password_resets_user_idx ON password_resets (user_id)`);

    await db.query(`
      CREATE TABLE projects (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
        name varchar(120) NOT NULL,
        code varchar(16) NOT NULL,
        next_calc_seq integer NOT NULL DEFAULT 1 CHECK (next_calc_seq >= 1),
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT projects_code_key UNIQUE (organization_id, code)
      )`);

    await db.query(`
      CREATE TABLE sheets (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
        project_id uuid NOT NULL REFERENCES projects(id) ON DELETE CASCADE,
        title varchar(200) NOT NULL,
        calc_number varchar(40) NOT NULL,
        status varchar(16) NOT NULL DEFAULT 'draft'
          CHECK (status IN ('draft', 'in-check', 'approved', 'superseded')),
        content jsonb NOT NULL,
        yjs_state bytea,
        revision integer NOT NULL DEFAULT 0 CHECK (revision >= 0),
        created_by_user_id uuid REFERENCES users(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT sheets_calc_number_key UNIQUE (organization_id, calc_number)
      )`);
    await db.query(`CREATE INDEX sheets_project_idx ON sheets (project_id)`);

    await db.query(`
      CREATE TABLE audit_events (
        id bigint GENERATED ALWAYS AS IDENTITY PRIMARY KEY,
        occurred_at timestamptz NOT NULL DEFAULT now(),
        action varchar(64) NOT NULL,
        actor_user_id uuid REFERENCES users(id) ON DELETE SET NULL,
        organization_id uuid REFERENCES organizations(id) ON DELETE SET NULL,
        subject varchar(254),
        ip varchar(64),
        details jsonb NOT NULL DEFAULT '{}'::jsonb
      )`);
    await db.query(`CREATE INDEX audit_events_organization_idx ON audit_events (organization_id, occurred_at)`);
    await db.query(`CREATE INDEX audit_events_actor_idx ON audit_events (actor_user_id, occurred_at)`);
  }

  async down(db: QueryRunner): Promise<void> {
    for (const table of [
      'audit_events',
      'sheets',
      'projects',
      'password_resets',
      'invitations',
      'memberships',
      'organizations',
      'sessions',
      'identities',
      'users',
    ]) {
      await db.query(`DROP TABLE IF EXISTS ${table}`);
    }
  }
}
