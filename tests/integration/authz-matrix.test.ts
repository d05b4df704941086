// Drives every cell of tests/support/authz-matrix.ts against the running server over HTTP, and checks
// that the table lists exactly the route handlers and server actions the code has.
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { desc, eq, inArray, ne, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { capturedMails, controllers, profileRevisions, releases, users } from "@/db/schema";
import { ROLES, type Role } from "@/lib/auth/permissions";
import { signedInUser, signIn, uniqueEmail, userRow } from "@/tests/support/auth";
import { registerController, siteId } from "@/tests/support/fleet";
import { createDoorModel } from "@/tests/support/profiles";
import { actionId, postAction } from "@/tests/e2e/support/server-action";
import {
  type ActionEntry,
  type Expectation,
  entryFile,
  entryName,
  forgedExpectation,
  IDENTITIES,
  type Identity,
  MATRIX,
  type MatrixEntry,
  MISSING,
  PLACEHOLDERS,
  renderMatrixMarkdown,
  type RouteEntry,
  rolesWith,
} from "@/tests/support/authz-matrix";

const BASE = (process.env.TEST_APP_URL ?? "http://127.0.0.1:3100").replace(/\/$/, "");
const ROOT = process.cwd();
const DIST = process.env.NEXT_DIST_DIR ?? ".next-test";
const CONCURRENCY = 6;

// ---------------------------------------------------------------------------------------------
// What the code has: route handlers' HTTP methods and "use server" files' exports.

const HTTP_METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"];
const SOURCE_DIRS = ["app", "components", "lib"];

function sourceFiles(dir: string): string[] {
  return readdirSync(path.join(ROOT, dir), { withFileTypes: true }).flatMap((d) => {
    const rel = path.posix.join(dir, d.name);
    if (d.isDirectory()) return d.name === "node_modules" ? [] : sourceFiles(rel);
    return /\.(ts|tsx|js|jsx|mjs)$/.test(d.name) ? [rel] : [];
  });
}

/** Names a module exports: `export const|let|function|async function X` and `export { a, b as X }`. */
function exportedNames(source: string): string[] {
  const names = new Set<string>();
  for (const m of source.matchAll(/export\s+(?:const|let|var)\s+([A-Za-z_$][\w$]*)/g)) names.add(m[1]!);
  for (const m of source.matchAll(/export\s+(?:async\s+)?function\s*\*?\s*([A-Za-z_$][\w$]*)/g)) names.add(m[1]!);
  for (const m of source.matchAll(/export\s+default\s/g)) names.add("default");
  for (const m of source.matchAll(/export\s*\{([^}]*)\}/g)) {
    for (const part of m[1]!.split(",")) {
      const name = part.trim().split(/\s+as\s+/).pop();
      if (name) names.add(name);
    }
  }
  return [...names];
}

/** Whether the module's first statement (after comments) is the "use server" directive. */
const isServerActionFile = (source: string) => /^(?:\s|\/\/[^\n]*\n|\/\*[\s\S]*?\*\/)*["']use server["']/.test(source);

function discover() {
  const files = SOURCE_DIRS.flatMap(sourceFiles);
  const endpoints: string[] = [];
  const inline: string[] = [];
  for (const file of files) {
    const source = readFileSync(path.join(ROOT, file), "utf8");
    if (file.startsWith("app/") && /\/route\.(ts|js)$/.test(file)) {
      for (const name of exportedNames(source)) if (HTTP_METHODS.includes(name)) endpoints.push(`${file} ${name}`);
    }
    if (isServerActionFile(source)) {
      for (const name of exportedNames(source)) endpoints.push(`${file} ${name}`);
    } else if (/["']use server["']/.test(source)) {
      inline.push(file);
    }
  }
  return { endpoints: endpoints.sort(), inline };
}

const listedKey = (e: MatrixEntry) => `${entryFile(e)} ${e.kind === "route" ? e.method : e.name}`;

// ---------------------------------------------------------------------------------------------
// The identities and the sample values, made fresh for this run.

type Person = Awaited<ReturnType<typeof signedInUser>>;
type Fixtures = { people: Record<Role, Person>; device: { serial: string; token: string }; values: Record<string, string> };
let fx: Fixtures;

beforeAll(async () => {
  const [people, model] = await Promise.all([
    Promise.all(ROLES.map(async (r) => [r, await signedInUser(r)] as const)).then((pairs) => Object.fromEntries(pairs) as Record<Role, Person>),
    createDoorModel(),
  ]);
  const device = await registerController(model.id);
  const [other] = await db.select({ serial: controllers.serial }).from(controllers).where(ne(controllers.serial, device.serial)).limit(1);
  const [profile] = await db
    .select({ profileId: profileRevisions.profileId })
    .from(profileRevisions)
    .groupBy(profileRevisions.profileId)
    .having(sql`count(*) >= 2`)
    .orderBy(profileRevisions.profileId)
    .limit(1);
  const revisions = profile
    ? await db.select({ id: profileRevisions.id }).from(profileRevisions).where(eq(profileRevisions.profileId, profile.profileId)).orderBy(desc(profileRevisions.id)).limit(2)
    : [];
  const [rel] = await db.select({ id: releases.id }).from(releases).orderBy(desc(releases.id)).limit(1);
  const [mail] = await db.select({ id: capturedMails.id }).from(capturedMails).orderBy(desc(capturedMails.id)).limit(1);
  const values: Record<string, string> = {
    serial: device.serial,
    otherSerial: other?.serial ?? MISSING.serial,
    profileId: String(profile?.profileId ?? MISSING.id),
    revisionId: String(revisions[0]?.id ?? MISSING.id),
    otherRevisionId: String(revisions[1]?.id ?? revisions[0]?.id ?? MISSING.id),
    siteId: String(await siteId()),
    releaseId: String(rel?.id ?? MISSING.id),
    mailId: String(mail?.id ?? MISSING.id),
    userId: people.viewer.id,
  };
  fx = { people, device: { serial: device.serial, token: device.token }, values };
});

/** Fills {placeholders}; every {email} becomes a new address, collected in `emails`. */
function fill(text: string, emails: string[]): string {
  return text.replace(/\{(\w+)\}/g, (whole, key: string) => {
    if (key === "email") {
      const email = uniqueEmail("authz");
      emails.push(email);
      return email;
    }
    const value = fx.values[key];
    if (value === undefined) throw new Error(`no value for ${whole} (known: ${Object.keys(PLACEHOLDERS).join(", ")})`);
    return value;
  });
}

const forgedToken = () => randomBytes(24).toString("base64url");

/** The headers that make a request come from an identity. */
function credentials(identity: Identity | "forged", cookie?: string): Record<string, string> {
  if (identity === "anonymous") return {};
  if (identity === "device") return { authorization: `Bearer ${fx.device.token}` };
  if (identity === "forged") return { cookie: `better-auth.session_token=${forgedToken()}.${forgedToken()}`, authorization: `Bearer ${forgedToken()}` };
  return { cookie: cookie ?? fx.people[identity].cookie };
}

// ---------------------------------------------------------------------------------------------
// Calling an endpoint and reading what came back.

type Outcome = "allow" | "deny" | "error";
type Observed = { outcome: Outcome; status: number; detail: string; performed: boolean };

// Session tokens are left out of messages and of the observations file.
const snippet = (text: string) => text.replace(/"token":"[^"]*"/g, '"token":"…"').replace(/\s+/g, " ").slice(0, 160);

function jsonCode(text: string): string | undefined {
  try {
    const body = JSON.parse(text) as { code?: unknown; error?: unknown } | null;
    const value = body?.code ?? body?.error;
    return typeof value === "string" ? value : undefined;
  } catch {
    return undefined;
  }
}

const toSignIn = (res: Response) => res.status >= 300 && res.status < 400 && (res.headers.get("location") ?? "").replace(BASE, "").startsWith("/sign-in");

async function callRoute(entry: RouteEntry, urlPath: string, headers: Record<string, string>, emails: string[]): Promise<Observed> {
  const init: RequestInit = { method: entry.method, headers: { origin: BASE, ...headers }, redirect: "manual" };
  if (entry.body !== undefined) {
    init.body = fill(JSON.stringify(entry.body), emails);
    (init.headers as Record<string, string>)["content-type"] = "application/json";
  }
  const res = await fetch(BASE + fill(urlPath, emails), init);
  const text = await res.text();
  const detail = `${res.status} ${snippet(text)}`;
  const observed = (outcome: Outcome): Observed => ({ outcome, status: res.status, detail, performed: outcome === "allow" });
  if (res.status >= 500) return observed("error");
  if (entry.refusal && res.status === entry.refusal.status && jsonCode(text) === entry.refusal.code) return observed("deny");
  if (res.status === 401 || res.status === 403 || toSignIn(res)) return observed("deny");
  // Next's own 404 page means the sample path names no route in the running build.
  if (res.status === 404 && !(res.headers.get("content-type") ?? "").includes("json")) return { ...observed("error"), detail: `404 page: no such route in the running build` };
  return observed("allow");
}

/** Calls an action as React's client does (tests/e2e/support/server-action.ts), with any Origin. */
async function callAction(entry: ActionEntry, fields: Record<string, string>, headers: Record<string, string>, origin: string, emails: string[]): Promise<Observed> {
  const { response: res, text, result } = await postAction({
    pagePath: entry.page,
    id: actionId(entry.file, entry.name),
    headers,
    origin,
    args: [{ ok: true }, "$K1"],
    fields: Object.entries(fields).map(([name, value]) => [name, fill(value, emails)]),
  });
  const observed = (outcome: Outcome, detail: string, performed = outcome === "allow"): Observed => ({ outcome, status: res.status, detail, performed });
  const redirect = res.headers.get("x-action-redirect");
  if (redirect) return observed("allow", `${res.status} action redirected to ${redirect}`);
  if (toSignIn(res)) return observed("deny", `${res.status} sent to ${res.headers.get("location")} before the action ran`);
  if (res.status === 403) return observed("deny", `403 refused before the action ran: ${snippet(text)}`);
  if (res.status >= 500) return observed("error", `${res.status} ${snippet(text)}`, false);
  if (!result) return observed("error", `${res.status} no ActionResult in ${snippet(text)}`, false);
  const detail = `${res.status} ${JSON.stringify(result).slice(0, 160)}`;
  if (result.ok === false && (result.code === "unauthenticated" || result.code === "forbidden")) return observed("deny", detail);
  return observed("allow", detail, result.ok === true);
}

// ---------------------------------------------------------------------------------------------
// Cells.

type Cell = { label: string; identity: Identity | "forged"; expect: Expectation | "refused"; path?: string; origin?: string; fields?: Record<string, string> };

function cellsOf(entry: MatrixEntry): Cell[] {
  return [
    ...IDENTITIES.map((identity): Cell => ({ label: identity, identity, expect: entry.allow.includes(identity) ? "allow" : "deny" })),
    { label: "forged session cookie and token", identity: "forged", expect: forgedExpectation(entry) },
    ...(entry.extra ?? []).map((x): Cell => ({ ...x })),
  ];
}

function limiter(max: number) {
  let active = 0;
  const waiting: (() => void)[] = [];
  return async <T>(fn: () => Promise<T>): Promise<T> => {
    while (active >= max) await new Promise<void>((resolve) => waiting.push(resolve));
    active++;
    try {
      return await fn();
    } finally {
      active--;
      waiting.shift()?.();
    }
  };
}
const limit = limiter(CONCURRENCY);

async function sessionOf(cookie: string): Promise<unknown> {
  const res = await fetch(`${BASE}/api/auth/get-session`, { headers: { cookie, origin: BASE } });
  return res.json();
}

/** What every cell got, written to .artifacts/authz-matrix-observed.json for reading a failure. */
const observations: { endpoint: string; cell: string; expected: string; got: Outcome; detail: string }[] = [];

afterAll(() => {
  if (!observations.length) return;
  mkdirSync(path.join(ROOT, ".artifacts"), { recursive: true });
  const sorted = [...observations].sort((a, b) => a.endpoint.localeCompare(b.endpoint) || a.cell.localeCompare(b.cell));
  writeFileSync(path.join(ROOT, ".artifacts", "authz-matrix-observed.json"), JSON.stringify(sorted, null, 1) + "\n");
});

/** Runs one cell; returns what went wrong, or null. */
async function runCell(entry: MatrixEntry, cell: Cell): Promise<string | null> {
  const emails: string[] = [];
  // An action that ends the session gets a session of its own, so the run's shared cookie survives.
  const ownCookie = entry.kind === "action" && entry.endsSession && cell.identity !== "anonymous" && cell.identity !== "device" && cell.identity !== "forged"
    ? await signIn(fx.people[cell.identity].email, fx.people[cell.identity].password)
    : undefined;
  const headers = credentials(cell.identity, ownCookie);
  const seen = entry.kind === "route"
    ? await callRoute(entry, cell.path ?? entry.path, headers, emails)
    : await callAction(entry, cell.fields ?? entry.fields, headers, cell.origin ?? BASE, emails);

  observations.push({ endpoint: entryName(entry), cell: cell.label, expected: cell.expect, got: seen.outcome, detail: seen.detail });
  const problems: string[] = [];
  if (cell.expect === "refused") {
    if (seen.performed || seen.outcome === "allow") problems.push(`expected the call to be refused, got ${seen.outcome}`);
  } else if (seen.outcome !== cell.expect) {
    problems.push(`expected ${cell.expect}, got ${seen.outcome === "error" ? "a server error" : `an unexpected ${seen.outcome}`}`);
  }
  if (cell.expect !== "allow" && emails.length) {
    const created = await db.select({ email: users.email }).from(users).where(inArray(users.email, emails));
    if (created.length) problems.push(`created ${created.map((u) => u.email).join(", ")}`);
  }
  if (ownCookie && seen.outcome === "allow" && (await sessionOf(ownCookie)) !== null) problems.push("the session is still alive afterwards");
  return problems.length ? `${cell.label}: ${problems.join("; ")} (${seen.detail})` : null;
}

/** Whether the build the server runs has the entry (a route or action newer than the build cannot answer yet). */
function inRunningBuild(entry: MatrixEntry): boolean {
  if (entry.kind === "route") return existsSync(path.join(ROOT, DIST, "server", "app", entry.dir, "route.js"));
  try {
    actionId(entry.file, entry.name);
    return true;
  } catch {
    return false;
  }
}

// ---------------------------------------------------------------------------------------------

describe("authorization matrix", () => {
  it("lists every route handler and server action the code has", () => {
    const listed = new Set(MATRIX.map(listedKey));
    const { endpoints, inline } = discover();
    expect(endpoints.length).toBeGreaterThan(40);
    expect(endpoints.filter((e) => !listed.has(e)), "add these to tests/support/authz-matrix.ts").toEqual([]);
    expect(inline, "server actions declared inside a function are not covered by the matrix; move them to an actions.ts").toEqual([]);
  });

  it("lists nothing that no longer exists", () => {
    const existing = new Set(discover().endpoints);
    expect([...new Set(MATRIX.map(listedKey))].filter((e) => !existing.has(e)), "remove or fix these entries").toEqual([]);
  });

  it("gives each entry exactly the identities its guard lets through", () => {
    const expected = (e: MatrixEntry): readonly Identity[] | null => {
      switch (e.guard) {
        case "public":
          return IDENTITIES;
        case "own-serial":
          return ["device"];
        case "signed-in":
        case "proxy":
          return ROLES;
        case "better-auth":
          return null;
        default:
          return rolesWith(e.guard);
      }
    };
    const wrong = MATRIX.filter((e) => {
      const want = expected(e);
      return want !== null && [...want].sort().join() !== [...e.allow].sort().join();
    }).map(entryName);
    expect(wrong).toEqual([]);
    const names = MATRIX.map(entryName);
    expect(names.filter((n, i) => names.indexOf(n) !== i), "entries listed twice").toEqual([]);
  });

  it("renders the table as Markdown to .artifacts/authz-matrix.md", () => {
    const markdown = renderMatrixMarkdown();
    const dir = path.join(ROOT, ".artifacts");
    mkdirSync(dir, { recursive: true });
    writeFileSync(path.join(dir, "authz-matrix.md"), markdown);
    expect(markdown.split("\n").filter((l) => l.startsWith("| ")).length).toBe(MATRIX.length + 2);
  });

  describe.concurrent("cells", () => {
    for (const entry of MATRIX) {
      const built = inRunningBuild(entry);
      const title = `${entryName(entry)}: ${entry.allow.length ? entry.allow.join(", ") : "nobody"}${built ? "" : ` (not in the ${DIST} build yet)`}`;
      (built ? it : it.skip)(title, async () => {
        const problems = await Promise.all(cellsOf(entry).map((cell) => limit(() => runCell(entry, cell))));
        expect(problems.filter(Boolean), entryName(entry)).toEqual([]);
      });
    }
  });

  it("keeps a signed-in user from giving themselves a role through better-auth's update-user", async () => {
    const viewer = await signedInUser("viewer");
    const res = await fetch(`${BASE}/api/auth/update-user`, {
      method: "POST",
      headers: { cookie: viewer.cookie, origin: BASE, "content-type": "application/json" },
      body: JSON.stringify({ name: "Still a viewer", role: "admin" }),
    });
    expect(res.status).toBeLessThan(500);
    expect((await userRow(viewer.id))?.role).toBe("viewer");
  });
});
