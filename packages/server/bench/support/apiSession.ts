/** A signed-in user talking JSON to the API, as the web app does (cookie, CSRF token, Origin). */
import { signIn } from './signIn';

export class ApiSession {
  private csrf = '';

  private constructor(
    readonly url: string,
    readonly cookie: string,
    readonly headers: Record<string, string>,
  ) {}

  /** `headers` go with every request (the bench sends `x-forwarded-proto: https` to a production server). */
  static async signIn(url: string, email: string, password: string, headers: Record<string, string> = {}): Promise<ApiSession> {
    const session = new ApiSession(url, await signIn(url, email, password, headers), headers);
    const token = (await session.request('GET', '/api/auth/csrf')) as { token: string };
    session.csrf = token.token;
    return session;
  }

  async request(method: string, path: string, body?: unknown): Promise<unknown> {
    const response = await fetch(`${this.url}${path}`, {
      method,
      headers: {
        ...this.headers,
        cookie: this.cookie,
        origin: this.url,
        'x-csrf-token': this.csrf,
        ...(body === undefined ? {} : { 'content-type': 'application/json' }),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await response.text();
    if (!response.ok) throw new Error(`${method} ${path} answered ${response.status}: ${text.slice(0, 300)}`);
    return text === '' ? undefined : JSON.parse(text);
  }
}
