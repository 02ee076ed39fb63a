import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getRevisionDiff(submittalId: number) {
  return unwrap(await api.GET('/api/submittals/{submittalId}/diff', { params: { path: { submittalId } } }));
}

export const getRevisionDiffQueryOptions = (submittalId: number) =>
  queryOptions({
    queryKey: ['submittals', submittalId, 'diff'],
    queryFn: () => getRevisionDiff(submittalId),
  });

export function useRevisionDiff(submittalId: number, enabled: boolean) {
  return useQuery({ ...getRevisionDiffQueryOptions(submittalId), enabled });
}
