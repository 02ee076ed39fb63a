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
 * The signed-in session lives in memory only: never in localStorage or a cookie, so a reload or a
 * closed tab signs the user out and a script injected into another page cannot read it. When the
 * token expires the API answers 401 and the client sends the user back to sign in, to return to
 * the same page afterwards.
 */
let current: Session | null = null;
const listeners = new Set<() => void>();

function emit(): void {
  for (const listener of listeners) listener();
}

export const sessionStore = {
  get(): Session | null {
    return current;
  },
  set(session: Session): void {
    current = session;
    emit();
  },
  clear(): void {
    if (current === null) return;
    current = null;
    emit();
  },
  subscribe(listener: () => void): () => void {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
};

export function useSession(): Session | null {
  return useSyncExternalStore(sessionStore.subscribe, sessionStore.get, sessionStore.get);
}
