// The two database roles of Sheaf (runs after npm install: it uses the `pg` driver).
//
// - OWNER_ROLE (sheaf_owner) owns the database, its schema and every table; migrations run as it.
// - APP_ROLE (sheaf_app) is what the server connects as: not a superuser, owner of nothing, with
//   SELECT/INSERT/UPDATE/DELETE on the tables (present and future: default privileges of the
//   owner), except issued revisions, which it may only read and add, and the migrations table,
//   which it may not touch. It holds no TRIGGER, TRUNCATE or CREATE right, so it can neither
//   change a revision nor switch off or drop the trigger that guards them, and, not being a
//   superuser, cannot set session_replication_role.
//
// Idempotent: run it again after a restore, or on a database made before the roles existed
// (objects another role owns are handed to the owner).

export const OWNER_ROLE = 'sheaf_owner';
export const APP_ROLE = 'sheaf_app';

const ident = (name) => {
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new Error(`"${name}" may hold only lower-case letters, digits and _`);
  return name;
};
const literal = (text) => `'${String(text).replace(/'/g, "''")}'`;

/**
 * The SQL, in three parts: `cluster` (on any database of the server, as a superuser or a role
 * with CREATEROLE that owns the database), `database` (connected to the database, as the same
 * role), `owner` (connected to the database as the owner role, or after SET ROLE to it).
 */
export function roleSetupSql(database, { owner = OWNER_ROLE, app = APP_ROLE, ownerPassword, appPassword } = {}) {
  const [db, o, a] = [ident(database), ident(owner), ident(app)];
  const cluster = [
    `DO $$ BEGIN
      IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = '${o}') THEN CREATE ROLE ${o} LOGIN NOSUPERUSER NOCREATEDB NOCREATEROLE; END IF;
      IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = '${a}') THEN CREATE ROLE ${a} LOGIN NOSUPERUSER NOCREATEDB NOCREATEROLE NOINHERIT; END IF;
    END $$`,
    ...(ownerPassword ? [`ALTER ROLE ${o} PASSWORD ${literal(ownerPassword)}`] : []),
    ...(appPassword ? [`ALTER ROLE ${a} PASSWORD ${literal(appPassword)}`] : []),
    // A CREATEROLE administrator (managed databases) must be able to act as the owner below.
    `DO $$ BEGIN
      IF NOT (SELECT rolsuper FROM pg_roles WHERE rolname = current_user) AND NOT pg_has_role(current_user, '${o}', 'USAGE') THEN
        EXECUTE 'GRANT ${o} TO ' || quote_ident(current_user);
      END IF;
    END $$`,
    `ALTER DATABASE ${db} OWNER TO ${o}`,
    `REVOKE CREATE, TEMPORARY ON DATABASE ${db} FROM PUBLIC`,
    `GRANT CONNECT ON DATABASE ${db} TO ${a}`,
  ];
  const inDatabase = [
    `ALTER SCHEMA public OWNER TO ${o}`,
    `REVOKE CREATE ON SCHEMA public FROM PUBLIC`,
    `GRANT USAGE ON SCHEMA public TO ${a}`,
    // Tables first (their indexes and serial sequences follow them), then what is left.
    `DO $$ DECLARE r record; BEGIN
      FOR r IN SELECT c.relname, c.relkind FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
                WHERE n.nspname = 'public' AND c.relkind IN ('r', 'p', 'v', 'm') AND c.relowner <> '${o}'::regrole LOOP
        EXECUTE format('ALTER %s public.%I OWNER TO ${o}', CASE r.relkind WHEN 'v' THEN 'VIEW' WHEN 'm' THEN 'MATERIALIZED VIEW' ELSE 'TABLE' END, r.relname);
      END LOOP;
      FOR r IN SELECT c.relname FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
                WHERE n.nspname = 'public' AND c.relkind = 'S' AND c.relowner <> '${o}'::regrole LOOP
        EXECUTE format('ALTER SEQUENCE public.%I OWNER TO ${o}', r.relname);
      END LOOP;
      FOR r IN SELECT p.oid::regprocedure AS routine FROM pg_proc p JOIN pg_namespace n ON n.oid = p.pronamespace
                WHERE n.nspname = 'public' AND p.proowner <> '${o}'::regrole LOOP
        EXECUTE format('ALTER ROUTINE %s OWNER TO ${o}', r.routine);
      END LOOP;
    END $$`,
  ];
  const asOwner = [
    `ALTER DEFAULT PRIVILEGES FOR ROLE ${o} IN SCHEMA public GRANT SELECT, INSERT, UPDATE, DELETE ON TABLES TO ${a}`,
    `ALTER DEFAULT PRIVILEGES FOR ROLE ${o} IN SCHEMA public GRANT USAGE, SELECT ON SEQUENCES TO ${a}`,
    `GRANT SELECT, INSERT, UPDATE, DELETE ON ALL TABLES IN SCHEMA public TO ${a}`,
    `GRANT USAGE, SELECT ON ALL SEQUENCES IN SCHEMA public TO ${a}`,
    // Issued revisions are read and added, never changed; a migration does the same for every
    // role but the owner (see the RecordGuards migration), so a table made later stays covered.
    `DO $$ BEGIN
      IF to_regclass('public.revisions') IS NOT NULL THEN
        REVOKE UPDATE, DELETE, TRUNCATE, TRIGGER, REFERENCES ON public.revisions FROM ${a};
      END IF;
      IF to_regclass('public.migrations') IS NOT NULL THEN
        REVOKE ALL ON public.migrations FROM ${a};
      END IF;
    END $$`,
  ];
  return { cluster, database: inDatabase, owner: asOwner };
}

/** The same server and credentials, another database (and optionally another user). */
export function withDatabase(url, database, user, password) {
  const parsed = new URL(url);
  parsed.pathname = `/${encodeURIComponent(database)}`;
  if (user !== undefined) {
    parsed.username = encodeURIComponent(user);
    parsed.password = password === undefined ? '' : encodeURIComponent(password);
  }
  return parsed.toString();
}

// Errors another run creating the same roles at the same moment may cause: harmless.
const RACE_CODES = new Set(['42710', '23505', 'XX000', '40001', '40P01']);

async function runAll(url, statements, { setRole } = {}) {
  const { default: pg } = await import('pg');
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    if (setRole) await client.query(`SET ROLE ${ident(setRole)}`);
    for (const sql of statements) {
      for (let attempt = 1; ; attempt += 1) {
        try {
          await client.query(sql);
          break;
        } catch (error) {
          if (attempt >= 3 || !RACE_CODES.has(error.code)) throw error;
          await new Promise((resolve) => setTimeout(resolve, 100 * attempt));
        }
      }
    }
  } finally {
    await client.end();
  }
}

/**
 * Creates (or brings up to date) the two roles for `database` through `adminUrl` (a superuser,
 * or a CREATEROLE role owning the database; any database of the server). Returns the URLs the
 * owner (migrations) and the app connect with: the admin URL's host, another user and database.
 */
export async function setUpRoles(adminUrl, database, options = {}) {
  const owner = options.owner ?? OWNER_ROLE;
  const app = options.app ?? APP_ROLE;
  const sql = roleSetupSql(database, options);
  await runAll(adminUrl, sql.cluster);
  const inDatabase = withDatabase(adminUrl, database);
  await runAll(inDatabase, sql.database);
  await runAll(inDatabase, sql.owner, { setRole: owner });
  return {
    ownerUrl: withDatabase(adminUrl, database, owner, options.ownerPassword),
    appUrl: withDatabase(adminUrl, database, app, options.appPassword),
  };
}
