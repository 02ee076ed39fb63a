import { api, unwrap } from './api-client';
import { queryClient } from './query-client';
import { sessionStore, type Session } from './session';

/** `8h`, `30m`, `3600` (seconds) → milliseconds; undefined when the format is unknown. */
export function parseDuration(value: string): number | undefined {
  const match = /^(\d+)\s*([smhd]?)$/.exec(value.trim());
  if (!match) return undefined;
  const n = Number(match[1]);
  const unit = { '': 1, s: 1, m: 60, h: 3600, d: 86400 }[match[2] as '' | 's' | 'm' | 'h' | 'd'];
  return n * unit * 1000;
}

/** Signs in and keeps the session in memory; the cache starts empty for the new user. */
export async function signIn(email: string, password: string): Promise<Session> {
  const data = unwrap(await api.POST('/api/auth/login', { body: { email, password } }));
  const ttl = parseDuration(data.expiresIn);
  const session: Session = {
    token: data.accessToken,
    user: { id: data.user.id, email: data.user.email, name: data.user.name, role: data.user.role },
    expiresAt: ttl === undefined ? undefined : Date.now() + ttl,
  };
  queryClient.clear();
  sessionStore.set(session);
  return session;
}

export function signOut(): void {
  sessionStore.clear();
  queryClient.clear();
}
