import type { Role } from '../api/types';

/** What each role may do, in the words shown beside role pickers. */
export const ROLE_INFO: Record<Role, { label: string; duty: string }> = {
  owner: { label: 'Owner', duty: 'manages members and settings' },
  engineer: { label: 'Engineer', duty: 'creates and edits sheets' },
  checker: { label: 'Checker', duty: 'writes notes, returns or approves sheets' },
  viewer: { label: 'Viewer', duty: 'reads sheets' },
};
