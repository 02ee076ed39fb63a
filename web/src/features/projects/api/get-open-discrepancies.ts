import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

/** Every open discrepancy of a project (up to 500), grouped client-side for the chart. */
export async function getOpenDiscrepancies(projectId: number) {
  return unwrap(
    await api.GET('/api/projects/{projectId}/discrepancies', {
      params: {
        path: { projectId },
        query: { status: 'open' as unknown as string[], pageSize: 500, page: 1, sort: 'id', order: 'asc' },
      },
    }),
  );
}

export const getOpenDiscrepanciesQueryOptions = (projectId: number) =>
  queryOptions({
    queryKey: ['discrepancies', projectId, { status: 'open', all: true }],
    queryFn: () => getOpenDiscrepancies(projectId),
  });

export function useOpenDiscrepancies(projectId: number) {
  return useQuery(getOpenDiscrepanciesQueryOptions(projectId));
}
