import type { DataSource, EntityManager } from 'typeorm';
import type { Invitation as ApiInvitation, Member, Role } from '@sheaf/engine/api';
import { Membership } from '../entities/Membership';
import { ApiError, notFound } from '../http/ApiError';
import { recordAudit } from './audit';

interface MemberRow {
  id: string;
  email: string;
  name: string;
  role: Role;
  joined_at: Date;
}

function toMember(row: MemberRow): Member {
  return { user: { id: row.id, email: row.email, name: row.name }, role: row.role, joinedAt: row.joined_at.toISOString() };
}

const ROLE_ORDER = `CASE m.role WHEN 'owner' THEN 0 WHEN 'engineer' THEN 1 WHEN 'checker' THEN 2 ELSE 3 END`;

/** Members (owners first, then by name) and the invitations not yet accepted. */
export async function listMembers(dataSource: DataSource, organizationId: string): Promise<{ members: Member[]; invitations: ApiInvitation[] }> {
  const members: MemberRow[] = await dataSource.query(
    `SELECT u.id, u.email, u.name, m.role, m.created_at AS joined_at
       FROM memberships m JOIN users u ON u.id = m.user_id
      WHERE m.organization_id = $1
      ORDER BY ${ROLE_ORDER}, lower(u.name), u.id`,
    [organizationId],
  );
  const invitations: { id: string; email: string; role: Role; created_at: Date; expires_at: Date }[] = await dataSource.query(
    `SELECT id, email, role, created_at, expires_at FROM invitations
      WHERE organization_id = $1 AND accepted_at IS NULL
      ORDER BY created_at DESC, id`,
    [organizationId],
  );
  return {
    members: members.map(toMember),
    invitations: invitations.map((i) => ({
      id: i.id,
      email: i.email,
      role: i.role,
      createdAt: i.created_at.toISOString(),
      expiresAt: i.expires_at.toISOString(),
    })),
  };
}

async function memberRow(manager: EntityManager, organizationId: string, userId: string): Promise<MemberRow | undefined> {
  const rows: MemberRow[] = await manager.query(
    `SELECT u.id, u.email, u.name, m.role, m.created_at AS joined_at
       FROM memberships m JOIN users u ON u.id = m.user_id
      WHERE m.organization_id = $1 AND m.user_id = $2`,
    [organizationId, userId],
  );
  return rows[0];
}

/**
 * Locks the organization's owner rows and refuses when taking `userId` out of the owners would
 * leave none. The lock makes two owners demoting each other at once safe.
 */
async function assertOwnerRemains(manager: EntityManager, organizationId: string, userId: string): Promise<void> {
  const owners: { user_id: string }[] = await manager.query(
    `SELECT user_id FROM memberships WHERE organization_id = $1 AND role = 'owner' ORDER BY user_id FOR UPDATE`,
    [organizationId],
  );
  if (owners.length === 1 && owners[0]?.user_id === userId) {
    throw new ApiError(409, 'last-owner', 'an organization keeps at least one owner: make another member owner first');
  }
}

interface Actor {
  userId: string;
  ip?: string;
}

/** Changes a member's role; 409 `last-owner` when it would leave the organization without an owner. */
export async function changeMemberRole(
  dataSource: DataSource,
  organizationId: string,
  userId: string,
  role: Role,
  actor: Actor,
): Promise<Member> {
  return dataSource.transaction(async (manager) => {
    const before = await memberRow(manager, organizationId, userId);
    if (!before) throw notFound('member');
    if (before.role === 'owner' && role !== 'owner') await assertOwnerRemains(manager, organizationId, userId);
    if (before.role !== role) {
      await manager.update(Membership, { organizationId, userId }, { role });
      await recordAudit(manager, {
        action: 'member.role-changed',
        actorUserId: actor.userId,
        organizationId,
        subject: before.email,
        ip: actor.ip,
        details: { userId, from: before.role, to: role },
      });
    }
    return toMember({ ...before, role });
  });
}

/** Removes a member; 409 `last-owner` when it is the only owner. */
export async function removeMember(dataSource: DataSource, organizationId: string, userId: string, actor: Actor): Promise<void> {
  await dataSource.transaction(async (manager) => {
    const before = await memberRow(manager, organizationId, userId);
    if (!before) throw notFound('member');
    if (before.role === 'owner') await assertOwnerRemains(manager, organizationId, userId);
    await manager.delete(Membership, { organizationId, userId });
    await recordAudit(manager, {
      action: 'member.removed',
      actorUserId: actor.userId,
      organizationId,
      subject: before.email,
      ip: actor.ip,
      details: { userId, role: before.role },
    });
  });
}
