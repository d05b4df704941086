import { describe, expect, it } from "vitest";
import { editorSchema, parameterFacts } from "@/components/profiles/editor/monaco-schema";
import { getSchema } from "@/lib/profiles/schemas";

type Node = Record<string, any>;

const v2 = getSchema(2).schema as Node;

function anyRequired(node: unknown): boolean {
  if (Array.isArray(node)) return node.some(anyRequired);
  if (typeof node !== "object" || node === null) return false;
  return Object.entries(node).some(([k, v]) => k === "required" || anyRequired(v));
}

describe("parameterFacts", () => {
  it("names unit, range, default and the safety flag", () => {
    const travel = v2.properties.closeTravelCounts;
    expect(parameterFacts(travel)).toBe(`Unit: counts · ${travel.minimum} to ${travel.maximum} · default ${travel.default} · safety-relevant`);
    expect(parameterFacts({ roostlineUnit: "ms", minimum: 1, maximum: 5, default: 2, roostlineSafety: true })).toBe("Unit: ms · 1 to 5 · default 2 · safety-relevant");
    expect(parameterFacts(v2.properties.openSensorActiveLevel)).toBe('default "low"');
    expect(parameterFacts({ minimum: -5 })).toBe("at least -5");
    expect(parameterFacts(v2.properties.schedule)).toBe("");
  });
});

describe("editorSchema", () => {
  it("adds hover text to every property and keeps the schema's checks", () => {
    const s = editorSchema(v2, { uri: "inmemory://x/base", relaxed: false }) as Node;
    expect(s.$id).toBe("inmemory://x/base");
    expect(s.required).toEqual(v2.required);
    expect(s.properties.stall.properties.thresholdCps.markdownDescription).toContain(parameterFacts(v2.properties.stall.properties.thresholdCps));
    expect(s.properties.stall.properties.thresholdCps.markdownDescription).toContain("Unit: counts/s");
    expect(s.properties.stall.properties.thresholdCps.minimum).toBe(10);
    expect(s.properties.schedule.oneOf).toHaveLength(2);
    expect(s.properties.schedule.oneOf[0].properties.openAt.markdownDescription).toContain("HH:MM");
  });

  it("escapes Markdown in descriptions", () => {
    const s = editorSchema({ properties: { a: { description: "2*3 <b>_x_</b>" } } }, { uri: "u", relaxed: false }) as Node;
    expect(s.properties.a.markdownDescription).toBe("2\\*3 \\<b\\>\\_x\\_\\</b\\>");
  });

  it("relaxes for overlays: nothing required, schedule forms as anyOf, no discriminator", () => {
    const s = editorSchema(v2, { uri: "u", relaxed: true }) as Node;
    expect(anyRequired(s)).toBe(false);
    expect(s.properties.schedule.anyOf).toHaveLength(2);
    expect(s.properties.schedule.oneOf).toBeUndefined();
    expect(s.properties.schedule.discriminator).toBeUndefined();
    expect(s.properties.schedule.default).toEqual(v2.properties.schedule.default);
    expect(s.additionalProperties).toBe(false);
  });

  it("leaves the catalog's schema untouched", () => {
    const before = JSON.stringify(v2);
    editorSchema(v2, { uri: "u", relaxed: true });
    expect(JSON.stringify(v2)).toBe(before);
  });
});
