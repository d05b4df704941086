// npm run bench: builds and starts the production server against its own database on the project's
// MariaDB, seeds a fleet with a release, and drives the device API with autocannon on loopback.
// Prints requests/s, latency, unexpected statuses, database round trips per request (counted by the
// server's own Questions status) and peak RSS, beside a trivial route of the same build and a bare
// node:http server returning the same bytes; then a fleet soak while a signed-in person browses.
// Flags: --controllers N (10000) --duration S (10) --connections N (20) --soak-s S (120) --no-build
import "./load-env";
import { spawnSync } from "node:child_process";
import { existsSync, mkdirSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { parseArgs } from "node:util";
import { closeDb } from "@/db/client";
import { addControllers, rebuildDatabase, releaseToAll } from "./bench/fleet";
import { browse, drive, fetchEtags, type LoadResult, type Poll, shapes } from "./bench/load";
import { peakRssMiB, questionCounter, startBareNode, startNext, stop } from "./bench/servers";

const ROOT = path.resolve(import.meta.dirname, "..");
const OUT = path.join(ROOT, ".artifacts", "bench");
const APP_PORT = 3200;
const BARE_PORT = 3201;
const DIST = ".next-bench";

const { values: flags } = parseArgs({
  options: { controllers: { type: "string", default: "10000" }, duration: { type: "string", default: "10" }, connections: { type: "string", default: "20" }, "soak-s": { type: "string", default: "120" }, "no-build": { type: "boolean", default: false } },
});
const N = Number(flags.controllers);
const DURATION = Number(flags.duration);
const CONNECTIONS = Number(flags.connections);
const SOAK_S = Number(flags["soak-s"]);
for (const [name, v] of Object.entries({ controllers: N, duration: DURATION, connections: CONNECTIONS, "soak-s": SOAK_S })) {
  if (!Number.isInteger(v) || v < 1) throw new Error(`--${name} must be a whole number above 0`);
}

const dbPort = process.env.ROOSTLINE_DB_PORT ?? "3317";
const DATABASE_URL = `mysql://roostline:${process.env.ROOSTLINE_DB_PASSWORD ?? "roostline-dev"}@127.0.0.1:${dbPort}/roostline_bench`;
const say = (line: string) => console.log(`[bench] ${line}`);

function sh(cmd: string, args: string[], env: NodeJS.ProcessEnv = process.env) {
  const r = spawnSync(cmd, args, { cwd: ROOT, env, stdio: "inherit" });
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(" ")} exited with ${r.status}`);
}

async function main() {
  mkdirSync(OUT, { recursive: true });
  sh("bash", ["scripts/db-start.sh"]);
  say(`database roostline_bench: demo seed + ${N} controllers + one release to all of them`);
  rebuildDatabase(ROOT, DATABASE_URL, path.join(ROOT, ".data/mariadb/my.cnf"));
  process.env.DATABASE_URL = DATABASE_URL;
  const fleet: Poll[] = await addControllers(N);
  await releaseToAll();
  await closeDb();

  const env = { ...process.env, NODE_ENV: "production", NEXT_TELEMETRY_DISABLED: "1", DATABASE_URL, APP_URL: `http://127.0.0.1:${APP_PORT}`, SMTP_PORT: "2599", ROOSTLINE_DEMO: "on", ROOSTLINE_BENCH_REFERENCE: path.join(OUT, "reference.json"), DEVICE_RATE_LIMIT_PER_MINUTE: "100000" } as NodeJS.ProcessEnv;
  if (!flags["no-build"] || !existsSync(path.join(ROOT, DIST))) {
    say(`building into ${DIST}`);
    sh("node", ["node_modules/next/dist/bin/next", "build"], { ...env, NEXT_DIST_DIR: DIST });
  }
  const app = await startNext({ root: ROOT, distDir: DIST, port: APP_PORT, env, log: path.join(OUT, "server.log") });
  let bare;
  const base = `http://127.0.0.1:${APP_PORT}`;
  try {
    say(`fetching every controller's configuration once (${N})`);
    const failures = await fetchEtags(base, fleet);
    if (failures) throw new Error(`${failures} controllers got no configuration`);
    const first = fleet[0]!;
    const sample = await fetch(`${base}/api/v1/controllers/${first.serial}/config`, { headers: { authorization: `Bearer ${first.token}` } });
    const reference = { body: await sample.text(), etag: sample.headers.get("etag")! };
    writeFileSync(path.join(OUT, "reference.json"), JSON.stringify(reference));
    bare = await startBareNode(BARE_PORT, path.join(OUT, "reference.json"));

    const counter = await questionCounter(DATABASE_URL);
    const bareUrl = `http://127.0.0.1:${BARE_PORT}`;
    const runs: { name: string; url: string; shape: Parameters<typeof drive>[0]["shape"]; db: boolean }[] = [
      { name: "304 path (If-None-Match matches)", url: base, shape: shapes.notModified, db: true },
      { name: "floor: trivial route, 304", url: base, shape: shapes.referenceNotModified(reference.etag), db: true },
      { name: "ceiling: node:http, 304", url: bareUrl, shape: shapes.bareNotModified(reference.etag), db: false },
      { name: "200 path (full signed document)", url: base, shape: shapes.full, db: true },
      { name: "floor: trivial route, 200", url: base, shape: shapes.referenceFull, db: true },
      { name: "ceiling: node:http, 200", url: bareUrl, shape: shapes.bareFull, db: false },
      { name: "check-ins (POST)", url: base, shape: shapes.checkIn, db: true },
    ];
    say("warming up (3 s each)");
    for (const r of runs) await drive({ url: r.url, fleet, shape: r.shape, connections: CONNECTIONS, durationS: 3 });

    const results: (LoadResult & { name: string; roundTripsPerRequest: number | null; peakRssMiB: number })[] = [];
    for (const r of runs) {
      say(`${r.name}: ${CONNECTIONS} connections, ${DURATION} s`);
      const before = await counter.read();
      const res = await drive({ url: r.url, fleet, shape: r.shape, connections: CONNECTIONS, durationS: DURATION });
      const trips = await counter.delta(before);
      results.push({ ...res, name: r.name, roundTripsPerRequest: r.db ? trips / Math.max(1, res.total) : null, peakRssMiB: peakRssMiB(app.pid!) });
    }

    say(`fleet soak: ${N} controllers each polling every 60 s (${(N / 60).toFixed(0)} req/s) for ${SOAK_S} s, while a signed-in admin browses`);
    const soakBefore = await counter.read();
    const stopAt = Date.now() + SOAK_S * 1000;
    const [soak, browsing] = await Promise.all([
      drive({ url: base, fleet, shape: shapes.notModified, connections: 50, durationS: SOAK_S, overallRate: Math.round(N / 60) }),
      browse(base, stopAt),
    ]);
    const soakTrips = await counter.delta(soakBefore);
    await counter.close();

    report({ results, soak: { ...soak, roundTripsPerRequest: soakTrips / Math.max(1, soak.total + browsing.pages), peakRssMiB: peakRssMiB(app.pid!) }, browsing });
  } finally {
    stop(app);
    stop(bare);
  }
}

type Row = LoadResult & { name: string; roundTripsPerRequest: number | null; peakRssMiB: number };

function report({ results, soak, browsing }: { results: Row[]; soak: LoadResult & { roundTripsPerRequest: number; peakRssMiB: number }; browsing: Awaited<ReturnType<typeof browse>> }) {
  const by = (name: string) => results.find((r) => r.name.startsWith(name))!;
  const ratio = (a: Row, b: Row) => (a.requestsPerS / b.requestsPerS).toFixed(2);
  const machine = `${os.cpus().length} cores (${os.cpus()[0]?.model.trim() ?? "unknown CPU"}), ${Math.round(os.totalmem() / 2 ** 30)} GiB, Node ${process.versions.node}`;
  const lines = [
    `Benchmark ${new Date().toISOString().slice(0, 10)} on ${machine}; ${N} controllers, ${CONNECTIONS} connections, ${DURATION} s per run.`,
    "",
    "| run | req/s | p50 ms | p99 ms | unexpected status | errors | DB round trips / request | server peak RSS MiB |",
    "|---|---:|---:|---:|---:|---:|---:|---:|",
    ...results.map((r) => `| ${r.name} | ${r.requestsPerS.toFixed(0)} | ${r.p50Ms} | ${r.p99Ms} | ${r.unexpected} | ${r.errors} | ${r.roundTripsPerRequest === null ? "–" : r.roundTripsPerRequest.toFixed(2)} | ${r.peakRssMiB.toFixed(0)} |`),
    "",
    `304 path: ${ratio(by("304"), by("floor: trivial route, 304"))} of the framework floor (target ≥ 0.80), ${ratio(by("304"), by("ceiling: node:http, 304"))} of the bare node:http ceiling; p99 ${by("304").p99Ms} ms (target < 50 ms).`,
    `200 path: ${ratio(by("200"), by("floor: trivial route, 200"))} of the framework floor, ${ratio(by("200"), by("ceiling: node:http, 200"))} of the ceiling.`,
    "",
    `Fleet soak (${SOAK_S} s at ${(N / 60).toFixed(0)} req/s): ${soak.total} polls, ${soak.requestsPerS.toFixed(0)} req/s, p50 ${soak.p50Ms} ms, p99 ${soak.p99Ms} ms, ${soak.unexpected} unexpected status, ${soak.errors} errors, ${soak.roundTripsPerRequest.toFixed(2)} DB round trips per request, peak RSS ${soak.peakRssMiB.toFixed(0)} MiB.`,
    `Browsing admin meanwhile: ${browsing.pages} pages, ${browsing.errors} errors, p50 ${browsing.p50Ms.toFixed(0)} ms, p99 ${browsing.p99Ms.toFixed(0)} ms, slowest ${browsing.maxMs.toFixed(0)} ms.`,
  ];
  console.log("\n" + lines.join("\n"));
  writeFileSync(path.join(OUT, "results.md"), lines.join("\n") + "\n");
  writeFileSync(path.join(OUT, "results.json"), JSON.stringify({ date: new Date().toISOString(), machine, results, soak, browsing }, null, 2));
  say(`written to ${path.relative(ROOT, OUT)}/results.md and results.json`);
}

main().catch((err) => {
  console.error(`[bench] failed: ${err instanceof Error ? err.message : err}`);
  process.exitCode = 1;
});
