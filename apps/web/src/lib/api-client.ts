// The one HTTP client of the web app. JSON in and out, cookies on the same origin, the CSRF
// header on every state-changing request, the contract's error envelope turned into ApiError,
// and a 401 (session gone) handled here, once, for every request.
import type { ApiErrorBody } from '@polecourt/contracts';

import { env } from '@/config/env';
import { SIGN_IN_PATH, signInPath } from '@/lib/sign-in-path';

export class ApiError extends Error {
  override readonly name = 'ApiError';
  readonly status: number;
  readonly code: string;
  readonly fields: Record<string, string>;
  /** The whole error body, for routes that send more beside the envelope (an upload's per-row report). */
  readonly body: unknown;

  constructor(init: { status: number; code: string; message: string; fields?: Record<string, string> | undefined; body?: unknown }) {
    super(init.message);
    this.status = init.status;
    this.code = init.code;
    this.fields = init.fields ?? {};
    this.body = init.body;
  }
}

export function isApiError(value: unknown): value is ApiError {
  return value instanceof ApiError;
}

export type QueryParams = Record<string, string | number | boolean | null | undefined>;

export interface RequestOptions {
  query?: QueryParams;
  body?: unknown;
  signal?: AbortSignal;
  headers?: Record<string, string>;
  /** false for requests where a 401 is an expected answer (sign-in, "who am I"). */
  redirectOn401?: boolean;
}

/** What the client does when the server says the session is gone. The app wires these to its router and cache. */
export interface UnauthorizedHooks {
  clearSession: () => void;
  redirect: (to: string) => void;
  currentPath: () => string;
}

export interface ApiClientOptions {
  baseUrl: string;
  timeoutMs?: number;
  fetch?: typeof fetch;
  unauthorized?: UnauthorizedHooks;
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

const STATE_CHANGING: ReadonlySet<Method> = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

// A 401 with this code means "wrong password", not "session gone": the form shows it, nobody is redirected.
const CREDENTIAL_CODES: ReadonlySet<string> = new Set(['invalid_credentials', 'invalid_password']);

export const NETWORK_ERROR_MESSAGE =
  'Could not reach the Polecourt server. Check your network connection and try again.';

const browserHooks: UnauthorizedHooks = {
  clearSession: () => {},
  redirect: (to) => {
    if (typeof window !== 'undefined') window.location.assign(to);
  },
  currentPath: () => (typeof window === 'undefined' ? '/' : window.location.pathname + window.location.search),
};

function fallbackMessage(status: number): string {
  if (status === 401) return 'You are not signed in.';
  if (status === 403) return 'Your role may not do this.';
  if (status === 404) return 'Not found.';
  if (status === 413) return 'What you sent is too large.';
  if (status === 429) return 'Too many tries. Wait a moment and try again.';
  if (status === 503) return 'The database is not available right now. Try again in a minute.';
  if (status >= 500) return 'The server hit a problem. Try again; if it keeps happening, tell your administrator.';
  return `The request failed (HTTP ${status}).`;
}

function isErrorBody(value: unknown): value is ApiErrorBody {
  if (typeof value !== 'object' || value === null || !('error' in value)) return false;
  const error = (value as { error: unknown }).error;
  if (typeof error !== 'object' || error === null) return false;
  const { code, message, fields } = error as Record<string, unknown>;
  return (
    typeof code === 'string' &&
    typeof message === 'string' &&
    (fields === undefined || (typeof fields === 'object' && fields !== null))
  );
}

function stringFields(fields: Record<string, unknown> | undefined): Record<string, string> | undefined {
  if (!fields) return undefined;
  return Object.fromEntries(Object.entries(fields).map(([k, v]) => [k, typeof v === 'string' ? v : String(v)]));
}

const UNREADABLE = Symbol('unreadable');

async function readBody(response: Response): Promise<unknown> {
  if (response.status === 204 || response.status === 205) return undefined;
  const text = await response.text();
  if (text.trim() === '') return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return UNREADABLE;
  }
}

function buildUrl(baseUrl: string, path: string, query: QueryParams | undefined): string {
  const url = `${baseUrl}${path.startsWith('/') ? path : `/${path}`}`;
  if (!query) return url;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== null) params.set(key, String(value));
  }
  const search = params.toString();
  return search ? `${url}${url.includes('?') ? '&' : '?'}${search}` : url;
}

export function createApiClient(options: ApiClientOptions) {
  const baseUrl = options.baseUrl.replace(/\/+$/, '');
  const timeoutMs = options.timeoutMs ?? 20_000;
  // Looked up on each call (not captured) so a test or polyfill replacing globalThis.fetch is honoured.
  const doFetch: typeof fetch = options.fetch ?? ((input, init) => globalThis.fetch(input, init));
  let hooks: UnauthorizedHooks = options.unauthorized ?? browserHooks;
  let csrfToken: string | null = null;

  function handleUnauthorized(): void {
    csrfToken = null;
    const from = hooks.currentPath();
    const onSignIn = from === SIGN_IN_PATH || from.startsWith(`${SIGN_IN_PATH}?`);
    // Clear first, so the sign-in page (reached by the redirect) sees nobody signed in.
    hooks.clearSession();
    if (!onSignIn) hooks.redirect(signInPath(from));
  }

  async function request<T>(method: Method, path: string, opts: RequestOptions = {}): Promise<T> {
    const headers: Record<string, string> = { Accept: 'application/json', ...opts.headers };
    let body: BodyInit | undefined;
    if (opts.body instanceof FormData) {
      body = opts.body; // the browser sets the multipart boundary itself
    } else if (opts.body !== undefined) {
      headers['Content-Type'] = 'application/json';
      body = JSON.stringify(opts.body);
    }
    if (STATE_CHANGING.has(method) && csrfToken) headers['x-csrf-token'] = csrfToken;

    // One controller for both the caller's cancel and our timeout, so either stops the fetch.
    const controller = new AbortController();
    let timedOut = false;
    const timer = setTimeout(() => {
      timedOut = true;
      controller.abort();
    }, timeoutMs);
    const onCallerAbort = () => controller.abort(opts.signal?.reason);
    if (opts.signal?.aborted) controller.abort(opts.signal.reason);
    else opts.signal?.addEventListener('abort', onCallerAbort, { once: true });

    let response: Response;
    let payload: unknown;
    try {
      response = await doFetch(buildUrl(baseUrl, path, opts.query), {
        method,
        headers,
        body: body ?? null,
        credentials: 'same-origin',
        signal: controller.signal,
      });
      payload = await readBody(response);
    } catch (cause) {
      // A cancel by the caller (React Query dropping a stale query) is not an error to show.
      if (opts.signal?.aborted) throw opts.signal.reason ?? cause;
      throw new ApiError({
        status: 0,
        code: 'network_error',
        message: timedOut
          ? `The Polecourt server did not answer within ${Math.round(timeoutMs / 1000)} s. Try again.`
          : NETWORK_ERROR_MESSAGE,
      });
    } finally {
      clearTimeout(timer);
      opts.signal?.removeEventListener('abort', onCallerAbort);
    }

    if (!response.ok) {
      const error = isErrorBody(payload)
        ? new ApiError({
            status: response.status,
            code: payload.error.code,
            message: payload.error.message,
            fields: stringFields(payload.error.fields),
            body: payload,
          })
        : new ApiError({ status: response.status, code: `http_${response.status}`, message: fallbackMessage(response.status) });
      if (response.status === 401 && opts.redirectOn401 !== false && !CREDENTIAL_CODES.has(error.code)) {
        handleUnauthorized();
      }
      throw error;
    }
    if (payload === UNREADABLE) {
      throw new ApiError({
        status: response.status,
        code: 'bad_response',
        message: 'The server sent an answer Polecourt could not read. Try again.',
      });
    }
    return payload as T;
  }

  return {
    request,
    get: <T>(path: string, opts?: Omit<RequestOptions, 'body'>) => request<T>('GET', path, opts),
    post: <T>(path: string, body?: unknown, opts?: RequestOptions) => request<T>('POST', path, { ...opts, body }),
    put: <T>(path: string, body?: unknown, opts?: RequestOptions) => request<T>('PUT', path, { ...opts, body }),
    patch: <T>(path: string, body?: unknown, opts?: RequestOptions) => request<T>('PATCH', path, { ...opts, body }),
    delete: <T>(path: string, opts?: RequestOptions) => request<T>('DELETE', path, opts),
    /** Kept in memory only (never in storage): a fresh one comes with every sign-in and every GET /auth/me. */
    setCsrfToken: (token: string | null) => {
      csrfToken = token;
    },
    getCsrfToken: () => csrfToken,
    setUnauthorizedHooks: (next: UnauthorizedHooks) => {
      hooks = next;
    },
  };
}

export type ApiClient = ReturnType<typeof createApiClient>;

export const api: ApiClient = createApiClient({ baseUrl: env.apiBaseUrl, timeoutMs: env.requestTimeoutMs });
