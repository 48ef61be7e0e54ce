import type { SheetContentV1 } from '@sheaf/engine/api';
import type { MachineOutput } from '@sheaf/engine';
import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { FrozenMaterials } from '@sheaf/engine/api';

/**
 * An issued revision of a sheet: written once at approval, never changed (a database trigger
 * refuses UPDATE, DELETE and TRUNCATE). Signatory names are copied in, so the record reads the
 * same whatever happens to the accounts later. Superseded is not a column: a newer revision of the
 * same sheet makes this one superseded.
 */
@Entity({ name: 'revisions' })
export class Revision {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'sheet_id', type: 'uuid' })
  sheetId: string;

  @Column({ name: 'organization_id', type: 'uuid' })
  organizationId: string;

  /** 1, 2, ... per sheet. */
  @Column({ type: 'integer' })
  number: number;

  @Column({ type: 'varchar', length: 200 })
  title: string;

  @Column({ name: 'calc_number', type: 'varchar', length: 40 })
  calcNumber: string;

  /** The sheet in the file format, version 1, as the engine's format reader returned it. */
  @Column({ type: 'jsonb' })
  content: SheetContentV1;

  /** The engine's machine output of `content`, computed on the server at approval. */
  @Column({ type: 'jsonb' })
  results: MachineOutput;

  /** The library materials `content` names, with their values, bases and sources as at approval (`freezeMaterials`). */
  @Column({ name: 'frozen_materials', type: 'jsonb', default: {} })
  frozenMaterials: FrozenMaterials;

  /** Hex sha-256 of the canonical JSON of `content` (keys sorted, no spaces). */
  @Column({ name: 'content_sha256', type: 'char', length: 64 })
  contentSha256: string;

  @Column({ name: 'prepared_by_user_id', type: 'uuid' })
  preparedByUserId: string;

  @Column({ name: 'prepared_by_name', type: 'varchar', length: 120 })
  preparedByName: string;

  /** When the preparer submitted this revision for check. */
  @Column({ name: 'prepared_at', type: 'timestamptz' })
  preparedAt: Date;

  @Column({ name: 'checked_by_user_id', type: 'uuid' })
  checkedByUserId: string;

  @Column({ name: 'checked_by_name', type: 'varchar', length: 120 })
  checkedByName: string;

  @Column({ name: 'checked_at', type: 'timestamptz' })
  checkedAt: Date;

  @Column({ name: 'approved_by_user_id', type: 'uuid' })
  approvedByUserId: string;

  @Column({ name: 'approved_by_name', type: 'varchar', length: 120 })
  approvedByName: string;

  @Column({ name: 'approved_at', type: 'timestamptz' })
  approvedAt: Date;

  /** The checker's reason for approving over open notes; null when none were open. */
  @Column({ name: 'override_reason', type: 'text', nullable: true })
  overrideReason: string | null;

  @Column({ name: 'open_notes_at_approval', type: 'integer', default: 0 })
  openNotesAtApproval: number;
}
