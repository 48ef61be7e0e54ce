import { useMe } from '../api/auth';
import type { Membership } from '../api/types';
import { useLocalStorageState } from './useLocalStorageState';

export const CURRENT_ORGANIZATION_KEY = 'sheaf.organizationId';

export interface CurrentOrganization {
  /** The organization the user is working in, or null when they belong to none. */
  membership: Membership | null;
  memberships: Membership[];
  select: (organizationId: string) => void;
}

/**
 * The organization chosen in the switcher: remembered in localStorage, and the first membership
 * when nothing (or an organization the user has since left) is remembered.
 */
export function useCurrentOrganization(): CurrentOrganization {
  const me = useMe();
  const [storedId, setStoredId] = useLocalStorageState(CURRENT_ORGANIZATION_KEY);
  const memberships = me.data?.memberships ?? [];
  const membership =
    memberships.find((m) => m.organization.id === storedId) ?? memberships[0] ?? null;
  return { membership, memberships, select: setStoredId };
}
