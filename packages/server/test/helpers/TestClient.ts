/* eslint-disable @typescript-eslint/no-explicit-any -- tests read JSON answers loosely and assert on them */
/** One HTTP answer, with the body parsed when it is JSON. */
export interface TestResponse<T = any> {
  status: number;
  headers: Headers;
  body: T;
  text: string;
  /** The Location header of a redirect. */
  location: string | null;
}

export interface RequestOptions {
  body?: unknown;
  headers?: Record<string, string>;
  /** Send the session's CSRF token on a state-changing request (default true). */
  csrf?: boolean;
  /** A raw body sent as is (for malformed JSON). */
  rawBody?: string;
}

const SESSION_COOKIE = 'sheaf.sid';

/**
 * A browser stand-in for tests: keeps cookies like a browser's jar (one host), fetches and
 * sends the CSRF token on state-changing requests, and forgets the token whenever the server
 * issues a new session (sign-in, sign-out), as the web app must.
 */
export class TestClient {
  private readonly cookies = new Map<string, string>();
  private csrfToken: string | undefined;

  constructor(readonly baseUrl: string) {}

  get sessionId(): string | undefined {
    return this.cookies.get(SESSION_COOKIE);
  }

  cookieHeader(): string {
    return [...this.cookies].map(([name, value]) => `${name}=${value}`).join('; ');
  }

  private remember(headers: Headers): void {
    for (const line of headers.getSetCookie()) {
      const [pair, ...attributes] = line.split(';');
      const eq = (pair ?? '').indexOf('=');
      if (eq < 0) continue;
      const name = (pair ?? '').slice(0, eq).trim();
      const value = (pair ?? '').slice(eq + 1).trim();
      const expired = attributes.some((a) => {
        const [key, val] = a.trim().split('=');
        if (key?.toLowerCase() === 'max-age') return Number(val) <= 0;
        if (key?.toLowerCase() === 'expires') return new Date(val ?? '').getTime() < Date.now();
        return false;
      });
      const before = this.cookies.get(name);
      if (expired || value === '') this.cookies.delete(name);
      else this.cookies.set(name, value);
      if (name === SESSION_COOKIE && before !== this.cookies.get(name)) this.csrfToken = undefined;
    }
  }

  /** A request to a path on the server, or to an absolute URL (redirects are not followed). */
  async request<T = any>(method: string, pathOrUrl: string, options: RequestOptions = {}): Promise<TestResponse<T>> {
    const url = pathOrUrl.startsWith('http') ? pathOrUrl : `${this.baseUrl}${pathOrUrl}`;
    const headers: Record<string, string> = { accept: 'application/json', ...options.headers };
    const changing = !['GET', 'HEAD', 'OPTIONS'].includes(method.toUpperCase());
    // The token first: fetching it may start the session whose cookie goes with this request.
    if (changing && options.csrf !== false && url.startsWith(`${this.baseUrl}/api/`)) {
      headers['x-csrf-token'] = await this.csrf();
    }
    const cookie = this.cookieHeader();
    if (cookie) headers.cookie = cookie;
    let body: string | undefined;
    if (options.rawBody !== undefined) {
      body = options.rawBody;
      headers['content-type'] ??= 'application/json';
    } else if (options.body !== undefined) {
      body = JSON.stringify(options.body);
      headers['content-type'] = 'application/json';
    }
    const response = await fetch(url, { method, headers, body, redirect: 'manual' });
    this.remember(response.headers);
    const text = await response.text();
    let parsed: unknown = text;
    if ((response.headers.get('content-type') ?? '').includes('application/json') && text) parsed = JSON.parse(text);
    return { status: response.status, headers: response.headers, body: parsed as T, text, location: response.headers.get('location') };
  }

  /** The session's CSRF token, fetched once per session. */
  async csrf(): Promise<string> {
    if (!this.csrfToken) {
      const response = await this.request<{ token: string }>('GET', '/api/auth/csrf');
      if (response.status !== 200) throw new Error(`GET /api/auth/csrf answered ${response.status}`);
      this.csrfToken = response.body.token;
    }
    return this.csrfToken;
  }

  get<T = any>(path: string, options?: RequestOptions) {
    return this.request<T>('GET', path, options);
  }
  post<T = any>(path: string, body?: unknown, options?: RequestOptions) {
    return this.request<T>('POST', path, { ...options, body });
  }
  patch<T = any>(path: string, body?: unknown, options?: RequestOptions) {
    return this.request<T>('PATCH', path, { ...options, body });
  }
  delete<T = any>(path: string, options?: RequestOptions) {
    return this.request<T>('DELETE', path, options);
  }

  /** Signs in with e-mail and password; throws unless the server says 200. */
  async signIn(email: string, password: string): Promise<void> {
    const response = await this.post('/api/auth/signin', { email, password });
    if (response.status !== 200) throw new Error(`sign-in as ${email} answered ${response.status}: ${response.text}`);
  }
}
