import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { analyseRun, type RunAnalysis } from "@/lib/calibration/analyse";
import { parseCalibrationCsv } from "@/lib/calibration/csv";
import { calibrationContext, suggestParameters, type SuggestedParameters } from "@/lib/calibration/suggest";
import { checkSafety, type SafetyContext } from "@/lib/profiles/safety";
import type { DoorParamsV2 } from "@/lib/profiles/schemas";

const text = (path: string) => readFileSync(new URL(path, import.meta.url), "utf8");

function exampleAnalysis(): RunAnalysis {
  const parsed = parseCalibrationCsv(text("../fixtures/calibration/example-run.csv"));
  if (!parsed.ok) throw new Error("fixture does not parse");
  const r = analyseRun(parsed.samples);
  if (!r.ok) throw new Error(r.errors.join("; "));
  return r.analysis;
}

const example = exampleAnalysis();

/** The example analysis with the numbers a hand calculation needs replaced. */
const withNumbers = (full: number, nominal: number, rampMs: number, longestMs: number): RunAnalysis => ({
  ...example,
  fullTravelCounts: full,
  nominalVelocityCps: nominal,
  velocityCps: { closing: nominal, opening: null },
  rampMs,
  travelTimeMs: { closing: longestMs, opening: null, longest: longestMs, longestDirection: "closing" },
});

const applied = (s: SuggestedParameters): DoorParamsV2 => {
  const doc = JSON.parse(text("../fixtures/profiles/safety-v2-clean.json")) as DoorParamsV2;
  doc.closeTravelCounts = s.closeTravelCounts;
  doc.travelTimeoutMs = s.travelTimeoutMs;
  doc.stall = { ...doc.stall, ...s.stall };
  return doc;
};

const BERLIN = { latitude: 52.52, longitude: 13.405, timeZone: "Europe/Berlin" };
const DRIVE_RULES = ["RL-STALL-FRACTION", "RL-STALL-WINDOW", "RL-STALL-BLANKING", "RL-TIMEOUT-MARGIN", "RL-CLOSE-TRAVEL", "RL-NO-REFERENCE"];

describe("suggestions for the example run", () => {
  const s = suggestParameters(example);

  it("suggests close travel, stall threshold, window, blanking and timeout from the measured numbers", () => {
    // Full travel 17,100 − round(0.5 % = 85.5) = 17,014 counts; 50 % of 4,000 counts/s = 2,000 counts/s;
    // 8 counts take 4 ms at 2,000 counts/s, below the 50 ms floor; ramp 229 ms + 50 ms = 279 → 300 ms;
    // the opening move took 4,607 ms: × 2 = 9,214 → 10,000 ms.
    expect(calibrationContext(example)).toEqual({ fullTravelCounts: 17_100, nominalVelocityCps: 4000, travelTimeMs: 4607 });
    expect(s).toMatchObject({ closeTravelCounts: 17_014, travelTimeoutMs: 10_000, stall: { thresholdCps: 2000, windowMs: 50, startupBlankingMs: 300 }, warnings: [] });
    expect(s.suggestions.map((x) => x.path)).toEqual(["/closeTravelCounts", "/stall/thresholdCps", "/stall/windowMs", "/stall/startupBlankingMs", "/travelTimeoutMs"]);
  });

  it("explains each suggestion with its numbers", () => {
    const reason = (path: string) => s.suggestions.find((x) => x.path === path)?.reason;
    expect(reason("/closeTravelCounts")).toContain("full travel of 17,100 counts; stopping 86 counts (0.5 %) short of it, at 17,014 counts");
    expect(reason("/stall/thresholdCps")).toContain("50 % of the door's closing speed of 4,000 counts/s");
    expect(reason("/stall/windowMs")).toContain("the shortest suggested window, 50 ms, is used: it holds 100 counts at the threshold");
    expect(reason("/stall/startupBlankingMs")).toContain("took 229 ms from rest to within 5 % of its running speed");
    expect(reason("/travelTimeoutMs")).toContain("took 4.61 s (opening); 2 × that is 9.21 s");
    expect(s.suggestions.every((x) => x.basis === "common practice")).toBe(true);
    expect(s.caution).toContain("second line of defence, not a guarantee");
  });

  it("passes the safety rules for stall, timeout and close travel when given the run's calibration", () => {
    const ctx: SafetyContext = { now: new Date("2026-03-01T12:00:00Z"), site: BERLIN, calibration: calibrationContext(example) };
    const findings = checkSafety(2, applied(s), ctx);
    expect(findings.filter((f) => f.severity === "error")).toEqual([]);
    expect(findings.filter((f) => DRIVE_RULES.includes(f.ruleId))).toEqual([]);
  });
});

describe("hand-worked suggestions", () => {
  it("rounds the stall window up to 10 ms when 8 counts need more than 50 ms", () => {
    // 50 % of 100 counts/s = 50 counts/s; 8 counts take 160 ms; 160 ms holds 8 counts.
    const s = suggestParameters(withNumbers(10_000, 100, 180, 10_300));
    expect(s.stall).toEqual({ thresholdCps: 50, windowMs: 160, startupBlankingMs: 350 });
    expect(s.suggestions.find((x) => x.parameter === "stall.windowMs")?.reason).toBe(
      "At 50 counts/s a window needs 160 ms to hold 8 counts (one count more or less is then at most 12.5 %); rounded up to 10 ms that is 160 ms, holding 8 counts at the threshold.",
    );
  });

  it("stops at a 300 ms window and warns when even that holds few counts", () => {
    // 50 % of 20 counts/s = 10 counts/s; 8 counts would take 800 ms; 300 ms holds 3 counts.
    const s = suggestParameters(withNumbers(10_000, 20, 180, 10_300));
    expect(s.stall.windowMs).toBe(300);
    expect(s.warnings.map((w) => w.code)).toEqual(["window-few-counts", "window-short"]);
  });

  it("adds one window to the ramp and rounds up to 50 ms for the blanking", () => {
    // 180 ms + 50 ms = 230 ms → 250 ms.
    expect(suggestParameters(withNumbers(10_000, 1000, 180, 10_300)).stall.startupBlankingMs).toBe(250);
    // 200 ms + 50 ms = 250 ms stays 250 ms.
    expect(suggestParameters(withNumbers(10_000, 1000, 200, 10_300)).stall.startupBlankingMs).toBe(250);
  });

  it("doubles the travel time, rounds up to a second, and keeps at least 2 s over the travel", () => {
    // 2 × 10,300 = 20,600 → 21,000 ms.
    expect(suggestParameters(withNumbers(10_000, 1000, 180, 10_300)).travelTimeoutMs).toBe(21_000);
    // 2 × 1,500 = 3,000 ms is less than 1,500 + 2,000 = 3,500 ms → 4,000 ms.
    const short = suggestParameters(withNumbers(1000, 1000, 100, 1500));
    expect(short.travelTimeoutMs).toBe(4000);
    expect(short.suggestions.at(-1)?.reason).toContain("2 × that is only 3 s, so the travel time plus 2 s, 3.5 s, rounded up to a whole second, is used");
  });

  it("warns when the threshold is close to the speed of the slower direction", () => {
    // 50 % of a 1,000 counts/s close is 500 counts/s, 91 % of a 550 counts/s open (above 85 %).
    const s = suggestParameters({ ...withNumbers(10_000, 1000, 180, 10_300), velocityCps: { closing: 1000, opening: 550 } });
    expect(s.warnings.map((w) => w.message)).toEqual([
      "The 500 counts/s threshold is 91 % of the 550 counts/s the door runs at while opening: the check may trip on every opening. Find out why the door is so much slower that way before using it.",
    ]);
  });

  it("takes another stall fraction and close margin when asked", () => {
    const s = suggestParameters(withNumbers(10_000, 1000, 180, 10_300), { stallFraction: 0.6, closeMarginShare: 0.01 });
    expect(s.stall.thresholdCps).toBe(600);
    expect(s.closeTravelCounts).toBe(9900);
  });

  it("refuses a stall fraction outside 0–1 and a margin the close-travel rule would warn about", () => {
    expect(() => suggestParameters(example, { stallFraction: 1 })).toThrow("stallFraction must be between 0 and 1");
    expect(() => suggestParameters(example, { closeMarginShare: 0.02 })).toThrow("closeMarginShare");
  });

  it("keeps every suggestion inside the parameter schema's range and says so", () => {
    const s = suggestParameters(withNumbers(250_000, 50_000, 180, 200_000));
    expect(s.closeTravelCounts).toBe(200_000);
    expect(s.stall.thresholdCps).toBe(20_000);
    expect(s.travelTimeoutMs).toBe(300_000);
    expect(s.warnings.filter((w) => w.code === "out-of-range").map((w) => w.message)).toEqual([
      "closeTravelCounts: 248,750 is outside 100–200,000.",
      "stall.thresholdCps: 25,000 is outside 10–20,000.",
      "travelTimeoutMs: 400,000 is outside 1,000–300,000.",
    ]);
  });

  it.each([
    ["a fast door", 17_100, 4000, 250, 4600],
    ["a slow door", 8000, 400, 400, 20_400],
    ["a long, slow run", 60_000, 1200, 600, 50_600],
  ])("gives no safety errors for %s", (_, full, nominal, ramp, travel) => {
    const a = withNumbers(full, nominal, ramp, travel);
    const findings = checkSafety(2, applied(suggestParameters(a)), { now: new Date("2026-03-01T12:00:00Z"), site: BERLIN, calibration: calibrationContext(a) });
    expect(findings.filter((f) => f.severity === "error")).toEqual([]);
    expect(findings.filter((f) => DRIVE_RULES.includes(f.ruleId))).toEqual([]);
  });
});
