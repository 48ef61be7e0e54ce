import { useQuery } from '@tanstack/react-query';
import { materialsQueryOptions } from '../../api/materials';

/**
 * The materials library of an organization (built-ins first, then its own), each value with its
 * basis and published source. One cached request however many pickers use it.
 */
export function useMaterials(organizationId: string) {
  return useQuery({ ...materialsQueryOptions(organizationId), enabled: organizationId !== '' });
}
