import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { checkDocument, titleAt } from "@/components/profiles/editor/check-document";
import { formatDocument } from "@/components/profiles/editor/document-edits";
import type { JsonObject } from "@/lib/profiles/json";

const fixtureText = (name: string) => readFileSync(new URL(`../fixtures/profiles/${name}`, import.meta.url), "utf8");
const fixture = (name: string) => JSON.parse(fixtureText(name)) as JsonObject;

const now = new Date("2026-03-01T12:00:00Z");
const site = { latitude: 52.5, longitude: 13.4, timeZone: "Europe/Berlin" };

describe("checkDocument", () => {
  it("reports a syntax error with its offset and runs nothing else", () => {
    const r = checkDocument({ version: 2, layer: "base", text: '{"closeTravelCounts": }', now });
    expect(r.parsed).toBeNull();
    expect(r.problems).toEqual([expect.objectContaining({ source: "syntax", severity: "error", offset: 22, pointer: null })]);
    expect(r.safetySkipped).toMatch(/not valid JSON/);
  });

  it("names the parameter and the pointer of each schema issue", () => {
    const doc = { ...fixture("v2-base-henhouse-350.json"), closeTravelCounts: 50 };
    const r = checkDocument({ version: 2, layer: "base", text: formatDocument(doc), now });
    expect(r.schemaIssues).toHaveLength(1);
    expect(r.problems).toEqual([
      expect.objectContaining({ source: "schema", pointer: "/closeTravelCounts", title: "Close travel", message: "must be at least 100 counts", inherited: false }),
    ]);
    expect(r.safetySkipped).toMatch(/schema issues/);
    expect(r.findings).toEqual([]);
  });

  it("points a missing key at the key itself and an unknown key at the key, titled by its group", () => {
    const doc = fixture("v2-base-henhouse-350.json");
    const stall = { ...(doc.stall as JsonObject), bogus: 1 } as JsonObject;
    delete stall.windowMs;
    const r = checkDocument({ version: 2, layer: "base", text: formatDocument({ ...doc, stall }), now });
    const missing = r.problems.find((p) => p.message.includes("required"));
    const unknown = r.problems.find((p) => p.message.includes("not a known parameter"));
    expect(missing).toMatchObject({ pointer: "/stall/windowMs", title: "Stall detection window" });
    expect(unknown).toMatchObject({ pointer: "/stall/bogus", title: "Stall check", markKey: true });
  });

  it("runs the safety rules on a valid document and lists their findings with rule ids", () => {
    const r = checkDocument({ version: 2, layer: "base", text: fixtureText("v2-base-henhouse-350.json"), safetyContext: { site }, now });
    expect(r.schemaIssues).toEqual([]);
    expect(r.safetySkipped).toBeNull();
    const safety = r.problems.filter((p) => p.source === "safety");
    expect(safety.length).toBe(r.findings.length);
    // No calibration and no door model: nothing to compare the drive values against.
    expect(safety.map((p) => p.ruleId)).toContain("RL-NO-REFERENCE");
    expect(safety.every((p) => p.pointers.length > 0)).toBe(true);
  });

  it("checks an overlay merged over the values beneath, marking problems the overlay does not set as inherited", () => {
    const base = { ...fixture("v2-base-henhouse-350.json"), debounceMs: 0 };
    const r = checkDocument({ version: 2, layer: "site", text: fixtureText("v2-site-overlay.json"), baseValues: base, now });
    expect((r.effective as JsonObject).timeZone).toBe("Europe/London");
    expect(r.problems).toEqual([expect.objectContaining({ pointer: "/debounceMs", inherited: true })]);
    const own = checkDocument({ version: 2, layer: "site", text: '{"stall": {"windowMs": 1}}', baseValues: fixture("v2-base-henhouse-350.json"), now });
    expect(own.problems).toEqual([expect.objectContaining({ pointer: "/stall/windowMs", inherited: false })]);
  });

  it("accepts a partial overlay with nothing beneath, but still checks the values it sets", () => {
    const r = checkDocument({ version: 2, layer: "controller", text: '{"stall": {"thresholdCps": 5}}', now });
    expect(r.problems.map((p) => p.pointer)).toEqual(["/stall/thresholdCps"]);
    expect(r.safetySkipped).toMatch(/values beneath/);
  });

  it("checks version 1 documents against the version 1 schema", () => {
    const r = checkDocument({ version: 1, layer: "base", text: fixtureText("v1-base-henhouse-350.json"), safetyContext: { site }, now });
    expect(r.schemaIssues).toEqual([]);
    expect(r.findings.every((f) => f.paths.every((p) => !p.startsWith("/stall/")))).toBe(true);
  });
});

describe("titleAt", () => {
  it("finds parameter titles, group titles and schedule-form titles", () => {
    expect(titleAt(2, "/stall/thresholdCps")).toBe("Stall velocity threshold");
    expect(titleAt(2, "/stall")).toBe("Stall check");
    expect(titleAt(2, "/schedule/closeAt", { schedule: { kind: "fixed" } })).toBe("Close time");
    expect(titleAt(2, "/nowhere")).toBe("/nowhere");
    expect(titleAt(2, "")).toBe("Door controller parameters, version 2");
  });
});
