import type { Role } from '@sheaf/engine/api';
import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

/** A user's role in an organization. Every organization keeps at least one owner. */
@Entity({ name: 'memberships' })
export class Membership {
  @PrimaryColumn({ name: 'organization_id', type: 'uuid' })
  organizationId: string;

  @PrimaryColumn({ name: 'user_id', type: 'uuid' })
  userId: string;

  @Column({ type: 'varchar', length: 16 })
  role: Role;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
