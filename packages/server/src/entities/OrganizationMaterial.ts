import type { MaterialCategory, MaterialPropertyKey, MaterialValue } from '@sheaf/engine';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/**
 * A material an organization added to its library (the built-in ones live in `library/`). `key`
 * is what criterion and point-set cells name in `material`; each value carries its basis and
 * published source.
 */
@Entity({ name: 'materials' })
export class OrganizationMaterial {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'organization_id', type: 'uuid' })
  organizationId: string;

  /** Unique within the organization and never the id of a built-in material. */
  @Column({ type: 'varchar', length: 64 })
  key: string;

  @Column({ type: 'varchar', length: 200 })
  name: string;

  @Column({ type: 'varchar', length: 40 })
  category: MaterialCategory;

  @Column({ type: 'text', default: '' })
  notes: string;

  /** Values by property (`Sy`, `Sut`, ...): `{ value, basis, source }`. */
  @Column({ type: 'jsonb' })
  properties: Partial<Record<MaterialPropertyKey, MaterialValue>>;

  @Column({ name: 'created_by_user_id', type: 'uuid', nullable: true })
  createdByUserId: string | null;

  @Column({ name: 'updated_by_user_id', type: 'uuid', nullable: true })
  updatedByUserId: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
