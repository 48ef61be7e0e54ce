import { useQueries } from '@tanstack/react-query';
import { projectsQueryOptions } from '../api/projects';
import type { Membership } from '../api/types';
import { useCurrentOrganization } from './useCurrentOrganization';

/**
 * The membership whose organization holds `projectId`, found among the project lists of the
 * user's organizations (the same cached lists the Projects page uses). A sheet opened from a
 * link may belong to an organization other than the one chosen in the switcher.
 * Undefined while the lists still load; null when none of the user's organizations holds it.
 */
export function useProjectOrganization(
  projectId: string | undefined,
): Membership | null | undefined {
  const { memberships } = useCurrentOrganization();
  const lists = useQueries({
    queries: memberships.map((m) => ({
      ...projectsQueryOptions(m.organization.id),
      enabled: projectId !== undefined,
    })),
  });
  if (projectId === undefined) return undefined;
  const index = lists.findIndex((list) => list.data?.some((p) => p.id === projectId));
  if (index >= 0) return memberships[index];
  return lists.some((list) => list.isPending) ? undefined : null;
}
