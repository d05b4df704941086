import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { diffParams, touchesSafety } from "@/lib/profiles/diff";
import type { JsonObject } from "@/lib/profiles/json";
import { mergeLayers } from "@/lib/profiles/merge";

const fixture = (name: string): JsonObject =>
  JSON.parse(readFileSync(new URL(`../fixtures/profiles/${name}`, import.meta.url), "utf8")) as JsonObject;

const base = () => fixture("v2-base-henhouse-350.json");

describe("diffParams", () => {
  it("finds nothing between a document and a reordered copy of it", () => {
    const doc = base();
    const reordered = JSON.parse(JSON.stringify(Object.fromEntries(Object.entries(doc).reverse()))) as JsonObject;
    expect(diffParams(doc, reordered, 2)).toEqual([]);
  });

  it("lists changed leaves by path with unit, relative change and safety flag", () => {
    const effective = mergeLayers([
      { layer: "base", values: base() },
      { layer: "site", values: fixture("v2-site-overlay.json") },
      { layer: "controller", values: fixture("v2-controller-overlay.json") },
    ]).values;
    const rows = diffParams(base(), effective, 2);
    expect(rows.map((r) => r.path)).toEqual([
      "/clock/source",
      "/closeTravelCounts",
      "/schedule/civilDuskOffsetMinutes",
      "/schedule/stepMinutes",
      "/stall/thresholdCps",
      "/timeZone",
    ]);
    const travel = rows.find((r) => r.path === "/closeTravelCounts")!;
    // Hand-worked: (16 980 − 17 112) / 17 112 = −0.771 %.
    expect(travel).toMatchObject({ change: "changed", before: 17112, after: 16980, unit: "counts", safety: true, title: "Close travel" });
    expect(travel.relativeChange).toBeCloseTo(-132 / 17112, 12);
    expect(rows.find((r) => r.path === "/stall/thresholdCps")).toMatchObject({ unit: "counts/s", relativeChange: -0.125, safety: true });
    expect(rows.find((r) => r.path === "/schedule/stepMinutes")).toMatchObject({ unit: "min", relativeChange: -0.5, safety: false });
    expect(rows.find((r) => r.path === "/timeZone")).toMatchObject({ before: "Europe/Berlin", after: "Europe/London", relativeChange: null, unit: null });
    expect(touchesSafety(rows)).toBe(true);
  });

  it("shows a change of schedule form as removed, added and changed rows, each with its own safety flag", () => {
    const after = base();
    after.schedule = { kind: "fixed", openAt: "07:00", closeAt: "21:00", stepMinutes: 30 };
    expect(diffParams(base(), after, 2)).toEqual([
      { path: "/schedule/civilDuskOffsetMinutes", change: "removed", before: 20, title: "Close offset from civil dusk", unit: "min", relativeChange: null, safety: true },
      { path: "/schedule/closeAt", change: "added", after: "21:00", title: "Close time", unit: null, relativeChange: null, safety: true },
      { path: "/schedule/kind", change: "changed", before: "sun", after: "fixed", title: "Schedule form", unit: null, relativeChange: null, safety: false },
      { path: "/schedule/openAt", change: "added", after: "07:00", title: "Open time", unit: null, relativeChange: null, safety: false },
      { path: "/schedule/sunriseOffsetMinutes", change: "removed", before: 15, title: "Open offset from sunrise", unit: "min", relativeChange: null, safety: false },
    ]);
  });

  it("gives no relative change from zero or between non-numbers", () => {
    const before = base();
    const after = base();
    (before.stall as JsonObject).startupBlankingMs = 0;
    after.homeOnPowerUp = false;
    const rows = diffParams(before, after, 2);
    expect(rows.map((r) => [r.path, r.relativeChange])).toEqual([
      ["/homeOnPowerUp", null],
      ["/stall/startupBlankingMs", null],
    ]);
  });

  it("compares overlays too: an emptied overlay removes its leaves", () => {
    const rows = diffParams(fixture("v2-controller-overlay.json"), {}, 2);
    expect(rows).toEqual([
      { path: "/closeTravelCounts", change: "removed", before: 16980, title: "Close travel", unit: "counts", relativeChange: null, safety: true },
      { path: "/stall/thresholdCps", change: "removed", before: 700, title: "Stall velocity threshold", unit: "counts/s", relativeChange: null, safety: true },
    ]);
  });

  it("describes a leaf the schema does not know without a unit or safety flag", () => {
    expect(diffParams({}, { experimental: 1 }, 2)).toEqual([
      { path: "/experimental", change: "added", after: 1, title: null, unit: null, relativeChange: null, safety: false },
    ]);
    expect(touchesSafety(diffParams({}, { experimental: 1 }, 2))).toBe(false);
  });

  it("uses the version's own paths for units", () => {
    const rows = diffParams(fixture("v1-base-henhouse-350.json"), { ...fixture("v1-base-henhouse-350.json"), stallWindowMs: 120 }, 1);
    expect(rows).toEqual([
      { path: "/stallWindowMs", change: "changed", before: 100, after: 120, title: "Stall detection window", unit: "ms", relativeChange: 0.2, safety: true },
    ]);
  });
});
