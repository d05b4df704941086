import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { checkSafety, type Calibration, type DoorModel, type SafetyContext, type SafetyFinding } from "@/lib/profiles/safety";
import { modelTravel, nominalVelocity } from "@/lib/profiles/safety/reference";
import type { DoorParamsV2 } from "@/lib/profiles/schemas";

const dir = new URL("../fixtures/profiles/", import.meta.url);
const fixture = <T = DoorParamsV2>(name: string): T => JSON.parse(readFileSync(new URL(name, dir), "utf8")) as T;
const clean = (change: (d: DoorParamsV2) => void = () => {}): DoorParamsV2 => {
  const d = fixture("safety-v2-clean.json");
  change(d);
  return d;
};

// A 350 mm pop-hole door on an 18 mm spool with 2 mm cord, 64:1 gearbox, 12 PPR encoder decoded ×4.
const HENHOUSE: DoorModel = {
  doorTravelMm: 350,
  spoolDiameterMm: 18,
  cordDiameterMm: 2,
  gearboxRatio: 64,
  encoderPulsesPerRev: 12,
  encoderDecoding: "x4",
  motorNoLoadRpm: 2700,
};
const CALIBRATION: Calibration = { fullTravelCounts: 17112, nominalVelocityCps: 1620, travelTimeMs: 10700 };
const BERLIN = { latitude: 52.52, longitude: 13.405, timeZone: "Europe/Berlin" };
const NOW = new Date("2026-03-01T12:00:00Z");
const withModel: SafetyContext = { now: NOW, site: BERLIN, doorModel: HENHOUSE };
const withCalibration: SafetyContext = { ...withModel, calibration: CALIBRATION };

const rule = (findings: SafetyFinding[], id: string) => findings.filter((f) => f.ruleId === id);

describe("reference values from the door model", () => {
  it("derives the nominal velocity from no-load speed, loaded-speed factor and counts per motor revolution", () => {
    // Hand calculation: 2700 rpm × 0.75 = 2025 rpm loaded (0.7–0.8 is common practice); ×4 quadrature
    // decoding counts both edges of both channels, 12 × 4 = 48 counts per revolution; 2025 × 48 / 60 = 1620 counts/s.
    expect(nominalVelocity({ now: NOW, doorModel: HENHOUSE })?.nominalCps).toBeCloseTo(1620, 9);
  });

  it("prefers the calibrated velocity over the model's estimate", () => {
    expect(nominalVelocity({ now: NOW, doorModel: HENHOUSE, calibration: { ...CALIBRATION, nominalVelocityCps: 2000 } })).toMatchObject({ nominalCps: 2000, calibrated: true });
  });

  it("counts the door model's travel on the first winding layer", () => {
    // Hand calculation: one turn takes π × (18 + 2) mm = 62.83 mm of cord; 350 mm is 5.5704 turns;
    // 48 × 64 = 3072 counts per spool turn; 5.5704 × 3072 = 17,112.3 counts.
    expect(modelTravel(HENHOUSE).counts).toBeCloseTo((350 / (Math.PI * 20)) * 3072, 6);
    expect(modelTravel(HENHOUSE).counts).toBeCloseTo(17112.3, 1);
  });
});

describe("a well-set drive", () => {
  it("gives no findings at all with the door model", () => {
    expect(checkSafety(2, clean(), withModel)).toEqual([]);
  });

  it("gives no findings at all with a calibration", () => {
    expect(checkSafety(2, clean(), withCalibration)).toEqual([]);
  });

  it("says once that the drive values went unchecked when there is neither calibration nor door model", () => {
    const found = checkSafety(2, clean(), { now: NOW, site: BERLIN });
    expect(found.map((f) => f.ruleId)).toEqual(["RL-NO-REFERENCE"]);
    expect(found[0]).toMatchObject({ severity: "warning", paths: ["/stall/thresholdCps", "/travelTimeoutMs", "/closeTravelCounts"] });
  });
});

describe("RL-STALL-FRACTION", () => {
  const at = (thresholdCps: number, ctx = withModel) => rule(checkSafety(2, clean((d) => (d.stall.thresholdCps = thresholdCps)), ctx), "RL-STALL-FRACTION");

  it("refuses a threshold below 30 % of the nominal velocity, naming both numbers", () => {
    const [f] = at(300);
    expect(f).toMatchObject({ severity: "error", paths: ["/stall/thresholdCps"] });
    expect(f?.message).toContain("Stall threshold 300 counts/s is 18.5 % of the nominal 1,620 counts/s");
    expect(f?.message).toContain("below 30 % the door keeps pressing on an obstacle");
    expect(f?.message).toContain("second line of defence");
  });

  it("passes 30 % exactly and refuses just below it", () => {
    expect(at(486)).toEqual([]); // 486 / 1620 = 0.300
    expect(at(485)[0]?.severity).toBe("error");
  });

  it("refuses a threshold at or above the running velocity", () => {
    expect(at(1620)[0]).toMatchObject({ severity: "error" });
    expect(at(1620)[0]?.message).toContain("trips on every run");
    expect(at(5000)[0]?.severity).toBe("error");
  });

  it("warns above 85 % (nuisance trips) and passes 85 % itself", () => {
    expect(at(1377)).toEqual([]); // 0.85 × 1620
    expect(at(1400)[0]).toMatchObject({ severity: "warning" });
    expect(at(1400)[0]?.message).toContain("86.4 %");
  });

  it("judges against the calibrated velocity when there is one", () => {
    const ctx = { ...withCalibration, calibration: { ...CALIBRATION, nominalVelocityCps: 3000 } };
    expect(at(800, ctx)[0]?.message).toContain("26.7 % of the nominal 3,000 counts/s (calibrated)");
  });
});

describe("RL-STALL-WINDOW", () => {
  const at = (thresholdCps: number, windowMs: number) =>
    rule(checkSafety(2, clean((d) => Object.assign(d.stall, { thresholdCps, windowMs })), withModel), "RL-STALL-WINDOW");

  it("warns when the window holds fewer than 4 counts at the threshold", () => {
    // 300 counts/s × 10 ms = 3 counts; one count is a third of the reading.
    const [f] = at(300, 10);
    expect(f).toMatchObject({ severity: "warning", paths: ["/stall/windowMs", "/stall/thresholdCps"] });
    expect(f?.message).toContain("holds 3 counts, fewer than 4");
    expect(at(400, 10)).toEqual([]); // 4 counts
  });

  it("warns when a long window lets the door press on an obstacle, with time and distance", () => {
    const [f] = at(800, 400);
    expect(f?.severity).toBe("warning");
    // (1 + 800/1620) × 400 ms = 597.5 ms at 1620 counts/s and 48.9 counts/mm (17,112.3 / 350) ≈ 20 mm.
    expect(f?.message).toContain("up to 598 ms and move up to 20 mm");
    expect(at(800, 300)).toEqual([]);
  });
});

describe("RL-STALL-BLANKING", () => {
  const at = (blank: number, ctx: SafetyContext = withModel, change: (d: DoorParamsV2) => void = () => {}) =>
    rule(
      checkSafety(2, clean((d) => ((d.stall.startupBlankingMs = blank), change(d))), ctx),
      "RL-STALL-BLANKING",
    );

  it("warns beyond 2 s of blanking, with the unguarded travel", () => {
    const [f] = at(2500);
    expect(f).toMatchObject({ severity: "warning", paths: ["/stall/startupBlankingMs"] });
    // 1620 counts/s × 2.5 s = 4050 counts ÷ 48.9 counts/mm ≈ 83 mm.
    expect(f?.message).toContain("off for the first 2.5 s of every run, about 83 mm of travel");
    expect(at(2000)).toEqual([]);
  });

  it("warns when blanking covers more than a quarter of a short travel", () => {
    const ctx = { ...withCalibration, calibration: { ...CALIBRATION, travelTimeMs: 4000 } };
    expect(at(1200, ctx, (d) => (d.travelTimeoutMs = 6000))[0]?.message).toContain("30 % of the 4 s travel time");
    expect(at(1000, ctx, (d) => (d.travelTimeoutMs = 6000))).toEqual([]);
  });

  it("warns when blanking is too short to get up to speed, and says a reopening door would never close", () => {
    // 800/1620 of an assumed 250 ms ramp = 123 ms, plus one 100 ms window = 223 ms.
    const [f] = at(150);
    expect(f?.message).toContain("shorter than the 223 ms");
    expect(f?.message).toContain("never close");
    expect(at(230)).toEqual([]);
  });

  it("still checks the 2 s limit without any reference", () => {
    expect(at(3000, { now: NOW, site: BERLIN })).toHaveLength(1);
    expect(at(100, { now: NOW, site: BERLIN })).toEqual([]);
  });
});

describe("RL-STALL-REOPEN", () => {
  it("warns when a stalled door only stops", () => {
    const found = rule(checkSafety(2, clean((d) => (d.stall.reopenOnStall = false)), withModel), "RL-STALL-REOPEN");
    expect(found).toMatchObject([{ severity: "warning", paths: ["/stall/reopenOnStall"] }]);
  });

  it("has no v1 counterpart, so a v1 document never gets it", () => {
    const found = checkSafety(1, fixture("safety-v1-hazards.json"), withModel);
    expect(rule(found, "RL-STALL-REOPEN")).toEqual([]);
  });
});

describe("RL-TIMEOUT-MARGIN", () => {
  const at = (timeout: number, ctx = withCalibration) => rule(checkSafety(2, clean((d) => (d.travelTimeoutMs = timeout)), ctx), "RL-TIMEOUT-MARGIN");

  it("refuses a timeout under 1.2 × the calibrated travel time and suggests the least", () => {
    const [f] = at(12800);
    expect(f).toMatchObject({ severity: "error", paths: ["/travelTimeoutMs"] });
    expect(f?.message).toContain("Travel timeout 12.8 s is 1.2 × the expected travel time of 10.7 s (calibrated)");
    expect(f?.message).toContain("Set at least 12.9 s");
    expect(at(12840)).toEqual([]); // 1.2 × 10,700
  });

  it("warns about a timeout over 4 × the travel time", () => {
    expect(at(42800)).toEqual([]);
    expect(at(43000)[0]).toMatchObject({ severity: "warning" });
    expect(at(43000)[0]?.message).toContain("4.02 ×");
  });

  it("estimates the travel time from the door model and the close travel when not calibrated", () => {
    // 17,112 counts ÷ 1620 counts/s = 10.563 s, plus half the 250 ms assumed ramp = 10.688 s; 1.2 × = 12.83 s.
    expect(at(12800, withModel)[0]?.message).toContain("expected travel time of 10.7 s (estimated: 17,112 counts at 1,620 counts/s");
    expect(at(12900, withModel)).toEqual([]);
  });
});

describe("RL-CLOSE-TRAVEL", () => {
  const at = (counts: number, ctx = withCalibration) => rule(checkSafety(2, clean((d) => (d.closeTravelCounts = counts)), ctx), "RL-CLOSE-TRAVEL");

  it("refuses even one count past the calibrated full travel", () => {
    expect(at(17112)).toEqual([]);
    const [f] = at(18000);
    expect(f).toMatchObject({ severity: "error", paths: ["/closeTravelCounts"] });
    // 888 counts ÷ (17,112 counts / 350 mm) = 18.2 mm.
    expect(f?.message).toContain("888 counts (about 18 mm) more than the calibrated full travel of 17,112 counts");
    expect(at(17113)[0]?.severity).toBe("error");
  });

  it("warns when the door stops more than 2 % short of the calibrated travel", () => {
    expect(at(16770)).toEqual([]); // 1.99 % short
    const [f] = at(16500);
    expect(f?.severity).toBe("warning");
    expect(f?.message).toContain("612 counts (about 13 mm) short");
    expect(f?.message).toContain("gap");
  });

  it("without calibration, warns beyond 5 % either side of the door model", () => {
    expect(at(17500, withModel)).toEqual([]);
    expect(at(18000, withModel)[0]).toMatchObject({ severity: "warning" });
    expect(at(18000, withModel)[0]?.message).toContain("No calibration yet: close travel 18,000 counts is 5.2 % more than the door model's 17,112 counts for 350 mm");
    expect(at(16000, withModel)[0]?.message).toContain("6.5 % less");
  });

  it("says nothing without calibration or model beyond the one no-reference warning", () => {
    expect(at(200000, { now: NOW, site: BERLIN })).toEqual([]);
  });
});
