import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { leafEntries, type JsonObject } from "@/lib/profiles/json";
import { mergeLayers } from "@/lib/profiles/merge";
import { validateParams } from "@/lib/profiles/schemas";

const fixture = (name: string): JsonObject =>
  JSON.parse(readFileSync(new URL(`../fixtures/profiles/${name}`, import.meta.url), "utf8")) as JsonObject;

function deepFreeze<T>(value: T): T {
  if (value && typeof value === "object") {
    Object.values(value).forEach(deepFreeze);
    Object.freeze(value);
  }
  return value;
}

const v2Layers = () => [
  { layer: "base" as const, values: fixture("v2-base-henhouse-350.json") },
  { layer: "site" as const, values: fixture("v2-site-overlay.json") },
  { layer: "controller" as const, values: fixture("v2-controller-overlay.json") },
];

describe("mergeLayers", () => {
  it("returns the base unchanged, every leaf from the base, when there are no overlays", () => {
    const base = fixture("v2-base-henhouse-350.json");
    const { values, provenance } = mergeLayers([{ layer: "base", values: base }]);
    expect(values).toEqual(base);
    expect(Object.keys(provenance)).toEqual(leafEntries(base).map(([p]) => p).sort());
    expect(new Set(Object.values(provenance))).toEqual(new Set(["base"]));
  });

  it("lays site over base and controller over site, naming the layer behind each leaf", () => {
    const { values, provenance } = mergeLayers(v2Layers());
    expect(validateParams(2, values)).toEqual({ ok: true, issues: [] });
    expect(values).toMatchObject({
      closeTravelCounts: 16980,
      timeZone: "Europe/London",
      stall: { thresholdCps: 700, windowMs: 100, startupBlankingMs: 300, reopenOnStall: true },
      schedule: { kind: "sun", sunriseOffsetMinutes: 15, civilDuskOffsetMinutes: 30, stepMinutes: 15 },
      clock: { source: "msf", alarmAfterHoursWithoutFix: 48 },
    });
    expect(provenance).toMatchObject({
      "/closeTravelCounts": "controller",
      "/stall/thresholdCps": "controller",
      "/stall/windowMs": "base",
      "/timeZone": "site",
      "/clock/source": "site",
      "/clock/alarmAfterHoursWithoutFix": "base",
      "/schedule/kind": "base",
      "/schedule/civilDuskOffsetMinutes": "site",
      "/schedule/stepMinutes": "site",
      "/debounceMs": "base",
    });
  });

  it("has a provenance entry for exactly the leaves of the result, in path order", () => {
    const { values, provenance } = mergeLayers(v2Layers());
    const leaves = leafEntries(values).map(([p]) => p).sort();
    expect(Object.keys(provenance)).toEqual(leaves);
  });

  it("replaces the schedule whole when an overlay changes its kind", () => {
    const fixed = { kind: "fixed", openAt: "07:30", closeAt: "20:15", stepMinutes: 15 };
    const { values, provenance } = mergeLayers([...v2Layers().slice(0, 2), { layer: "controller", values: { schedule: fixed } }]);
    expect(values.schedule).toEqual(fixed);
    expect(validateParams(2, values).ok).toBe(true);
    expect(Object.entries(provenance).filter(([p]) => p.startsWith("/schedule/"))).toEqual([
      ["/schedule/closeAt", "controller"],
      ["/schedule/kind", "controller"],
      ["/schedule/openAt", "controller"],
      ["/schedule/stepMinutes", "controller"],
    ]);
  });

  it("merges a schedule overlay of the same kind field by field", () => {
    const { values, provenance } = mergeLayers([
      { layer: "base", values: fixture("v2-base-henhouse-350.json") },
      { layer: "site", values: { schedule: { kind: "sun", civilDuskOffsetMinutes: 25 } } },
    ]);
    expect(values.schedule).toEqual({ kind: "sun", sunriseOffsetMinutes: 15, civilDuskOffsetMinutes: 25, stepMinutes: 30 });
    expect(provenance["/schedule/sunriseOffsetMinutes"]).toBe("base");
    expect(provenance["/schedule/kind"]).toBe("site");
  });

  it("replaces lists whole instead of merging them item by item", () => {
    const { values, provenance } = mergeLayers([
      { layer: "base", values: { holidays: ["12-24", "12-25", "12-26"], note: { a: 1 } } },
      { layer: "site", values: { holidays: ["01-01"] } },
    ]);
    expect(values.holidays).toEqual(["01-01"]);
    expect(provenance).toEqual({ "/holidays": "site", "/note/a": "base" });
  });

  it("leaves its inputs untouched and shares no objects with them", () => {
    const layers = deepFreeze(v2Layers());
    const { values } = mergeLayers(layers);
    (values.stall as JsonObject).windowMs = 1;
    expect((layers[0]!.values.stall as JsonObject).windowMs).toBe(100);
  });

  it("keeps a __proto__ key from parsed JSON as data, never as a prototype", () => {
    const overlay = JSON.parse('{"__proto__": {"polluted": true}}') as JsonObject;
    const { values, provenance } = mergeLayers([{ layer: "base", values: {} }, { layer: "site", values: overlay }]);
    expect(Object.hasOwn(values, "__proto__")).toBe(true);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(Object.getPrototypeOf(values)).toBe(Object.prototype);
    expect(provenance).toEqual({ "/__proto__/polluted": "site" });
  });

  it("escapes / and ~ in keys as JSON Pointer does", () => {
    const { provenance } = mergeLayers([{ layer: "base", values: { "a/b": { "c~d": 1 } } }]);
    expect(provenance).toEqual({ "/a~1b/c~0d": "base" });
  });

  it.each([
    [["site", "base"]],
    [["base", "controller", "site"]],
    [["base", "site", "site"]],
    [[]],
  ])("refuses layers in the order %j", (order) => {
    expect(() => mergeLayers(order.map((layer) => ({ layer: layer as "base", values: {} })))).toThrow(/base/);
  });
});
