import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getInvitations() {
  return unwrap(await api.GET('/api/invitations'));
}

export const getInvitationsQueryOptions = () =>
  queryOptions({ queryKey: ['invitations'], queryFn: getInvitations });

export function useInvitations() {
  return useQuery(getInvitationsQueryOptions());
}
