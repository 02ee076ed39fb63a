import createClient, { type Middleware } from 'openapi-fetch';
import { env } from '@/config/env';
import { ApiError, describeError, errorTitle, toApiError } from './api-error';
import type { paths } from './api-types';
import { notify } from './notify';
import { sessionStore } from './session';
import { renewSession } from './session-api';

/** Called when the API refuses the session (401): the app sends the user to sign in and back. */
let onUnauthorized: (() => void) | null = null;
export function setUnauthorizedHandler(handler: () => void): void {
  onUnauthorized = handler;
}

const SIGN_IN_PATH = '/auth/login';
/** Renew the access token this long before it runs out, rather than wait for a refusal. */
const RENEW_AHEAD_MS = 60_000;

/** Copies of requests sent with a session, kept until their answer, to send once more after a renewal. */
const retries = new Map<string, Request>();

/** The signed-in session, renewed first when its access token is about to run out; null when signed out. */
async function liveSession() {
  const session = sessionStore.get();
  if (!session) return null;
  if (session.expiresAt !== undefined && session.expiresAt - Date.now() < RENEW_AHEAD_MS)
    return (await renewSession()) ?? session;
  return session;
}

const withToken = (request: Request, token: string): Request => {
  request.headers.set('Authorization', `Bearer ${token}`);
  return request;
};

const middleware: Middleware = {
  async onRequest({ request, id }) {
    if (request.headers.has('Authorization')) return request;
    const session = await liveSession();
    if (!session) return request;
    withToken(request, session.token);
    retries.set(id, request.clone());
    return request;
  },
  async onResponse({ request, response, id, options }) {
    const retry = retries.get(id);
    retries.delete(id);
    if (response.ok) return response;
    // An access token refused on the way (expired, or the tab slept): renew once and send again.
    if (response.status === 401 && retry) {
      const renewed = await renewSession();
      if (renewed) {
        const again = await options.fetch(withToken(retry, renewed.token));
        if (again.status !== 401) return again.ok ? again : failure(request, again);
      }
    }
    return failure(request, response);
  },
  onError({ id }) {
    retries.delete(id);
  },
};

/** Throws the ApiError of a refused answer; a refused session also sends the user to sign in. */
async function failure(request: Request, response: Response): Promise<never> {
  const body: unknown = await response
    .clone()
    .json()
    .catch(() => null);
  const error = toApiError(response.status, response.statusText, body);
  const isSignIn = new URL(request.url).pathname.endsWith(SIGN_IN_PATH);
  if (response.status === 401 && !isSignIn) {
    sessionStore.clear();
    onUnauthorized?.();
    throw error;
  }
  // Reads show their own error state in the view; a failed change is also toasted.
  if (request.method !== 'GET' && !isSignIn)
    notify({ intent: 'error', title: errorTitle(error), body: describeError(error) });
  throw error;
}

/** The typed client for every call to the Ligament API (types generated from api/openapi.json). */
export const api = createClient<paths>({ baseUrl: env.apiOrigin || window.location.origin });
api.use(middleware);

/** Unwraps an openapi-fetch result: the data, or the ApiError the middleware raised. */
export function unwrap<T>(result: { data?: T; error?: unknown; response: Response }): T {
  if (result.error !== undefined) {
    throw result.error instanceof ApiError
      ? result.error
      : toApiError(result.response.status, result.response.statusText, result.error);
  }
  return result.data as T;
}

/**
 * The session's Authorization header for what openapi-fetch cannot do (CSV download, upload
 * progress, the server's report), renewed first as the client's own requests are, so a page left
 * open past the access token's life still downloads and uploads.
 */
export async function authHeaders(): Promise<Record<string, string>> {
  const session = await liveSession();
  return session ? { Authorization: `Bearer ${session.token}` } : {};
}

export function apiUrl(path: string): string {
  return `${env.apiOrigin}${path}`;
}
