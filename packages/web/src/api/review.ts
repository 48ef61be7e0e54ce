import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type {
  ApproveSheetResponse,
  ReviewState,
  ReviewStateResponse,
} from '@sheaf/engine/api';
import { apiRequest } from './client';
import { sheetKeys } from './sheets';

/** Query keys of the check workflow: the state, notes, revisions and history of one sheet. */
export const reviewKeys = {
  ofSheet: (sheetId: string) => ['review', sheetId] as const,
  state: (sheetId: string) => ['review', sheetId, 'state'] as const,
  notes: (sheetId: string, revision?: number) => ['review', sheetId, 'notes', revision ?? 'all'] as const,
  revisions: (sheetId: string) => ['review', sheetId, 'revisions'] as const,
  revision: (sheetId: string, number: number) => ['review', sheetId, 'revisions', number] as const,
  diff: (sheetId: string, from: number, to: number | 'current') => ['review', sheetId, 'diff', from, to] as const,
  history: (sheetId: string) => ['review', sheetId, 'history'] as const,
};

const enc = encodeURIComponent;

/**
 * GET /api/sheets/:sheetId/review: status, preparer, checker, signatures and what you may do.
 * Polled while the page is open, so a submission, return or approval made by someone else shows
 * within a quarter of a minute.
 */
export function useReviewState(sheetId: string) {
  return useQuery({
    queryKey: reviewKeys.state(sheetId),
    queryFn: ({ signal }) =>
      apiRequest<ReviewStateResponse>(`/api/sheets/${enc(sheetId)}/review`, { signal }).then((r) => r.review),
    refetchInterval: 15_000,
  });
}

/**
 * After a transition everything about the sheet may have changed: its status (the sheet itself,
 * lists), its workflow state, notes, revisions and history.
 */
async function afterTransition(queryClient: QueryClient, sheetId: string, review?: ReviewState) {
  if (review) queryClient.setQueryData(reviewKeys.state(sheetId), review);
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: reviewKeys.ofSheet(sheetId) }),
    queryClient.invalidateQueries({ queryKey: sheetKeys.all }),
  ]);
}

function useTransition<Input>(sheetId: string, path: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Input) =>
      apiRequest<ReviewStateResponse>(`/api/sheets/${enc(sheetId)}/${path}`, { method: 'POST', body: input }).then(
        (r) => r.review,
      ),
    onSuccess: (review) => afterTransition(queryClient, sheetId, review),
  });
}

/** POST /api/sheets/:sheetId/submit. */
export function useSubmitForCheck(sheetId: string) {
  return useTransition<{ checkerUserId: string; message?: string }>(sheetId, 'submit');
}

/** POST /api/sheets/:sheetId/return. */
export function useReturnSheet(sheetId: string) {
  return useTransition<{ message: string }>(sheetId, 'return');
}

/** POST /api/sheets/:sheetId/checker (owners). */
export function useReassignChecker(sheetId: string) {
  return useTransition<{ checkerUserId: string }>(sheetId, 'checker');
}

/** POST /api/sheets/:sheetId/approve: issues the next revision (results computed by the server). */
export function useApproveSheet(sheetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { overrideReason?: string }) =>
      apiRequest<ApproveSheetResponse>(`/api/sheets/${enc(sheetId)}/approve`, { method: 'POST', body: input }),
    onSuccess: (answer) => afterTransition(queryClient, sheetId, answer.review),
  });
}
