import { z } from 'zod';
import { DisplayName, EmailAddress, Id, Role, Timestamp, User } from './common';

export const Organization = z
  .object({ id: Id, name: z.string(), slug: z.string(), role: Role })
  .meta({ id: 'Organization', description: 'An organization as seen by one of its members (with that member\'s role)' });
export type Organization = z.infer<typeof Organization>;

export const OrganizationListResponse = z
  .object({ organizations: z.array(Organization) })
  .meta({ id: 'OrganizationListResponse' });
export type OrganizationListResponse = z.infer<typeof OrganizationListResponse>;

export const CreateOrganizationRequest = z.object({ name: DisplayName }).meta({ id: 'CreateOrganizationRequest' });
export type CreateOrganizationRequest = z.infer<typeof CreateOrganizationRequest>;

export const OrganizationResponse = z.object({ organization: Organization }).meta({ id: 'OrganizationResponse' });
export type OrganizationResponse = z.infer<typeof OrganizationResponse>;

export const Member = z.object({ user: User, role: Role, joinedAt: Timestamp }).meta({ id: 'Member' });
export type Member = z.infer<typeof Member>;

export const Invitation = z
  .object({ id: Id, email: EmailAddress, role: Role, createdAt: Timestamp, expiresAt: Timestamp })
  .meta({ id: 'Invitation' });
export type Invitation = z.infer<typeof Invitation>;

export const MemberListResponse = z
  .object({ members: z.array(Member), invitations: z.array(Invitation) })
  .meta({ id: 'MemberListResponse' });
export type MemberListResponse = z.infer<typeof MemberListResponse>;

export const CreateInvitationRequest = z
  .object({ email: EmailAddress, role: Role })
  .meta({ id: 'CreateInvitationRequest' });
export type CreateInvitationRequest = z.infer<typeof CreateInvitationRequest>;

export const InvitationResponse = z.object({ invitation: Invitation }).meta({ id: 'InvitationResponse' });
export type InvitationResponse = z.infer<typeof InvitationResponse>;

export const UpdateMemberRequest = z.object({ role: Role }).meta({ id: 'UpdateMemberRequest' });
export type UpdateMemberRequest = z.infer<typeof UpdateMemberRequest>;

export const MemberResponse = z.object({ member: Member }).meta({ id: 'MemberResponse' });
export type MemberResponse = z.infer<typeof MemberResponse>;

/** `GET /api/invitations/:token`: what the invitation page shows before anyone signs in. */
export const InvitationPreview = z
  .object({
    organization: z.object({ id: Id, name: z.string() }),
    email: EmailAddress,
    role: Role,
    expired: z.boolean(),
    accepted: z.boolean(),
  })
  .meta({ id: 'InvitationPreview' });
export type InvitationPreview = z.infer<typeof InvitationPreview>;

export const InvitationPreviewResponse = z
  .object({ invitation: InvitationPreview })
  .meta({ id: 'InvitationPreviewResponse' });
export type InvitationPreviewResponse = z.infer<typeof InvitationPreviewResponse>;

export const AcceptInvitationResponse = z
  .object({ organization: z.object({ id: Id, name: z.string(), slug: z.string() }), role: Role })
  .meta({ id: 'AcceptInvitationResponse' });
export type AcceptInvitationResponse = z.infer<typeof AcceptInvitationResponse>;
