import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getProject(projectId: number) {
  return unwrap(await api.GET('/api/projects/{projectId}', { params: { path: { projectId } } }));
}

export const getProjectQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId], queryFn: () => getProject(projectId) });

export function useProject(projectId: number) {
  return useQuery(getProjectQueryOptions(projectId));
}
