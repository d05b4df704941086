// Generated and mutated parameter documents against the validator, the safety rules, the layer
// merge, the v1 → v2 migration and the canonical hash: none of them may throw on what a client can
// send, and every refusal names a path and says what is wrong.
import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { demoDoorModels, demoSites } from "@/db/seed/demo";
import { CanonicalJsonError, canonicalJson, contentHash } from "@/lib/profiles/canonical";
import { defaultDocument } from "@/lib/profiles/defaults";
import { jsonEqual, leafEntries, type JsonObject, type JsonValue } from "@/lib/profiles/json";
import { mergeLayers } from "@/lib/profiles/merge";
import { parameterInfo } from "@/lib/profiles/parameter-info";
import { MigrationError, migrateOverlayV1toV2, migrateV1toV2 } from "@/lib/profiles/migrate";
import { checkSafety, type DoorModel, type SafetyContext } from "@/lib/profiles/safety";
import { expectedTravelTime, modelTravel, nominalVelocity } from "@/lib/profiles/safety/reference";
import { validateParams, type ParamsVersion, type ValidationResult } from "@/lib/profiles/schemas";
import { baseDocument } from "@/tests/support/profiles";

const SEED = 20_260_301;
const RUNS = 150;
const fixture = (name: string): JsonObject => JSON.parse(readFileSync(new URL(`../fixtures/profiles/${name}`, import.meta.url), "utf8")) as JsonObject;

// ---------------------------------------------------------------------------------------------
// Valid starting documents: the test helper's base, the fixtures, and the seed's documents for each
// demo door model (worked out from the drive train the way the seed does).

const NOW = new Date("2026-03-01T12:00:00Z");

function seedBase(model: DoorModel): JsonObject {
  const ctx = { now: NOW, doorModel: model };
  const closeTravelCounts = Math.round(modelTravel(model).counts);
  const nominal = nominalVelocity(ctx)!.nominalCps;
  const expected = expectedTravelTime(ctx, closeTravelCounts)!.ms;
  const doc = defaultDocument(2);
  return {
    ...doc,
    closeTravelCounts,
    timeZone: "Europe/Berlin",
    travelTimeoutMs: Math.ceil((expected * 2.5) / 1000) * 1000,
    stall: { ...(doc.stall as object), thresholdCps: Math.round(nominal * 0.5), windowMs: 100 },
  } as JsonObject;
}

const V2_DOCS: JsonObject[] = [
  baseDocument() as JsonObject,
  defaultDocument(2) as JsonObject,
  fixture("v2-base-henhouse-350.json"),
  fixture("safety-v2-clean.json"),
  fixture("safety-v2-hazards.json"),
  fixture("safety-v2-fixed-tromso.json"),
  ...demoDoorModels.map(seedBase),
];
const V1_DOCS: JsonObject[] = [defaultDocument(1) as JsonObject, fixture("v1-base-henhouse-350.json"), fixture("v1-base-fixed-times.json"), fixture("safety-v1-clean.json"), fixture("safety-v1-hazards.json")];
const V2_OVERLAYS: JsonObject[] = [fixture("v2-site-overlay.json"), fixture("v2-controller-overlay.json")];
const V1_OVERLAYS: JsonObject[] = [fixture("v1-site-overlay.json"), fixture("v1-controller-overlay.json")];

const CONTEXTS: SafetyContext[] = [
  { now: NOW },
  ...demoSites.flatMap((s) => demoDoorModels.map((m): SafetyContext => ({ now: NOW, site: { latitude: s.latitude, longitude: s.longitude, timeZone: s.timeZone }, doorModel: m }))),
  { now: NOW, site: { latitude: 69.65, longitude: 18.96, timeZone: "Europe/Oslo" }, doorModel: demoDoorModels[0], calibration: { fullTravelCounts: 17_000, nominalVelocityCps: 4000, travelTimeMs: 4500 } },
];

// ---------------------------------------------------------------------------------------------
// Mutations. Objects are built with defineProperty so "__proto__" stays an own data key, exactly as
// JSON.parse leaves it in a request body.

const own = (o: Record<string, unknown>, key: string, value: unknown) => Object.defineProperty(o, key, { value, enumerable: true, writable: true, configurable: true });

function clone(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(clone);
  if (value && typeof value === "object") {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) own(out, k, clone(v));
    return out;
  }
  return value;
}

function nested(depth: number, leaf: unknown = 1): unknown {
  let v: unknown = leaf;
  for (let i = 0; i < depth; i++) v = i % 2 ? [v] : { d: v };
  return v;
}

const PROTO_KEYS = ["__proto__", "constructor", "prototype", "toString", "hasOwnProperty", "valueOf"];

const protoObject = fc.constantFrom(
  JSON.parse('{"__proto__":{"polluted":true}}') as unknown,
  JSON.parse('{"constructor":{"prototype":{"polluted":true}}}') as unknown,
  JSON.parse('{"__proto__":null,"kind":"sun"}') as unknown,
  JSON.parse('{"toString":1,"valueOf":"x","hasOwnProperty":false}') as unknown,
);

const edgeNumber = fc.constantFrom(1e308, -1e308, -1, -0, 0, 0.5, -0.5, 1e-308, 5e-324, Number.MAX_SAFE_INTEGER, Number.MAX_SAFE_INTEGER + 2, -Number.MAX_SAFE_INTEGER, 2 ** 31, 2 ** 32, 4_294_967_296, 1e21, 123.456);
const nonJsonNumber = fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY);
const loneSurrogates = fc.string({ unit: fc.integer({ min: 0xd800, max: 0xdfff }).map((c) => String.fromCharCode(c)), maxLength: 4 });
const controlChars = fc.string({ unit: fc.integer({ min: 0, max: 0x1f }).map((c) => String.fromCharCode(c)), maxLength: 8 });
const oddString = fc.oneof(
  fc.string(),
  fc.string({ unit: "binary" }),
  loneSurrogates,
  controlChars,
  fc.constantFrom("", " ", "NaN", "Infinity", "-0", "1e308", "0x10", "1".repeat(400), "24:00", "06:30\n", "Europe/Atlantis", "UTC", "../../etc", "\u202e", "\ufeff"),
  fc.integer({ min: 1, max: 20_000 }).map((n) => "x".repeat(n)),
);

/** A value of any kind a client could put where a parameter belongs. */
const wrongValue: fc.Arbitrary<unknown> = fc.oneof(
  { arbitrary: edgeNumber, weight: 4 },
  { arbitrary: fc.integer(), weight: 2 },
  { arbitrary: fc.double(), weight: 2 },
  { arbitrary: nonJsonNumber, weight: 1 },
  { arbitrary: oddString, weight: 3 },
  { arbitrary: fc.constantFrom(true, false, null), weight: 2 },
  { arbitrary: fc.jsonValue({ maxDepth: 3 }), weight: 3 },
  { arbitrary: protoObject, weight: 1 },
  { arbitrary: fc.constantFrom(nested(33), nested(200), [], {}, [[]], [null]), weight: 1 },
);

type Mutation = { kind: "drop"; at: number } | { kind: "set"; at: number; value: unknown } | { kind: "add"; at: number; key: string; value: unknown };

const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({ kind: fc.constant("drop" as const), at: fc.nat() }),
  fc.record({ kind: fc.constant("set" as const), at: fc.nat(), value: wrongValue }),
  fc.record({ kind: fc.constant("add" as const), at: fc.nat(), key: fc.oneof(fc.constantFrom(...PROTO_KEYS), fc.string({ maxLength: 12 })), value: wrongValue }),
);

type Slot = { parent: Record<string, unknown> | unknown[]; key: string | number };

function slots(value: unknown, out: Slot[] = []): Slot[] {
  if (Array.isArray(value)) value.forEach((v, i) => (out.push({ parent: value, key: i }), slots(v, out)));
  else if (value && typeof value === "object") for (const [k, v] of Object.entries(value)) out.push({ parent: value as Record<string, unknown>, key: k }), slots(v, out);
  return out;
}

function containers(value: unknown, out: Record<string, unknown>[] = []): Record<string, unknown>[] {
  if (value && typeof value === "object" && !Array.isArray(value)) {
    out.push(value as Record<string, unknown>);
    for (const v of Object.values(value)) containers(v, out);
  }
  return out;
}

/** Applies mutations to a copy; slots are chosen modulo what exists, so every mutation lands somewhere. */
function mutate(doc: unknown, mutations: readonly Mutation[]): unknown {
  const copy = clone(doc);
  for (const m of mutations) {
    if (m.kind === "add") {
      const all = containers(copy);
      if (all.length) own(all[m.at % all.length]!, m.key, clone(m.value));
      continue;
    }
    const all = slots(copy);
    if (!all.length) continue;
    const { parent, key } = all[m.at % all.length]!;
    if (m.kind === "drop") {
      if (Array.isArray(parent)) parent.splice(key as number, 1);
      else delete parent[key as string];
    } else if (Array.isArray(parent)) parent[key as number] = clone(m.value);
    else own(parent, key as string, clone(m.value));
  }
  return copy;
}

/** Sets a parameter to an allowed value at or near its limits, so the document stays valid more often and the safety rules run on edge values. */
function retuned(version: ParamsVersion) {
  const params = parameterInfo(version).filter((p) => p.variant === null);
  const edge = (p: (typeof params)[number]): fc.Arbitrary<unknown> => {
    if (p.allowed) return fc.constantFrom(...p.allowed);
    if (p.type === "boolean") return fc.boolean();
    if (p.type === "integer" || p.type === "number") {
      const lo = p.minimum ?? -1e6;
      const hi = p.maximum ?? 1e6;
      const inRange = p.type === "integer" ? fc.integer({ min: Math.ceil(lo), max: Math.floor(hi) }) : fc.double({ min: lo, max: hi, noNaN: true });
      return fc.oneof(fc.constantFrom(lo, hi, p.default ?? lo), inRange);
    }
    return fc.constant(p.default);
  };
  const one = fc.constantFrom(...params).chain((p) => edge(p).map((value) => ({ path: p.path, value })));
  return fc.array(one, { minLength: 1, maxLength: 5 });
}

function setAt(doc: unknown, pointer: string, value: unknown): unknown {
  const copy = clone(doc) as Record<string, unknown>;
  const keys = pointer.slice(1).split("/");
  let node: Record<string, unknown> = copy;
  for (const k of keys.slice(0, -1)) {
    if (!node[k] || typeof node[k] !== "object") own(node, k, {});
    node = node[k] as Record<string, unknown>;
  }
  own(node, keys[keys.length - 1]!, value);
  return copy;
}

const retunedDocs = (version: ParamsVersion, docs: readonly unknown[]) =>
  fc.tuple(fc.constantFrom(...docs), retuned(version)).map(([doc, changes]) => changes.reduce((d, c) => setAt(d, c.path, c.value), doc));

const mutated = (docs: readonly unknown[]) => fc.tuple(fc.constantFrom(...docs), fc.array(mutation, { minLength: 1, maxLength: 4 })).map(([doc, ms]) => mutate(doc, ms));

/** Reorders every object's keys (deeply), keeping own "__proto__" keys as data. */
function shuffleKeys(value: unknown, rnd: () => number): unknown {
  if (Array.isArray(value)) return value.map((v) => shuffleKeys(v, rnd));
  if (value && typeof value === "object") {
    const entries = Object.entries(value);
    for (let i = entries.length - 1; i > 0; i--) {
      const j = Math.floor(rnd() * (i + 1));
      [entries[i], entries[j]] = [entries[j]!, entries[i]!];
    }
    const out: Record<string, unknown> = {};
    for (const [k, v] of entries) own(out, k, shuffleKeys(v, rnd));
    return out;
  }
  return value;
}

function lcg(seed: number): () => number {
  let s = seed >>> 0 || 1;
  return () => ((s = (Math.imul(s, 1_664_525) + 1_013_904_223) >>> 0) / 2 ** 32);
}

// ---------------------------------------------------------------------------------------------
// The properties.

function expectWellFormed(result: ValidationResult) {
  expect(typeof result.ok).toBe("boolean");
  expect(result.ok).toBe(result.issues.length === 0);
  for (const issue of result.issues) {
    expect(typeof issue.path).toBe("string");
    expect(issue.path === "" || issue.path.startsWith("/")).toBe(true);
    expect(typeof issue.keyword).toBe("string");
    expect(typeof issue.message).toBe("string");
    expect(issue.message.trim().length).toBeGreaterThan(0);
    if (issue.property !== undefined) expect(typeof issue.property).toBe("string");
  }
}

function expectFindingsWellFormed(version: ParamsVersion, doc: unknown, ctx: SafetyContext) {
  const findings = checkSafety(version, doc, ctx);
  for (const f of findings) {
    expect(f.ruleId).toMatch(/^RL-[A-Z]+(-[A-Z]+)*$/);
    expect(["error", "warning"]).toContain(f.severity);
    expect(f.paths.length).toBeGreaterThan(0);
    for (const p of f.paths) expect(p.startsWith("/")).toBe(true);
    expect(f.title.trim().length).toBeGreaterThan(0);
    expect(f.message.trim().length).toBeGreaterThan(0);
  }
  // Errors come first.
  const firstWarning = findings.findIndex((f) => f.severity === "warning");
  if (firstWarning >= 0) expect(findings.slice(firstWarning).every((f) => f.severity === "warning")).toBe(true);
}

const ctxArb = fc.constantFrom(...CONTEXTS);
const fcParams = (numRuns = RUNS) => ({ seed: SEED, numRuns });

describe("validateParams on arbitrary values", () => {
  it.each([1, 2] as const)("never throws on any JSON value for version %i, and says valid or lists issues with a path and a message", (version) => {
    fc.assert(
      fc.property(fc.jsonValue(), (value) => {
        expectWellFormed(validateParams(version, value));
      }),
      fcParams(),
    );
  });

  it.each([1, 2] as const)("never throws on any JavaScript value for version %i (NaN, dates, maps, sparse arrays, null prototypes)", (version) => {
    const anything = fc.anything({ withBigInt: true, withDate: true, withMap: true, withSet: true, withNullPrototype: true, withSparseArray: true, withTypedArray: true, withBoxedValues: true, withObjectString: true });
    fc.assert(
      fc.property(anything, (value) => {
        expectWellFormed(validateParams(version, value));
      }),
      fcParams(),
    );
  });
});

describe("mutations of valid documents", () => {
  it("starts from documents that are valid, so the mutations below start from a known place", () => {
    for (const d of V2_DOCS) expect(validateParams(2, d).issues).toEqual([]);
    for (const d of V1_DOCS) expect(validateParams(1, d).issues).toEqual([]);
  });

  it("validates every mutated version 2 document without throwing; a valid one passes the safety rules without throwing", () => {
    fc.assert(
      fc.property(fc.oneof(mutated(V2_DOCS), retunedDocs(2, V2_DOCS)), ctxArb, (doc, ctx) => {
        const result = validateParams(2, doc);
        expectWellFormed(result);
        if (result.ok) expectFindingsWellFormed(2, doc, ctx);
        else expect(() => checkSafety(2, doc, ctx)).toThrow(TypeError);
      }),
      fcParams(200),
    );
  }, 30_000);

  it("validates every mutated version 1 document without throwing; a valid one migrates to a valid version 2 document", () => {
    fc.assert(
      fc.property(fc.oneof(mutated(V1_DOCS), retunedDocs(1, V1_DOCS)), ctxArb, (doc, ctx) => {
        const result = validateParams(1, doc);
        expectWellFormed(result);
        if (!result.ok) {
          let thrown: unknown;
          try {
            migrateV1toV2(doc);
          } catch (err) {
            thrown = err;
          }
          expect(thrown).toBeInstanceOf(MigrationError);
          expect((thrown as MigrationError).issues.length).toBeGreaterThan(0);
          return;
        }
        const v2 = migrateV1toV2(doc);
        expectWellFormed(validateParams(2, v2));
        expect(validateParams(2, v2).issues).toEqual([]);
        expectFindingsWellFormed(1, doc, ctx);
      }),
      fcParams(150),
    );
  }, 30_000);

  it("keeps a valid document's hash when its keys are reordered, and the hash of a mutated one is stable too", () => {
    fc.assert(
      fc.property(fc.oneof(fc.constantFrom(...V2_DOCS, ...V1_DOCS), mutated([...V2_DOCS, ...V1_DOCS])), fc.integer(), (doc, seed) => {
        let hash: string;
        try {
          hash = contentHash(doc);
        } catch (err) {
          // Only values JSON cannot hold (NaN, Infinity) are refused, with the path named.
          expect(err).toBeInstanceOf(CanonicalJsonError);
          expect((err as CanonicalJsonError).path).toMatch(/^(\/.*)?$/);
          return;
        }
        expect(hash).toMatch(/^[0-9a-f]{64}$/);
        expect(contentHash(shuffleKeys(doc, lcg(seed)))).toBe(hash);
      }),
      fcParams(300),
    );
  });
});

describe("prototype keys", () => {
  it("treats __proto__ and constructor keys as data everywhere and never pollutes Object.prototype", () => {
    fc.assert(
      fc.property(mutated([...V2_DOCS, ...V2_OVERLAYS]), (doc) => {
        validateParams(2, doc);
        try {
          contentHash(doc);
        } catch (err) {
          expect(err).toBeInstanceOf(CanonicalJsonError);
        }
        if (doc && typeof doc === "object" && !Array.isArray(doc)) mergeLayers([{ layer: "base", values: V2_DOCS[0]! }, { layer: "site", values: doc }]);
        expect(({} as Record<string, unknown>).polluted).toBeUndefined();
        expect(Object.prototype.hasOwnProperty.call(Object.prototype, "polluted")).toBe(false);
      }),
      fcParams(200),
    );
  });

  it("hashes a document with an own __proto__ key differently from the same document without it", () => {
    const doc = clone(V2_DOCS[0]) as Record<string, unknown>;
    const withProto = clone(doc) as Record<string, unknown>;
    own(withProto, "__proto__", { polluted: true });
    expect(contentHash(withProto)).not.toBe(contentHash(doc));
    expect(canonicalJson(withProto)).toContain('"__proto__":{"polluted":true}');
  });
});

describe("v1 overlays with prototype keys", () => {
  it("refuses version 1 overlays with prototype keys, at the top and in the schedule, with a MigrationError", () => {
    const cases = ['{"timeZone":"Europe/London","__proto__":1}', '{"constructor":1}', '{"toString":1}', '{"schedule":{"kind":"sun","__proto__":1}}', '{"schedule":{"kind":"sun","constructor":1}}'];
    const outcomes = cases.map((text) => {
      try {
        return `${text} → migrated to ${JSON.stringify(migrateOverlayV1toV2(JSON.parse(text) as object, { below: V1_DOCS[1] }))}`;
      } catch (err) {
        return err instanceof MigrationError ? "refused" : `${text} → ${String(err)}`;
      }
    });
    expect(outcomes).toEqual(cases.map(() => "refused"));
  });
});

describe("mergeLayers on generated overlays", () => {
  const overlayArb = fc.oneof(
    mutated(V2_OVERLAYS),
    mutated(V2_DOCS),
    fc.dictionary(fc.oneof(fc.string({ maxLength: 8 }), fc.constantFrom(...PROTO_KEYS, "schedule", "stall", "clock", "kind")), fc.jsonValue({ maxDepth: 3 })),
  );

  it("never throws for object overlays, and every leaf of the overlay ends up in the result, credited to its layer", () => {
    fc.assert(
      fc.property(fc.constantFrom(...V2_DOCS), overlayArb, overlayArb, (base, site, controller) => {
        if (!site || typeof site !== "object" || Array.isArray(site) || !controller || typeof controller !== "object" || Array.isArray(controller)) return;
        const { values, provenance } = mergeLayers([
          { layer: "base", values: base },
          { layer: "site", values: site },
          { layer: "controller", values: controller },
        ]);
        for (const [pointer, leaf] of leafEntries(controller as JsonValue)) {
          expect(provenance[pointer]).toBe("controller");
          expect(at(values, pointer)).toEqual(leaf);
        }
        for (const layer of Object.values(provenance)) expect(["base", "site", "controller"]).toContain(layer);
      }),
      fcParams(300),
    );
  });

  it("refuses an overlay that is not an object with a message naming the layer, and never throws anything else", () => {
    fc.assert(
      fc.property(fc.jsonValue(), (overlay) => {
        try {
          mergeLayers([{ layer: "base", values: V2_DOCS[0]! }, { layer: "site", values: overlay as object }]);
          expect(overlay && typeof overlay === "object" && !Array.isArray(overlay)).toBe(true);
        } catch (err) {
          expect(err).toBeInstanceOf(Error);
          expect((err as Error).message).toMatch(/site layer must be an object/);
        }
      }),
      fcParams(),
    );
  });

  it("migrates mutated version 1 overlays or refuses them with a MigrationError naming a path", () => {
    fc.assert(
      fc.property(mutated(V1_OVERLAYS), fc.constantFrom(...V1_DOCS), (overlay, below) => {
        try {
          const out = migrateOverlayV1toV2(overlay as object, { below });
          expect(out && typeof out === "object").toBe(true);
        } catch (err) {
          expect(err).toBeInstanceOf(MigrationError);
          expect(typeof (err as MigrationError).path).toBe("string");
          expect((err as MigrationError).message.length).toBeGreaterThan(0);
        }
      }),
      fcParams(300),
    );
  });
});

function at(doc: unknown, pointer: string): unknown {
  if (pointer === "") return doc;
  return pointer
    .slice(1)
    .split("/")
    .map((t) => t.replace(/~1/g, "/").replace(/~0/g, "~"))
    .reduce<unknown>((node, key) => (node && typeof node === "object" && Object.hasOwn(node, key) ? (node as Record<string, unknown>)[key] : undefined), doc);
}

describe("canonicalJson and contentHash on arbitrary values", () => {
  it("turns any JSON value into canonical text that parses back to an equal value and is a fixed point", () => {
    fc.assert(
      fc.property(fc.jsonValue(), fc.integer(), (value, seed) => {
        const text = canonicalJson(value);
        expect(jsonEqual(JSON.parse(text), value)).toBe(true);
        expect(canonicalJson(JSON.parse(text))).toBe(text);
        expect(contentHash(shuffleKeys(value, lcg(seed)))).toBe(contentHash(value));
      }),
      fcParams(300),
    );
  });

  it("refuses values JSON cannot hold with a CanonicalJsonError naming the path, and throws nothing else", () => {
    const anything = fc.anything({ withBigInt: true, withDate: true, withMap: true, withSet: true, withNullPrototype: true, withSparseArray: true, withTypedArray: true, withBoxedValues: true, withObjectString: true });
    fc.assert(
      fc.property(anything, (value) => {
        try {
          expect(typeof canonicalJson(value)).toBe("string");
        } catch (err) {
          expect(err).toBeInstanceOf(CanonicalJsonError);
          expect((err as CanonicalJsonError).message.length).toBeGreaterThan(0);
        }
      }),
      fcParams(300),
    );
  });

  it("hashes documents nested far deeper than the database stores (32 levels)", () => {
    for (const depth of [33, 100, 1000, 3000]) expect(contentHash({ parameterSetVersion: 2, deep: nested(depth) }), `depth ${depth}`).toMatch(/^[0-9a-f]{64}$/);
  });

  it("validates documents as deeply nested as a 256 KiB request body allows without overflowing the stack", () => {
    for (const depth of [1000, 10_000, 100_000]) expectWellFormed(validateParams(2, { parameterSetVersion: 2, deep: nested(depth) }));
  });
});
