import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError } from './ApiError';

/** Query metadata the web app understands. */
declare module '@tanstack/react-query' {
  interface Register {
    queryMeta: {
      /** false: a 401 from this query is an expected answer ("signed out"), not a lost session. */
      redirectOnUnauthorized?: boolean;
    };
    mutationMeta: {
      /** false: a 401 is part of this mutation's answer (wrong password), not a lost session. */
      redirectOnUnauthorized?: boolean;
    };
  }
}

export interface AppQueryClientOptions {
  /** Called when a request made on the user's behalf answers 401: the session has ended. */
  onUnauthorized?: () => void;
}

/** The query client of the web app: one retry for flaky networks, never for answers like 403. */
export function createAppQueryClient(options: AppQueryClientOptions = {}): QueryClient {
  const { onUnauthorized } = options;
  return new QueryClient({
    queryCache: new QueryCache({
      onError(error, query) {
        if (
          isApiError(error) &&
          error.isUnauthorized &&
          query.meta?.redirectOnUnauthorized !== false
        ) {
          onUnauthorized?.();
        }
      },
    }),
    mutationCache: new MutationCache({
      onError(error, _variables, _context, mutation) {
        if (
          isApiError(error) &&
          error.isUnauthorized &&
          mutation.meta?.redirectOnUnauthorized !== false
        ) {
          onUnauthorized?.();
        }
      },
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        retry: (failureCount, error) => {
          if (isApiError(error) && error.status !== 0 && error.status < 500) return false;
          return failureCount < 1;
        },
      },
      mutations: { retry: false },
    },
  });
}
