import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { api, authHeaders, setUnauthorizedHandler, unwrap } from './api-client';
import { ApiError } from './api-error';
import { sessionStore } from './session';

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

const PRIYA = {
  id: 2,
  email: 'priya@fennick-ode.example.test',
  name: 'Priya Halvorsen',
  role: 'consultant' as const,
};
const refused = () => json(401, { statusCode: 401, error: 'Unauthorized', message: 'Sign in first.' });
const renewed = (token: string) => json(200, { accessToken: token, expiresIn: '15m', user: PRIYA });

/** The refresh route answers through the global fetch (lib/session-api.ts); `answer` says how. */
function stubRefresh(answer: () => Response) {
  const refresh = vi.fn<(request: Request) => Promise<Response>>(async () => answer());
  vi.stubGlobal('fetch', refresh);
  return refresh;
}

beforeEach(() => setUnauthorizedHandler(() => undefined));
afterEach(() => {
  vi.unstubAllGlobals();
  sessionStore.clear();
});

describe('api client', () => {
  it('sends the session token as a bearer header', async () => {
    const fetchMock = vi.fn<(request: Request) => Promise<Response>>(async () => json(200, []));
    sessionStore.set({ token: 'jwt-1', user: PRIYA });
    await api.GET('/api/projects', { fetch: fetchMock as unknown as typeof fetch });
    expect(fetchMock.mock.calls[0]![0].headers.get('Authorization')).toBe('Bearer jwt-1');
  });

  it('on 401 renews the access token from the refresh cookie and sends the request once more', async () => {
    const refresh = stubRefresh(() => renewed('jwt-2'));
    const fetchMock = vi.fn<(request: Request) => Promise<Response>>(async (request) =>
      request.headers.get('Authorization') === 'Bearer jwt-2' ? json(200, [{ id: 1 }]) : refused(),
    );
    const onUnauthorized = vi.fn();
    setUnauthorizedHandler(onUnauthorized);
    sessionStore.set({ token: 'jwt-1', user: PRIYA });
    const data = unwrap(await api.GET('/api/projects', { fetch: fetchMock as unknown as typeof fetch }));
    expect(data).toEqual([{ id: 1 }]);
    expect(fetchMock).toHaveBeenCalledTimes(2);
    expect(refresh).toHaveBeenCalledTimes(1);
    const call = refresh.mock.calls[0]![0];
    expect(new URL(call.url).pathname).toBe('/api/auth/session/refresh');
    expect(call.method).toBe('POST');
    expect(call.headers.get('X-Ligament-Session')).toBe('1');
    expect(sessionStore.get()?.token).toBe('jwt-2');
    expect(onUnauthorized).not.toHaveBeenCalled();
  });

  it('sends a change once more after a renewal with the same body', async () => {
    stubRefresh(() => renewed('jwt-2'));
    const bodies: string[] = [];
    const fetchMock = vi.fn<(request: Request) => Promise<Response>>(async (request) => {
      bodies.push(await request.text());
      return request.headers.get('Authorization') === 'Bearer jwt-2' ? json(201, { id: 9 }) : refused();
    });
    sessionStore.set({ token: 'jwt-1', user: PRIYA });
    const created = unwrap(
      await api.POST('/api/tokens', {
        body: { name: 'CI', projectId: 1 },
        fetch: fetchMock as unknown as typeof fetch,
      }),
    );
    expect(created).toEqual({ id: 9 });
    expect(bodies).toEqual([
      JSON.stringify({ name: 'CI', projectId: 1 }),
      JSON.stringify({ name: 'CI', projectId: 1 }),
    ]);
  });

  it('renews once for several requests refused at the same time', async () => {
    const refresh = stubRefresh(() => renewed('jwt-2'));
    const fetchMock = vi.fn<(request: Request) => Promise<Response>>(async (request) =>
      request.headers.get('Authorization') === 'Bearer jwt-2' ? json(200, []) : refused(),
    );
    sessionStore.set({ token: 'jwt-1', user: PRIYA });
    const options = { fetch: fetchMock as unknown as typeof fetch };
    await Promise.all([api.GET('/api/projects', options), api.GET('/api/organisations', options)]);
    expect(refresh).toHaveBeenCalledTimes(1);
    expect(fetchMock).toHaveBeenCalledTimes(4);
  });

  it('when the session has ended too, forgets it and asks the app to send the user to sign in', async () => {
    stubRefresh(refused);
    const fetchMock = vi.fn(async () => refused());
    const onUnauthorized = vi.fn();
    setUnauthorizedHandler(onUnauthorized);
    sessionStore.set({ token: 'old', user: PRIYA });
    const call = api.GET('/api/projects', { fetch: fetchMock as unknown as typeof fetch });
    await expect(call).rejects.toBeInstanceOf(ApiError);
    expect(sessionStore.get()).toBeNull();
    expect(sessionStore.status()).toBe('signed-out');
    expect(onUnauthorized).toHaveBeenCalledTimes(1);
  });

  it('does not try to renew a refused sign-in (wrong password)', async () => {
    const refresh = stubRefresh(() => renewed('never'));
    const fetchMock = vi.fn(async () => refused());
    const call = api.POST('/api/auth/login', {
      body: { email: PRIYA.email, password: 'wrong' },
      fetch: fetchMock as unknown as typeof fetch,
    });
    await expect(call).rejects.toBeInstanceOf(ApiError);
    expect(refresh).not.toHaveBeenCalled();
  });

  it("turns the API's error shape into an ApiError carrying its details", async () => {
    const body = { statusCode: 409, error: 'Conflict', message: 'Already stamped.', details: [{ id: 4 }] };
    const fetchMock = vi.fn(async () => json(409, body));
    const failure = await api
      .POST('/api/submittals/{submittalId}/stamp', {
        params: { path: { submittalId: 4 } },
        body: { action: 'rejected', comment: 'x' },
        fetch: fetchMock as unknown as typeof fetch,
      })
      .then(unwrap)
      .catch((e: unknown) => e);
    expect(failure).toBeInstanceOf(ApiError);
    expect(failure).toMatchObject({ statusCode: 409, message: 'Already stamped.', details: [{ id: 4 }] });
  });

  it('gives raw downloads and uploads a token renewed first when it is about to run out', async () => {
    const refresh = stubRefresh(() => renewed('jwt-2'));
    sessionStore.set({ token: 'jwt-1', user: PRIYA, expiresAt: Date.now() + 10_000 });
    expect(await authHeaders()).toEqual({ Authorization: 'Bearer jwt-2' });
    expect(refresh).toHaveBeenCalledTimes(1);
    // A token with time left is sent as it is.
    sessionStore.set({ token: 'jwt-3', user: PRIYA, expiresAt: Date.now() + 10 * 60_000 });
    expect(await authHeaders()).toEqual({ Authorization: 'Bearer jwt-3' });
    expect(refresh).toHaveBeenCalledTimes(1);
    sessionStore.clear();
    expect(await authHeaders()).toEqual({});
  });
});
