// A test client over real HTTP: keeps the session cookie and the CSRF token,
// never throws on a status, so each test says which status it expects.
export interface Reply<T = any> {
  status: number;
  body: T;
  headers: Headers;
}

export class TestClient {
  private cookies = new Map<string, string>();
  csrfToken: string | null = null;

  constructor(readonly baseUrl: string) {}

  get cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }

  async request<T = any>(method: string, path: string, body?: unknown, options: { csrf?: boolean; headers?: Record<string, string> } = {}): Promise<Reply<T>> {
    const headers: Record<string, string> = { accept: 'application/json', ...options.headers };
    if (body !== undefined && !(body instanceof FormData)) headers['content-type'] ??= 'application/json';
    if (this.cookies.size) headers.cookie = this.cookieHeader;
    if (method !== 'GET' && options.csrf !== false && this.csrfToken) headers['x-csrf-token'] = this.csrfToken;
    const res = await fetch(this.baseUrl + path, {
      method,
      headers,
      body: body === undefined ? undefined : body instanceof FormData || typeof body === 'string' ? body : JSON.stringify(body),
      redirect: 'manual',
    });
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(';');
      const eq = pair!.indexOf('=');
      const name = pair!.slice(0, eq);
      const value = pair!.slice(eq + 1);
      if (value === '' || /expires=Thu, 01 Jan 1970/i.test(c)) this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
    const text = await res.text();
    let parsed: unknown = text;
    try {
      parsed = text ? JSON.parse(text) : null;
    } catch {
      /* not JSON: keep the text */
    }
    return { status: res.status, body: parsed as T, headers: res.headers };
  }

  get<T = any>(path: string) {
    return this.request<T>('GET', path);
  }
  post<T = any>(path: string, body?: unknown, options?: { csrf?: boolean }) {
    return this.request<T>('POST', path, body ?? {}, options);
  }
  patch<T = any>(path: string, body?: unknown, options?: { csrf?: boolean }) {
    return this.request<T>('PATCH', path, body ?? {}, options);
  }

  async login(email: string, password: string): Promise<Reply> {
    const r = await this.post('/api/auth/login', { email, password });
    if (r.status === 200) this.csrfToken = r.body.csrfToken;
    return r;
  }
}

export const DEMO_PASSWORD = 'polecourt-demo';
export const DEMO = {
  admin: 'admin@example.com',
  systems_engineer: 'systems@example.com',
  controls_engineer: 'controls@example.com',
  auditor: 'auditor@example.com',
} as const;

export async function signedIn(baseUrl: string, role: keyof typeof DEMO): Promise<TestClient> {
  const c = new TestClient(baseUrl);
  const r = await c.login(DEMO[role], DEMO_PASSWORD);
  if (r.status !== 200) throw new Error(`could not sign in as ${role}: ${r.status} ${JSON.stringify(r.body)}`);
  return c;
}
