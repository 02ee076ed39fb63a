import { afterEach, describe, expect, it, vi } from 'vitest';
import { api, setUnauthorizedHandler, unwrap } from './api-client';
import { ApiError } from './api-error';
import { sessionStore } from './session';

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

afterEach(() => {
  vi.unstubAllGlobals();
  sessionStore.clear();
});

describe('api client', () => {
  it('sends the session token as a bearer header', async () => {
    const fetchMock = vi.fn<(request: Request) => Promise<Response>>(async () => json(200, []));
    vi.stubGlobal('fetch', fetchMock);
    sessionStore.set({
      token: 'jwt-1',
      user: { id: 2, email: 'priya@fennick-ode.example.test', name: 'Priya Halvorsen', role: 'consultant' },
    });
    await api.GET('/api/projects', { fetch: fetchMock as unknown as typeof fetch });
    expect(fetchMock.mock.calls[0]![0].headers.get('Authorization')).toBe('Bearer jwt-1');
  });

  it('on 401 ends the session and asks the app to send the user to sign in', async () => {
    const fetchMock = vi.fn(async () =>
      json(401, { statusCode: 401, error: 'Unauthorized', message: 'The session has expired.' }),
    );
    const onUnauthorized = vi.fn();
    setUnauthorizedHandler(onUnauthorized);
    sessionStore.set({
      token: 'old',
      user: { id: 2, email: 'priya@fennick-ode.example.test', name: 'Priya Halvorsen', role: 'consultant' },
    });
    const call = api.GET('/api/projects', { fetch: fetchMock as unknown as typeof fetch });
    await expect(call).rejects.toBeInstanceOf(ApiError);
    expect(sessionStore.get()).toBeNull();
    expect(onUnauthorized).toHaveBeenCalledTimes(1);
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
});
