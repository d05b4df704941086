import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import {
  buildForm,
  chooseForm,
  displayValue,
  fieldId,
  formKeys,
  formTitle,
  groupParameters,
  isFormTag,
  limitsHint,
  rangeMessage,
  readDraft,
  replacesForm,
} from "@/components/profiles/editor/fields-model";
import type { JsonObject } from "@/lib/profiles/json";
import { mergeLayers } from "@/lib/profiles/merge";
import { findParameter, parameterInfo } from "@/lib/profiles/parameter-info";
import { validateParams } from "@/lib/profiles/schemas";

const fixture = (name: string): JsonObject =>
  JSON.parse(readFileSync(new URL(`../fixtures/profiles/${name}`, import.meta.url), "utf8")) as JsonObject;

const FIXED_DEFAULTS = () => ({ openAt: findParameter(2, "/schedule/openAt", "fixed")?.default, closeAt: findParameter(2, "/schedule/closeAt", "fixed")?.default });

const param = (version: 1 | 2, path: string) => {
  const p = findParameter(version, path, "sun");
  if (!p) throw new Error(`no parameter ${path}`);
  return p;
};

describe("groupParameters", () => {
  it("puts every visible parameter of a version-2 profile in exactly one section", () => {
    const doc = fixture("v2-base-henhouse-350.json");
    const groups = groupParameters(2, doc);
    const shown = groups.flatMap((g) => g.params.map((p) => p.path));
    expect(new Set(shown).size).toBe(shown.length);
    expect(shown).toContain("/schedule/sunriseOffsetMinutes");
    expect(shown).not.toContain("/schedule/openAt");
    expect(groups.map((g) => g.id)).not.toContain("other");
    expect(groups.find((g) => g.id === "stall")?.params.map((p) => p.path)).toEqual([
      "/stall/thresholdCps",
      "/stall/windowMs",
      "/stall/startupBlankingMs",
      "/stall/reopenOnStall",
    ]);
    expect(groups.find((g) => g.id === "stall")?.hasSafety).toBe(true);
    expect(groups.find((g) => g.id === "display")?.hasSafety).toBe(false);
  });

  it("shows the fixed-times fields when the schedule is fixed, for version 1 too", () => {
    const doc = fixture("v1-base-fixed-times.json");
    const shown = groupParameters(1, doc).flatMap((g) => g.params.map((p) => p.path));
    expect(shown).toContain("/schedule/openAt");
    expect(shown).toContain("/stallThresholdCps");
    expect(shown).not.toContain("/schedule/openOffsetMin");
  });

  it("shows only the fields every form shares when there is no schedule yet", () => {
    const shown = groupParameters(2, {}).flatMap((g) => g.params.map((p) => p.path));
    expect(shown).toContain("/schedule/kind");
    expect(shown).toContain("/schedule/stepMinutes");
    expect(shown).not.toContain("/schedule/closeAt");
  });
});

describe("schedule forms", () => {
  it("recognises the schedule's kind as the form tag, and nothing else", () => {
    const params = parameterInfo(2);
    expect(params.filter((p) => isFormTag(p, params)).map((p) => p.path)).toEqual(["/schedule/kind"]);
  });

  it("lists a form's keys in schema order, the tag first", () => {
    expect(formKeys(2, "/schedule", "fixed")).toEqual(["kind", "openAt", "closeAt", "stepMinutes"]);
    expect(formKeys(2, "/schedule", "sun")).toEqual(["kind", "sunriseOffsetMinutes", "civilDuskOffsetMinutes", "stepMinutes"]);
    expect(formKeys(2, "/schedule", "moon")).toEqual([]);
    expect(formTitle(2, "/schedule", "sun")).toBe("Sun-following schedule");
    expect(formTitle(2, "/schedule", "moon")).toBe("moon");
  });

  it("switches a schedule to the other form, keeping the shared step and filling in defaults", () => {
    const doc = fixture("v2-base-henhouse-350.json");
    const current = { ...(doc.schedule as JsonObject), stepMinutes: 10 };
    const fixed = buildForm(2, "/schedule", "fixed", current);
    expect(fixed).toEqual({ kind: "fixed", ...FIXED_DEFAULTS(), stepMinutes: 10 });
    expect(validateParams(2, { ...doc, schedule: fixed }).ok).toBe(true);
    const sun = buildForm(2, "/schedule", "sun", fixed);
    const dflt = (path: string) => param(2, path).default;
    expect(sun).toEqual({ kind: "sun", sunriseOffsetMinutes: dflt("/schedule/sunriseOffsetMinutes"), civilDuskOffsetMinutes: dflt("/schedule/civilDuskOffsetMinutes"), stepMinutes: 10 });
  });

  it("builds a valid version-1 form from nothing", () => {
    const doc = fixture("v1-base-henhouse-350.json");
    const fixed = buildForm(1, "/schedule", "fixed", undefined);
    expect(validateParams(1, { ...doc, schedule: fixed })).toEqual({ ok: true, issues: [] });
  });
});

describe("readDraft", () => {
  it("reads whole numbers, numbers, text and refuses what the type cannot hold", () => {
    const counts = param(2, "/closeTravelCounts");
    expect(readDraft(counts, " 17000 ")).toEqual({ ok: true, value: 17000 });
    expect(readDraft(counts, "-5")).toEqual({ ok: true, value: -5 });
    expect(readDraft(counts, "1.5")).toEqual({ ok: false, message: "must be a whole number" });
    expect(readDraft(counts, "1e3")).toEqual({ ok: false, message: "must be a whole number" });
    expect(readDraft(counts, "")).toEqual({ ok: false, message: "needs a value" });
    expect(readDraft({ ...counts, type: "number" }, "1.5")).toEqual({ ok: true, value: 1.5 });
    expect(readDraft({ ...counts, type: "number" }, "abc")).toEqual({ ok: false, message: "must be a number" });
    expect(readDraft(param(2, "/timeZone"), "Europe/Oslo")).toEqual({ ok: true, value: "Europe/Oslo" });
  });
});

describe("rangeMessage and hints", () => {
  it("uses the validator's wording, with the unit", () => {
    const counts = param(2, "/closeTravelCounts");
    expect(rangeMessage(counts, 99)).toBe("must be at least 100 counts");
    expect(rangeMessage(counts, 200001)).toBe("must be at most 200000 counts");
    expect(rangeMessage(counts, 100)).toBeNull();
    const issue = validateParams(2, { ...fixture("v2-base-henhouse-350.json"), closeTravelCounts: 99 }).issues[0];
    expect(issue?.message).toBe(rangeMessage(counts, 99));
  });

  it("describes limits, defaults and values for people", () => {
    const threshold = param(2, "/stall/thresholdCps");
    expect(limitsHint(threshold)).toBe(`${threshold.minimum} to ${threshold.maximum} counts/s · default ${String(threshold.default)}`);
    expect(limitsHint(param(2, "/homeOnPowerUp"))).toBe("default on");
    const sunrise = param(2, "/schedule/sunriseOffsetMinutes");
    expect(limitsHint(sunrise)).toBe(`-120 to 240 min · default ${String(sunrise.default)}`);
    expect(displayValue(param(2, "/travelTimeoutMs"), 20000)).toBe("20000 ms");
    expect(displayValue(param(2, "/travelTimeoutMs"), undefined)).toBe("not set");
  });

  it("makes DOM ids from pointers", () => {
    expect(fieldId("pw1", "/stall/thresholdCps")).toBe("pw1-f-stall-thresholdCps");
  });
});

describe("chooseForm", () => {
  const base = fixture("v2-base-henhouse-350.json");

  it("switches a whole profile's schedule in place, keeping the key order", () => {
    const next = chooseForm({ version: 2, doc: base, effective: base, parent: "/schedule", kind: "fixed" });
    expect(Object.keys(next)).toEqual(Object.keys(base));
    expect(next.schedule).toEqual({ kind: "fixed", ...FIXED_DEFAULTS(), stepMinutes: 30 });
  });

  it("gives an overlay that changes form the complete new schedule, which then wins the merge", () => {
    const overlay = fixture("v2-site-overlay.json");
    const effective = mergeLayers([{ layer: "base", values: base }, { layer: "site", values: overlay }]).values;
    const next = chooseForm({ version: 2, doc: overlay, beneath: base, effective, parent: "/schedule", kind: "fixed" });
    expect(next.schedule).toEqual({ kind: "fixed", ...FIXED_DEFAULTS(), stepMinutes: 15 });
    expect(replacesForm(next, base, "/schedule")).toBe(true);
    const merged = mergeLayers([{ layer: "base", values: base }, { layer: "site", values: next }]).values;
    expect(validateParams(2, merged)).toEqual({ ok: true, issues: [] });
  });

  it("drops the overlay's schedule when it goes back to the form beneath", () => {
    const overlay = { timeZone: "Europe/London", schedule: { kind: "fixed", openAt: "06:00", closeAt: "22:00", stepMinutes: 30 } } as JsonObject;
    const effective = mergeLayers([{ layer: "base", values: base }, { layer: "site", values: overlay }]).values;
    const next = chooseForm({ version: 2, doc: overlay, beneath: base, effective, parent: "/schedule", kind: "sun" });
    expect(next).toEqual({ timeZone: "Europe/London" });
    expect(replacesForm(next, base, "/schedule")).toBe(false);
  });

  it("changes nothing when the form chosen is already in effect", () => {
    const overlay = fixture("v2-site-overlay.json");
    expect(chooseForm({ version: 2, doc: overlay, beneath: base, effective: base, parent: "/schedule", kind: "sun" })).toBe(overlay);
  });
});
