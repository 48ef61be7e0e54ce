import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/**
 * A note on one cell of a sheet, by the cell's stable id, so it stays with the cell from revision
 * to revision. A note without a parent opens a thread; replies point at it. A thread is resolved
 * (and reopened) on its first note.
 */
@Entity({ name: 'notes' })
export class Note {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'sheet_id', type: 'uuid' })
  sheetId: string;

  @Column({ name: 'cell_id', type: 'varchar', length: 64 })
  cellId: string;

  @Column({ name: 'parent_id', type: 'uuid', nullable: true })
  parentId: string | null;

  /** null once the author's account is deleted. */
  @Column({ name: 'author_user_id', type: 'uuid', nullable: true })
  authorUserId: string | null;

  @Column({ type: 'text' })
  body: string;

  /** The revision the sheet was at when the note was written (issued, or in preparation). */
  @Column({ type: 'integer' })
  revision: number;

  /** Members named with @name in the body. */
  @Column({ type: 'uuid', array: true, default: () => "'{}'" })
  mentions: string[];

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column({ name: 'resolved_at', type: 'timestamptz', nullable: true })
  resolvedAt: Date | null;

  @Column({ name: 'resolved_by_user_id', type: 'uuid', nullable: true })
  resolvedByUserId: string | null;
}
