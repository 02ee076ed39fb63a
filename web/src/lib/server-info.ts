import { useQuery } from '@tanstack/react-query';
import { api } from './api-client';

export interface ServerInfo {
  readonly engineVersion: string;
  readonly status: string;
  /** Demo mode, as /api/health reports it (the demo mailbox itself needs an admin sign-in). */
  readonly demo: boolean;
  /** Unsafe settings the server reports, e.g. the public demo JWT secret. */
  readonly warnings: readonly string[];
}

export async function getServerInfo(): Promise<ServerInfo> {
  const health = await api.GET('/api/health');
  return {
    engineVersion: health.data?.engineVersion ?? 'unknown',
    status: health.data?.status ?? 'down',
    demo: health.data?.demo === true,
    warnings: health.data?.warnings ?? [],
  };
}

/** Engine version and demo mode, read once per visit. */
export function useServerInfo() {
  return useQuery({ queryKey: ['server-info'], queryFn: getServerInfo, staleTime: Infinity, retry: false });
}
