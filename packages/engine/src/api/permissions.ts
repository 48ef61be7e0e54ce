import type { Role } from './common';

/**
 * The one permission table of Sheaf: which role may take which action in an organization.
 * The server decides every API route and every websocket connection with it; the web app uses
 * the same table only to hide controls a member cannot use (the server still decides).
 *
 * - owner: everything, including members and settings, and reassigning a sheet's checker
 * - engineer: create and edit projects and sheets, submit them for check, write and answer notes
 * - checker: read, write and resolve notes, return or approve (never their own sheet: checked per
 *   sheet, as is "only the checker the sheet was submitted to")
 * - viewer: read, revisions included
 *
 * Every member reads templates and the materials library (`template.read`, `material.read`);
 * owners and engineers save templates and add or edit the organization's materials
 * (`template.write`, `material.write`).
 *
 * `sheet.check` is what makes a member eligible to be named as a sheet's checker.
 */
export const ACTIONS = [
  'org.read',
  'org.manageMembers',
  'project.read',
  'project.create',
  'sheet.read',
  'sheet.create',
  'sheet.edit',
  'sheet.delete',
  'sheet.submit',
  'sheet.check',
  'sheet.return',
  'sheet.approve',
  'sheet.reassignChecker',
  'note.create',
  'note.resolve',
  'revision.read',
  'template.read',
  'template.write',
  'material.read',
  'material.write',
] as const;
export type Action = (typeof ACTIONS)[number];

const READ: readonly Action[] = ['org.read', 'project.read', 'sheet.read', 'revision.read', 'template.read', 'material.read'];

export const PERMISSIONS: Readonly<Record<Role, readonly Action[]>> = {
  owner: ACTIONS,
  engineer: [...READ, 'project.create', 'sheet.create', 'sheet.edit', 'sheet.delete', 'sheet.submit', 'note.create', 'template.write', 'material.write'],
  checker: [...READ, 'note.create', 'note.resolve', 'sheet.check', 'sheet.return', 'sheet.approve'],
  viewer: READ,
};

/** True when `role` may take `action`. */
export function can(role: Role, action: Action): boolean {
  return PERMISSIONS[role].includes(action);
}

/** True when a member with this role may change a sheet's live content (a read-only connection otherwise). */
export function canEditSheet(role: Role): boolean {
  return can(role, 'sheet.edit');
}
