import { readdirSync, readFileSync } from "node:fs";
import { join, relative, sep } from "node:path";
import Ajv2020 from "ajv/dist/2020";
import addFormats from "ajv-formats";
import { describe, expect, it } from "vitest";
import { GET as openApiRoute } from "@/app/api/v1/openapi.json/route";
import { checkInExample, openApiDocument as doc, type HttpMethod, type Operation } from "@/lib/api/openapi";

const ROOT = join(import.meta.dirname, "..", "..");
const DOCUMENTED_DIRS = ["app/api/v1/controllers", "app/api/v1/device", "app/api/v1/releases"];

/** Every route.ts below a directory as [OpenAPI path, exported methods]. */
function routesUnder(dir: string): [string, HttpMethod[]][] {
  const files = readdirSync(join(ROOT, dir), { recursive: true, encoding: "utf8" }).filter((f) => f === "route.ts" || f.endsWith(`${sep}route.ts`));
  return files.map((f) => {
    const rel = relative(join(ROOT, "app"), join(ROOT, dir, f)).split(sep).slice(0, -1);
    const path = "/" + rel.map((s) => s.replace(/^\[(\w+)\]$/, "{$1}")).join("/");
    const text = readFileSync(join(ROOT, dir, f), "utf8");
    const methods = [...text.matchAll(/export\s+(?:const|async\s+function|function)\s+(GET|POST|PUT|PATCH|DELETE)\b/g)].map((m) => m[1]!.toLowerCase() as HttpMethod);
    return [path, methods];
  });
}

const operations = (): [string, HttpMethod, Operation][] =>
  Object.entries(doc.paths).flatMap(([path, item]) => Object.entries(item).map(([m, op]): [string, HttpMethod, Operation] => [path, m as HttpMethod, op]));

/** Resolves a local JSON pointer such as "#/components/schemas/Error" in the document. */
function resolve(pointer: string): unknown {
  return pointer
    .replace(/^#\//, "")
    .split("/")
    .reduce<unknown>((node, key) => (node && typeof node === "object" ? (node as Record<string, unknown>)[key.replace(/~1/g, "/").replace(/~0/g, "~")] : undefined), doc);
}

function refsIn(node: unknown, out: string[] = []): string[] {
  if (Array.isArray(node)) node.forEach((n) => refsIn(n, out));
  else if (node && typeof node === "object") {
    for (const [k, v] of Object.entries(node)) if (k === "$ref" && typeof v === "string") out.push(v);
    else refsIn(v, out);
  }
  return out;
}

// OpenAPI 3.1 schemas are JSON Schema 2020-12 (OpenAPI Specification 3.1.0, OpenAPI Initiative,
// Schema Object: "a superset of the JSON Schema Specification Draft 2020-12"), so ajv's 2020 build
// compiles them; the whole document is one resource so "#/components/…" references resolve.
function schemaValidator(name: string) {
  const ajv = new Ajv2020({ strict: false, allErrors: true });
  addFormats(ajv);
  ajv.addSchema({ ...doc, $id: "urn:roostline:openapi" });
  const validate = ajv.getSchema(`urn:roostline:openapi#/components/schemas/${name}`);
  if (!validate) throw new Error(`no schema ${name}`);
  return (value: unknown) => validate(value) as boolean;
}

describe("the OpenAPI document", () => {
  it("is plain JSON declaring OpenAPI 3.1.0 with the required info fields", () => {
    // OpenAPI Specification 3.1.0, OpenAPI Object: `openapi` and `info` are required; Info Object: `title` and `version` are required.
    expect(JSON.parse(JSON.stringify(doc))).toEqual(doc);
    expect(doc.openapi).toBe("3.1.0");
    expect(doc.info).toMatchObject({ title: "Roostline device API", version: "1" });
    expect(doc.servers).toEqual([{ url: "/" }]);
  });

  it("documents every method of every route under controllers, device and releases", () => {
    const found = DOCUMENTED_DIRS.flatMap(routesUnder);
    expect(found.length).toBeGreaterThanOrEqual(7);
    for (const [path, methods] of found) {
      expect(methods.length, `${path} exports no handler the test recognises`).toBeGreaterThan(0);
      for (const m of methods) expect(doc.paths[path]?.[m], `${m.toUpperCase()} ${path} is not in lib/api/openapi.ts`).toBeDefined();
    }
    expect(doc.paths["/api/v1/health"]?.get).toBeDefined();
  });

  it("declares each path template variable as a required path parameter", () => {
    // OpenAPI Specification 3.1.0, Paths Object: each templated name must match a path parameter;
    // Parameter Object: for `in: path`, `required` is REQUIRED and MUST be true.
    for (const [path, , op] of operations()) {
      const declared = (op.parameters ?? []).map((p) => ("$ref" in p ? resolve(p.$ref) : p) as { name: string; in: string; required: boolean }).filter((p) => p.in === "path");
      const names = [...path.matchAll(/\{(\w+)\}/g)].map((m) => m[1]);
      expect(declared.map((p) => p.name).sort(), path).toEqual(names.sort());
      for (const p of declared) expect(p.required, `${path} ${p.name}`).toBe(true);
    }
  });

  it("gives every operation a unique id, a security requirement and described responses", () => {
    const ids = operations().map(([, , op]) => op.operationId);
    expect(new Set(ids).size).toBe(ids.length);
    for (const [path, m, op] of operations()) {
      expect(Array.isArray(op.security), `${m} ${path}`).toBe(true);
      for (const r of Object.values(op.responses)) {
        // OpenAPI Specification 3.1.0, Response Object: `description` is REQUIRED.
        const response = ("$ref" in r ? resolve(r.$ref) : r) as { description?: string };
        expect(response.description, `${m} ${path}`).toBeTruthy();
      }
    }
  });

  it("resolves every $ref inside the document", () => {
    for (const r of refsIn(doc)) expect(resolve(r), r).toBeDefined();
  });

  it("uses the bearer token on device calls and the session cookie on fleet calls", () => {
    expect(doc.components.securitySchemes.controllerToken).toMatchObject({ type: "http", scheme: "bearer" });
    expect(doc.components.securitySchemes.session).toMatchObject({ type: "apiKey", in: "cookie" });
    expect(doc.paths["/api/v1/controllers/{serial}/config"]?.get?.security).toEqual([{ controllerToken: [] }]);
    expect(doc.paths["/api/v1/releases"]?.post?.security).toEqual([{ session: [] }]);
    expect(doc.paths["/api/v1/device/public-key"]?.get?.security).toEqual([]);
  });

  it("lists 200, 304, 401, 403, 404, 429 with Retry-After and 503 for the configuration download, and says how to verify", () => {
    const op = doc.paths["/api/v1/controllers/{serial}/config"]!.get!;
    expect(Object.keys(op.responses).sort()).toEqual(["200", "304", "401", "403", "404", "429", "503"]);
    expect(doc.components.responses.E429?.headers?.["Retry-After"]).toBeDefined();
    expect(op.description).toMatch(/canonical JSON/);
    expect(op.description).toMatch(/Ed25519/);
    expect(op.description).toMatch(/\/api\/v1\/device\/public-key/);
    expect(JSON.stringify(doc.components.schemas.SignedConfiguration)).toContain("https://roostline.invalid/schemas/door-params/2");
  });
});

describe("the documented schemas", () => {
  it("compile as JSON Schema 2020-12", () => {
    for (const name of Object.keys(doc.components.schemas)) expect(() => schemaValidator(name), name).not.toThrow();
  });

  it("accept every request example given in the document", () => {
    for (const [path, m, op] of operations()) {
      const media = op.requestBody?.content["application/json"];
      const ref = media?.schema.$ref;
      if (!media || media.example === undefined || typeof ref !== "string") continue;
      const name = ref.split("/").pop()!;
      expect(schemaValidator(name)(media.example), `${m} ${path}`).toBe(true);
    }
  });

  it("accepts the check-in example and refuses what the route refuses", () => {
    const valid = schemaValidator("CheckIn");
    expect(valid(checkInExample)).toBe(true);
    expect(valid({ ...checkInExample, appliedHash: null, refusedReason: "nothing released" })).toBe(true);
    expect(valid({ ...checkInExample, appliedHash: null })).toBe(false);
    expect(valid({ ...checkInExample, appliedHash: null, refusedReason: "   " })).toBe(false);
    expect(valid({ ...checkInExample, appliedHash: "A".repeat(64) })).toBe(false);
    expect(valid({ ...checkInExample, extra: 1 })).toBe(false);
    expect(valid({ ...checkInExample, firmwareVersion: "1.4" })).toBe(false);
    expect(valid({ ...checkInExample, uptimeS: 1.5 })).toBe(false);
    expect(valid({ ...checkInExample, counters: { ...checkInExample.counters, doorCycles: -1 } })).toBe(false);
    expect(valid({ ...checkInExample, counters: { ...checkInExample.counters, stallEvents: 2 ** 32 } })).toBe(false);
    const { timeFixAgeS: _omitted, ...partial } = checkInExample.counters;
    expect(valid({ ...checkInExample, counters: partial })).toBe(false);
  });

  it("refuses a release change with neither percent nor state, as the route does", () => {
    const valid = schemaValidator("ReleaseChange");
    expect(valid({})).toBe(false);
    expect(valid({ state: "paused" })).toBe(true);
    expect(valid({ percent: 101 })).toBe(false);
  });
});

describe("GET /api/v1/openapi.json", () => {
  it("serves the document as JSON that caches for five minutes", async () => {
    const res = await openApiRoute(new Request("http://127.0.0.1:3100/api/v1/openapi.json"), {});
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/application\/json/);
    expect(res.headers.get("cache-control")).toBe("public, max-age=300");
    expect(await res.json()).toEqual(doc);
  });
});
