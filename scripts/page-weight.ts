// First-load JavaScript (gzip) of every page route of a production build, read from the build's own
// manifests: `npx tsx scripts/page-weight.ts [--dist .next-test]`. Prints figures against the budget;
// exits 1 only when the build is missing or unreadable.
//
// What counts as a page's first load (Next 16, Turbopack):
// - build-manifest.json rootMainFiles: the runtime and framework chunks every page loads. The
//   polyfillFiles are left out: they are served with `nomodule`, so current browsers skip them.
// - from the page's server/app/<route>/page_client-reference-manifest.js, entryJSFiles for each
//   layout, template, loading and page on the route's segment chain, and for the error boundaries
//   (error, global-error, not-found, forbidden, unauthorized) whose file is itself a client module:
//   those travel in every response's component tree. A server-component boundary's client children
//   load only when it renders, so they are left out.
// - chunks behind a dynamic import() are not first load: they are fetched after hydration, when the
//   component that imports them renders. The editor's Monaco is such a chunk group; it is listed
//   on its own, and every page's first load is checked to hold none of it.
// Checked by hand against the <script src> tags the test build serves for / and /profiles/[profileId].
import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import { parseArgs } from "node:util";
import { gzipSync } from "node:zlib";
import { runInNewContext } from "node:vm";

const BUDGET_KB = 250;
const EDITOR_ROUTE = "/profiles/[profileId]";
const CHUNK_REF = /static\/chunks\/[A-Za-z0-9_.-]+\.js/g;
// Text only Monaco's own code carries (its worker hook, its loader's messages) — not its CSS class
// name, which the shortcuts name to ignore keys typed inside the editor.
const MONACO_MARKER = /MonacoEnvironment|@monaco-editor\/loader/;
const BOUNDARIES = new Set(["error", "global-error", "not-found", "forbidden", "unauthorized"]);
const RENDERED = new Set(["layout", "template", "loading", "page"]);

type ClientManifest = { clientModules: Record<string, unknown>; entryJSFiles?: Record<string, string[]> };
type Row = { route: string; chunks: string[]; gzipBytes: number; rawBytes: number };

function fail(message: string): never {
  console.error(`page-weight: ${message}`);
  process.exit(1);
}

function readJson<T>(file: string): T {
  if (!existsSync(file)) fail(`${file} is missing: build first (npm test builds .next-test) or pass --dist`);
  return JSON.parse(readFileSync(file, "utf8")) as T;
}

/** Loads a page_client-reference-manifest.js, which assigns to globalThis.__RSC_MANIFEST. */
function readClientManifest(file: string): ClientManifest {
  if (!existsSync(file)) fail(`${file} is missing: the build looks incomplete`);
  const sandbox: { globalThis?: unknown; __RSC_MANIFEST?: Record<string, ClientManifest> } = {};
  sandbox.globalThis = sandbox;
  runInNewContext(readFileSync(file, "utf8"), sandbox);
  const entry = Object.values(sandbox.__RSC_MANIFEST ?? {})[0];
  if (!entry) fail(`${file} holds no manifest`);
  return entry;
}

/** Whether an app file (as "[project]/app/…/name", no extension) is a client module in the manifest. */
function isClientModule(manifest: ClientManifest, entry: string): boolean {
  return [".tsx", ".ts", ".jsx", ".js"].some((ext) => `${entry}${ext}` in manifest.clientModules);
}

/** The first-load chunks of one page: root chunks plus the entries on its segment chain. */
function firstLoadChunks(manifest: ClientManifest, pageKey: string, rootMain: string[]): string[] {
  const pageDir = pageKey.replace(/\/page$/, "");
  const chunks = new Set(rootMain);
  for (const [entry, files] of Object.entries(manifest.entryJSFiles ?? {})) {
    const rel = entry.replace(/^\[project\]\/app/, "");
    const dir = rel.slice(0, rel.lastIndexOf("/"));
    const name = rel.slice(rel.lastIndexOf("/") + 1);
    const onChain = pageDir === dir || pageDir.startsWith(`${dir}/`) || dir === "";
    if (!onChain) continue;
    if (RENDERED.has(name) || (BOUNDARIES.has(name) && isClientModule(manifest, entry))) for (const f of files) chunks.add(f);
  }
  return [...chunks];
}

function main(): void {
  const { values } = parseArgs({ options: { dist: { type: "string", default: ".next-test" } }, strict: true });
  const dist = path.resolve(values.dist!);
  if (!existsSync(dist)) fail(`no build at ${dist}: build first (npm test builds .next-test) or pass --dist`);
  const build = readJson<{ rootMainFiles?: string[] }>(path.join(dist, "build-manifest.json"));
  const routes = readJson<Record<string, string>>(path.join(dist, "app-path-routes-manifest.json"));
  const rootMain = build.rootMainFiles ?? [];

  const sizes = new Map<string, { raw: number; gzip: number; text: string }>();
  const chunk = (file: string) => {
    let s = sizes.get(file);
    if (!s) {
      const full = path.join(dist, file);
      if (!existsSync(full)) fail(`${full} is named in a manifest but missing`);
      const buf = readFileSync(full);
      s = { raw: buf.length, gzip: gzipSync(buf).length, text: buf.toString("utf8") };
      sizes.set(file, s);
    }
    return s;
  };

  const rows: Row[] = [];
  for (const [key, route] of Object.entries(routes)) {
    if (!key.endsWith("/page") || route.startsWith("/_")) continue;
    const manifest = readClientManifest(path.join(dist, "server", "app", `${key}_client-reference-manifest.js`));
    const chunks = firstLoadChunks(manifest, key, rootMain);
    const sum = chunks.reduce((acc, f) => ({ raw: acc.raw + chunk(f).raw, gzip: acc.gzip + chunk(f).gzip }), { raw: 0, gzip: 0 });
    rows.push({ route, chunks, gzipBytes: sum.gzip, rawBytes: sum.raw });
  }
  if (rows.length === 0) fail(`${dist} lists no page routes`);
  rows.sort((a, b) => b.gzipBytes - a.gzipBytes);

  // Chunks named inside a page's first-load chunks (the loaders of its dynamic imports), transitively.
  const lazyOf = (first: string[]) => {
    const lazy = new Set<string>();
    const queue = [...first];
    while (queue.length) {
      for (const ref of chunk(queue.pop()!).text.match(CHUNK_REF) ?? []) {
        if (first.includes(ref) || lazy.has(ref) || !existsSync(path.join(dist, ref))) continue;
        lazy.add(ref);
        queue.push(ref);
      }
    }
    return lazy;
  };
  // Monaco's group: what only the editor loads lazily, plus any lazy chunk carrying Monaco's own text.
  const editor = rows.find((r) => r.route === EDITOR_ROUTE);
  const lazy = editor ? lazyOf(editor.chunks) : new Set<string>();
  const elsewhere = new Set(rows.filter((r) => r !== editor).flatMap((r) => [...lazyOf(r.chunks)]));
  const monaco = [...lazy].filter((f) => !elsewhere.has(f) || MONACO_MARKER.test(chunk(f).text));

  const kb = (bytes: number) => (bytes / 1024).toFixed(1);
  const width = Math.max(...rows.map((r) => r.route.length), 5) + 2;
  console.log(`First-load JavaScript per page, gzip (node:zlib, default level), build ${path.relative(process.cwd(), dist) || dist}; budget ${BUDGET_KB} KB`);
  console.log(`${"Route".padEnd(width)}${"gzip KB".padStart(9)}${"raw KB".padStart(9)}${"chunks".padStart(8)}  budget`);
  for (const r of rows) {
    const over = r.gzipBytes > BUDGET_KB * 1024;
    const note = r.route === EDITOR_ROUTE ? "  (editor; Monaco lazy, not counted)" : "";
    console.log(`${r.route.padEnd(width)}${kb(r.gzipBytes).padStart(9)}${kb(r.rawBytes).padStart(9)}${String(r.chunks.length).padStart(8)}  ${over ? "OVER" : "ok"}${note}`);
  }
  const shared = rootMain.reduce((acc, f) => acc + chunk(f).gzip, 0);
  console.log(`\nShared by every page (rootMainFiles, ${rootMain.length} chunks): ${kb(shared)} KB gzip`);
  if (editor) {
    const lazyGzip = [...lazy].reduce((acc, f) => acc + chunk(f).gzip, 0);
    const monacoGzip = monaco.reduce((acc, f) => acc + chunk(f).gzip, 0);
    console.log(`${EDITOR_ROUTE}: ${lazy.size} chunks behind dynamic imports (${kb(lazyGzip)} KB gzip); Monaco's group, loaded only there and lazily: ${monaco.length} chunks, ${kb(monacoGzip)} KB gzip`);
  }
  const leaks = rows.flatMap((r) => r.chunks.filter((f) => monaco.includes(f) || MONACO_MARKER.test(chunk(f).text)).map((f) => `${r.route}: ${f}`));
  console.log(leaks.length === 0 ? "Monaco in any page's first load: none" : `Monaco in a first load:\n  ${leaks.join("\n  ")}`);
}

main();
