// The servers a benchmark run measures: the production build, and a bare node:http server serving
// the same bytes; plus the two counters read around each run (database round trips, peak RSS).
import { type ChildProcess, spawn } from "node:child_process";
import { readdirSync, readFileSync } from "node:fs";
import mysql from "mysql2/promise";

/** Starts `next start` of a build on a port in its own process group; resolves once it answers. */
export async function startNext(opts: { root: string; distDir: string; port: number; env: NodeJS.ProcessEnv; log: string }): Promise<ChildProcess> {
  const { openSync } = await import("node:fs");
  if (await answers(`http://127.0.0.1:${opts.port}/`)) throw new Error(`port ${opts.port} is already taken; stop what runs there`);
  const out = openSync(opts.log, "w");
  const child = spawn("node", ["node_modules/next/dist/bin/next", "start", "-H", "127.0.0.1", "-p", String(opts.port)], {
    cwd: opts.root,
    env: { ...opts.env, NEXT_DIST_DIR: opts.distDir },
    detached: true,
    stdio: ["ignore", out, out],
  });
  try {
    await waitFor(`http://127.0.0.1:${opts.port}/api/v1/health`, `the app on port ${opts.port} (see ${opts.log})`);
  } catch (err) {
    stop(child);
    throw err;
  }
  return child;
}

/** A bare node:http server answering every GET with the reference bytes and ETag (304 on a match). */
export async function startBareNode(port: number, referenceFile: string): Promise<ChildProcess> {
  const code = `
    const http = require("node:http");
    const ref = JSON.parse(require("node:fs").readFileSync(${JSON.stringify(referenceFile)}, "utf8"));
    http.createServer((req, res) => {
      const headers = { etag: ref.etag, "cache-control": "private, no-cache" };
      if (req.headers["if-none-match"] === ref.etag) { res.writeHead(304, headers); res.end(); return; }
      res.writeHead(200, { ...headers, "content-type": "application/json; charset=utf-8" });
      res.end(ref.body);
    }).listen(${port}, "127.0.0.1");`;
  const child = spawn("node", ["-e", code], { detached: true, stdio: "ignore" });
  try {
    await waitFor(`http://127.0.0.1:${port}/`, `the bare node:http server on port ${port}`);
  } catch (err) {
    stop(child);
    throw err;
  }
  return child;
}

async function answers(url: string): Promise<boolean> {
  try {
    await fetch(url);
    return true;
  } catch {
    return false;
  }
}

async function waitFor(url: string, what: string) {
  for (let i = 0; i < 300; i++) {
    try {
      const r = await fetch(url);
      if (r.status < 500) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`${what} did not answer`);
}

/** Ends a child's whole process group. */
export function stop(child: ChildProcess | undefined) {
  if (!child?.pid) return;
  try {
    process.kill(-child.pid, "SIGTERM");
  } catch {
    // already gone
  }
}

/** The peak resident set (VmHWM, MiB) of a process and its descendants, from /proc. */
export function peakRssMiB(pid: number): number {
  const parentOf = new Map<number, number>();
  for (const name of readdirSync("/proc")) {
    if (!/^\d+$/.test(name)) continue;
    try {
      const stat = readFileSync(`/proc/${name}/stat`, "utf8");
      parentOf.set(Number(name), Number(stat.slice(stat.lastIndexOf(")") + 2).split(" ")[1]));
    } catch {
      // exited meanwhile
    }
  }
  const tree = [pid];
  for (let i = 0; i < tree.length; i++) for (const [p, pp] of parentOf) if (pp === tree[i]) tree.push(p);
  let peak = 0;
  for (const p of tree) {
    try {
      const m = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${p}/status`, "utf8"));
      if (m) peak = Math.max(peak, Number(m[1]) / 1024);
    } catch {
      // exited meanwhile
    }
  }
  return peak;
}

/**
 * Counts statements the database server received, from its own `Questions` status; the reading
 * itself is one statement, which `delta` takes off.
 */
export async function questionCounter(databaseUrl: string) {
  const conn = await mysql.createConnection({ uri: databaseUrl });
  const read = async () => {
    const [rows] = await conn.query("SHOW GLOBAL STATUS LIKE 'Questions'");
    return Number((rows as { Value: string }[])[0]!.Value);
  };
  return {
    read,
    delta: async (since: number) => (await read()) - since - 1,
    close: () => conn.end(),
  };
}
