import { useSyncExternalStore } from 'react';

/** Roles the API knows; the web app only uses them to choose navigation and guard routes. */
export type Role = 'admin' | 'checker' | 'consultant' | 'owner-rep';

export interface SessionUser {
  readonly id: number;
  readonly email: string;
  readonly name: string;
  readonly role: Role;
}

export interface Session {
  readonly token: string;
  readonly user: SessionUser;
  /** Epoch milliseconds after which the API will refuse the token, when known. */
  readonly expiresAt?: number;
}

/**
 * `restoring` while the app asks the API whether this browser still has a session (its httpOnly
 * refresh cookie), at start-up; then `signed-in` or `signed-out`.
 */
export type SessionStatus = 'restoring' | 'signed-in' | 'signed-out';

interface Snapshot {
  readonly status: SessionStatus;
  readonly session: Session | null;
}

/**
 * The access token lives in memory only, never in localStorage or a script-readable cookie, so a
 * script injected into a page cannot take it away. What survives a reload or a new tab is the
 * refresh cookie, which only the browser and the API see (lib/session-api.ts renews from it).
 */
let snapshot: Snapshot = { status: 'signed-out', session: null };
const listeners = new Set<() => void>();

function update(next: Snapshot): void {
  snapshot = next;
  for (const listener of listeners) listener();
}

export const sessionStore = {
  get(): Session | null {
    return snapshot.session;
  },
  status(): SessionStatus {
    return snapshot.status;
  },
  snapshot(): Snapshot {
    return snapshot;
  },
  set(session: Session): void {
    update({ status: 'signed-in', session });
  },
  /** The app is asking the API for the session the refresh cookie holds. */
  restoring(): void {
    if (snapshot.status !== 'signed-in') update({ status: 'restoring', session: null });
  },
  clear(): void {
    if (snapshot.status === 'signed-out') return;
    update({ status: 'signed-out', session: null });
  },
  subscribe(listener: () => void): () => void {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
};

export function useSession(): Session | null {
  return useSyncExternalStore(sessionStore.subscribe, sessionStore.get, sessionStore.get);
}

export function useSessionStatus(): SessionStatus {
  return useSyncExternalStore(sessionStore.subscribe, sessionStore.status, sessionStore.status);
}
