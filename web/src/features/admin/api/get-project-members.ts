import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getProjectMembers(projectId: number) {
  return unwrap(await api.GET('/api/projects/{projectId}/members', { params: { path: { projectId } } }));
}

export const getProjectMembersQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'members'], queryFn: () => getProjectMembers(projectId) });

export function useProjectMembers(projectId: number | undefined) {
  return useQuery({ ...getProjectMembersQueryOptions(projectId ?? 0), enabled: projectId !== undefined });
}
