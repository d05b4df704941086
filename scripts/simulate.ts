// A fleet of pretend controllers against a server on this machine: each polls its signed
// configuration, verifies it with the published key, "applies" it and checks in with plausible
// counters. `npm run simulate -- --controllers 50 --interval-s 5 [--base-url http://127.0.0.1:3000]
// [--tokens .data/demo-controllers-roostline.json] [--duration-s 60] [--once] [--seed 1] [--progress-s 5]
// [--state FILE]`. With --state each controller remembers its ETag, applied hash and counters
// between runs, as a real one does across restarts; without it every run starts from nothing.
//
// The tokens file is a JSON array; the demo seed writes one per database as
// .data/demo-controllers-<database>.json (the demo's is .data/demo-controllers-roostline.json):
//   [{ "serial": "HM350-0001", "token": "rlc_…", "firmwareVersion": "1.4.2" }, …]
// firmwareVersion is optional (default 1.4.2); the first --controllers entries are used.
import { createPublicKey, type KeyObject } from "node:crypto";
import { readFile, rename, writeFile } from "node:fs/promises";
import { pathToFileURL } from "node:url";
import { parseArgs } from "node:util";
import { z } from "zod";
import { CliError, kebabFlag, parseCliInput } from "@/lib/cli/types";
import { verifyPayload } from "@/lib/fleet/signing";
import { zodIssues } from "@/lib/http/validation";
import { canonicalJson, contentHash } from "@/lib/profiles/canonical";

/** Whether a URL points at this machine (127.0.0.0/8, ::1 or localhost) over HTTP(S). */
export function isLoopbackUrl(value: string): boolean {
  let url: URL;
  try {
    url = new URL(value);
  } catch {
    return false;
  }
  if (url.protocol !== "http:" && url.protocol !== "https:") return false;
  return url.hostname === "localhost" || url.hostname === "[::1]" || /^127\.\d{1,3}\.\d{1,3}\.\d{1,3}$/.test(url.hostname);
}

export const simulateSchema = z.object({
  controllers: z.coerce.number({ error: "must be a number" }).int("must be a whole number").min(1, "must be at least 1").max(10_000, "must be at most 10000").default(50),
  intervalS: z.coerce.number({ error: "must be a number" }).positive("must be greater than 0").max(86_400, "must be at most 86400").default(5),
  // Load from a script must never reach someone else's server.
  baseUrl: z.string().refine(isLoopbackUrl, "must be a loopback address such as http://127.0.0.1:3000 (127.x.x.x, [::1] or localhost); the simulator only sends traffic to this machine").default("http://127.0.0.1:3000"),
  tokens: z.string().min(1, "must name a file").default(".data/demo-controllers-roostline.json"),
  durationS: z.coerce.number({ error: "must be a number" }).positive("must be greater than 0").max(86_400, "must be at most 86400").default(60),
  once: z.boolean().default(false),
  seed: z.coerce.number({ error: "must be a number" }).int("must be a whole number").default(1),
  progressS: z.coerce.number({ error: "must be a number" }).positive("must be greater than 0").default(5),
  state: z.string().min(1, "must name a file").optional(),
});
export type SimulateOptions = z.input<typeof simulateSchema>;

const tokensFileSchema = z
  .array(
    z.object({
      serial: z.string({ error: "must be the controller's serial" }).min(1, "must be the controller's serial"),
      token: z.string({ error: "must be the controller's token (rlc_…)" }).regex(/^[A-Za-z0-9_-]{10,200}$/, "must be the controller's token (rlc_…)"),
      firmwareVersion: z.string().regex(/^\d+\.\d+\.\d+$/, "must be a version such as 1.4.2").optional(),
    }),
  )
  .min(1, "lists no controllers");

export type FetchLike = (url: string, init: RequestInit) => Promise<Response>;

export type SimulationSummary = {
  controllers: number;
  requests: number;
  ok: number;
  notModified: number;
  notFound: number;
  checkIns: number;
  throttled: number;
  errors: number;
  verified: number;
  refused: number;
  p50Ms: number | null;
  p99Ms: number | null;
  errorSamples: string[];
  exitCode: 0 | 1;
};

// The demo drive turns at about 4,000 counts/s; the cord stretches a little every cycle.
const NOMINAL_COUNTS_PER_S = 4000;
const CORD_STRETCH_PER_CYCLE = 0.0002;
const STALL_CHANCE = 1 / 200;
const MAX_COUNT = 4_294_967_295;
const LATENCY_WINDOW = 10_000;
const MAX_ERROR_SAMPLES = 10;

/** mulberry32: a small seeded PRNG, so runs with the same --seed draw the same numbers. */
function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

type Device = {
  serial: string;
  token: string;
  firmwareVersion: string;
  rng: () => number;
  etag: string | null;
  appliedHash: string | null;
  closeTravelCounts: number;
  cyclesSinceApplied: number;
  doorCycles: number;
  stallEvents: number;
  uptimeS: number;
  timeFixAgeS: number | null;
  lastOpenCounts: number | null;
  lastCloseCounts: number | null;
  lastTravelMs: number | null;
};

// What --state keeps of a controller between runs (not its token or random stream).
const savedSchema = z.record(
  z.string(),
  z.object({
    etag: z.string().nullable(),
    appliedHash: z.string().nullable(),
    closeTravelCounts: z.number(),
    cyclesSinceApplied: z.number(),
    doorCycles: z.number(),
    stallEvents: z.number(),
    uptimeS: z.number(),
    timeFixAgeS: z.number().nullable(),
    lastOpenCounts: z.number().nullable(),
    lastCloseCounts: z.number().nullable(),
    lastTravelMs: z.number().nullable(),
  }),
);
type Saved = z.infer<typeof savedSchema>;

async function readSaved(path: string | undefined): Promise<Saved> {
  if (!path) return {};
  let text: string;
  try {
    text = await readFile(path, "utf8");
  } catch (err) {
    if ((err as { code?: string }).code === "ENOENT") return {};
    throw new CliError(`--state ${path}: ${(err as Error).message}`);
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (err) {
    throw new CliError(`--state ${path}: not valid JSON (${(err as Error).message}); delete it to start afresh`);
  }
  const parsed = savedSchema.safeParse(value);
  if (!parsed.success) throw new CliError(`--state ${path}: ${zodIssues(parsed.error)[0]!.path || "the file"}: ${zodIssues(parsed.error)[0]!.message}; delete it to start afresh`);
  return parsed.data;
}

async function writeSaved(path: string, devices: Device[]) {
  const out: Saved = {};
  for (const { serial, token: _t, firmwareVersion: _f, rng: _r, ...kept } of devices) out[serial] = kept;
  // Written beside and renamed, so an interrupted run never leaves half a file.
  await writeFile(`${path}.tmp`, JSON.stringify(out, null, 2) + "\n");
  await rename(`${path}.tmp`, path);
}

function newDevice(entry: z.infer<typeof tokensFileSchema>[number], index: number, seed: number): Device {
  const rng = prng(Math.imul(seed, 0x9e3779b1) ^ Math.imul(index + 1, 0x85ebca6b));
  return {
    serial: entry.serial,
    token: entry.token,
    firmwareVersion: entry.firmwareVersion ?? "1.4.2",
    rng,
    etag: null,
    appliedHash: null,
    closeTravelCounts: 16_000 + Math.floor(rng() * 2000),
    cyclesSinceApplied: 0,
    doorCycles: 2 * Math.floor(rng() * 1000),
    stallEvents: Math.floor(rng() * 5),
    uptimeS: Math.floor(rng() * 30 * 86_400),
    timeFixAgeS: Math.floor(rng() * 3600),
    lastOpenCounts: null,
    lastCloseCounts: null,
    lastTravelMs: null,
  };
}

// One interval stands for one day: the door opens at dawn and closes at dusk.
function liveOneDay(d: Device) {
  for (let i = 0; i < 2; i++) {
    d.doorCycles = Math.min(MAX_COUNT, d.doorCycles + 1);
    d.cyclesSinceApplied++;
    const close = Math.round(d.closeTravelCounts * (1 + CORD_STRETCH_PER_CYCLE) ** d.cyclesSinceApplied);
    d.lastCloseCounts = Math.min(MAX_COUNT, close);
    // The open sensor trips a few counts before the counted end.
    d.lastOpenCounts = Math.max(0, d.lastCloseCounts - Math.floor(d.rng() * 12));
    d.lastTravelMs = Math.round((d.lastCloseCounts / NOMINAL_COUNTS_PER_S) * 1000 * (0.97 + 0.06 * d.rng()));
    if (d.rng() < STALL_CHANCE) d.stallEvents++;
  }
  d.uptimeS = Math.min(MAX_COUNT, d.uptimeS + 86_400);
  // The long-wave signal is usually caught at night; some nights it is not.
  d.timeFixAgeS = d.rng() < 0.8 ? Math.floor(d.rng() * 3600) : Math.min(MAX_COUNT, (d.timeFixAgeS ?? 0) + 86_400);
}

export type ConfigCheck = { ok: true; contentHash: string; closeTravelCounts: number | null } | { ok: false; reason: string };

/** What a controller decides about a served configuration: verified (signature, serial, content hash) or refused with a reason. */
export function checkConfiguration(body: unknown, serial: string, publicKey: KeyObject | null): ConfigCheck {
  if (!body || typeof body !== "object" || Array.isArray(body)) return { ok: false, reason: "the configuration is not a JSON object" };
  const { signature, ...signed } = body as Record<string, unknown>;
  if (!publicKey) return { ok: false, reason: "cannot verify: the public key could not be fetched" };
  const sig = signature as { algorithm?: unknown; value?: unknown } | undefined;
  if (!sig || sig.algorithm !== "Ed25519" || typeof sig.value !== "string") return { ok: false, reason: "the signature is missing or not Ed25519" };
  let canonical: string;
  try {
    canonical = canonicalJson(signed);
  } catch (err) {
    return { ok: false, reason: `the configuration cannot be canonicalised (${(err as Error).message})` };
  }
  if (!verifyPayload(canonical, sig.value, publicKey)) return { ok: false, reason: "the signature does not verify with the published key" };
  if (signed.serial !== serial) return { ok: false, reason: `the configuration is for ${String(signed.serial)}, not ${serial}` };
  const params = signed.parameters;
  if (!params || typeof params !== "object" || typeof signed.contentHash !== "string" || contentHash(params) !== signed.contentHash) {
    return { ok: false, reason: "the content hash does not match the parameters" };
  }
  const close = (params as Record<string, unknown>).closeTravelCounts;
  return { ok: true, contentHash: signed.contentHash, closeTravelCounts: typeof close === "number" && Number.isInteger(close) && close > 0 ? close : null };
}

function retryAfterMs(res: Response): number | null {
  const value = res.headers.get("retry-after");
  if (!value) return null;
  const seconds = /^\d+$/.test(value) ? Number(value) : (Date.parse(value) - Date.now()) / 1000;
  return Number.isFinite(seconds) ? Math.max(0, seconds) * 1000 : null;
}

const percentile = (sorted: number[], p: number) => (sorted.length ? sorted[Math.max(0, Math.ceil((p / 100) * sorted.length) - 1)]! : null);

async function readDevices(path: string, wanted: number, seed: number, saved: Saved, log: (line: string) => void): Promise<Device[]> {
  let text: string;
  try {
    text = await readFile(path, "utf8");
  } catch (err) {
    const missing = (err as { code?: string }).code === "ENOENT";
    throw new CliError(`--tokens ${path}: ${missing ? "no such file; run npm run db:seed first (it writes the demo controllers' tokens) or pass --tokens" : (err as Error).message}`);
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (err) {
    throw new CliError(`--tokens ${path}: not valid JSON (${(err as Error).message})`);
  }
  const parsed = tokensFileSchema.safeParse(value);
  if (!parsed.success) {
    const first = zodIssues(parsed.error)[0]!;
    throw new CliError(`--tokens ${path}: ${first.path ? `${first.path}: ` : ""}${first.message}`);
  }
  if (parsed.data.length < wanted) log(`[simulate] ${path} lists only ${parsed.data.length} controller${parsed.data.length === 1 ? "" : "s"}; simulating all of them`);
  return parsed.data.slice(0, wanted).map((entry, i) => ({ ...newDevice(entry, i, seed), ...saved[entry.serial] }));
}

/** Runs the simulated fleet until --duration-s has passed or, with --once, after one round; resolves with the counts and an exit code. */
export async function runSimulation(input: SimulateOptions, fetchImpl: FetchLike, log: (line: string) => void = console.log): Promise<SimulationSummary> {
  const opts = parseCliInput(simulateSchema, input, kebabFlag);
  const origin = new URL(opts.baseUrl).origin;
  const devices = await readDevices(opts.tokens, opts.controllers, opts.seed, await readSaved(opts.state), log);
  const started = Date.now();
  const deadline = started + opts.durationS * 1000;
  const s = { requests: 0, ok: 0, notModified: 0, notFound: 0, checkIns: 0, throttled: 0, errors: 0, verified: 0, refused: 0 };
  const latencies: number[] = [];
  const errorSamples: string[] = [];
  const fail = (what: string) => {
    s.errors++;
    if (errorSamples.length < MAX_ERROR_SAMPLES) {
      errorSamples.push(what);
      log(`[simulate] error: ${what}`);
    }
  };
  const sleep = (ms: number) => new Promise<void>((r) => setTimeout(r, Math.max(0, Math.min(ms, deadline - Date.now()))));

  async function call(method: string, path: string, init: RequestInit): Promise<Response | null> {
    const t0 = performance.now();
    s.requests++;
    try {
      // Redirects are not followed, so no request leaves the loopback origin.
      const res = await fetchImpl(origin + path, { ...init, method, redirect: "manual", signal: AbortSignal.timeout(10_000) });
      latencies.push(performance.now() - t0);
      if (latencies.length > LATENCY_WINDOW) latencies.shift();
      return res;
    } catch (err) {
      const code = (err as { cause?: { code?: string } }).cause?.code;
      fail(code === "ECONNREFUSED" ? `${method} ${path}: nothing listens on ${origin} (is the server running? npm run dev)` : `${method} ${path}: ${(err as Error).message}${code ? ` (${code})` : ""}`);
      return null;
    }
  }

  async function refuseStatus(res: Response, what: string): Promise<number | null> {
    const text = await res.text().catch(() => "");
    if (res.status === 429) s.throttled++;
    fail(`${what} answered ${res.status}${text ? `: ${text.slice(0, 160)}` : ""}`);
    return res.status === 429 || res.status === 503 ? retryAfterMs(res) : null;
  }

  log(`[simulate] ${devices.length} controllers against ${origin}, every ${opts.intervalS} s, ${opts.once ? "one round" : `for ${opts.durationS} s`} (seed ${opts.seed})`);
  let publicKey: KeyObject | null = null;
  const keyRes = await call("GET", "/api/v1/device/public-key", {});
  if (keyRes?.status === 200) {
    try {
      publicKey = createPublicKey(((await keyRes.json()) as { pem: string }).pem);
    } catch (err) {
      fail(`GET /api/v1/device/public-key: unusable key (${(err as Error).message})`);
    }
  } else if (keyRes) await refuseStatus(keyRes, "GET /api/v1/device/public-key");

  /** One poll, a day of door movements (unless retrying) and a check-in; the Retry-After wait when the server asked for one. */
  async function cycle(d: Device, live: boolean): Promise<number | null> {
    const base = `/api/v1/controllers/${encodeURIComponent(d.serial)}`;
    const auth = { authorization: `Bearer ${d.token}` };
    const res = await call("GET", `${base}/config`, { headers: d.etag ? { ...auth, "if-none-match": d.etag } : auth });
    if (!res) return null;
    let refusedReason: string | null = null;
    if (res.status === 200) {
      s.ok++;
      const etag = res.headers.get("etag");
      const check = checkConfiguration(await res.json().catch(() => null), d.serial, publicKey);
      if (check.ok) {
        s.verified++;
        d.etag = etag;
        d.appliedHash = check.contentHash;
        if (check.closeTravelCounts !== null && check.closeTravelCounts !== d.closeTravelCounts) {
          d.closeTravelCounts = check.closeTravelCounts;
          d.cyclesSinceApplied = 0;
        }
      } else {
        s.refused++;
        refusedReason = check.reason;
        if (errorSamples.length < MAX_ERROR_SAMPLES) errorSamples.push(`${d.serial}: refused: ${check.reason}`);
        log(`[simulate] ${d.serial} refused its configuration: ${check.reason}`);
      }
    } else if (res.status === 304) {
      s.notModified++;
      if (!d.appliedHash) refusedReason = "nothing applied yet";
    } else if (res.status === 404) {
      s.notFound++;
      await res.text().catch(() => "");
      d.etag = null;
      refusedReason = "nothing released";
    } else {
      return refuseStatus(res, `GET ${base}/config`);
    }
    if (live) liveOneDay(d);
    const c = { doorCycles: d.doorCycles, lastOpenCounts: d.lastOpenCounts, lastCloseCounts: d.lastCloseCounts, lastTravelMs: d.lastTravelMs, stallEvents: d.stallEvents, timeFixAgeS: d.timeFixAgeS };
    const checkIn = { appliedHash: d.appliedHash, refusedReason, firmwareVersion: d.firmwareVersion, uptimeS: d.uptimeS, counters: c };
    const posted = await call("POST", `${base}/check-ins`, { headers: { ...auth, "content-type": "application/json" }, body: JSON.stringify(checkIn) });
    if (!posted) return null;
    if (posted.status !== 201) return refuseStatus(posted, `POST ${base}/check-ins`);
    await posted.text().catch(() => "");
    s.checkIns++;
    return null;
  }

  async function runDevice(d: Device, index: number) {
    // Spread evenly over one interval, with jitter inside each controller's slot.
    const slotMs = (opts.intervalS * 1000) / devices.length;
    await sleep(index * slotMs + d.rng() * slotMs * 0.5);
    let retried = false;
    while (Date.now() < deadline) {
      const waitMs = await cycle(d, !retried);
      if (waitMs !== null && !retried) {
        retried = true;
        await sleep(waitMs);
        continue;
      }
      retried = false;
      if (opts.once) return;
      await sleep(opts.intervalS * 1000 * (0.9 + 0.2 * d.rng()));
    }
  }

  const line = () => {
    const sorted = [...latencies].sort((a, b) => a - b);
    const ms = (v: number | null) => (v === null ? "–" : `${v.toFixed(1)} ms`);
    return `${((Date.now() - started) / 1000).toFixed(1)} s  requests ${s.requests}  200 ${s.ok}  304 ${s.notModified}  404 ${s.notFound}  429 ${s.throttled}  check-ins ${s.checkIns}  errors ${s.errors}  verified ${s.verified}  refused ${s.refused}  p50 ${ms(percentile(sorted, 50))}  p99 ${ms(percentile(sorted, 99))}`;
  };
  const progress = setInterval(() => log(`[simulate] ${line()}`), opts.progressS * 1000);
  try {
    await Promise.all(devices.map((d, i) => runDevice(d, i)));
  } finally {
    clearInterval(progress);
    if (opts.state) await writeSaved(opts.state, devices);
  }
  const exitCode = s.errors === 0 && s.refused === 0 ? 0 : 1;
  log(`[simulate] done: ${line()}${exitCode ? "  (exit 1)" : ""}`);
  const sorted = [...latencies].sort((a, b) => a - b);
  return { controllers: devices.length, ...s, p50Ms: percentile(sorted, 50), p99Ms: percentile(sorted, 99), errorSamples, exitCode };
}

const USAGE = `Usage: npm run simulate -- [--controllers 50] [--interval-s 5] [--base-url http://127.0.0.1:3000]
       [--tokens .data/demo-controllers-roostline.json] [--duration-s 60] [--once] [--seed 1] [--progress-s 5] [--state FILE]
Exit 0 when every response was 2xx, 304 or 404 and every signature verified; 1 otherwise.`;

async function main(argv: string[]): Promise<number> {
  const { values } = parseArgs({
    args: argv,
    options: {
      controllers: { type: "string" },
      "interval-s": { type: "string" },
      "base-url": { type: "string" },
      tokens: { type: "string" },
      "duration-s": { type: "string" },
      once: { type: "boolean" },
      seed: { type: "string" },
      "progress-s": { type: "string" },
      state: { type: "string" },
      help: { type: "boolean", short: "h" },
    },
    strict: true,
    allowPositionals: false,
  });
  if (values.help) {
    console.log(USAGE);
    return 0;
  }
  const summary = await runSimulation(
    { controllers: values.controllers, intervalS: values["interval-s"], baseUrl: values["base-url"], tokens: values.tokens, durationS: values["duration-s"], once: values.once, seed: values.seed, progressS: values["progress-s"], state: values.state },
    (url, init) => fetch(url, init),
  );
  return summary.exitCode;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  main(process.argv.slice(2)).then(
    (code) => process.exit(code),
    (err: unknown) => {
      if (err instanceof CliError || (err instanceof Error && (err as { code?: string }).code?.startsWith("ERR_PARSE_ARGS"))) {
        console.error(`simulate: ${err.message.split("\n")[0]}`);
        process.exit(1);
      }
      console.error(err);
      process.exit(1);
    },
  );
}
