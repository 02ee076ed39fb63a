import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getSubmittal(submittalId: number) {
  return unwrap(await api.GET('/api/submittals/{submittalId}', { params: { path: { submittalId } } }));
}

export const getSubmittalQueryOptions = (submittalId: number) =>
  queryOptions({ queryKey: ['submittals', submittalId], queryFn: () => getSubmittal(submittalId) });

export function useSubmittal(submittalId: number) {
  return useQuery(getSubmittalQueryOptions(submittalId));
}
