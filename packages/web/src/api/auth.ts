import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiRequest, forgetCsrfToken } from './client';
import type { MeResponse, User } from './types';

export const authKeys = {
  me: ['auth', 'me'] as const,
};

/** GET /api/auth/me: the signed-in user and their memberships; a 401 means "signed out". */
export function meQueryOptions() {
  return queryOptions({
    queryKey: authKeys.me,
    queryFn: ({ signal }) => apiRequest<MeResponse>('/api/auth/me', { signal }),
    staleTime: 60_000,
    meta: { redirectOnUnauthorized: false },
  });
}

export function useMe() {
  return useQuery(meQueryOptions());
}

export interface SignInInput {
  email: string;
  password: string;
}

export interface SignUpInput extends SignInInput {
  name: string;
}

/** The session changed: drop the old CSRF token and everything cached for the previous user. */
function useSessionChanged() {
  const queryClient = useQueryClient();
  return () => {
    forgetCsrfToken();
    queryClient.removeQueries();
  };
}

export function useSignIn() {
  const sessionChanged = useSessionChanged();
  return useMutation({
    mutationFn: (input: SignInInput) =>
      apiRequest<{ user: User }>('/api/auth/signin', { method: 'POST', body: input }),
    meta: { redirectOnUnauthorized: false },
    onSuccess: sessionChanged,
  });
}

export function useSignUp() {
  const sessionChanged = useSessionChanged();
  return useMutation({
    mutationFn: (input: SignUpInput) =>
      apiRequest<{ user: User }>('/api/auth/signup', { method: 'POST', body: input }),
    meta: { redirectOnUnauthorized: false },
    onSuccess: sessionChanged,
  });
}

export function useSignOut() {
  const sessionChanged = useSessionChanged();
  return useMutation({
    mutationFn: () => apiRequest<void>('/api/auth/signout', { method: 'POST' }),
    onSuccess: sessionChanged,
  });
}

export function useUpdateProfile() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { name: string }) =>
      apiRequest<{ user: User }>('/api/auth/me', { method: 'PATCH', body: input }),
    onSuccess: ({ user }) => {
      queryClient.setQueryData<MeResponse>(authKeys.me, (old) => (old ? { ...old, user } : old));
    },
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (input: { email: string }) =>
      apiRequest<void>('/api/auth/reset/request', { method: 'POST', body: input }),
    meta: { redirectOnUnauthorized: false },
  });
}

export function useConfirmPasswordReset() {
  return useMutation({
    mutationFn: (input: { token: string; password: string }) =>
      apiRequest<void>('/api/auth/reset/confirm', { method: 'POST', body: input }),
    meta: { redirectOnUnauthorized: false },
  });
}
