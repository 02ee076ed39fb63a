import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getProjectSubmittals(projectId: number) {
  return unwrap(await api.GET('/api/projects/{projectId}/submittals', { params: { path: { projectId } } }));
}

/** The project's submittals (the same list and cache key as the project overview). */
export const getProjectSubmittalsQueryOptions = (projectId: number) =>
  queryOptions({
    queryKey: ['projects', projectId, 'submittals'],
    queryFn: () => getProjectSubmittals(projectId),
  });

/**
 * The submittals an answer may link as its revision: those uploaded as a revision of the
 * discrepancy's submittal (the API refuses any other), newest first.
 */
export function useRevisionCandidates(projectId: number, submittalId: number, enabled: boolean) {
  return useQuery({
    ...getProjectSubmittalsQueryOptions(projectId),
    enabled,
    select: (submittals) =>
      submittals
        .filter((s) => s.revisionOfId === submittalId)
        .sort((a, b) => b.createdAt.localeCompare(a.createdAt)),
  });
}

/** The project's submittals, newest first (the list's submittal filter and column). */
export function useProjectSubmittals(projectId: number | undefined) {
  return useQuery({ ...getProjectSubmittalsQueryOptions(projectId ?? 0), enabled: projectId !== undefined });
}
