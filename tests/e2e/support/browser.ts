// One fresh Chromium profile per call, with every request logged and checked against 127.0.0.1.
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import { type BrowserContext, chromium, type Page } from "playwright-core";
import { expect } from "vitest";

export const BASE_URL = (process.env.TEST_APP_URL ?? "http://127.0.0.1:3100").replace(/\/$/, "");
export const ARTIFACTS = path.resolve(process.cwd(), ".artifacts");
const CHROMIUM_HOME = path.join(ARTIFACTS, "chromium");

export const DESKTOP = { width: 1280, height: 800 };
export const PHONE = { width: 390, height: 844 };

const ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export type BrowserSession = {
  context: BrowserContext;
  page: Page;
  /** Every URL the browser asked for, in order. */
  requests: string[];
  /** Requests to any host but 127.0.0.1 (data:, blob: and about: are local). */
  foreignRequests: () => string[];
  /** Uncaught errors thrown in the page. */
  pageErrors: string[];
  /** What the content security policy blocked (Chromium reports each as a console error). */
  cspViolations: string[];
  close: () => Promise<void>;
};

export type SessionOptions = {
  /** Names the request log written to .artifacts/e2e-requests/. */
  label?: string;
  viewport?: { width: number; height: number };
  /** Saved in localStorage before any page script runs, as the theme toggle would. */
  theme?: "light" | "dark";
};

function isLocal(url: string): boolean {
  const { protocol, hostname } = new URL(url);
  if (protocol === "data:" || protocol === "blob:" || protocol === "about:") return true;
  return hostname === "127.0.0.1";
}

/** Starts Chromium with a fresh profile under .artifacts/chromium; close() removes the profile. */
export async function openSession(options: SessionOptions = {}): Promise<BrowserSession> {
  mkdirSync(path.join(CHROMIUM_HOME, "config"), { recursive: true });
  mkdirSync(path.join(CHROMIUM_HOME, "cache"), { recursive: true });
  const profile = mkdtempSync(path.join(CHROMIUM_HOME, "profile-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: "/usr/bin/chromium",
    headless: true,
    args: ARGS,
    env: { ...process.env, XDG_CONFIG_HOME: path.join(CHROMIUM_HOME, "config"), XDG_CACHE_HOME: path.join(CHROMIUM_HOME, "cache") },
    viewport: options.viewport ?? DESKTOP,
    locale: "en-GB",
    timezoneId: "UTC",
  });
  context.setDefaultTimeout(15_000);
  const requests: string[] = [];
  const pageErrors: string[] = [];
  context.on("request", (request) => requests.push(request.url()));
  context.on("weberror", (error) => pageErrors.push(String(error.error())));
  const cspViolations: string[] = [];
  context.on("console", (message) => {
    if (/content security policy/i.test(message.text())) cspViolations.push(message.text());
  });
  if (options.theme) {
    const theme = options.theme;
    await context.addInitScript((t) => {
      try {
        localStorage.setItem("roostline-theme", t);
      } catch {
        // about:blank has no storage.
      }
    }, theme);
  }
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    requests,
    pageErrors,
    cspViolations,
    foreignRequests: () => requests.filter((url) => !isLocal(url)),
    close: async () => {
      await context.close();
      const logDir = path.join(ARTIFACTS, "e2e-requests");
      mkdirSync(logDir, { recursive: true });
      const name = `${Date.now()}-${(options.label ?? "session").replace(/[^a-z0-9-]+/gi, "-")}.log`;
      writeFileSync(path.join(logDir, name), requests.join("\n") + "\n");
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** Full URL for an app path. */
export const appUrl = (pathname: string) => `${BASE_URL}${pathname}`;

/**
 * Runs `body` in a fresh browser, then fails the test if the browser asked any host but
 * 127.0.0.1 or a page threw an uncaught error. The browser is closed either way.
 */
export async function withSession<T>(options: SessionOptions, body: (session: BrowserSession) => Promise<T>): Promise<T> {
  const session = await openSession(options);
  try {
    const result = await body(session);
    expect(session.foreignRequests(), "requests to hosts other than 127.0.0.1").toEqual([]);
    expect(session.pageErrors, "uncaught errors in the page").toEqual([]);
    expect(session.cspViolations, "what the content security policy blocked").toEqual([]);
    return result;
  } finally {
    const foreign = session.foreignRequests();
    if (foreign.length > 0) console.error("[e2e] requests to other hosts:", foreign);
    await session.close();
  }
}

/** Waits until React has hydrated the element, so its event handlers are attached. */
export async function waitForHydration(page: Page, selector: string): Promise<void> {
  await page.waitForFunction((sel) => {
    const el = document.querySelector(sel);
    return !!el && Object.keys(el).some((key) => key.startsWith("__reactProps"));
  }, selector);
}

/** A unique address for data a test creates. */
export function uniqueEmail(tag: string): string {
  return `e2e-${tag}-${Date.now()}-${Math.random().toString(36).slice(2, 8)}@example.test`;
}

/** Fails when the text looks like it leaks an exception or a stack trace. */
export function expectNoStackTrace(text: string): void {
  expect(text).not.toMatch(/^\s*at\s+\S.*:\d+:\d+\)?\s*$/m);
  expect(text).not.toContain("Error:");
}
