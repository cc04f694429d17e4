// A bounded autocannon run against a loopback URL, with p50/p95 computed from every response
// time (autocannon's own summary has no p95).
import autocannon from "autocannon";
import { quantileSorted } from "simple-statistics";

export type LoadResult = { requestsPerSec: number; p50Ms: number; p95Ms: number; errors: number; non2xx: number; total: number };

export async function load(opts: { url: string; connections: number; durationSec: number; headers?: Record<string, string> }): Promise<LoadResult> {
  if (!/^http:\/\/(127\.\d+\.\d+\.\d+|localhost)(:\d+)?\//.test(opts.url)) throw new Error("benchmarks only target loopback");
  const times: number[] = [];
  const result = await autocannon({
    url: opts.url,
    connections: opts.connections,
    duration: opts.durationSec,
    headers: opts.headers,
    setupClient: (client) => {
      client.on("response", (_status: number, _bytes: number, responseTime: number) => times.push(responseTime));
    },
  });
  times.sort((a, b) => a - b);
  return {
    requestsPerSec: result.requests.average,
    p50Ms: times.length ? quantileSorted(times, 0.5) : NaN,
    p95Ms: times.length ? quantileSorted(times, 0.95) : NaN,
    errors: result.errors + result.timeouts,
    non2xx: result.non2xx,
    total: result.requests.total,
  };
}

export function row(label: string, r: LoadResult): string {
  return `${label.padEnd(34)} ${r.requestsPerSec.toFixed(0).padStart(8)} req/s   p50 ${r.p50Ms.toFixed(1).padStart(6)} ms   p95 ${r.p95Ms.toFixed(1).padStart(6)} ms   errors ${r.errors}   non-2xx ${r.non2xx}`;
}
