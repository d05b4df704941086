// Load for the benchmark: autocannon runs over the device API (rotating through the fleet's tokens)
// and a signed-in person browsing the console at the same time.
import autocannon from "autocannon";
import type { BenchController } from "./fleet";

export type LoadResult = { requestsPerS: number; p50Ms: number; p99Ms: number; total: number; unexpected: number; errors: number; statusCounts: Record<string, number> };

export type Poll = BenchController & { etag?: string };

type Shape = { path: (c: Poll) => string; method?: "GET" | "POST"; headers?: (c: Poll) => Record<string, string>; body?: (c: Poll) => string; expect: number[] };

/** One autocannon run; every request goes to the next controller of `fleet` in turn. */
export async function drive(opts: { url: string; fleet: Poll[]; shape: Shape; connections: number; durationS: number; overallRate?: number }): Promise<LoadResult> {
  let next = 0;
  const result = await autocannon({
    url: opts.url,
    connections: opts.connections,
    duration: opts.durationS,
    ...(opts.overallRate ? { overallRate: opts.overallRate } : {}),
    requests: [
      {
        method: opts.shape.method ?? "GET",
        setupRequest: (req) => {
          const c = opts.fleet[next++ % opts.fleet.length]!;
          return { ...req, path: opts.shape.path(c), headers: { ...opts.shape.headers?.(c) }, ...(opts.shape.body ? { body: opts.shape.body(c) } : {}) };
        },
      },
    ],
  });
  const statusCounts: Record<string, number> = {};
  for (const [code, v] of Object.entries(result.statusCodeStats ?? {})) statusCounts[code] = Number(v.count ?? 0);
  const total = Object.values(statusCounts).reduce((a, b) => a + b, 0);
  const expected = opts.shape.expect.reduce((a, code) => a + (statusCounts[String(code)] ?? 0), 0);
  return {
    requestsPerS: result.requests.average,
    p50Ms: result.latency.p50,
    p99Ms: result.latency.p99,
    total,
    unexpected: total - expected,
    errors: result.errors + result.timeouts,
    statusCounts,
  };
}

const auth = (c: Poll) => ({ authorization: `Bearer ${c.token}` });

export const shapes = {
  notModified: { path: (c: Poll) => `/api/v1/controllers/${c.serial}/config`, headers: (c: Poll) => ({ ...auth(c), "if-none-match": c.etag ?? "" }), expect: [304] },
  full: { path: (c: Poll) => `/api/v1/controllers/${c.serial}/config`, headers: auth, expect: [200] },
  checkIn: {
    method: "POST" as const,
    path: (c: Poll) => `/api/v1/controllers/${c.serial}/check-ins`,
    headers: (c: Poll) => ({ ...auth(c), "content-type": "application/json" }),
    body: () =>
      JSON.stringify({ appliedHash: null, refusedReason: "benchmark", firmwareVersion: "1.4.2", uptimeS: 3600, counters: { doorCycles: 12, lastOpenCounts: 4200, lastCloseCounts: 4198, lastTravelMs: 9100, stallEvents: 0, timeFixAgeS: 600 } }),
    expect: [201],
  },
  referenceNotModified: (etag: string) => ({ path: () => "/api/v1/bench/reference", headers: () => ({ "if-none-match": etag }), expect: [304] }),
  referenceFull: { path: () => "/api/v1/bench/reference", expect: [200] },
  bareNotModified: (etag: string) => ({ path: () => "/", headers: () => ({ "if-none-match": etag }), expect: [304] }),
  bareFull: { path: () => "/", expect: [200] },
};

/** Fetches every controller's configuration once (concurrently), keeping its ETag for the 304 runs. */
export async function fetchEtags(base: string, fleet: Poll[], concurrency = 16): Promise<number> {
  let i = 0;
  let failures = 0;
  await Promise.all(
    Array.from({ length: concurrency }, async () => {
      while (i < fleet.length) {
        const c = fleet[i++]!;
        const r = await fetch(`${base}/api/v1/controllers/${c.serial}/config`, { headers: auth(c) });
        await r.arrayBuffer();
        if (r.status === 200) c.etag = r.headers.get("etag") ?? undefined;
        else failures++;
      }
    }),
  );
  return failures;
}

export type BrowseResult = { pages: number; errors: number; p50Ms: number; p99Ms: number; maxMs: number };

/** Signs in as the demo admin and loads console pages one after another until `stopAt`. */
export async function browse(base: string, stopAt: number): Promise<BrowseResult> {
  const signIn = await fetch(`${base}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: base },
    body: JSON.stringify({ email: "admin@hollowmere.example", password: "roostline-admin" }),
  });
  if (signIn.status !== 200) throw new Error(`the browsing user could not sign in (${signIn.status})`);
  const cookie = signIn.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  const pages = ["/", "/profiles", "/reviews", "/controllers", "/releases", "/sites", "/audit"];
  const times: number[] = [];
  let errors = 0;
  for (let k = 0; Date.now() < stopAt; k++) {
    const t0 = performance.now();
    const r = await fetch(`${base}${pages[k % pages.length]}`, { headers: { cookie }, redirect: "manual" });
    await r.arrayBuffer();
    times.push(performance.now() - t0);
    if (r.status !== 200) errors++;
    await new Promise((res) => setTimeout(res, 500));
  }
  times.sort((a, b) => a - b);
  const at = (q: number) => times[Math.min(times.length - 1, Math.floor(q * times.length))] ?? 0;
  return { pages: times.length, errors, p50Ms: at(0.5), p99Ms: at(0.99), maxMs: times[times.length - 1] ?? 0 };
}
