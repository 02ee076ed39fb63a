import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

/** The project and its submittals, so an upload can be marked as a revision of one of them. */
export async function getUploadContext(projectId: number) {
  const [project, submittals] = await Promise.all([
    api.GET('/api/projects/{projectId}', { params: { path: { projectId } } }).then(unwrap),
    api.GET('/api/projects/{projectId}/submittals', { params: { path: { projectId } } }).then(unwrap),
  ]);
  return { project, submittals };
}

export const getUploadContextQueryOptions = (projectId: number) =>
  queryOptions({
    queryKey: ['projects', projectId, 'upload-context'],
    queryFn: () => getUploadContext(projectId),
  });

export function useUploadContext(projectId: number) {
  return useQuery(getUploadContextQueryOptions(projectId));
}
