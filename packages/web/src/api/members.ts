import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from './client';
import type { MembersResponse, PendingInvitation, Role } from './types';

export const memberKeys = {
  ofOrganization: (organizationId: string) => ['organizations', organizationId, 'members'] as const,
};

export function useMembers(organizationId: string) {
  return useQuery({
    queryKey: memberKeys.ofOrganization(organizationId),
    queryFn: ({ signal }) =>
      apiRequest<MembersResponse>(`/api/orgs/${enc(organizationId)}/members`, { signal }),
  });
}

export function useInviteMember(organizationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { email: string; role: Role }) =>
      apiRequest<{ invitation: PendingInvitation }>(
        `/api/orgs/${enc(organizationId)}/invitations`,
        {
          method: 'POST',
          body: input,
        },
      ).then((r) => r.invitation),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: memberKeys.ofOrganization(organizationId) }),
  });
}

/**
 * Changes a member's role, showing the new role at once and putting the old one back if the
 * server refuses (the last owner, say).
 */
export function useChangeMemberRole(organizationId: string) {
  const queryClient = useQueryClient();
  const key = memberKeys.ofOrganization(organizationId);
  return useMutation({
    mutationFn: (input: { userId: string; role: Role }) =>
      apiRequest<unknown>(`/api/orgs/${enc(organizationId)}/members/${enc(input.userId)}`, {
        method: 'PATCH',
        body: { role: input.role },
      }),
    onMutate: async (input) => {
      await queryClient.cancelQueries({ queryKey: key });
      const previous = queryClient.getQueryData<MembersResponse>(key);
      queryClient.setQueryData<MembersResponse>(key, (old) =>
        old
          ? {
              ...old,
              members: old.members.map((m) =>
                m.user.id === input.userId ? { ...m, role: input.role } : m,
              ),
            }
          : old,
      );
      return { previous };
    },
    onError: (_error, _input, context) => {
      if (context?.previous) queryClient.setQueryData(key, context.previous);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: key }),
  });
}

export function useRemoveMember(organizationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { userId: string }) =>
      apiRequest<void>(`/api/orgs/${enc(organizationId)}/members/${enc(input.userId)}`, {
        method: 'DELETE',
      }),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: memberKeys.ofOrganization(organizationId) }),
  });
}

const enc = encodeURIComponent;
