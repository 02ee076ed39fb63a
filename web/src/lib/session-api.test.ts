import { afterEach, describe, expect, it, vi } from 'vitest';
import { sessionStore } from './session';
import { endSession, parseDuration, restoreSession, toSession } from './session-api';

const USER = { id: 3, email: 'tomasz@larchmont-review.example.test', name: 'Tomasz Quell', role: 'checker' };
const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

/** The flag cookie the API sets beside the httpOnly refresh cookie. */
const flag = (on: boolean) => {
  document.cookie = on ? 'ligament_signed_in=1; path=/' : 'ligament_signed_in=; path=/; max-age=0';
};

afterEach(() => {
  vi.unstubAllGlobals();
  sessionStore.clear();
  flag(false);
});

describe('session api', () => {
  it('restores the session the refresh cookie holds, asking with the session header', async () => {
    const fetchMock = vi.fn<(request: Request) => Promise<Response>>(async () =>
      json(200, { accessToken: 'jwt-r', expiresIn: '15m', user: USER }),
    );
    vi.stubGlobal('fetch', fetchMock);
    flag(true);
    const restoring = restoreSession();
    expect(sessionStore.status()).toBe('restoring');
    await restoring;
    expect(sessionStore.status()).toBe('signed-in');
    expect(sessionStore.get()).toMatchObject({ token: 'jwt-r', user: { role: 'checker' } });
    const request = fetchMock.mock.calls[0]![0];
    expect(request.headers.get('X-Ligament-Session')).toBe('1');
    expect(request.credentials).toBe('same-origin');
  });

  it('asks nothing when the browser has no session flag', async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    await restoreSession();
    expect(fetchMock).not.toHaveBeenCalled();
    expect(sessionStore.status()).toBe('signed-out');
  });

  it('ends restoring as signed out when there is no live session, or the server cannot be reached', async () => {
    flag(true);
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => json(401, { statusCode: 401, error: 'Unauthorized', message: 'No session.' })),
    );
    await restoreSession();
    expect(sessionStore.status()).toBe('signed-out');
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => {
        throw new TypeError('network');
      }),
    );
    await restoreSession();
    expect(sessionStore.status()).toBe('signed-out');
  });

  it('signs out on the server with the session header', async () => {
    const fetchMock = vi.fn<(request: Request) => Promise<Response>>(
      async () => new Response(null, { status: 204 }),
    );
    vi.stubGlobal('fetch', fetchMock);
    await endSession();
    const request = fetchMock.mock.calls[0]![0];
    expect(new URL(request.url).pathname).toBe('/api/auth/session/sign-out');
    expect(request.headers.get('X-Ligament-Session')).toBe('1');
  });

  it('reads the access token lifetime', () => {
    expect(parseDuration('15m')).toBe(900_000);
    expect(parseDuration('8h')).toBe(28_800_000);
    expect(parseDuration('3600')).toBe(3_600_000);
    expect(parseDuration('soon')).toBeUndefined();
    expect(
      toSession(
        {
          accessToken: 't',
          expiresIn: '15m',
          user: { ...USER, role: 'checker', organisationId: null, organisation: null, active: true },
        },
        1000,
      ).expiresAt,
    ).toBe(901_000);
  });
});
