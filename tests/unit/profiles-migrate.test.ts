import { readdirSync, readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { jsonEqual, leafEntries, type JsonObject } from "@/lib/profiles/json";
import { mergeLayers } from "@/lib/profiles/merge";
import { migrateOverlayV1toV2, migrateV1toV2, MigrationError, V1_TO_V2_PATHS, V1_TO_V2_SCHEDULE_KEYS } from "@/lib/profiles/migrate";
import { findParameter } from "@/lib/profiles/parameter-info";
import { validateParams } from "@/lib/profiles/schemas";

const dir = new URL("../fixtures/profiles/", import.meta.url);
const fixture = (name: string): JsonObject => JSON.parse(readFileSync(new URL(name, dir), "utf8")) as JsonObject;
const validV1Documents = readdirSync(dir).filter((n) => n.startsWith("v1-base-"));

function at(doc: unknown, path: string): unknown {
  return path.split("/").slice(1).reduce<unknown>((node, key) => (node as Record<string, unknown> | undefined)?.[key], doc);
}

describe("migrateV1toV2", () => {
  it("has more than one v1 fixture to migrate", () => {
    expect(validV1Documents.length).toBeGreaterThanOrEqual(2);
  });

  it.each(validV1Documents)("migrates %s to a valid version 2 document", (name) => {
    expect(validateParams(2, migrateV1toV2(fixture(name)))).toEqual({ ok: true, issues: [] });
  });

  it.each(validV1Documents)("carries every value of %s over exactly, to its new place", (name) => {
    const v1 = fixture(name);
    const v2 = migrateV1toV2(v1);
    for (const [path, value] of leafEntries(v1)) {
      const [, top, sub] = path.split("/") as [string, string, string | undefined];
      if (top === "parameterSetVersion") continue;
      const target = sub ? `/schedule/${V1_TO_V2_SCHEDULE_KEYS[sub]}` : `/${V1_TO_V2_PATHS[top]!.join("/")}`;
      expect(at(v2, target), `${path} → ${target}`).toEqual(value);
    }
    expect(v2.parameterSetVersion).toBe(2);
  });

  it("gives the new reopen-after-stall setting its schema default", () => {
    const v2 = migrateV1toV2(fixture("v1-base-henhouse-350.json"));
    expect(v2.stall.reopenOnStall).toBe(findParameter(2, "/stall/reopenOnStall")?.default);
    expect(v2.stall.reopenOnStall).toBe(true);
  });

  it("turns the Henhouse 350 v1 profile into the v2 fixture, field for field", () => {
    expect(migrateV1toV2(fixture("v1-base-henhouse-350.json"))).toEqual(fixture("v2-base-henhouse-350.json"));
  });

  it("moves a fixed-times schedule with its step", () => {
    expect(migrateV1toV2(fixture("v1-base-fixed-times.json")).schedule).toEqual({
      kind: "fixed",
      openAt: "06:30",
      closeAt: "20:45",
      stepMinutes: 15,
    });
  });

  it("refuses an invalid v1 document and hands back the issues", () => {
    expect(() => migrateV1toV2(fixture("invalid-v1-out-of-range.json"))).toThrow(MigrationError);
    try {
      migrateV1toV2(fixture("invalid-v1-out-of-range.json"));
    } catch (error) {
      expect((error as MigrationError).issues).toEqual([{ path: "/stallWindowMs", keyword: "minimum", message: "must be at least 10 ms" }]);
    }
    expect(() => migrateV1toV2(fixture("v2-base-henhouse-350.json"))).toThrow("not a valid version 1 parameter document");
  });
});

describe("migrateOverlayV1toV2", () => {
  it("maps the site and controller overlays to their v2 fixtures", () => {
    expect(migrateOverlayV1toV2(fixture("v1-site-overlay.json"))).toEqual(fixture("v2-site-overlay.json"));
    expect(migrateOverlayV1toV2(fixture("v1-controller-overlay.json"))).toEqual(fixture("v2-controller-overlay.json"));
  });

  it("gives the same effective configuration whether layers are merged before or after migrating", () => {
    const base = fixture("v1-base-henhouse-350.json");
    const site = fixture("v1-site-overlay.json");
    const controller = fixture("v1-controller-overlay.json");
    const mergedThenMigrated = migrateV1toV2(
      mergeLayers([{ layer: "base", values: base }, { layer: "site", values: site }, { layer: "controller", values: controller }]).values,
    );
    const migratedThenMerged = mergeLayers([
      { layer: "base", values: migrateV1toV2(base) },
      { layer: "site", values: migrateOverlayV1toV2(site, { below: base }) },
      { layer: "controller", values: migrateOverlayV1toV2(controller) },
    ]).values;
    expect(jsonEqual(migratedThenMerged, mergedThenMigrated)).toBe(true);
  });

  it("agrees with the whole-document migration on a complete document, less the new default", () => {
    const v1 = fixture("v1-base-fixed-times.json");
    const asOverlay = migrateOverlayV1toV2(v1);
    const full = migrateV1toV2(v1) as unknown as JsonObject;
    delete (full.stall as JsonObject).reopenOnStall;
    expect(jsonEqual(asOverlay, full)).toBe(true);
  });

  it("carries the step from beneath into a schedule that switches form", () => {
    const base = fixture("v1-base-henhouse-350.json");
    const overlay = { schedule: { kind: "fixed", openAt: "07:00", closeAt: "20:30" } };
    const v2Overlay = migrateOverlayV1toV2(overlay, { below: base });
    expect(v2Overlay).toEqual({ schedule: { kind: "fixed", openAt: "07:00", closeAt: "20:30", stepMinutes: 30 } });
    const merged = mergeLayers([{ layer: "base", values: migrateV1toV2(base) }, { layer: "site", values: v2Overlay }]).values;
    expect(validateParams(2, merged).ok).toBe(true);
  });

  it("asks for the values beneath when it cannot tell whether the schedule form changes", () => {
    const overlay = { schedule: { kind: "fixed", openAt: "07:00", closeAt: "20:30" } };
    expect(() => migrateOverlayV1toV2(overlay)).toThrow(/pass the version 1 values beneath it/);
    expect(migrateOverlayV1toV2({ ...overlay, scheduleStepMin: 10 })).toEqual({
      schedule: { kind: "fixed", openAt: "07:00", closeAt: "20:30", stepMinutes: 10 },
    });
  });

  it("adds no step when the overlay keeps the schedule form, so the step stays with the layer that set it", () => {
    const base = fixture("v1-base-henhouse-350.json");
    expect(migrateOverlayV1toV2({ schedule: { kind: "sun", closeOffsetMin: 5 } }, { below: base })).toEqual({
      schedule: { kind: "sun", civilDuskOffsetMinutes: 5 },
    });
  });

  it("refuses keys that version 1 does not have, naming them", () => {
    expect(() => migrateOverlayV1toV2({ stall: { thresholdCps: 1 } })).toThrow('"stall" is not a version 1 parameter');
    expect(() => migrateOverlayV1toV2({ schedule: { sunriseOffsetMinutes: 1 } })).toThrow(
      '"sunriseOffsetMinutes" is not a version 1 schedule parameter',
    );
    expect(() => migrateOverlayV1toV2({ parameterSetVersion: 2 })).toThrow(MigrationError);
  });
});
