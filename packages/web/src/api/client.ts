import { ApiError } from './ApiError';

/**
 * The one place the web app talks HTTP to the Sheaf server. Same origin only; cookies ride along
 * (`credentials: 'same-origin'`); every state-changing request carries the CSRF token the server
 * hands out at GET /api/auth/csrf; every error answer becomes an {@link ApiError}.
 */

export type HttpMethod = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export interface RequestOptions {
  method?: HttpMethod;
  body?: unknown;
  signal?: AbortSignal;
}

const CSRF_HEADER = 'x-csrf-token';
const UNSAFE_METHODS: ReadonlySet<HttpMethod> = new Set(['POST', 'PATCH', 'PUT', 'DELETE']);

let csrfToken: string | null = null;
let csrfTokenRequest: Promise<string> | null = null;

/** The session's CSRF token, fetched once and then reused. */
export async function getCsrfToken(): Promise<string> {
  if (csrfToken) return csrfToken;
  // Several mutations may start together; they share one token request.
  csrfTokenRequest ??= send<{ token: string }>('/api/auth/csrf', { method: 'GET' }, null)
    .then(({ token }) => {
      if (typeof token !== 'string' || token === '') {
        throw new ApiError(500, 'csrf', 'The server sent no CSRF token.');
      }
      csrfToken = token;
      return token;
    })
    .finally(() => {
      csrfTokenRequest = null;
    });
  return csrfTokenRequest;
}

/** The server issues a new token when the session changes: call after sign-in, sign-up, sign-out. */
export function forgetCsrfToken(): void {
  csrfToken = null;
}

/** Sends one request to the Sheaf API and returns its parsed JSON (undefined for 204). */
export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const method = options.method ?? 'GET';
  if (!UNSAFE_METHODS.has(method)) return send<T>(path, options, null);

  const token = await getCsrfToken();
  try {
    return await send<T>(path, options, token);
  } catch (error) {
    // A token from before a session change is refused once; fetch a fresh one and retry once.
    if (error instanceof ApiError && error.status === 403 && error.code === 'csrf') {
      forgetCsrfToken();
      return send<T>(path, options, await getCsrfToken());
    }
    throw error;
  }
}

async function send<T>(path: string, options: RequestOptions, token: string | null): Promise<T> {
  const method = options.method ?? 'GET';
  const headers: Record<string, string> = { accept: 'application/json' };
  if (options.body !== undefined) headers['content-type'] = 'application/json';
  if (token) headers[CSRF_HEADER] = token;

  let response: Response;
  try {
    response = await fetch(path, {
      method,
      headers,
      credentials: 'same-origin',
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, 'network', cause instanceof Error ? cause.message : 'network failure');
  }

  if (response.status === 204 || response.status === 202) {
    // 202 may carry a body; the callers of 202 endpoints need nothing from it.
    return undefined as T;
  }

  const text = await response.text();
  const json = parseJson(text);

  if (!response.ok) throw errorFromResponse(response, json);
  if (json === undefined) {
    throw new ApiError(
      response.status,
      'bad-response',
      `The server's answer to ${method} ${path} was not JSON.`,
    );
  }
  return json as T;
}

function parseJson(text: string): unknown {
  if (text === '') return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

function errorFromResponse(response: Response, json: unknown): ApiError {
  const body = isRecord(json) && isRecord(json.error) ? json.error : null;
  const code = typeof body?.code === 'string' ? body.code : `http-${response.status}`;
  const message =
    typeof body?.message === 'string' && body.message !== ''
      ? body.message
      : `The server answered ${response.status}${response.statusText ? ` ${response.statusText}` : ''}.`;
  const details = Array.isArray(body?.details)
    ? body.details.filter(isRecord).map((d) => ({
        field: typeof d.field === 'string' ? d.field : '',
        row: typeof d.row === 'number' ? d.row : undefined,
        column: typeof d.column === 'string' ? d.column : undefined,
        message: typeof d.message === 'string' ? d.message : '',
      }))
    : [];
  return new ApiError(response.status, code, message, details);
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null;
}
