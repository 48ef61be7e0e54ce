import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** Names of the events Sheaf records. */
export type AuditAction =
  | 'auth.signin'
  | 'auth.signin-failed'
  | 'auth.signup'
  | 'auth.password-reset'
  | 'auth.identity-linked'
  | 'organization.created'
  | 'member.role-changed'
  | 'member.removed'
  | 'invitation.sent'
  | 'invitation.accepted'
  | 'sheet.submitted'
  | 'sheet.returned'
  | 'sheet.approved'
  | 'sheet.checker-reassigned'
  | 'sheet.reopened'
  | 'note.created'
  | 'note.resolved'
  | 'note.reopened';

/** An append-only record of a security-relevant event: who, what, where from, when. */
@Entity({ name: 'audit_events' })
export class AuditEvent {
  @PrimaryGeneratedColumn('identity', { type: 'bigint', generatedIdentity: 'ALWAYS' })
  id: string;

  @CreateDateColumn({ name: 'occurred_at', type: 'timestamptz' })
  occurredAt: Date;

  @Column({ type: 'varchar', length: 64 })
  action: AuditAction;

  @Column({ name: 'actor_user_id', type: 'uuid', nullable: true })
  actorUserId: string | null;

  @Column({ name: 'organization_id', type: 'uuid', nullable: true })
  organizationId: string | null;

  /** What the event is about in words: an e-mail address, a user id. */
  @Column({ type: 'varchar', length: 254, nullable: true })
  subject: string | null;

  @Column({ type: 'varchar', length: 64, nullable: true })
  ip: string | null;

  @Column({ type: 'jsonb', default: () => "'{}'::jsonb" })
  details: Record<string, unknown>;
}
