import createClient from 'openapi-fetch';
import { env } from '@/config/env';
import type { components, paths } from './api-types';
import { sessionStore, type Session } from './session';

/**
 * The three calls that create, renew and end a browser session, on a client of their own without
 * the app client's middleware (which renews sessions itself, so it must not call itself).
 */
const client = createClient<paths>({
  baseUrl: env.apiOrigin || window.location.origin,
  // Looked up on each call rather than once, so a test can stand in for the network.
  fetch: (request) => globalThis.fetch(request),
});

/** The API refuses the session routes without it (cross-site request forgery defence). */
const SESSION_HEADERS = { 'X-Ligament-Session': '1' } as const;

/** `8h`, `15m`, `3600` (seconds) → milliseconds; undefined when the format is unknown. */
export function parseDuration(value: string): number | undefined {
  const match = /^(\d+)\s*([smhd]?)$/.exec(value.trim());
  if (!match) return undefined;
  const n = Number(match[1]);
  const unit = { '': 1, s: 1, m: 60, h: 3600, d: 86400 }[match[2] as '' | 's' | 'm' | 'h' | 'd'];
  return n * unit * 1000;
}

/** The session an access-token answer describes. */
export function toSession(data: components['schemas']['LoginResponseDto'], now = Date.now()): Session {
  const ttl = parseDuration(data.expiresIn);
  return {
    token: data.accessToken,
    user: { id: data.user.id, email: data.user.email, name: data.user.name, role: data.user.role },
    expiresAt: ttl === undefined ? undefined : now + ttl,
  };
}

/** Renew the access token this long before it runs out. */
const RENEW_AHEAD_MS = 60_000;

let renewing: Promise<Session | null> | null = null;
let timer: ReturnType<typeof setTimeout> | undefined;

/**
 * A new access token from the refresh cookie. One request at a time per tab: calls made while one
 * runs share it. Answers the session, or null: when the API says the session is over (401) the
 * session is cleared; a network failure leaves it as it is.
 */
export function renewSession(): Promise<Session | null> {
  renewing ??= (async () => {
    try {
      const { data, response } = await client.POST('/api/auth/session/refresh', {
        params: { header: SESSION_HEADERS },
      });
      if (data) {
        const session = toSession(data);
        sessionStore.set(session);
        return session;
      }
      if (response.status === 401) sessionStore.clear();
      return null;
    } catch {
      return null;
    } finally {
      renewing = null;
    }
  })();
  return renewing;
}

/**
 * Renews the access token a minute before it runs out, for as long as the tab is open, so the token
 * in memory stays good for raw fetches too (downloads, uploads with progress). Answers the stop.
 */
export function keepSessionFresh(): () => void {
  const schedule = () => {
    clearTimeout(timer);
    const expiresAt = sessionStore.get()?.expiresAt;
    if (expiresAt === undefined) return;
    timer = setTimeout(() => void renewSession(), Math.max(0, expiresAt - Date.now() - RENEW_AHEAD_MS));
  };
  const unsubscribe = sessionStore.subscribe(schedule);
  schedule();
  return () => {
    unsubscribe();
    clearTimeout(timer);
  };
}

/** The API sets this script-readable flag (no secret) beside the httpOnly refresh cookie. */
const SIGNED_IN_FLAG = /(?:^|;\s*)ligament_signed_in=1(?:;|$)/;

/**
 * At start-up: signed in again if the refresh cookie still holds a live session. Without the flag
 * cookie there is no session to restore, and no request is made.
 */
export async function restoreSession(): Promise<void> {
  if (!SIGNED_IN_FLAG.test(document.cookie)) {
    sessionStore.clear();
    return;
  }
  sessionStore.restoring();
  const session = await renewSession();
  if (!session) sessionStore.clear();
}

/** Ends the session on the server (every tab of this browser) and clears the cookie. */
export async function endSession(): Promise<void> {
  await client.POST('/api/auth/session/sign-out', { params: { header: SESSION_HEADERS } });
}
