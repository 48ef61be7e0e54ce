import type { TemplateParameter } from '@sheaf/engine';
import type { SheetContentV1 } from '@sheaf/engine/api';
import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

/**
 * One version of a template: written once, never changed (a new edit is a new version), so a
 * sheet made from version N can always be traced to exactly what it started from.
 */
@Entity({ name: 'template_versions' })
export class TemplateVersion {
  @PrimaryColumn({ name: 'template_id', type: 'uuid' })
  templateId: string;

  @PrimaryColumn({ type: 'integer' })
  version: number;

  @Column({ type: 'varchar', length: 200 })
  title: string;

  @Column({ type: 'text', default: '' })
  description: string;

  @Column({ type: 'varchar', length: 60 })
  category: string;

  /** The template's sheet in the file format, version 1. */
  @Column({ type: 'jsonb' })
  content: SheetContentV1;

  /** The quantity cells that are parameters, with units and ranges. */
  @Column({ type: 'jsonb' })
  parameters: TemplateParameter[];

  /** The sheet it was saved from (null once that sheet is deleted). */
  @Column({ name: 'source_sheet_id', type: 'uuid', nullable: true })
  sourceSheetId: string | null;

  /** The approved revision it was saved from, when saved from one. */
  @Column({ name: 'source_revision_id', type: 'uuid', nullable: true })
  sourceRevisionId: string | null;

  @Column({ name: 'created_by_user_id', type: 'uuid', nullable: true })
  createdByUserId: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
