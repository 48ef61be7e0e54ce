import type { DataSource } from 'typeorm';
import type { AcceptInvitationResponse, Invitation as ApiInvitation, InvitationPreview, Role } from '@sheaf/engine/api';
import { Invitation } from '../entities/Invitation';
import { Membership } from '../entities/Membership';
import { Organization } from '../entities/Organization';
import { ApiError, conflict, forbidden, notFound } from '../http/ApiError';
import type { Mailer } from '../mail/mailer';
import { invitationMail } from '../mail/messages';
import { normalizeEmail } from './accounts';
import { recordAudit } from './audit';
import { hashToken, newToken } from './tokens';

export const INVITATION_VALID_DAYS = 7;

function toApi(invitation: Invitation): ApiInvitation {
  return {
    id: invitation.id,
    email: invitation.email,
    role: invitation.role,
    createdAt: invitation.createdAt.toISOString(),
    expiresAt: invitation.expiresAt.toISOString(),
  };
}

/**
 * Invites an address to the organization with a role and mails the one-time link. An earlier
 * open invitation to the same address is replaced; a current member cannot be invited (409).
 * When the mail cannot be sent, the invitation is withdrawn and the error reported.
 */
export async function inviteByEmail(
  dataSource: DataSource,
  mailer: Mailer,
  publicUrl: string,
  input: { organizationId: string; email: string; role: Role; inviter: { id: string; name: string }; ip?: string },
): Promise<ApiInvitation> {
  const email = normalizeEmail(input.email);
  const { token, tokenHash } = newToken();
  const { invitation, organization } = await dataSource.transaction(async (manager) => {
    const organization = await manager.findOneByOrFail(Organization, { id: input.organizationId });
    const existing: unknown[] = await manager.query(
      `SELECT 1 FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.organization_id = $1 AND u.email = $2`,
      [input.organizationId, email],
    );
    if (existing.length > 0) throw conflict(`email: ${email} is already a member of ${organization.name}`);
    await manager.query(`DELETE FROM invitations WHERE organization_id = $1 AND email = $2 AND accepted_at IS NULL`, [
      input.organizationId,
      email,
    ]);
    const inserted = await manager.insert(Invitation, {
      organizationId: input.organizationId,
      email,
      role: input.role,
      tokenHash,
      invitedByUserId: input.inviter.id,
      expiresAt: new Date(Date.now() + INVITATION_VALID_DAYS * 24 * 3600_000),
    });
    const invitation = await manager.findOneByOrFail(Invitation, { id: inserted.identifiers[0]?.id as string });
    await recordAudit(manager, {
      action: 'invitation.sent',
      actorUserId: input.inviter.id,
      organizationId: input.organizationId,
      subject: email,
      ip: input.ip,
      details: { role: input.role, invitationId: invitation.id },
    });
    return { invitation, organization };
  });

  try {
    await mailer.send(
      invitationMail({
        to: email,
        organizationName: organization.name,
        inviterName: input.inviter.name,
        role: input.role,
        link: `${publicUrl}/invite/${token}`,
        expiresAt: invitation.expiresAt,
      }),
    );
  } catch (error) {
    await dataSource.getRepository(Invitation).delete({ id: invitation.id });
    throw new ApiError(502, 'internal', `the invitation e-mail to ${email} could not be sent; try again later`, { cause: error });
  }
  return toApi(invitation);
}

async function findByToken(dataSource: DataSource, token: string): Promise<Invitation | null> {
  return dataSource.getRepository(Invitation).findOneBy({ tokenHash: hashToken(token) });
}

/** What an invitation link shows before anyone signs in; 404 for an unknown token. */
export async function previewInvitation(dataSource: DataSource, token: string): Promise<InvitationPreview> {
  const invitation = await findByToken(dataSource, token);
  if (!invitation) throw notFound('invitation');
  const organization = await dataSource.getRepository(Organization).findOneByOrFail({ id: invitation.organizationId });
  return {
    organization: { id: organization.id, name: organization.name },
    email: invitation.email,
    role: invitation.role,
    expired: invitation.expiresAt.getTime() <= Date.now(),
    accepted: invitation.acceptedAt !== null,
  };
}

/**
 * Accepts an invitation for the signed-in user: 409 when already used (or already a member),
 * 410 when expired, 403 when it was sent to another address. Proves the user's address.
 */
export async function acceptInvitation(
  dataSource: DataSource,
  token: string,
  user: { id: string; email: string },
  ip?: string,
): Promise<AcceptInvitationResponse> {
  return dataSource.transaction(async (manager) => {
    const invitation = await manager.findOne(Invitation, {
      where: { tokenHash: hashToken(token) },
      lock: { mode: 'pessimistic_write' },
    });
    if (!invitation) throw notFound('invitation');
    if (invitation.acceptedAt) throw conflict('this invitation has already been used');
    if (invitation.expiresAt.getTime() <= Date.now()) {
      throw new ApiError(410, 'expired', 'this invitation has expired; ask an owner of the organization for a new one');
    }
    if (normalizeEmail(user.email) !== invitation.email) {
      throw forbidden(`this invitation was sent to ${invitation.email}; sign in with that address to accept it`);
    }
    const organization = await manager.findOneByOrFail(Organization, { id: invitation.organizationId });
    const already = await manager.findOneBy(Membership, { organizationId: organization.id, userId: user.id });
    if (already) throw conflict(`you are already a member of ${organization.name} (as ${already.role})`);

    await manager.insert(Membership, { organizationId: organization.id, userId: user.id, role: invitation.role });
    await manager.update(Invitation, { id: invitation.id }, { acceptedAt: new Date(), acceptedByUserId: user.id });
    await manager.query(`UPDATE users SET email_verified_at = now() WHERE id = $1 AND email_verified_at IS NULL`, [user.id]);
    await recordAudit(manager, {
      action: 'invitation.accepted',
      actorUserId: user.id,
      organizationId: organization.id,
      subject: invitation.email,
      ip,
      details: { role: invitation.role, invitationId: invitation.id },
    });
    return { organization: { id: organization.id, name: organization.name, slug: organization.slug }, role: invitation.role };
  });
}

