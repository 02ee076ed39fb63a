import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

/**
 * Every discrepancy a submittal raised (one page of up to 500), for the member panels and the report:
 * with those a later revision carried on or resolved, since they are this submittal's record.
 */
export async function getSubmittalDiscrepancies(projectId: number, submittalId: number) {
  return unwrap(
    await api.GET('/api/projects/{projectId}/discrepancies', {
      params: {
        path: { projectId },
        query: { submittalId, pageSize: 500, page: 1, sort: 'id', order: 'asc', includeSuperseded: true },
      },
    }),
  );
}

export const getSubmittalDiscrepanciesQueryOptions = (projectId: number, submittalId: number) =>
  queryOptions({
    queryKey: ['discrepancies', projectId, { submittalId, all: true }],
    queryFn: () => getSubmittalDiscrepancies(projectId, submittalId),
  });

export function useSubmittalDiscrepancies(projectId: number | undefined, submittalId: number) {
  return useQuery({
    ...getSubmittalDiscrepanciesQueryOptions(projectId ?? 0, submittalId),
    enabled: projectId !== undefined,
  });
}
