import { z } from 'zod';
import {
  AcceptInvitationResponse,
  CreateInvitationRequest,
  CreateOrganizationRequest,
  Id,
  InvitationPreviewResponse,
  InvitationResponse,
  MemberListResponse,
  MemberResponse,
  OrganizationListResponse,
  OrganizationResponse,
  UpdateMemberRequest,
} from '@sheaf/engine/api';
import { organizationFromParams } from '../auth/permissions';
import { acceptInvitation, inviteByEmail, previewInvitation } from '../services/invitations';
import { changeMemberRole, listMembers, removeMember } from '../services/members';
import { createOrganization, membershipsOf } from '../services/organizations';
import { created, defineRoute, noContent, ok, type Route } from './defineRoute';

const OrgParams = z.object({ orgId: Id });
const MemberParams = z.object({ orgId: Id, userId: Id });
const TokenParams = z.object({ token: z.string().min(1).max(200) });

function grantOf(access: { organizationId: string } | undefined): string {
  if (!access) throw new Error('permission route without an access grant');
  return access.organizationId;
}

/** Organizations, their members, and invitations. */
export function organizationRoutes(): Route[] {
  return [
    defineRoute({
      id: 'orgs.list',
      method: 'get',
      path: '/api/orgs',
      summary: "The signed-in user's organizations with their role in each",
      tag: 'organizations',
      access: { kind: 'signed-in' },
      response: { status: 200, description: 'Organizations by name', schema: OrganizationListResponse },
      handler: async ({ deps, user }) => {
        const memberships = await membershipsOf(deps.dataSource, (user as Express.User).id);
        return ok({ organizations: memberships.map((m) => ({ ...m.organization, role: m.role })) });
      },
    }),
    defineRoute({
      id: 'orgs.create',
      method: 'post',
      path: '/api/orgs',
      summary: 'Create an organization; the creator becomes its owner',
      tag: 'organizations',
      access: { kind: 'signed-in' },
      body: CreateOrganizationRequest,
      response: { status: 201, description: 'The new organization', schema: OrganizationResponse },
      handler: async ({ req, deps, user, body }) => {
        const organization = await createOrganization(deps.dataSource, body.name, (user as Express.User).id, req.ip);
        return created({ organization });
      },
    }),
    defineRoute({
      id: 'members.list',
      method: 'get',
      path: '/api/orgs/:orgId/members',
      summary: 'Members and open invitations of an organization',
      tag: 'members',
      access: { kind: 'permission', action: 'org.read', resolve: organizationFromParams },
      params: OrgParams,
      response: { status: 200, description: 'Members (owners first) and invitations not yet accepted', schema: MemberListResponse },
      handler: async ({ deps, access }) => ok(await listMembers(deps.dataSource, grantOf(access))),
    }),
    defineRoute({
      id: 'invitations.create',
      method: 'post',
      path: '/api/orgs/:orgId/invitations',
      summary: 'Invite an e-mail address with a role; mails a one-time link valid for 7 days',
      tag: 'members',
      access: { kind: 'permission', action: 'org.manageMembers', resolve: organizationFromParams },
      params: OrgParams,
      body: CreateInvitationRequest,
      response: { status: 201, description: 'The invitation (the link goes only by mail)', schema: InvitationResponse },
      errors: [409, 502],
      handler: async ({ req, deps, user, access, body }) => {
        const inviter = user as Express.User;
        const invitation = await inviteByEmail(deps.dataSource, deps.mailer, deps.urls.publicUrl, {
          organizationId: grantOf(access),
          email: body.email,
          role: body.role,
          inviter: { id: inviter.id, name: inviter.name },
          ip: req.ip,
        });
        return created({ invitation });
      },
    }),
    defineRoute({
      id: 'members.update',
      method: 'patch',
      path: '/api/orgs/:orgId/members/:userId',
      summary: "Change a member's role (an organization always keeps one owner)",
      tag: 'members',
      access: { kind: 'permission', action: 'org.manageMembers', resolve: organizationFromParams },
      params: MemberParams,
      body: UpdateMemberRequest,
      response: { status: 200, description: 'The member with the new role', schema: MemberResponse },
      errors: [409],
      handler: async ({ req, deps, user, access, params, body }) => {
        const member = await changeMemberRole(deps.dataSource, grantOf(access), params.userId, body.role, {
          userId: (user as Express.User).id,
          ip: req.ip,
        });
        return ok({ member });
      },
    }),
    defineRoute({
      id: 'members.remove',
      method: 'delete',
      path: '/api/orgs/:orgId/members/:userId',
      summary: 'Remove a member (never the last owner)',
      tag: 'members',
      access: { kind: 'permission', action: 'org.manageMembers', resolve: organizationFromParams },
      params: MemberParams,
      response: { status: 204, description: 'Removed' },
      errors: [409],
      handler: async ({ req, deps, user, access, params }) => {
        await removeMember(deps.dataSource, grantOf(access), params.userId, { userId: (user as Express.User).id, ip: req.ip });
        return noContent();
      },
    }),
    defineRoute({
      id: 'invitations.preview',
      method: 'get',
      path: '/api/invitations/:token',
      summary: 'What an invitation link offers (no sign-in needed)',
      tag: 'members',
      access: { kind: 'public' },
      params: TokenParams,
      response: { status: 200, description: 'The organization, address and role, and whether it is still usable', schema: InvitationPreviewResponse },
      handler: async ({ deps, params }) => ok({ invitation: await previewInvitation(deps.dataSource, params.token) }),
    }),
    defineRoute({
      id: 'invitations.accept',
      method: 'post',
      path: '/api/invitations/:token/accept',
      summary: 'Accept an invitation as the signed-in user (whose e-mail must be the invited one)',
      tag: 'members',
      access: { kind: 'signed-in' },
      params: TokenParams,
      response: { status: 200, description: 'Now a member with the invited role', schema: AcceptInvitationResponse },
      errors: [403, 404, 409, 410],
      handler: async ({ req, deps, user, params }) =>
        ok(await acceptInvitation(deps.dataSource, params.token, user as Express.User, req.ip)),
    }),
  ];
}
