import type { Request, Response } from 'express';
import { clearSessionCookie, readCookie, setSessionCookie } from './session-cookie.js';

const request = (over: Partial<Request> = {}) =>
  ({ secure: false, headers: {}, ...over }) as unknown as Request;
const response = () => {
  const cookie = jest.fn();
  const clearCookie = jest.fn();
  return { res: { cookie, clearCookie } as unknown as Response, cookie, clearCookie };
};

describe('session cookie', () => {
  it('is httpOnly, SameSite=Strict, scoped to the session routes, and not Secure on plain http', () => {
    const { res, cookie } = response();
    setSessionCookie(request(), res, 'lgr_abc', 60_000, 'http://localhost:3000');
    expect(cookie).toHaveBeenCalledWith('ligament_session', 'lgr_abc', {
      httpOnly: true,
      secure: false,
      sameSite: 'strict',
      path: '/api/auth/session',
      maxAge: 60_000,
    });
    // Beside it, a script-readable flag with no secret in it: "this browser has a session".
    expect(cookie).toHaveBeenCalledWith('ligament_signed_in', '1', {
      secure: false,
      sameSite: 'strict',
      path: '/',
      maxAge: 60_000,
    });
  });

  it('is Secure when the request came over https or the public address is https (TLS at a proxy)', () => {
    const direct = response();
    setSessionCookie(request({ secure: true }), direct.res, 'lgr_abc', 1, 'http://localhost:3000');
    expect(direct.cookie.mock.calls[0]?.[2]).toMatchObject({ secure: true });
    const proxied = response();
    setSessionCookie(request(), proxied.res, 'lgr_abc', 1, 'https://review.example.test');
    expect(proxied.cookie.mock.calls[0]?.[2]).toMatchObject({ secure: true });
    const cleared = response();
    clearSessionCookie(request(), cleared.res, 'https://review.example.test');
    expect(cleared.clearCookie).toHaveBeenCalledWith('ligament_session', {
      httpOnly: true,
      secure: true,
      sameSite: 'strict',
      path: '/api/auth/session',
    });
    expect(cleared.clearCookie).toHaveBeenCalledWith('ligament_signed_in', {
      secure: true,
      sameSite: 'strict',
      path: '/',
    });
  });

  it('reads one cookie out of the Cookie header, ignoring others and empty values', () => {
    const req = request({ headers: { cookie: 'theme=dark; ligament_session=lgr_x-y_z; other=1' } });
    expect(readCookie(req, 'ligament_session')).toBe('lgr_x-y_z');
    expect(
      readCookie(request({ headers: { cookie: 'ligament_session=' } }), 'ligament_session'),
    ).toBeUndefined();
    expect(readCookie(request(), 'ligament_session')).toBeUndefined();
    expect(
      readCookie(request({ headers: { cookie: 'xligament_session=1' } }), 'ligament_session'),
    ).toBeUndefined();
  });
});
