import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getTokens() {
  return unwrap(await api.GET('/api/tokens'));
}

export const getTokensQueryOptions = () => queryOptions({ queryKey: ['tokens'], queryFn: getTokens });

export function useTokens(enabled = true) {
  return useQuery({ ...getTokensQueryOptions(), enabled });
}
