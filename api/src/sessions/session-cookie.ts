import type { Request, Response } from 'express';

/** The refresh cookie: httpOnly, SameSite=Strict, sent only to the session routes. */
export const SESSION_COOKIE = 'ligament_session';
export const SESSION_COOKIE_PATH = '/api/auth/session';
/**
 * A second cookie that says only that this browser has a session, readable by the web app, so a page
 * opened while signed out does not ask to renew a session that is not there. It holds no secret.
 */
export const SIGNED_IN_COOKIE = 'ligament_signed_in';
/**
 * The header the web app sends on the session routes. A page on another site cannot add a custom
 * header to a request here without a CORS preflight, which this service never grants.
 */
export const SESSION_HEADER = 'x-ligament-session';

/** The value of one cookie from the request's Cookie header, or undefined. */
export function readCookie(request: Request, name: string): string | undefined {
  for (const part of (request.headers.cookie ?? '').split(';')) {
    const at = part.indexOf('=');
    if (at > 0 && part.slice(0, at).trim() === name) {
      const value = part.slice(at + 1).trim();
      return value === '' ? undefined : value;
    }
  }
  return undefined;
}

/**
 * Secure when the request came over https or the service's public address is https (TLS ended at a
 * proxy). The demo on http://localhost needs it off, or the browser would never send it back.
 */
function secure(request: Request, publicUrl: string): boolean {
  return request.secure || publicUrl.startsWith('https:');
}

export function setSessionCookie(
  request: Request,
  response: Response,
  token: string,
  maxAgeMs: number,
  publicUrl: string,
): void {
  response.cookie(SESSION_COOKIE, token, {
    httpOnly: true,
    secure: secure(request, publicUrl),
    sameSite: 'strict',
    path: SESSION_COOKIE_PATH,
    maxAge: maxAgeMs,
  });
  response.cookie(SIGNED_IN_COOKIE, '1', {
    secure: secure(request, publicUrl),
    sameSite: 'strict',
    path: '/',
    maxAge: maxAgeMs,
  });
}

export function clearSessionCookie(request: Request, response: Response, publicUrl: string): void {
  response.clearCookie(SESSION_COOKIE, {
    httpOnly: true,
    secure: secure(request, publicUrl),
    sameSite: 'strict',
    path: SESSION_COOKIE_PATH,
  });
  response.clearCookie(SIGNED_IN_COOKIE, {
    secure: secure(request, publicUrl),
    sameSite: 'strict',
    path: '/',
  });
}
