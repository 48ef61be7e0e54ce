import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from './client';
import type { Project } from './types';

export const projectKeys = {
  ofOrganization: (organizationId: string) =>
    ['organizations', organizationId, 'projects'] as const,
};

/** GET /api/orgs/:orgId/projects, as options for useQuery or useQueries. */
export function projectsQueryOptions(organizationId: string) {
  return queryOptions({
    queryKey: projectKeys.ofOrganization(organizationId),
    queryFn: ({ signal }) =>
      apiRequest<{ projects: Project[] }>(
        `/api/orgs/${encodeURIComponent(organizationId)}/projects`,
        {
          signal,
        },
      ).then((r) => r.projects),
  });
}

export function useProjects(organizationId: string) {
  return useQuery(projectsQueryOptions(organizationId));
}

export interface NewProjectInput {
  name: string;
  code?: string;
}

export function useCreateProject(organizationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: NewProjectInput) =>
      apiRequest<{ project: Project }>(`/api/orgs/${encodeURIComponent(organizationId)}/projects`, {
        method: 'POST',
        body: input,
      }).then((r) => r.project),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: projectKeys.ofOrganization(organizationId) }),
  });
}
