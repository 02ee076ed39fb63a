import { useQuery } from '@tanstack/react-query';
import { api } from './api-client';

export interface ServerInfo {
  readonly engineVersion: string;
  readonly status: string;
  /** The demo mailbox answers only in demo mode (404 otherwise). */
  readonly demo: boolean;
}

export async function getServerInfo(): Promise<ServerInfo> {
  const [health, mailbox] = await Promise.all([
    api.GET('/api/health'),
    api.GET('/api/mail/mailbox').catch(() => null),
  ]);
  return {
    engineVersion: health.data?.engineVersion ?? 'unknown',
    status: health.data?.status ?? 'down',
    demo: mailbox?.response.ok === true,
  };
}

/** Engine version and demo mode, read once per visit. */
export function useServerInfo() {
  return useQuery({ queryKey: ['server-info'], queryFn: getServerInfo, staleTime: Infinity, retry: false });
}
