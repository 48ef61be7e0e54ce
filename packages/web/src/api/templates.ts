import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  CreateTemplateRequest,
  NewTemplateVersionRequest,
  SheetFromTemplateRequest,
  SheetFromTemplateResponse,
  TemplateDetail,
  TemplateListResponse,
  TemplateResponse,
} from '@sheaf/engine/api';
import { apiRequest } from './client';
import { sheetKeys } from './sheets';

export interface TemplateFilter {
  q?: string;
  category?: string;
}

export const templateKeys = {
  all: ['templates'] as const,
  list: (organizationId: string, filter: TemplateFilter) => ['templates', organizationId, 'list', filter.q ?? '', filter.category ?? ''] as const,
  detail: (organizationId: string, templateId: string, version: number | undefined) =>
    ['templates', organizationId, 'detail', templateId, version ?? 'latest'] as const,
};

const base = (organizationId: string) => `/api/orgs/${encodeURIComponent(organizationId)}/templates`;

/** GET /api/orgs/:orgId/templates?q=&category=: built-in and organization templates, with every category. */
export function useTemplates(organizationId: string, filter: TemplateFilter) {
  return useQuery({
    queryKey: templateKeys.list(organizationId, filter),
    queryFn: ({ signal }) => {
      const params = new URLSearchParams();
      if (filter.q) params.set('q', filter.q);
      if (filter.category) params.set('category', filter.category);
      const query = params.size > 0 ? `?${params.toString()}` : '';
      return apiRequest<TemplateListResponse>(`${base(organizationId)}${query}`, { signal });
    },
    placeholderData: (previous) => previous,
  });
}

/** GET /api/orgs/:orgId/templates/:templateId?version=: a template at a version (the latest by default). */
export function templateQueryOptions(organizationId: string, templateId: string, version?: number) {
  return queryOptions({
    queryKey: templateKeys.detail(organizationId, templateId, version),
    queryFn: ({ signal }) =>
      apiRequest<TemplateResponse>(
        `${base(organizationId)}/${encodeURIComponent(templateId)}${version ? `?version=${version}` : ''}`,
        { signal },
      ).then((r) => r.template),
  });
}

export function useTemplate(organizationId: string, templateId: string, version?: number) {
  return useQuery(templateQueryOptions(organizationId, templateId, version));
}

/** POST /api/projects/:projectId/sheets/from-template. */
export function useCreateSheetFromTemplate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ projectId, ...input }: SheetFromTemplateRequest & { projectId: string }) =>
      apiRequest<SheetFromTemplateResponse>(`/api/projects/${encodeURIComponent(projectId)}/sheets/from-template`, {
        method: 'POST',
        body: input,
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sheetKeys.all }),
  });
}

/** POST /api/sheets/:sheetId/templates: the sheet's content as a new template. */
export function useSaveSheetAsTemplate(sheetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateTemplateRequest) =>
      apiRequest<TemplateResponse>(`/api/sheets/${encodeURIComponent(sheetId)}/templates`, { method: 'POST', body: input }).then(
        (r): TemplateDetail => r.template,
      ),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: templateKeys.all }),
  });
}

/** POST /api/orgs/:orgId/templates/:templateId/versions: a new version (older versions and their sheets stay). */
export function useSaveTemplateVersion(organizationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ templateId, ...input }: NewTemplateVersionRequest & { templateId: string }) =>
      apiRequest<TemplateResponse>(`${base(organizationId)}/${encodeURIComponent(templateId)}/versions`, { method: 'POST', body: input }).then(
        (r): TemplateDetail => r.template,
      ),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: templateKeys.all }),
  });
}

/** POST /api/sheets/:sheetId/templates/from-revision/:number: an approved revision's content as a new template. */
export function useSaveRevisionAsTemplate(sheetId: string, revisionNumber: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateTemplateRequest) =>
      apiRequest<TemplateResponse>(`/api/sheets/${encodeURIComponent(sheetId)}/templates/from-revision/${revisionNumber}`, {
        method: 'POST',
        body: input,
      }).then((r): TemplateDetail => r.template),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: templateKeys.all }),
  });
}
