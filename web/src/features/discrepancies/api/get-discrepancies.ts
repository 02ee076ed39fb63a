import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export interface DiscrepancyFilters {
  readonly submittalId?: number;
  readonly class?: readonly string[];
  readonly severity?: readonly string[];
  readonly status?: readonly string[];
  readonly memberId?: string;
  readonly code?: string;
  readonly sort:
    'id' | 'createdAt' | 'updatedAt' | 'severity' | 'class' | 'status' | 'memberId' | 'code' | 'fileName';
  readonly order: 'asc' | 'desc';
  readonly page: number;
  readonly pageSize: number;
}

const csv = (values: readonly string[] | undefined) =>
  values && values.length > 0 ? values.join(',') : undefined;

export async function getDiscrepancies(projectId: number, filters: DiscrepancyFilters) {
  return unwrap(
    await api.GET('/api/projects/{projectId}/discrepancies', {
      params: {
        path: { projectId },
        query: {
          submittalId: filters.submittalId,
          // The API reads these as comma-separated lists.
          class: csv(filters.class) as unknown as string[] | undefined,
          severity: csv(filters.severity) as unknown as string[] | undefined,
          status: csv(filters.status) as unknown as string[] | undefined,
          memberId: filters.memberId || undefined,
          code: filters.code || undefined,
          sort: filters.sort,
          order: filters.order,
          page: filters.page,
          pageSize: filters.pageSize,
        },
      },
    }),
  );
}

export const getDiscrepanciesQueryOptions = (projectId: number, filters: DiscrepancyFilters) =>
  queryOptions({
    queryKey: ['discrepancies', projectId, filters],
    queryFn: () => getDiscrepancies(projectId, filters),
    placeholderData: keepPreviousData,
  });

export function useDiscrepancies(projectId: number | undefined, filters: DiscrepancyFilters) {
  return useQuery({
    ...getDiscrepanciesQueryOptions(projectId ?? 0, filters),
    enabled: projectId !== undefined,
  });
}
