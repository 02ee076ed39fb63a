import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getSubmittalFiles(submittalId: number) {
  return unwrap(await api.GET('/api/submittals/{submittalId}/files', { params: { path: { submittalId } } }));
}

export const getSubmittalFilesQueryOptions = (submittalId: number) =>
  queryOptions({
    queryKey: ['submittals', submittalId, 'files'],
    queryFn: () => getSubmittalFiles(submittalId),
  });

export function useSubmittalFiles(submittalId: number) {
  return useQuery(getSubmittalFilesQueryOptions(submittalId));
}
