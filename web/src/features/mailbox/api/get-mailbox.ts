import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getMailbox() {
  return unwrap(await api.GET('/api/mail/mailbox'));
}

export const getMailboxQueryOptions = () =>
  queryOptions({ queryKey: ['mailbox'], queryFn: getMailbox, staleTime: 0 });

export function useMailbox() {
  return useQuery({ ...getMailboxQueryOptions(), refetchInterval: 5000 });
}
