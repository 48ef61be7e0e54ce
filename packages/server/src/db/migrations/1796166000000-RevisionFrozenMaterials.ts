import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The material values an issued revision used, frozen at approval (`{ materialId: values with
 * basis and source }`), so a later edit of the materials library never changes an approved
 * calculation. Revisions issued before this column existed used no library materials.
 */
export class RevisionFrozenMaterials1796166000000 implements MigrationInterface {
  name = 'RevisionFrozenMaterials1796166000000';

  async up(db: QueryRunner): Promise<void> {
    // A constant default adds the column without rewriting rows, so the immutability trigger on
    // revisions (row UPDATE and DELETE) is not involved.
    await db.query(`ALTER TABLE revisions ADD COLUMN frozen_materials jsonb NOT NULL DEFAULT '{}'::jsonb`);
  }

  async down(db: QueryRunner): Promise<void> {
    await db.query(`ALTER TABLE revisions DROP COLUMN IF EXISTS frozen_materials`);
  }
}
