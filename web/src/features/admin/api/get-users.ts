import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getUsers() {
  return unwrap(await api.GET('/api/users'));
}

export const getUsersQueryOptions = () => queryOptions({ queryKey: ['users'], queryFn: getUsers });

export function useUsers() {
  return useQuery(getUsersQueryOptions());
}
