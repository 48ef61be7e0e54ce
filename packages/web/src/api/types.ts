/**
 * Shapes of the Sheaf HTTP API, as the shared schemas in `@sheaf/engine/api` define them (the
 * server validates with the same schemas), plus the few views the web app derives from them.
 */
export type {
  Invitation as PendingInvitation,
  InvitationPreview,
  MemberListResponse as MembersResponse,
  Member,
  MeResponse,
  Membership,
  Organization as OrganizationWithRole,
  OrganizationRef,
  Project,
  Role,
  SheetDetail,
  SheetStatus,
  SheetSummary,
  SheetWithRoleResponse as SheetResponse,
  User,
  AcceptInvitationResponse,
  SheetContentV1 as SheetContent,
} from '@sheaf/engine/api';
export { ROLES, SHEET_STATUSES, MIN_PASSWORD_LENGTH, can } from '@sheaf/engine/api';

/** One cell of a sheet file (format v1) as the page lists it: `id`, `kind` and the kind's own fields. */
export interface SheetCell {
  id: string;
  kind: string;
  name?: unknown;
  [field: string]: unknown;
}

/** A person named in the title block (prepared / checked / approved) and when they signed. */
export interface Signatory {
  name: string;
  at?: string | null;
}
