// How fast the console answers, against a server already running on this machine:
// `npx tsx scripts/page-timing.ts [--base-url http://127.0.0.1:3100] [--requests 20] [--loads 5]`.
// Signs in as the demo admin, then times each page's server response (sequential requests, first
// byte and complete body, which includes the streamed panels) and, in headless Chromium, the
// dashboard's first contentful paint and DOMContentLoaded. Prints figures; the target is a guide.
import { parseArgs } from "node:util";
import { chromium } from "playwright-core";
import { demoUsers } from "@/db/seed/demo";
import { isLoopbackUrl } from "./simulate";

const TARGET_MS = 1000;
const PAGES = ["/", "/profiles", "/reviews", "/controllers", "/releases", "/sites", "/help"];

function fail(message: string): never {
  console.error(`page-timing: ${message}`);
  process.exit(1);
}

function percentile(sorted: number[], p: number): number {
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[i]!;
}

const median = (values: number[]) => percentile([...values].sort((a, b) => a - b), 50);

async function signIn(baseUrl: string): Promise<string> {
  const admin = demoUsers.find((u) => u.role === "admin");
  if (!admin) fail("the demo seed has no admin");
  let res: Response;
  try {
    res = await fetch(`${baseUrl}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: baseUrl },
      body: JSON.stringify({ email: admin.email, password: admin.password }),
    });
  } catch (err) {
    fail(`no server at ${baseUrl} (${(err as Error).message})`);
  }
  if (res.status !== 200) fail(`sign-in as ${admin.email} answered ${res.status}: is the demo seed loaded?`);
  return res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}

/** One GET: milliseconds to the response headers and to the end of the body. */
async function timeRequest(url: string, cookie: string): Promise<{ firstByte: number; complete: number; status: number }> {
  const started = performance.now();
  const res = await fetch(url, { headers: { cookie }, redirect: "manual" });
  const firstByte = performance.now() - started;
  await res.arrayBuffer();
  return { firstByte, complete: performance.now() - started, status: res.status };
}

// Resolves with first contentful paint and DOMContentLoaded end, in ms since navigation start.
const PAINT_TIMES = `new Promise((resolve) => {
  const nav = performance.getEntriesByType("navigation")[0];
  const done = (fcp) => resolve({ fcp, dcl: nav.domContentLoadedEventEnd });
  const now = performance.getEntriesByName("first-contentful-paint")[0];
  if (now) return done(now.startTime);
  new PerformanceObserver((list) => {
    const entry = list.getEntriesByName("first-contentful-paint")[0];
    if (entry) done(entry.startTime);
  }).observe({ type: "paint", buffered: true });
})`;

async function browserTimings(baseUrl: string, cookie: string, loads: number): Promise<{ fcp: number[]; dcl: number[] }> {
  const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", headless: true, args: ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update"] });
  try {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 }, locale: "en-GB", timezoneId: "UTC" });
    const { hostname } = new URL(baseUrl);
    await context.addCookies(
      cookie.split("; ").map((pair) => {
        const at = pair.indexOf("=");
        return { name: pair.slice(0, at), value: pair.slice(at + 1), domain: hostname, path: "/" };
      }),
    );
    const fcp: number[] = [];
    const dcl: number[] = [];
    // The first load fills the browser cache; it is timed like the rest, as a returning visit would not be.
    for (let i = 0; i < loads; i++) {
      const page = await context.newPage();
      await page.goto(`${baseUrl}/`, { waitUntil: "load" });
      if (new URL(page.url()).pathname !== "/") fail(`the dashboard sent the browser to ${page.url()}`);
      // A string, not a function: tsx's helpers (__name) do not exist in the page.
      const t = (await page.evaluate(PAINT_TIMES)) as { fcp: number; dcl: number };
      fcp.push(t.fcp);
      dcl.push(t.dcl);
      await page.close();
    }
    return { fcp, dcl };
  } finally {
    await browser.close();
  }
}

async function main(): Promise<void> {
  const { values } = parseArgs({
    options: { "base-url": { type: "string", default: "http://127.0.0.1:3100" }, requests: { type: "string", default: "20" }, loads: { type: "string", default: "5" } },
    strict: true,
  });
  const baseUrl = values["base-url"]!.replace(/\/$/, "");
  if (!isLoopbackUrl(baseUrl)) fail("--base-url must be on this machine (127.x.x.x, [::1] or localhost)");
  const requests = Number(values.requests);
  const loads = Number(values.loads);
  if (!Number.isInteger(requests) || requests < 1 || !Number.isInteger(loads) || loads < 1) fail("--requests and --loads must be whole numbers of at least 1");

  const cookie = await signIn(baseUrl);
  const ms = (v: number) => `${v.toFixed(0)} ms`.padStart(9);
  console.log(`Server response, ${requests} sequential requests per page as the demo admin, ${baseUrl} (after one unmeasured warm-up request)`);
  console.log(`${"Page".padEnd(14)}${"first byte".padStart(11)}${"p95".padStart(9)}${"complete".padStart(11)}${"p95".padStart(9)}  target`);
  for (const pathname of PAGES) {
    const warm = await timeRequest(`${baseUrl}${pathname}`, cookie);
    if (warm.status !== 200) {
      console.log(`${pathname.padEnd(14)}answered ${warm.status}, not timed`);
      continue;
    }
    const runs = [];
    for (let i = 0; i < requests; i++) runs.push(await timeRequest(`${baseUrl}${pathname}`, cookie));
    const first = runs.map((r) => r.firstByte).sort((a, b) => a - b);
    const complete = runs.map((r) => r.complete).sort((a, b) => a - b);
    const target = pathname === "/" ? `${TARGET_MS} ms: ${percentile(complete, 95) <= TARGET_MS ? "met" : "MISSED"} (p95 complete)` : "";
    console.log(`${pathname.padEnd(14)}${ms(percentile(first, 50)).padStart(11)}${ms(percentile(first, 95))}${ms(percentile(complete, 50)).padStart(11)}${ms(percentile(complete, 95))}  ${target}`);
  }

  const { fcp, dcl } = await browserTimings(baseUrl, cookie, loads);
  console.log(`\nDashboard in headless Chromium, ${loads} loads (1280×800; the first with an empty cache), median:`);
  console.log(`  first contentful paint  ${ms(median(fcp)).trim()}   (each: ${fcp.map((v) => v.toFixed(0)).join(", ")})`);
  console.log(`  DOMContentLoaded        ${ms(median(dcl)).trim()}   (each: ${dcl.map((v) => v.toFixed(0)).join(", ")})`);
  console.log(`  target ${TARGET_MS} ms for first contentful paint: ${median(fcp) <= TARGET_MS ? "met" : "MISSED"}`);
}

main().catch((err: unknown) => fail((err as Error).stack ?? String(err)));
