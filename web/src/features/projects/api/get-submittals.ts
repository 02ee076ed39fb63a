import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getSubmittals(projectId: number) {
  return unwrap(await api.GET('/api/projects/{projectId}/submittals', { params: { path: { projectId } } }));
}

export const getSubmittalsQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'submittals'], queryFn: () => getSubmittals(projectId) });

export function useSubmittals(projectId: number) {
  return useQuery(getSubmittalsQueryOptions(projectId));
}
