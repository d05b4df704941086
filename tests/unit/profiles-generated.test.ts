import { describe, expect, it } from "vitest";
import { renderAll, SCHEMA_TYPE_TARGETS, VALIDATOR_TARGETS } from "@/scripts/generate-schema-types";

describe("generated schema types", () => {
  it("are up to date with the schemas (run npm run schemas:types when this fails)", { timeout: 60_000 }, async () => {
    const results = await renderAll();
    expect(results.map((r) => r.output)).toEqual([...SCHEMA_TYPE_TARGETS, ...VALIDATOR_TARGETS].map((t) => t.output));
    expect(results.filter((r) => r.stale).map((r) => r.output)).toEqual([]);
  });

  it("carry a do-not-edit banner naming their schema", { timeout: 60_000 }, async () => {
    for (const r of await renderAll()) {
      expect(r.content.split("\n")[0]).toMatch(/^\/\* generated from schemas\/door-params-v[12]\.schema\.json .*; do not edit \*\/$/);
    }
  });

  it("name the root types after the parameter-set version", { timeout: 60_000 }, async () => {
    const [v1, v2] = await renderAll();
    expect(v1?.content).toContain("export interface DoorParamsV1 {");
    expect(v2?.content).toContain("export interface DoorParamsV2 {");
  });

  it("include validators compiled ahead of time, so pages never generate code at run time", { timeout: 60_000 }, async () => {
    const validators = (await renderAll()).slice(SCHEMA_TYPE_TARGETS.length);
    expect(validators).toHaveLength(2);
    for (const v of validators) {
      expect(v.content).toContain("export default validate");
      expect(v.content).not.toMatch(/new Function|\beval\(|require\(/);
    }
  });
});
