import { afterEach, describe, expect, it, vi } from 'vitest';

import { ApiError, NETWORK_ERROR_MESSAGE, type UnauthorizedHooks, createApiClient } from './api-client';

function json(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

function setup(opts: { currentPath?: string; timeoutMs?: number } = {}) {
  const fetchMock = vi.fn<typeof fetch>();
  const hooks = {
    clearSession: vi.fn<UnauthorizedHooks['clearSession']>(),
    redirect: vi.fn<UnauthorizedHooks['redirect']>(),
    currentPath: vi.fn<UnauthorizedHooks['currentPath']>(() => opts.currentPath ?? '/users?page=2'),
  };
  const client = createApiClient({
    baseUrl: '/api',
    fetch: fetchMock,
    unauthorized: hooks,
    ...(opts.timeoutMs === undefined ? {} : { timeoutMs: opts.timeoutMs }),
  });
  return { client, fetchMock, hooks };
}

function sentInit(fetchMock: ReturnType<typeof vi.fn<typeof fetch>>, call = 0): RequestInit {
  const init = fetchMock.mock.calls[call]?.[1];
  if (!init) throw new Error(`fetch call ${call} had no init`);
  return init;
}

function sentHeaders(fetchMock: ReturnType<typeof vi.fn<typeof fetch>>, call = 0): Record<string, string> {
  return sentInit(fetchMock, call).headers as Record<string, string>;
}

async function caught(promise: Promise<unknown>): Promise<unknown> {
  try {
    await promise;
  } catch (error) {
    return error;
  }
  throw new Error('expected the request to fail');
}

afterEach(() => {
  vi.useRealTimers();
});

describe('requests', () => {
  it('GET sends cookies on the same origin, asks for JSON, builds the query and returns the parsed body', async () => {
    const { client, fetchMock } = setup();
    fetchMock.mockResolvedValueOnce(json(200, { items: [], total: 0 }));

    const result = await client.get('/users', { query: { limit: 25, offset: 50, search: undefined } });

    expect(result).toEqual({ items: [], total: 0 });
    expect(fetchMock.mock.calls[0]?.[0]).toBe('/api/users?limit=25&offset=50');
    const init = sentInit(fetchMock);
    expect(init.method).toBe('GET');
    expect(init.credentials).toBe('same-origin');
    expect(sentHeaders(fetchMock).Accept).toBe('application/json');
  });

  it('POST sends the body as JSON', async () => {
    const { client, fetchMock } = setup();
    fetchMock.mockResolvedValueOnce(json(201, { id: 7 }));

    await client.post('/users', { name: 'Mira Vesk' });

    expect(sentInit(fetchMock).body).toBe('{"name":"Mira Vesk"}');
    expect(sentHeaders(fetchMock)['Content-Type']).toBe('application/json');
  });

  it('returns undefined for 204 No Content', async () => {
    const { client, fetchMock } = setup();
    fetchMock.mockResolvedValueOnce(new Response(null, { status: 204 }));

    await expect(client.post('/auth/logout')).resolves.toBeUndefined();
  });
});

describe('CSRF header', () => {
  it.each(['post', 'put', 'patch', 'delete'] as const)('is attached to %s', async (method) => {
    const { client, fetchMock } = setup();
    client.setCsrfToken('tok-123');
    fetchMock.mockResolvedValueOnce(json(200, {}));

    await (method === 'delete' ? client.delete('/things/1') : client[method]('/things/1', { a: 1 }));

    expect(sentHeaders(fetchMock)['x-csrf-token']).toBe('tok-123');
  });

  it('is not attached to GET', async () => {
    const { client, fetchMock } = setup();
    client.setCsrfToken('tok-123');
    fetchMock.mockResolvedValueOnce(json(200, {}));

    await client.get('/users');

    expect(sentHeaders(fetchMock)).not.toHaveProperty('x-csrf-token');
  });

  it('is left out while no token is known', async () => {
    const { client, fetchMock } = setup();
    fetchMock.mockResolvedValueOnce(json(200, {}));

    await client.post('/auth/login', { email: 'a@example.com', password: 'x' });

    expect(sentHeaders(fetchMock)).not.toHaveProperty('x-csrf-token');
  });
});

describe('errors', () => {
  it('turns the error envelope into an ApiError with status, code, message and fields', async () => {
    const { client, fetchMock } = setup();
    fetchMock.mockResolvedValueOnce(
      json(400, { error: { code: 'invalid_input', message: 'Check the marked fields', fields: { email: 'Enter a valid e-mail address' } } }),
    );

    const error = await caught(client.post('/users', {}));

    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      status: 400,
      code: 'invalid_input',
      message: 'Check the marked fields',
      fields: { email: 'Enter a valid e-mail address' },
    });
  });

  it('gives an empty fields object when the envelope has none', async () => {
    const { client, fetchMock } = setup();
    fetchMock.mockResolvedValueOnce(json(409, { error: { code: 'email_taken', message: 'That e-mail address is taken' } }));

    const error = (await caught(client.post('/users', {}))) as ApiError;

    expect(error.status).toBe(409);
    expect(error.code).toBe('email_taken');
    expect(error.fields).toEqual({});
  });

  it('still gives a typed ApiError when the body is not the envelope (a proxy error page)', async () => {
    const { client, fetchMock } = setup();
    fetchMock.mockResolvedValueOnce(new Response('<html>Bad Gateway</html>', { status: 502 }));

    const error = (await caught(client.get('/health'))) as ApiError;

    expect(error).toBeInstanceOf(ApiError);
    expect(error.status).toBe(502);
    expect(error.code).toBe('http_502');
    expect(error.message).not.toContain('<html>');
  });

  it('reports a success answer that is not JSON as bad_response', async () => {
    const { client, fetchMock } = setup();
    fetchMock.mockResolvedValueOnce(new Response('<!doctype html>', { status: 200 }));

    await expect(client.get('/users')).rejects.toMatchObject({ code: 'bad_response' });
  });

  it('turns a network failure into network_error with plain words', async () => {
    const { client, fetchMock } = setup();
    fetchMock.mockRejectedValueOnce(new TypeError('Failed to fetch'));

    const error = (await caught(client.get('/users'))) as ApiError;

    expect(error).toBeInstanceOf(ApiError);
    expect(error.status).toBe(0);
    expect(error.code).toBe('network_error');
    expect(error.message).toBe(NETWORK_ERROR_MESSAGE);
  });

  it('turns a request the server never answers into network_error once the timeout passes', async () => {
    vi.useFakeTimers();
    const { client, fetchMock } = setup({ timeoutMs: 5000 });
    fetchMock.mockImplementationOnce(
      (_url, init) =>
        new Promise<Response>((_resolve, reject) => {
          init?.signal?.addEventListener('abort', () => reject(new DOMException('aborted', 'AbortError')));
        }),
    );

    const pending = caught(client.get('/users'));
    await vi.advanceTimersByTimeAsync(5000);
    const error = (await pending) as ApiError;

    expect(error.code).toBe('network_error');
    expect(error.message).toContain('5 s');
  });

  it('passes a cancel by the caller through as the abort reason, not as an ApiError', async () => {
    const { client, fetchMock } = setup();
    fetchMock.mockImplementationOnce(
      (_url, init) =>
        new Promise<Response>((_resolve, reject) => {
          init?.signal?.addEventListener('abort', () => reject(init.signal?.reason));
        }),
    );
    const controller = new AbortController();
    const reason = new DOMException('query dropped', 'AbortError');

    const pending = caught(client.get('/users', { signal: controller.signal }));
    controller.abort(reason);

    expect(await pending).toBe(reason);
  });
});

describe('401 handling', () => {
  it('clears the session and the CSRF token and sends the user to sign-in, keeping the page they wanted', async () => {
    const { client, fetchMock, hooks } = setup({ currentPath: '/users?page=2' });
    client.setCsrfToken('tok-123');
    fetchMock.mockResolvedValueOnce(json(401, { error: { code: 'not_signed_in', message: 'Sign in first' } }));

    const error = await caught(client.patch('/users/3', { active: false }));

    expect(error).toMatchObject({ status: 401, code: 'not_signed_in' });
    expect(hooks.clearSession).toHaveBeenCalledTimes(1);
    expect(hooks.redirect).toHaveBeenCalledWith('/sign-in?redirectTo=%2Fusers%3Fpage%3D2');
    expect(client.getCsrfToken()).toBeNull();

    fetchMock.mockResolvedValueOnce(json(200, {}));
    await client.post('/auth/logout');
    expect(sentHeaders(fetchMock, 1)).not.toHaveProperty('x-csrf-token');
  });

  it('does not redirect when the user is already on the sign-in page', async () => {
    const { client, fetchMock, hooks } = setup({ currentPath: '/sign-in?redirectTo=%2Fusers' });
    fetchMock.mockResolvedValueOnce(json(401, { error: { code: 'not_signed_in', message: 'Sign in first' } }));

    await caught(client.get('/reports'));

    expect(hooks.clearSession).toHaveBeenCalledTimes(1);
    expect(hooks.redirect).not.toHaveBeenCalled();
  });

  it('leaves a wrong password to the form: no redirect, no cleared session', async () => {
    const { client, fetchMock, hooks } = setup();
    fetchMock.mockResolvedValueOnce(json(401, { error: { code: 'invalid_credentials', message: 'Wrong e-mail or password' } }));

    const error = await caught(client.post('/auth/login', { email: 'a@example.com', password: 'nope' }));

    expect(error).toMatchObject({ status: 401, code: 'invalid_credentials' });
    expect(hooks.clearSession).not.toHaveBeenCalled();
    expect(hooks.redirect).not.toHaveBeenCalled();
  });

  it('skips the handling for requests that expect a 401 (redirectOn401: false)', async () => {
    const { client, fetchMock, hooks } = setup();
    fetchMock.mockResolvedValueOnce(json(401, { error: { code: 'not_signed_in', message: 'Sign in first' } }));

    await caught(client.get('/auth/me', { redirectOn401: false }));

    expect(hooks.clearSession).not.toHaveBeenCalled();
    expect(hooks.redirect).not.toHaveBeenCalled();
  });

  it('does not treat 403 as signed out', async () => {
    const { client, fetchMock, hooks } = setup();
    fetchMock.mockResolvedValueOnce(json(403, { error: { code: 'forbidden', message: 'Your role may not do this' } }));

    await caught(client.get('/users'));

    expect(hooks.clearSession).not.toHaveBeenCalled();
    expect(hooks.redirect).not.toHaveBeenCalled();
  });
});
