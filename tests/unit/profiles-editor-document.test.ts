import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { formatDocument, getAt, parseText, pointerTokens, removeAt, schemaKeyOrder, setAt } from "@/components/profiles/editor/document-edits";
import type { JsonObject } from "@/lib/profiles/json";
import { parameterInfo } from "@/lib/profiles/parameter-info";

const fixture = (name: string): JsonObject =>
  JSON.parse(readFileSync(new URL(`../fixtures/profiles/${name}`, import.meta.url), "utf8")) as JsonObject;

const order = schemaKeyOrder(parameterInfo(2));

describe("pointerTokens and getAt", () => {
  it("unescapes ~1 before ~0, as RFC 6901 section 4 requires", () => {
    expect(pointerTokens("/a~1b/m~0n/~01")).toEqual(["a/b", "m~n", "~1"]);
    expect(pointerTokens("")).toEqual([]);
    expect(() => pointerTokens("a")).toThrow(/not a JSON Pointer/);
  });

  it("reads nested values and gives undefined for a missing step", () => {
    const doc = fixture("v2-base-henhouse-350.json");
    expect(getAt(doc, "/stall/thresholdCps")).toBe(800);
    expect(getAt(doc, "/stall/nothing")).toBeUndefined();
    expect(getAt(doc, "/debounceMs/deeper")).toBeUndefined();
    expect(getAt(doc, "")).toBe(doc);
  });
});

describe("schemaKeyOrder", () => {
  it("lists each group's keys in schema order, every schedule form's keys under one parent", () => {
    expect(order.get("")?.slice(0, 3)).toEqual(["parameterSetVersion", "closeTravelCounts", "openSensorActiveLevel"]);
    expect(order.get("/stall")).toEqual(["thresholdCps", "windowMs", "startupBlankingMs", "reopenOnStall"]);
    expect(order.get("/schedule")).toEqual(expect.arrayContaining(["kind", "openAt", "closeAt", "stepMinutes", "sunriseOffsetMinutes"]));
    expect(order.get("/schedule")?.[0]).toBe("kind");
  });
});

describe("setAt", () => {
  it("replaces a value in place, keeping every key where it was", () => {
    const doc = fixture("v2-base-henhouse-350.json");
    const next = setAt(doc, "/stall/windowMs", 120, order);
    expect(getAt(next, "/stall/windowMs")).toBe(120);
    expect(Object.keys(next)).toEqual(Object.keys(doc));
    expect(Object.keys(next.stall as JsonObject)).toEqual(Object.keys(doc.stall as JsonObject));
    expect(getAt(doc, "/stall/windowMs")).toBe(100);
  });

  it("puts a new key where the schema lists it and creates a missing group", () => {
    const overlay = fixture("v2-controller-overlay.json");
    const withTimeout = setAt(overlay, "/travelTimeoutMs", 22000, order);
    expect(Object.keys(withTimeout)).toEqual(["closeTravelCounts", "travelTimeoutMs", "stall"]);
    const withClock = setAt(withTimeout, "/clock/source", "msf", order);
    expect(Object.keys(withClock)).toEqual(["closeTravelCounts", "travelTimeoutMs", "stall", "clock"]);
    const first = setAt(withClock, "/parameterSetVersion", 2, order);
    expect(Object.keys(first)[0]).toBe("parameterSetVersion");
    const blanking = setAt(first, "/stall/startupBlankingMs", 250, order);
    expect(Object.keys(blanking.stall as JsonObject)).toEqual(["thresholdCps", "startupBlankingMs"]);
  });

  it("appends a key the schema does not know, and replaces a scalar standing where a group belongs", () => {
    expect(Object.keys(setAt({ b: 1 }, "/zz", 2, order))).toEqual(["b", "zz"]);
    expect(setAt({ stall: 5 }, "/stall/windowMs", 50, order)).toEqual({ stall: { windowMs: 50 } });
  });

  it("keeps a __proto__ key as data", () => {
    const doc = JSON.parse('{"__proto__": {"x": 1}}') as JsonObject;
    const next = setAt(doc, "/__proto__/x", 2);
    expect(Object.getPrototypeOf(next)).toBe(Object.prototype);
    expect(JSON.stringify(next)).toBe('{"__proto__":{"x":2}}');
  });

  it("refuses to replace the whole document", () => {
    expect(() => setAt({}, "", 1)).toThrow();
  });
});

describe("removeAt", () => {
  it("removes a key and drops groups the removal leaves empty", () => {
    const overlay = fixture("v2-controller-overlay.json");
    expect(removeAt(overlay, "/stall/thresholdCps")).toEqual({ closeTravelCounts: 16980 });
    expect(removeAt(overlay, "/closeTravelCounts")).toEqual({ stall: { thresholdCps: 700 } });
  });

  it("leaves the document alone when the key is absent", () => {
    const overlay = fixture("v2-site-overlay.json");
    expect(removeAt(overlay, "/stall/windowMs")).toEqual(overlay);
    expect(removeAt(overlay, "/timeZone/deeper")).toEqual(overlay);
  });

  it("keeps the order of the remaining keys", () => {
    const overlay = fixture("v2-site-overlay.json");
    expect(Object.keys(removeAt(overlay, "/clock/source"))).toEqual(["timeZone", "schedule"]);
  });
});

describe("formatDocument and parseText", () => {
  it("writes two-space JSON with a final newline that reads back equal", () => {
    const doc = fixture("v2-base-henhouse-350.json");
    const text = formatDocument(doc);
    expect(text).toBe(`${JSON.stringify(doc, null, 2)}\n`);
    expect(parseText(text)).toEqual({ ok: true, value: doc });
    expect(text.split("\n")[1]).toBe('  "parameterSetVersion": 2,');
  });

  it("returns the parser's message instead of throwing", () => {
    const r = parseText("{");
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message.length).toBeGreaterThan(0);
  });
});
