/** One autocannon run against a GET route, with exact percentiles from every response's time. */
import autocannon from 'autocannon';
import { percentile } from './clients';

export interface HttpRun {
  connections: number;
  /** Offered load in requests per second; undefined runs as fast as the server answers. */
  rate?: number;
  seconds: number;
}

export interface HttpFigures {
  requestsPerSecond: number;
  p50: number;
  p95: number;
  p99: number;
  /** Answers that were not 2xx, plus connection errors and timeouts. */
  failures: number;
  responses: number;
}

export async function loadRoute(url: string, headers: Record<string, string>, run: HttpRun): Promise<HttpFigures> {
  const times: number[] = [];
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon(
      {
        url,
        headers,
        connections: run.connections,
        duration: run.seconds,
        ...(run.rate === undefined ? {} : { overallRate: run.rate }),
      },
      (error, done) => (error ? reject(error) : resolve(done)),
    );
    instance.on('response', (_client: unknown, _status: number, _bytes: number, responseTime: number) => times.push(responseTime));
  });
  times.sort((a, b) => a - b);
  return {
    requestsPerSecond: result.requests.total / result.duration,
    p50: percentile(times, 0.5),
    p95: percentile(times, 0.95),
    p99: percentile(times, 0.99),
    failures: result.non2xx + result.errors + result.timeouts,
    responses: times.length,
  };
}
