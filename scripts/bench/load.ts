// One autocannon run and the figures `npm run bench` prints for it. Latency percentiles are computed
// from every response's own time (autocannon's summary has p90 and p97.5 but no p95), so p50, p95 and
// p99 come from the same list of responses, whatever their status.
import autocannon from "autocannon";

export interface LoadFigures {
  requestsPerSecond: number;
  p50Ms: number;
  p95Ms: number;
  p99Ms: number;
  /** Connection errors and timeouts. */
  errors: number;
  /** Responses with a status outside 200–299. */
  non2xx: number;
  responses: number;
}

/** A request to load, named as the report names it; `server` says whose memory the run is about. */
export interface LoadTarget extends Omit<LoadOptions, "seconds" | "connections"> {
  name: string;
  server: "app" | "bare";
}

export interface LoadOptions {
  url: string;
  method?: "GET" | "POST";
  headers?: Record<string, string>;
  body?: string;
  seconds: number;
  connections?: number;
}

/** Nearest-rank percentile of an ascending list. */
export function percentile(sorted: ArrayLike<number>, pct: number) {
  if (sorted.length === 0) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((pct / 100) * sorted.length) - 1))];
}

export function load(opts: LoadOptions): Promise<LoadFigures> {
  const times: number[] = [];
  return new Promise((resolve, reject) => {
    const instance = autocannon(
      {
        url: opts.url,
        method: opts.method ?? "GET",
        headers: opts.headers,
        body: opts.body,
        connections: opts.connections ?? 32,
        duration: opts.seconds,
      },
      (error, result) => {
        if (error) return reject(error);
        const sorted = Float64Array.from(times).sort();
        resolve({
          requestsPerSecond: result.requests.average,
          p50Ms: percentile(sorted, 50),
          p95Ms: percentile(sorted, 95),
          p99Ms: percentile(sorted, 99),
          errors: result.errors + result.timeouts,
          non2xx: result.non2xx,
          responses: sorted.length,
        });
      },
    );
    instance.on("response", (_client, _status, _bytes, responseTimeMs) => times.push(responseTimeMs));
  });
}
