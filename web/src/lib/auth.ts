import { api, unwrap } from './api-client';
import { queryClient } from './query-client';
import { sessionStore, type Session } from './session';
import { endSession, toSession } from './session-api';

/** Signs in (the API also sets the refresh cookie); the cache starts empty for the new user. */
export async function signIn(email: string, password: string): Promise<Session> {
  const data = unwrap(await api.POST('/api/auth/login', { body: { email, password } }));
  const session = toSession(data);
  queryClient.clear();
  sessionStore.set(session);
  return session;
}

/**
 * Signs out here and on the server: the session ends for every tab of this browser. The page forgets
 * the session even when the server cannot be reached.
 */
export async function signOut(): Promise<void> {
  try {
    await endSession();
  } finally {
    sessionStore.clear();
    queryClient.clear();
  }
}
