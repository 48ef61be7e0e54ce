import type { SheetContentV1, SheetStatus } from '@sheaf/engine/api';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/** A calculation sheet: its title block, status and current content. */
@Entity({ name: 'sheets' })
export class Sheet {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Kept equal to the project's organization; calc numbers are unique per organization. */
  @Column({ name: 'organization_id', type: 'uuid' })
  organizationId: string;

  @Column({ name: 'project_id', type: 'uuid' })
  projectId: string;

  @Column({ type: 'varchar', length: 200 })
  title: string;

  /** Stays with the sheet if it moves to another project. */
  @Column({ name: 'calc_number', type: 'varchar', length: 40 })
  calcNumber: string;

  @Column({ type: 'varchar', length: 16, default: 'draft' })
  status: SheetStatus;

  /** The sheet in the file format, version 1. */
  @Column({ type: 'jsonb' })
  content: SheetContentV1;

  /** Compacted Yjs document state, once the sheet has been co-edited. */
  @Column({ name: 'yjs_state', type: 'bytea', nullable: true })
  yjsState: Buffer | null;

  /** Number of the revision being worked on; 0 until the first is issued. */
  @Column({ type: 'integer', default: 0 })
  revision: number;

  @Column({ name: 'created_by_user_id', type: 'uuid', nullable: true })
  createdByUserId: string | null;

  /** Who submitted the revision in preparation for check (the preparer); null before that. */
  @Column({ name: 'prepared_by_user_id', type: 'uuid', nullable: true })
  preparedByUserId: string | null;

  /** The checker it was submitted to (or reassigned to); kept after a return for the next submission. */
  @Column({ name: 'checker_user_id', type: 'uuid', nullable: true })
  checkerUserId: string | null;

  /** When it was last submitted for check. */
  @Column({ name: 'submitted_at', type: 'timestamptz', nullable: true })
  submittedAt: Date | null;

  /** The template it was made from: a template's UUID or `builtin:<key>`; null for a sheet started empty. */
  @Column({ name: 'template_id', type: 'varchar', length: 100, nullable: true })
  templateId: string | null;

  /** The version of that template. */
  @Column({ name: 'template_version', type: 'integer', nullable: true })
  templateVersion: number | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
