import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export interface DiscrepancyFilters {
  readonly submittalId?: number;
  readonly class?: readonly string[];
  readonly severity?: readonly string[];
  readonly status?: readonly string[];
  readonly memberId?: string;
  readonly code?: string;
  /** Free text: message, member, file, code, name or pointer; "#12" finds discrepancy 12. */
  readonly q?: string;
  readonly assigneeId?: number;
  /** Also items a later revision carried on or resolved (by default only current ones). */
  readonly includeSuperseded?: boolean;
  readonly sort:
    | 'id'
    | 'createdAt'
    | 'updatedAt'
    | 'severity'
    | 'class'
    | 'status'
    | 'memberId'
    | 'code'
    | 'fileName'
    | 'submittalId'
    | 'dueDate';
  readonly order: 'asc' | 'desc';
  readonly page: number;
  readonly pageSize: number;
}

const csv = (values: readonly string[] | undefined) =>
  values && values.length > 0 ? values.join(',') : undefined;

/** The list's query string values, shared by the page and the CSV export. */
export function discrepancyQuery(filters: Omit<DiscrepancyFilters, 'page' | 'pageSize'>) {
  return {
    submittalId: filters.submittalId,
    // The API reads these as comma-separated lists.
    class: csv(filters.class) as unknown as string[] | undefined,
    severity: csv(filters.severity) as unknown as string[] | undefined,
    status: csv(filters.status) as unknown as string[] | undefined,
    memberId: filters.memberId || undefined,
    code: filters.code || undefined,
    q: filters.q?.trim() || undefined,
    assigneeId: filters.assigneeId,
    includeSuperseded: filters.includeSuperseded ? true : undefined,
    sort: filters.sort,
    order: filters.order,
  };
}

export async function getDiscrepancies(projectId: number, filters: DiscrepancyFilters) {
  return unwrap(
    await api.GET('/api/projects/{projectId}/discrepancies', {
      params: {
        path: { projectId },
        query: { ...discrepancyQuery(filters), page: filters.page, pageSize: filters.pageSize },
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
