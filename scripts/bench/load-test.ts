import autocannon from 'autocannon';

export interface LoadResult {
  requestsPerSec: number;
  p50: number;
  p95: number;
  p99: number;
  /** Responses other than 2xx/3xx, plus connection errors and timeouts. */
  failures: number;
  responses: number;
}

/** Nearest-rank percentile of sorted values. */
function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return Number.NaN;
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(p * sorted.length) - 1))]!;
}

/**
 * Loads one URL with autocannon for `seconds` at `connections` concurrent connections and reports the
 * request rate and the 50th/95th/99th percentile latencies over every response (autocannon's own summary
 * has no 95th percentile, so each response time is kept). With `nextPath`, each request asks for the path it returns.
 */
export function loadTest(
  url: string,
  opts: { connections: number; seconds: number; headers?: Record<string, string>; /** A path per request, instead of the URL's. */ nextPath?: () => string },
): Promise<LoadResult> {
  const times: number[] = [];
  let failures = 0;
  return new Promise((resolve, reject) => {
    const nextPath = opts.nextPath;
    const requests = nextPath ? [{ setupRequest: (req: autocannon.Request) => ({ ...req, path: nextPath() }) }] : undefined;
    const instance = autocannon({ url, connections: opts.connections, duration: opts.seconds, headers: opts.headers, timeout: 20, requests }, (err, result) => {
      if (err) return reject(err);
      times.sort((a, b) => a - b);
      resolve({
        requestsPerSec: result.requests.average,
        p50: percentile(times, 0.5),
        p95: percentile(times, 0.95),
        p99: percentile(times, 0.99),
        failures: failures + result.errors + result.timeouts,
        responses: times.length,
      });
    });
    instance.on('response', (_client, statusCode, _bytes, responseTime) => {
      times.push(responseTime);
      if (statusCode >= 400) failures++;
    });
  });
}
