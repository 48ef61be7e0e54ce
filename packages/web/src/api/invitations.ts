import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { authKeys } from './auth';
import { apiRequest } from './client';
import type { InvitationPreview, OrganizationRef, Role } from './types';

export const invitationKeys = {
  byToken: (token: string) => ['invitations', token] as const,
};

/** GET /api/invitations/:token: who invites whom, with which role; readable while signed out. */
export function useInvitation(token: string) {
  return useQuery({
    queryKey: invitationKeys.byToken(token),
    queryFn: ({ signal }) =>
      apiRequest<{ invitation: InvitationPreview }>(
        `/api/invitations/${encodeURIComponent(token)}`,
        { signal },
      ).then((r) => r.invitation),
    meta: { redirectOnUnauthorized: false },
  });
}

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () =>
      apiRequest<{ organization: OrganizationRef; role: Role }>(
        `/api/invitations/${encodeURIComponent(token)}/accept`,
        { method: 'POST' },
      ),
    onSuccess: async () => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: authKeys.me }),
        queryClient.invalidateQueries({ queryKey: invitationKeys.byToken(token) }),
      ]);
    },
  });
}
