import { readFileSync } from "node:fs";
import Ajv2020 from "ajv/dist/2020";
import { describe, expect, it } from "vitest";
import { type JsonObject, type JsonValue, setOwn } from "@/lib/profiles/json";
import { findParameter, parameterInfo } from "@/lib/profiles/parameter-info";
import {
  createParamsAjv,
  getSchema,
  isKnownTimeZone,
  isValidParams,
  PARAMS_VERSIONS,
  SCHEMA_CATALOG,
  validateParams,
  type ParamsVersion,
} from "@/lib/profiles/schemas";

const fixture = (name: string): JsonObject =>
  JSON.parse(readFileSync(new URL(`../fixtures/profiles/${name}`, import.meta.url), "utf8")) as JsonObject;

const brief = (version: ParamsVersion, value: unknown) =>
  validateParams(version, value).issues.map(({ path, keyword, property }) => ({ path, keyword, ...(property ? { property } : {}) }));

describe("valid fixtures", () => {
  it.each([
    [1, "v1-base-henhouse-350.json"],
    [1, "v1-base-fixed-times.json"],
    [2, "v2-base-henhouse-350.json"],
  ] as const)("accepts version %i fixture %s", (version, name) => {
    expect(validateParams(version, fixture(name))).toEqual({ ok: true, issues: [] });
    expect(isValidParams(version, fixture(name))).toBe(true);
  });

  it("matches the Henhouse 350 drive: 420 mm of travel at 6400 counts per 50 mm spool turn", () => {
    // Hand-worked: 16 PPR × 4 (quadrature, both edges of both channels) = 64 counts per motor turn;
    // × 100 (gearbox) = 6400 counts per spool turn; spool radius 25 mm → circumference π × 50 mm = 157.08 mm;
    // 6400 / 157.08 = 40.74 counts/mm; × 420 mm = 17 112 counts. Cord build-up on the spool is ignored.
    const countsPerMm = (16 * 4 * 100) / (Math.PI * 50);
    expect(countsPerMm).toBeCloseTo(40.74, 2);
    expect(fixture("v1-base-henhouse-350.json").closeTravelCounts).toBe(Math.round(420 * countsPerMm));
    expect(fixture("v2-base-henhouse-350.json").closeTravelCounts).toBe(17112);
  });
});

describe("invalid fixtures", () => {
  it("names the group holding an unknown key", () => {
    const r = validateParams(2, fixture("invalid-v2-unknown-key.json"));
    expect(r.ok).toBe(false);
    expect(r.issues).toEqual([
      { path: "/stall", keyword: "additionalProperties", property: "sensitivity", message: '"sensitivity" is not a known parameter here' },
    ]);
  });

  it("says a boolean must be true or false", () => {
    expect(validateParams(2, fixture("invalid-v2-wrong-type.json")).issues).toEqual([
      { path: "/homeOnPowerUp", keyword: "type", message: "must be true or false" },
    ]);
  });

  it("gives the limit with its unit when a value is out of range", () => {
    expect(validateParams(2, fixture("invalid-v2-out-of-range.json")).issues).toEqual([
      { path: "/closeTravelCounts", keyword: "maximum", message: "must be at most 200000 counts" },
    ]);
    expect(validateParams(1, fixture("invalid-v1-out-of-range.json")).issues).toEqual([
      { path: "/stallWindowMs", keyword: "minimum", message: "must be at least 10 ms" },
    ]);
  });

  it("reports a missing parameter at its parent's path and names it", () => {
    expect(validateParams(2, fixture("invalid-v2-missing-required.json")).issues).toEqual([
      { path: "", keyword: "required", property: "travelTimeoutMs", message: '"travelTimeoutMs" is required' },
    ]);
  });

  it("checks a schedule against the form its kind names", () => {
    expect(brief(2, fixture("invalid-v2-wrong-schedule-form.json"))).toEqual([
      { path: "/schedule", keyword: "required", property: "sunriseOffsetMinutes" },
      { path: "/schedule", keyword: "required", property: "civilDuskOffsetMinutes" },
      { path: "/schedule", keyword: "additionalProperties", property: "openAt" },
      { path: "/schedule", keyword: "additionalProperties", property: "closeAt" },
    ]);
  });

  it("refuses a schedule kind that is neither form, listing the forms", () => {
    const doc = fixture("v2-base-henhouse-350.json");
    doc.schedule = { kind: "weekly", stepMinutes: 30 };
    expect(validateParams(2, doc).issues).toEqual([
      { path: "/schedule", keyword: "discriminator", property: "kind", message: '"kind" must be one of "fixed", "sun"' },
    ]);
    doc.schedule = { stepMinutes: 30 };
    expect(validateParams(2, doc).issues[0]?.message).toBe('"kind" is required and must be one of "fixed", "sun"');
  });

  it("wants times of day as HH:MM on the 24-hour clock", () => {
    expect(validateParams(2, fixture("invalid-v2-bad-time-of-day.json")).issues).toEqual([
      { path: "/schedule/closeAt", keyword: "pattern", message: "must be a time of day as HH:MM on the 24-hour clock, 00:00 to 23:59" },
    ]);
  });

  it("refuses a time zone the runtime does not know", () => {
    expect(brief(2, fixture("invalid-v2-unknown-time-zone.json"))).toEqual([{ path: "/timeZone", keyword: "format" }]);
  });

  it("refuses a version 1 document checked against version 2, starting with its version number", () => {
    const r = validateParams(2, fixture("v1-base-henhouse-350.json"));
    expect(r.ok).toBe(false);
    expect(r.issues).toContainEqual({ path: "/parameterSetVersion", keyword: "const", message: "must be 2 (found 1)" });
    expect(r.issues).toContainEqual(expect.objectContaining({ path: "", keyword: "additionalProperties", property: "stallThresholdCps" }));
    expect(r.issues).toContainEqual(expect.objectContaining({ path: "", keyword: "required", property: "stall" }));
    expect(r.issues).toContainEqual(expect.objectContaining({ path: "/schedule", keyword: "additionalProperties", property: "openOffsetMin" }));
    expect(validateParams(1, fixture("v2-base-henhouse-350.json")).issues).toContainEqual(
      expect.objectContaining({ path: "/parameterSetVersion", keyword: "const" }),
    );
  });

  it("refuses a document that is not an object", () => {
    expect(validateParams(2, null).issues).toEqual([{ path: "", keyword: "type", message: "must be a group of parameters (an object)" }]);
    expect(validateParams(2, []).issues).toEqual([{ path: "", keyword: "type", message: "must be a group of parameters (an object)" }]);
  });

  it("reports a whole number given as a fraction", () => {
    const doc = fixture("v2-base-henhouse-350.json");
    doc.debounceMs = 12.5;
    expect(validateParams(2, doc).issues).toEqual([{ path: "/debounceMs", keyword: "type", message: "must be a whole number" }]);
  });
});

describe("schema catalog and strict mode", () => {
  it("holds one schema per version with our non-resolvable ids", () => {
    expect(SCHEMA_CATALOG.map((e) => [e.version, e.id])).toEqual([
      [1, "https://roostline.invalid/schemas/door-params/1"],
      [2, "https://roostline.invalid/schemas/door-params/2"],
    ]);
    expect(getSchema(2).schema.$schema).toBe("https://json-schema.org/draft/2020-12/schema");
    expect(() => getSchema(3 as ParamsVersion)).toThrow("no parameter schema for version 3");
  });

  it("compiles both schemas in strict mode once the annotation keywords are registered", () => {
    const ajv = createParamsAjv();
    for (const { schema } of SCHEMA_CATALOG) expect(() => ajv.compile(schema)).not.toThrow();
  });

  it("is refused by strict mode without the annotation keywords, so registering them is what lets them in", () => {
    const bare = new Ajv2020({ strict: true, discriminator: true });
    bare.addFormat("iana-time-zone", true);
    expect(() => bare.compile(getSchema(1).schema)).toThrow(/unknown keyword: "roostline(Unit|Safety)"/);
  });

  it("forbids unknown keys on every object of both schemas", () => {
    const objects: Record<string, unknown>[] = [];
    const walk = (node: unknown) => {
      if (Array.isArray(node)) node.forEach(walk);
      else if (node && typeof node === "object") {
        const n = node as Record<string, unknown>;
        if (n.properties) objects.push(n);
        Object.entries(n).forEach(([k, v]) => k !== "default" && walk(v));
      }
    };
    for (const { schema } of SCHEMA_CATALOG) walk(schema);
    expect(objects.length).toBeGreaterThan(5);
    for (const o of objects) expect(o.additionalProperties).toBe(false);
  });

  it("knows real IANA zones and refuses offsets and made-up names", () => {
    expect(isKnownTimeZone("Europe/Berlin")).toBe(true);
    expect(isKnownTimeZone("America/Argentina/Buenos_Aires")).toBe(true);
    expect(isKnownTimeZone("UTC")).toBe(true);
    expect(isKnownTimeZone("+01:00")).toBe(false);
    expect(isKnownTimeZone("Mars/Olympus_Mons")).toBe(false);
  });
});

function documentFromDefaults(version: ParamsVersion): JsonObject {
  const doc: JsonObject = {};
  const kind = findParameter(version, "/schedule/kind")?.default;
  for (const p of parameterInfo(version)) {
    if (p.variant !== null && p.variant !== kind) continue;
    const keys = p.path.split("/").slice(1);
    let node = doc;
    for (const k of keys.slice(0, -1)) node = (node[k] ??= {}) as JsonObject;
    setOwn(node, keys[keys.length - 1]!, p.default as JsonValue);
  }
  return doc;
}

describe("parameter info", () => {
  it.each(PARAMS_VERSIONS)("documents every leaf of version %i with title, description and a default in range", (version) => {
    for (const p of parameterInfo(version)) {
      expect(p.title, p.path).not.toBe("");
      expect(p.description, p.path).not.toBe("");
      expect(p.default, p.path).not.toBeNull();
      if ((p.type === "integer" || p.type === "number") && p.allowed === null) {
        expect(p.unit, p.path).not.toBeNull();
        expect(p.minimum! <= (p.default as number) && (p.default as number) <= p.maximum!, p.path).toBe(true);
      }
    }
  });

  it.each(PARAMS_VERSIONS)("builds a valid version %i document from the defaults alone", (version) => {
    expect(validateParams(version, documentFromDefaults(version))).toEqual({ ok: true, issues: [] });
  });

  it("lists version 2 leaves as pointers with units and limits", () => {
    expect(findParameter(2, "/stall/thresholdCps")).toMatchObject({
      title: "Stall velocity threshold",
      unit: "counts/s",
      minimum: 10,
      maximum: 20000,
      default: 800,
      safety: true,
      type: "integer",
      variant: null,
    });
    expect(findParameter(2, "/schedule/kind")).toMatchObject({ allowed: ["fixed", "sun"], default: "sun", variant: null });
    expect(findParameter(2, "/schedule/stepMinutes")).toMatchObject({ default: 30, unit: "min", variant: null });
    expect(findParameter(2, "/schedule/openAt")).toMatchObject({ variant: "fixed", default: "07:00" });
    expect(findParameter(2, "/clock/source")?.allowed).toEqual(["dcf77", "msf", "wwvb", "gnss", "ntp", "rtc-only"]);
    expect(parameterInfo(2).filter((p) => p.path === "/schedule/stepMinutes")).toHaveLength(1);
  });

  it("marks exactly the parameters that can trap or injure as safety-relevant", () => {
    expect(parameterInfo(2).filter((p) => p.safety).map((p) => p.path)).toEqual([
      "/closeTravelCounts",
      "/homeOnPowerUp",
      "/travelTimeoutMs",
      "/stall/thresholdCps",
      "/stall/windowMs",
      "/stall/startupBlankingMs",
      "/stall/reopenOnStall",
      "/powerUpMode",
      "/schedule/closeAt",
      "/schedule/civilDuskOffsetMinutes",
    ]);
    expect(parameterInfo(1).filter((p) => p.safety).map((p) => p.path)).toEqual([
      "/closeTravelCounts",
      "/homeOnPowerUp",
      "/travelTimeoutMs",
      "/stallThresholdCps",
      "/stallWindowMs",
      "/stallBlankingMs",
      "/powerUpMode",
      "/schedule/closeAt",
      "/schedule/closeOffsetMin",
    ]);
  });
});
