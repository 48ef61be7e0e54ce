import type { EntityManager } from 'typeorm';
import type { AuditAction } from '../entities/AuditEvent';

export interface AuditInput {
  action: AuditAction;
  actorUserId?: string | null;
  organizationId?: string | null;
  subject?: string | null;
  ip?: string | null;
  details?: Record<string, unknown>;
}

/** Appends one audit event (inside the caller's transaction when given its manager). */
export async function recordAudit(manager: EntityManager, event: AuditInput): Promise<void> {
  await manager.query(
    `INSERT INTO audit_events (action, actor_user_id, organization_id, subject, ip, details)
     VALUES ($1, $2, $3, $4, $5, $6::jsonb)`,
    [
      event.action,
      event.actorUserId ?? null,
      event.organizationId ?? null,
      event.subject?.slice(0, 254) ?? null,
      event.ip?.slice(0, 64) ?? null,
      JSON.stringify(event.details ?? {}),
    ],
  );
}
