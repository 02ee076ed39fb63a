import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getInvitation(token: string) {
  return unwrap(await api.GET('/api/invitations/{token}', { params: { path: { token } } }));
}

export const getInvitationQueryOptions = (token: string) =>
  queryOptions({ queryKey: ['invitation', token], queryFn: () => getInvitation(token), retry: false });

export function useInvitation(token: string) {
  return useQuery(getInvitationQueryOptions(token));
}
