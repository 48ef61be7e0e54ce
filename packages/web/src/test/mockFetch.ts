import { vi } from 'vitest';

/** One recorded request as the app sent it. */
export interface SentRequest {
  method: string;
  path: string;
  headers: Record<string, string>;
  body: unknown;
  credentials: RequestCredentials | undefined;
}

export type Reply = { status?: number; body?: unknown; text?: string };
/** A reply, or a function of the request that returns one (or a promise of one). */
export type Handler = Reply | ((request: SentRequest) => Reply | Promise<Reply>);

/**
 * Replaces the global fetch with a table of routes keyed "METHOD /path" (query string included
 * when the key has one, ignored otherwise). Unknown routes answer 404 in the API's error shape,
 * so a test sees exactly which request it forgot to expect.
 */
export function mockFetch(routes: Record<string, Handler>) {
  const sent: SentRequest[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const url = new URL(typeof input === 'string' ? input : input.toString(), 'http://localhost');
    const method = (init.method ?? 'GET').toUpperCase();
    const headers: Record<string, string> = {};
    new Headers(init.headers).forEach((value, key) => {
      headers[key] = value;
    });
    const request: SentRequest = {
      method,
      path: url.pathname + url.search,
      headers,
      body: typeof init.body === 'string' ? JSON.parse(init.body) : undefined,
      credentials: init.credentials,
    };
    sent.push(request);
    const handler =
      routes[`${method} ${url.pathname}${url.search}`] ?? routes[`${method} ${url.pathname}`];
    const reply: Reply = handler
      ? typeof handler === 'function'
        ? await handler(request)
        : handler
      : {
          status: 404,
          body: { error: { code: 'not-found', message: `no mock for ${method} ${request.path}` } },
        };
    const status = reply.status ?? 200;
    const text = reply.text ?? (reply.body === undefined ? '' : JSON.stringify(reply.body));
    return new Response(status === 204 ? null : text, {
      status,
      headers: { 'content-type': reply.text !== undefined ? 'text/plain' : 'application/json' },
    });
  });
  vi.stubGlobal('fetch', fetchMock);
  return {
    sent,
    /** The requests sent to `METHOD /path` (path without query string). */
    to(method: string, path: string) {
      return sent.filter((r) => r.method === method && r.path.split('?')[0] === path);
    },
  };
}
