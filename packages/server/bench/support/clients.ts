import WebSocket from 'ws';

/** A WebSocket class that sends the session cookie and an Origin, as a browser page would. */
export function socketClass(cookie: string, origin: string): new (address: string, protocols?: string | string[]) => WebSocket {
  return class extends WebSocket {
    constructor(address: string, protocols?: string | string[]) {
      super(address, protocols, { headers: { cookie, origin } });
    }
  };
}

export function percentile(sorted: number[], fraction: number): number {
  const index = Math.min(sorted.length - 1, Math.max(0, Math.ceil(fraction * sorted.length) - 1));
  return sorted[index] ?? Number.NaN;
}

export async function until(check: () => boolean, timeoutMs: number): Promise<boolean> {
  const deadline = Date.now() + timeoutMs;
  while (!check()) {
    if (Date.now() > deadline) return false;
    await new Promise((resolve) => setTimeout(resolve, 1));
  }
  return true;
}
