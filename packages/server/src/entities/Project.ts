import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A job within an organization; its code prefixes the calc numbers of its sheets. */
@Entity({ name: 'projects' })
export class Project {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'organization_id', type: 'uuid' })
  organizationId: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  /** Unique within the organization, e.g. `GBL`. */
  @Column({ type: 'varchar', length: 16 })
  code: string;

  /** Sequence number the next sheet's calc number takes (`GBL-004` when 4). */
  @Column({ name: 'next_calc_seq', type: 'integer', default: 1 })
  nextCalcSeq: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
