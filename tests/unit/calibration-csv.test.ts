import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { CALIBRATION_MAX_ROWS, parseCalibrationCsv, type CalibrationCsv } from "@/lib/calibration/csv";
import { exampleRun, toCalibrationCsv } from "../fixtures/calibration/generate";

const fixture = (name: string) => readFileSync(new URL(`../fixtures/calibration/${name}`, import.meta.url), "utf8");
const errorsOf = (r: CalibrationCsv) => (r.ok ? [] : r.errors);

describe("reading a calibration run", () => {
  it("reads the example run with all four columns and no warnings", () => {
    const r = parseCalibrationCsv(fixture("example-run.csv"));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.warnings).toEqual([]);
    expect(r.samples.length).toBeGreaterThan(1000);
    expect(r.samples[0]).toEqual({ tMs: 0, counts: 0, velocityCps: 0, openSensor: 1 });
  });

  it("keeps the example fixture identical to what its generator writes", () => {
    expect(fixture("example-run.csv")).toBe(toCalibrationCsv(exampleRun().samples));
  });

  it("accepts a byte order mark, CRLF line ends, blank lines, any column order and case", () => {
    const r = parseCalibrationCsv("\uFEFFCounts,Time_MS\r\n0,0\r\n\r\n5,10\r\n,\r\n12,20\r\n");
    expect(r).toEqual({ ok: true, samples: [{ tMs: 0, counts: 0 }, { tMs: 10, counts: 5 }, { tMs: 20, counts: 12 }], warnings: [] });
  });

  it("reads quoted fields and keeps file line numbers for rows after a blank line", () => {
    const r = parseCalibrationCsv('time_ms,counts\n"0","0"\n\n"10",x\n');
    expect(errorsOf(r)).toEqual([{ row: 4, column: "counts", message: 'row 4: counts "x" is not a whole number' }]);
  });

  it("ignores an unknown column with a warning naming it", () => {
    const r = parseCalibrationCsv("time_ms,counts,current_ma\n0,0,120\n10,4,180\n");
    expect(r.ok && r.warnings).toEqual([{ row: 1, column: "current_ma", message: "unknown column current_ma; the columns are time_ms,counts,velocity_cps,open_sensor; it is ignored" }]);
  });
});

describe("refusing a bad calibration run", () => {
  it("refuses an empty file", () => {
    expect(errorsOf(parseCalibrationCsv(fixture("bad-empty.csv")))).toEqual([{ row: 1, message: "the file is empty: the first row must be the header" }]);
  });

  it("refuses a header without samples", () => {
    expect(errorsOf(parseCalibrationCsv("time_ms,counts\n"))).toEqual([{ row: 2, message: "the file has a header but no samples" }]);
  });

  it("names the missing required column", () => {
    const errors = errorsOf(parseCalibrationCsv(fixture("bad-missing-column.csv")));
    expect(errors).toEqual([{ row: 1, column: "counts", message: "the header has no counts column (required: time_ms,counts)" }]);
  });

  it("refuses a file whose first row is data, not a header", () => {
    expect(errorsOf(parseCalibrationCsv("0,0\n10,5\n"))[0]?.message).toContain("row 1 must be the header");
  });

  it("refuses a repeated column name", () => {
    expect(errorsOf(parseCalibrationCsv("time_ms,counts,counts\n0,0,0\n"))).toEqual([{ row: 1, column: "counts", message: "column counts appears twice in the header" }]);
  });

  it("names every row where time goes backwards", () => {
    const errors = errorsOf(parseCalibrationCsv(fixture("bad-non-monotonic-time.csv")));
    expect(errors).toEqual([
      { row: 6, column: "time_ms", message: "row 6: time_ms 12 is earlier than 15 on row 5; times must increase" },
      { row: 9, column: "time_ms", message: "row 9: time_ms 18 is earlier than 25 on row 8; times must increase" },
    ]);
  });

  it("reports every bad cell with its row and column", () => {
    const errors = errorsOf(parseCalibrationCsv(fixture("bad-non-numeric.csv")));
    expect(errors).toEqual([
      { row: 4, column: "counts", message: 'row 4: counts "abc" is not a whole number' },
      { row: 5, column: "open_sensor", message: 'row 5: open_sensor "yes" is not 0 or 1' },
      { row: 6, column: "counts", message: 'row 6: counts "64.5" is not a whole number' },
      { row: 7, column: "velocity_cps", message: "row 7: velocity_cps is missing" },
    ]);
  });

  it("refuses a row with more cells than the header", () => {
    expect(errorsOf(parseCalibrationCsv("time_ms,counts\n0,0,7\n"))).toEqual([{ row: 2, message: "row 2 has 3 cells but the header has 2" }]);
  });

  it("does not take hexadecimal, exponents or Infinity as numbers", () => {
    const errors = errorsOf(parseCalibrationCsv("time_ms,counts\n0x10,0\n1e3,0\nInfinity,0\n"));
    expect(errors.map((e) => e.row)).toEqual([2, 3, 4]);
  });

  it("reports an unclosed quote with its row", () => {
    const errors = errorsOf(parseCalibrationCsv('time_ms,counts\n0,0\n10,"5\n'));
    expect(errors).toHaveLength(1);
    expect(errors[0]?.message).toMatch(/^the file could not be read as CSV near row 3/);
  });

  it("lists the first 50 errors and sums up the rest", () => {
    const rows = Array.from({ length: 120 }, (_, i) => `${i},x`);
    const errors = errorsOf(parseCalibrationCsv(["time_ms,counts", ...rows].join("\n")));
    expect(errors).toHaveLength(51);
    expect(errors[50]).toEqual({ row: 52, message: "and 70 more errors, from row 52 on" });
  });

  it(`refuses more than ${CALIBRATION_MAX_ROWS.toLocaleString("en-US")} data rows`, () => {
    const text = "time_ms,counts\n" + Array.from({ length: CALIBRATION_MAX_ROWS + 1 }, (_, i) => `${i},0`).join("\n");
    expect(errorsOf(parseCalibrationCsv(text))).toEqual([{ row: CALIBRATION_MAX_ROWS + 2, message: "the file has 200,001 data rows; at most 200,000 are accepted" }]);
  });
});

describe("warnings on a calibration run", () => {
  it("drops a repeated time stamp and flags a jump in counts far beyond the run's speed", () => {
    const r = parseCalibrationCsv(fixture("warn-duplicate-and-jump.csv"));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.samples.map((s) => s.tMs)).toEqual([0, 10, 20, 30, 40, 50, 60, 70, 80, 90]);
    expect(r.warnings).toHaveLength(2);
    expect(r.warnings[0]).toEqual({ row: 6, column: "time_ms", message: "row 6: time_ms 30 repeats row 5; the later sample is dropped" });
    // Moving steps of 8, 32, 40, 40, 5,000, 40, 40 and 40 counts per 10 ms: the median is 40 counts
    // (4,000 counts/s), and 5,000 counts is far beyond 3 × 40.
    expect(r.warnings[1]).toMatchObject({ row: 9, column: "counts" });
    expect(r.warnings[1]?.message).toBe(
      "row 9: counts jump by 5,000 in 10 ms (500,000 counts/s), more than 3 × the run's typical 4,000 counts/s: a lost encoder edge, a counter overflow or a glitch?",
    );
  });

  it("does not flag ordinary running as jumps", () => {
    const r = parseCalibrationCsv(fixture("example-run.csv"));
    expect(r.ok && r.warnings.filter((w) => w.column === "counts")).toEqual([]);
  });
});
