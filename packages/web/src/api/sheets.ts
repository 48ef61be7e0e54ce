import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from './client';
import type { SheetContent, SheetDetail, SheetResponse, SheetStatus, SheetSummary } from './types';

export interface SheetFilter {
  q?: string;
  status?: SheetStatus;
}

export const sheetKeys = {
  all: ['sheets'] as const,
  ofOrganization: (organizationId: string, filter: SheetFilter) =>
    ['sheets', 'organization', organizationId, filter.q ?? '', filter.status ?? ''] as const,
  ofProject: (projectId: string) => ['sheets', 'project', projectId] as const,
  detail: (sheetId: string) => ['sheets', 'detail', sheetId] as const,
};

/** GET /api/orgs/:orgId/sheets?q=&status=: the organization's sheets, searched and filtered. */
export function useOrganizationSheets(organizationId: string, filter: SheetFilter) {
  return useQuery({
    queryKey: sheetKeys.ofOrganization(organizationId, filter),
    queryFn: ({ signal }) => {
      const params = new URLSearchParams();
      if (filter.q) params.set('q', filter.q);
      if (filter.status) params.set('status', filter.status);
      const query = params.size > 0 ? `?${params.toString()}` : '';
      return apiRequest<{ sheets: SheetSummary[] }>(
        `/api/orgs/${encodeURIComponent(organizationId)}/sheets${query}`,
        { signal },
      ).then((r) => r.sheets);
    },
    // Keep the old rows on screen while a new search runs, so the table does not flicker.
    placeholderData: (previous) => previous,
  });
}

export function useProjectSheets(projectId: string) {
  return useQuery({
    queryKey: sheetKeys.ofProject(projectId),
    queryFn: ({ signal }) =>
      apiRequest<{ sheets: SheetSummary[] }>(
        `/api/projects/${encodeURIComponent(projectId)}/sheets`,
        {
          signal,
        },
      ).then((r) => r.sheets),
  });
}

/** GET /api/sheets/:sheetId, as options for useQuery or a route loader's prefetch. */
export function sheetQueryOptions(sheetId: string) {
  return queryOptions({
    queryKey: sheetKeys.detail(sheetId),
    queryFn: ({ signal }) =>
      apiRequest<SheetResponse>(`/api/sheets/${encodeURIComponent(sheetId)}`, { signal }),
  });
}

/** GET /api/sheets/:sheetId. Errors are thrown to the route's error boundary: no sheet, no page. */
export function useSheet(sheetId: string) {
  return useQuery({ ...sheetQueryOptions(sheetId), throwOnError: true });
}

export interface NewSheetInput {
  title: string;
  content?: SheetContent;
}

export function useCreateSheet(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: NewSheetInput) =>
      apiRequest<{ sheet: SheetDetail }>(`/api/projects/${encodeURIComponent(projectId)}/sheets`, {
        method: 'POST',
        body: input,
      }).then((r) => r.sheet),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sheetKeys.all }),
  });
}

export function useUpdateSheet(sheetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { title?: string; projectId?: string }) =>
      apiRequest<unknown>(`/api/sheets/${encodeURIComponent(sheetId)}`, {
        method: 'PATCH',
        body: input,
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sheetKeys.all }),
  });
}

export function useDeleteSheet(sheetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () =>
      apiRequest<void>(`/api/sheets/${encodeURIComponent(sheetId)}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sheetKeys.all }),
  });
}
