import createClient, { type Middleware } from 'openapi-fetch';
import { env } from '@/config/env';
import { ApiError, describeError, errorTitle, toApiError } from './api-error';
import type { paths } from './api-types';
import { notify } from './notify';
import { sessionStore } from './session';

/** Called when the API refuses the session (401): the app sends the user to sign in and back. */
let onUnauthorized: (() => void) | null = null;
export function setUnauthorizedHandler(handler: () => void): void {
  onUnauthorized = handler;
}

const SIGN_IN_PATH = '/auth/login';

const middleware: Middleware = {
  onRequest({ request }) {
    const token = sessionStore.get()?.token;
    if (token && !request.headers.has('Authorization'))
      request.headers.set('Authorization', `Bearer ${token}`);
    return request;
  },
  async onResponse({ request, response }) {
    if (response.ok) return response;
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
  },
};

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

/** Raw fetch with the session's token, for what openapi-fetch cannot do (CSV download, upload progress). */
export function authHeaders(): Record<string, string> {
  const token = sessionStore.get()?.token;
  return token ? { Authorization: `Bearer ${token}` } : {};
}

export function apiUrl(path: string): string {
  return `${env.apiOrigin}${path}`;
}
