import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Organization materials (the built-in ones are files in `library/`), templates with their
 * versions, and on each sheet the template id and version it was made from (`builtin:<key>` or a
 * template's UUID; not a foreign key, since built-in templates have no row).
 */
export class TemplatesAndMaterials1796165000000 implements MigrationInterface {
  name = 'TemplatesAndMaterials1796165000000';

  async up(db: QueryRunner): Promise<void> {
    await db.query(`
      CREATE TABLE materials (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
        key varchar(64) NOT NULL,
        name varchar(200) NOT NULL,
        category varchar(40) NOT NULL,
        notes text NOT NULL DEFAULT '',
        properties jsonb NOT NULL,
        created_by_user_id uuid REFERENCES users(id) ON DELETE SET NULL,
        updated_by_user_id uuid REFERENCES users(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT materials_key_key UNIQUE (organization_id, key)
      )`);

    await db.query(`
      CREATE TABLE templates (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
        current_version integer NOT NULL CHECK (current_version >= 1),
        title varchar(200) NOT NULL,
        description text NOT NULL DEFAULT '',
        category varchar(60) NOT NULL,
        created_by_user_id uuid REFERENCES users(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await db.query(`CREATE INDEX templates_organization_idx ON templates (organization_id, updated_at DESC)`);

    await db.query(`
      CREATE TABLE template_versions (
        template_id uuid NOT NULL REFERENCES templates(id) ON DELETE CASCADE,
        version integer NOT NULL CHECK (version >= 1),
        title varchar(200) NOT NULL,
        description text NOT NULL DEFAULT '',
        category varchar(60) NOT NULL,
        content jsonb NOT NULL,
        parameters jsonb NOT NULL,
        source_sheet_id uuid REFERENCES sheets(id) ON DELETE SET NULL,
        source_revision_id uuid,
        created_by_user_id uuid REFERENCES users(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY (template_id, version)
      )`);
    // A version is written once: editing a template adds a version instead.
    await db.query(`
      CREATE FUNCTION template_versions_immutable() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        -- The only changes allowed are the foreign keys set to null when the source sheet or the
        -- author's account is deleted (ON DELETE SET NULL).
        IF (NEW.template_id, NEW.version, NEW.title, NEW.description, NEW.category, NEW.content, NEW.parameters,
            NEW.source_revision_id, NEW.created_at)
           IS NOT DISTINCT FROM
           (OLD.template_id, OLD.version, OLD.title, OLD.description, OLD.category, OLD.content, OLD.parameters,
            OLD.source_revision_id, OLD.created_at)
           AND (NEW.source_sheet_id IS NOT DISTINCT FROM OLD.source_sheet_id OR NEW.source_sheet_id IS NULL)
           AND (NEW.created_by_user_id IS NOT DISTINCT FROM OLD.created_by_user_id OR NEW.created_by_user_id IS NULL) THEN
          RETURN NEW;
        END IF;
        RAISE EXCEPTION 'template versions are never changed; save a new version instead';
      END $$`);
    await db.query(`
      CREATE TRIGGER template_versions_no_update BEFORE UPDATE ON template_versions
        FOR EACH ROW EXECUTE FUNCTION template_versions_immutable()`);

    await db.query(`ALTER TABLE sheets ADD COLUMN template_id varchar(100)`);
    await db.query(`ALTER TABLE sheets ADD COLUMN template_version integer CHECK (template_version >= 1)`);
  }

  async down(db: QueryRunner): Promise<void> {
    await db.query(`ALTER TABLE sheets DROP COLUMN IF EXISTS template_version`);
    await db.query(`ALTER TABLE sheets DROP COLUMN IF EXISTS template_id`);
    await db.query(`DROP TABLE IF EXISTS template_versions`);
    await db.query(`DROP FUNCTION IF EXISTS template_versions_immutable()`);
    await db.query(`DROP TABLE IF EXISTS templates`);
    await db.query(`DROP TABLE IF EXISTS materials`);
  }
}
