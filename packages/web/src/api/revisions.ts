import { useQuery } from '@tanstack/react-query';
import type {
  RevisionDiffResponse,
  RevisionListResponse,
  RevisionResponse,
  SheetHistoryResponse,
} from '@sheaf/engine/api';
import { apiRequest } from './client';
import { reviewKeys } from './review';

const enc = encodeURIComponent;

/** GET /api/sheets/:sheetId/revisions: issued revisions, newest first. */
export function useRevisions(sheetId: string) {
  return useQuery({
    queryKey: reviewKeys.revisions(sheetId),
    queryFn: ({ signal }) =>
      apiRequest<RevisionListResponse>(`/api/sheets/${enc(sheetId)}/revisions`, { signal }).then((r) => r.revisions),
  });
}

/** GET /api/sheets/:sheetId/revisions/:number. An issued revision never changes: cached for good. */
export function useRevision(sheetId: string, number: number) {
  return useQuery({
    queryKey: reviewKeys.revision(sheetId, number),
    queryFn: ({ signal }) =>
      apiRequest<RevisionResponse>(`/api/sheets/${enc(sheetId)}/revisions/${number}`, { signal }).then(
        (r) => r.revision,
      ),
    staleTime: Infinity,
    throwOnError: true,
  });
}

/** GET /api/sheets/:sheetId/diff?from=&to= (to may be 'current': the sheet as it is now). */
export function useRevisionDiff(sheetId: string, from: number | null, to: number | 'current' | null) {
  return useQuery({
    queryKey: reviewKeys.diff(sheetId, from ?? 0, to ?? 'current'),
    queryFn: ({ signal }) =>
      apiRequest<RevisionDiffResponse>(`/api/sheets/${enc(sheetId)}/diff?from=${from}&to=${to}`, { signal }),
    enabled: from !== null && to !== null,
    // Between two issued revisions the answer never changes.
    staleTime: to === 'current' ? 0 : Infinity,
  });
}

/** GET /api/sheets/:sheetId/history. */
export function useSheetHistory(sheetId: string) {
  return useQuery({
    queryKey: reviewKeys.history(sheetId),
    queryFn: ({ signal }) => apiRequest<SheetHistoryResponse>(`/api/sheets/${enc(sheetId)}/history`, { signal }),
  });
}
