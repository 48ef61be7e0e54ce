import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/**
 * One Yjs update of a sheet's live document, appended before it was relayed to anyone. Rows are
 * folded into `sheets.yjs_state` by compaction and then deleted; see src/collab/README.md.
 */
@Entity({ name: 'sheet_updates' })
export class SheetUpdate {
  /** bigserial: PostgreSQL's bigint arrives as a string. Log order is id order. */
  @PrimaryGeneratedColumn('increment', { type: 'bigint' })
  id: string;

  @Column({ name: 'sheet_id', type: 'uuid' })
  sheetId: string;

  /** A Yjs update (v1 encoding). */
  @Column({ type: 'bytea' })
  update: Buffer;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  /** Who sent it; null once that user is deleted. */
  @Column({ name: 'user_id', type: 'uuid', nullable: true })
  userId: string | null;
}
