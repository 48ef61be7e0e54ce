import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type {
  CreateMaterialRequest,
  ExportMaterialsResponse,
  ImportMaterialsResponse,
  LibraryMaterial,
  MaterialListResponse,
  UpdateMaterialRequest,
} from '@sheaf/engine/api';
import { apiRequest } from './client';

export const materialKeys = {
  ofOrganization: (organizationId: string) => ['organizations', organizationId, 'materials'] as const,
};

const base = (organizationId: string) => `/api/orgs/${encodeURIComponent(organizationId)}/materials`;

/** GET /api/orgs/:orgId/materials: built-in materials, then the organization's own. */
export function materialsQueryOptions(organizationId: string) {
  return queryOptions({
    queryKey: materialKeys.ofOrganization(organizationId),
    queryFn: ({ signal }) => apiRequest<MaterialListResponse>(base(organizationId), { signal }).then((r) => r.materials),
    // The library changes rarely; a picker on every criterion cell shares one request.
    staleTime: 60_000,
  });
}

function useInvalidateMaterials(organizationId: string) {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: materialKeys.ofOrganization(organizationId) });
}

export function useCreateMaterial(organizationId: string) {
  const invalidate = useInvalidateMaterials(organizationId);
  return useMutation({
    mutationFn: (input: CreateMaterialRequest) =>
      apiRequest<{ material: LibraryMaterial }>(base(organizationId), { method: 'POST', body: input }).then((r) => r.material),
    onSuccess: invalidate,
  });
}

export function useUpdateMaterial(organizationId: string) {
  const invalidate = useInvalidateMaterials(organizationId);
  return useMutation({
    mutationFn: ({ key, ...input }: UpdateMaterialRequest & { key: string }) =>
      apiRequest<{ material: LibraryMaterial }>(`${base(organizationId)}/${encodeURIComponent(key)}`, { method: 'PUT', body: input }).then(
        (r) => r.material,
      ),
    onSuccess: invalidate,
  });
}

export function useDeleteMaterial(organizationId: string) {
  const invalidate = useInvalidateMaterials(organizationId);
  return useMutation({
    mutationFn: (key: string) => apiRequest<void>(`${base(organizationId)}/${encodeURIComponent(key)}`, { method: 'DELETE' }),
    onSuccess: invalidate,
  });
}

/** POST .../materials/import with the CSV text; a bad row saves nothing (the error lists every bad row). */
export function useImportMaterials(organizationId: string) {
  const invalidate = useInvalidateMaterials(organizationId);
  return useMutation({
    mutationFn: (csv: string) => apiRequest<ImportMaterialsResponse>(`${base(organizationId)}/import`, { method: 'POST', body: { csv } }),
    onSuccess: invalidate,
  });
}

/** GET .../materials/export: the organization's own materials as CSV text. */
export function exportMaterials(organizationId: string): Promise<ExportMaterialsResponse> {
  return apiRequest<ExportMaterialsResponse>(`${base(organizationId)}/export`);
}
