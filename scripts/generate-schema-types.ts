// TypeScript types from the parameter-set JSON Schemas: `tsx scripts/generate-schema-types.ts` writes
// schemas/generated/*.ts; `--check` only compares and exits 1 when a generated file is stale.
import { readFileSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { _ } from "ajv";
import standaloneCode from "ajv/dist/standalone";
import { compile, type JSONSchema } from "json-schema-to-typescript";
import { createParamsAjv } from "@/lib/profiles/params-ajv";

const ROOT = join(dirname(fileURLToPath(import.meta.url)), "..");

export const SCHEMA_TYPE_TARGETS = [
  { schema: "schemas/door-params-v1.schema.json", output: "schemas/generated/door-params-v1.ts", typeName: "DoorParamsV1" },
  { schema: "schemas/door-params-v2.schema.json", output: "schemas/generated/door-params-v2.ts", typeName: "DoorParamsV2" },
] as const;

export const VALIDATOR_TARGETS = [
  { schema: "schemas/door-params-v1.schema.json", output: "schemas/generated/validate-v1.ts" },
  { schema: "schemas/door-params-v2.schema.json", output: "schemas/generated/validate-v2.ts" },
] as const;

type Node = Record<string, unknown>;

const isNode = (v: unknown): v is Node => typeof v === "object" && v !== null && !Array.isArray(v);

function range(node: Node): string | null {
  const min = node.minimum;
  const max = node.maximum;
  if (typeof min === "number" && typeof max === "number") return `Range ${min} to ${max}`;
  if (typeof min === "number") return `At least ${min}`;
  if (typeof max === "number") return `At most ${max}`;
  return null;
}

// A leaf keeps its title in the doc comment rather than as a type name: the generator would otherwise
// emit one alias per titled property (CloseTravel = number …), which says less than the field itself.
function prepare(node: unknown, isRoot: boolean): unknown {
  if (Array.isArray(node)) return node.map((n) => prepare(n, false));
  if (!isNode(node)) return node;
  const out: Node = {};
  for (const [k, v] of Object.entries(node)) {
    out[k] = k === "default" || k === "const" || k === "enum" ? v : prepare(v, false);
  }
  const isLeaf = node.type !== "object";
  if (isRoot || (isLeaf && typeof node.title === "string")) {
    const lines = [
      isLeaf && typeof node.title === "string" ? `${node.title}.` : null,
      typeof node.description === "string" ? node.description : null,
      typeof node.roostlineUnit === "string" ? `Unit: ${node.roostlineUnit}.` : null,
      range(node) ? `${range(node)}.` : null,
      node.default !== undefined && isLeaf ? `Default: ${JSON.stringify(node.default)}.` : null,
      node.roostlineSafety === true ? "Safety-relevant." : null,
    ].filter((l): l is string => l !== null);
    delete out.title;
    if (lines.length > 0) out.description = lines.join("\n");
  }
  return out;
}

/** The generated TypeScript for one schema, exactly as it is written to schemas/generated/. */
export async function renderSchemaTypes(schema: unknown, typeName: string, schemaPath: string): Promise<string> {
  const banner = `/* generated from ${schemaPath} by scripts/generate-schema-types.ts; do not edit */`;
  // The generator names the root type after its title or $id; the name we pass is the one we want.
  const prepared: Node = { ...(prepare(schema, true) as Node), title: typeName };
  delete prepared.$id;
  return compile(prepared as JSONSchema, typeName, {
    bannerComment: banner,
    additionalProperties: false,
    unknownAny: true,
    strictIndexSignatures: true,
  });
}

/** A schema's validator compiled ahead of time (ajv standalone), as a module of its own. */
export function renderValidator(schema: object, schemaPath: string): string {
  const ajv = createParamsAjv({ source: true, esm: true, formats: _`paramFormats` });
  const code = standaloneCode(ajv, ajv.compile(schema)).replace(/^"use strict";/, "");
  return [
    `/* generated from ${schemaPath} by scripts/generate-schema-types.ts; do not edit */`,
    "// @ts-nocheck",
    'import { paramFormats } from "@/lib/profiles/schema-formats";',
    code,
    "",
  ].join("\n");
}

function compare(root: string, output: string, content: string) {
  let current: string | null = null;
  try {
    current = readFileSync(join(root, output), "utf8");
  } catch {
    current = null;
  }
  return { output, content, stale: current !== content };
}

/** Renders every target and reports which generated files differ from what is on disk. */
export async function renderAll(root = ROOT): Promise<{ output: string; content: string; stale: boolean }[]> {
  const types = await Promise.all(
    SCHEMA_TYPE_TARGETS.map(async (t) => {
      const schema: unknown = JSON.parse(readFileSync(join(root, t.schema), "utf8"));
      return compare(root, t.output, await renderSchemaTypes(schema, t.typeName, t.schema));
    }),
  );
  const validators = VALIDATOR_TARGETS.map((t) => compare(root, t.output, renderValidator(JSON.parse(readFileSync(join(root, t.schema), "utf8")) as object, t.schema)));
  return [...types, ...validators];
}

async function main(argv: string[]): Promise<number> {
  const check = argv.includes("--check");
  const results = await renderAll();
  if (check) {
    const stale = results.filter((r) => r.stale);
    for (const r of stale) console.error(`stale: ${r.output} (run npm run schemas:types)`);
    if (stale.length === 0) console.log(`schema types up to date (${results.length} files)`);
    return stale.length === 0 ? 0 : 1;
  }
  for (const r of results) {
    if (r.stale) writeFileSync(join(ROOT, r.output), r.content);
    console.log(`${r.stale ? "wrote" : "unchanged"} ${r.output}`);
  }
  return 0;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  main(process.argv.slice(2)).then(
    (code) => process.exit(code),
    (error: unknown) => {
      console.error(error instanceof Error ? error.message : error);
      process.exit(1);
    },
  );
}
