import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { authKeys } from './auth';
import { apiRequest } from './client';
import type { OrganizationRef, OrganizationWithRole } from './types';

export const organizationKeys = {
  all: ['organizations'] as const,
};

export function useOrganizations() {
  return useQuery({
    queryKey: organizationKeys.all,
    queryFn: ({ signal }) =>
      apiRequest<{ organizations: OrganizationWithRole[] }>('/api/orgs', { signal }).then(
        (r) => r.organizations,
      ),
  });
}

export function useCreateOrganization() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { name: string }) =>
      apiRequest<{ organization: OrganizationRef }>('/api/orgs', {
        method: 'POST',
        body: input,
      }).then((r) => r.organization),
    onSuccess: async () => {
      // Memberships live on /api/auth/me; the switcher reads them from there.
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: authKeys.me }),
        queryClient.invalidateQueries({ queryKey: organizationKeys.all }),
      ]);
    },
  });
}
