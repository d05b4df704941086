/*
 * Calibration run CSV — what a technician records on site while the door closes and opens once.
 *
 *   time_ms,counts,velocity_cps,open_sensor
 *   0,0,0,1
 *   7,0,0,1
 *   ...
 *
 * - UTF-8 text, comma separated, one sample a row; a byte order mark at the start is allowed. Fields may
 *   be quoted as in RFC 4180. Blank lines are skipped; row numbers in messages are the file's lines, the
 *   header being row 1.
 * - The header row is required. Column names are case-blind and may come in any order:
 *     time_ms       required  time of the sample in milliseconds, a decimal number (any origin, e.g. the
 *                             controller's uptime); must increase from row to row
 *     counts        required  encoder position, a whole number; the firmware counts up from the open end
 *                             stop while closing
 *     velocity_cps  optional  the controller's own velocity reading in counts per second (a decimal,
 *                             signed); without it the velocity is derived from counts and time
 *     open_sensor   optional  1 while the open end-stop sensor sees the door, 0 otherwise (whatever its
 *                             electrical active level)
 *   Other columns are ignored with a warning. When an optional column is present every row needs it.
 * - At most 200,000 data rows (the caller limits the upload to 5 MiB).
 * - Errors (the run is refused): a missing or non-numeric cell, a fractional count, an open_sensor other
 *   than 0 or 1, time going backwards, more cells than the header has. Every row is checked and the
 *   first 50 errors are listed, then "and N more".
 * - Warnings (the run is read): a repeated time stamp (the later row is dropped), a jump in counts
 *   between two samples far faster than the door otherwise moves (a lost encoder edge, a counter
 *   overflow or an electrical glitch).
 */
import { capProblems, mapHeader, readCsvTable } from "@/lib/fleet/csv-records";
import { median } from "./series";

export const CALIBRATION_MAX_ROWS = 200_000;
export const CALIBRATION_MAX_ISSUES = 50;
export const CALIBRATION_REQUIRED = ["time_ms", "counts"] as const;
export const CALIBRATION_OPTIONAL = ["velocity_cps", "open_sensor"] as const;

/** A step between samples faster than this many times the run's typical moving rate looks like a glitch (common practice). */
export const JUMP_FACTOR = 3;
/** Steps of this many counts or fewer are never called jumps: encoder quantisation at short sample intervals. */
export const JUMP_MIN_COUNTS = 20;

export type CalibrationSample = { tMs: number; counts: number; velocityCps?: number; openSensor?: 0 | 1 };
export type CsvIssue = { row: number; column?: string; message: string };
export type CalibrationCsv = { ok: true; samples: CalibrationSample[]; warnings: CsvIssue[] } | { ok: false; errors: CsvIssue[] };

const DECIMAL = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)$/;
const WHOLE = /^[+-]?\d+$/;

/** Samples of a calibration run from CSV text, with every row checked; errors refuse the run, warnings do not. */
export function parseCalibrationCsv(text: string): CalibrationCsv {
  const table = readCsvTable(text, { maxRows: CALIBRATION_MAX_ROWS });
  if (!table.ok) return { ok: false, errors: [{ row: table.row, message: table.message }] };
  if (looksLikeData(table.header)) {
    return { ok: false, errors: [{ row: 1, message: `row 1 must be the header (${CALIBRATION_REQUIRED.join(",")}, optionally ${CALIBRATION_OPTIONAL.join(",")}); it looks like data` }] };
  }
  const { index, problems } = mapHeader(table.header, CALIBRATION_REQUIRED, CALIBRATION_OPTIONAL);
  const errors: CsvIssue[] = [];
  const warnings: CsvIssue[] = [];
  for (const p of problems) {
    const issue = { row: 1, column: p.column, message: p.unknown ? `${p.message}; it is ignored` : p.message };
    (p.unknown ? warnings : errors).push(issue);
  }
  if (errors.length) return { ok: false, errors };
  if (table.records.length === 0) return { ok: false, errors: [{ row: 2, message: "the file has a header but no samples" }] };

  const col = (name: string) => index.get(name);
  const [tCol, cCol, vCol, sCol] = [col("time_ms")!, col("counts")!, col("velocity_cps"), col("open_sensor")];
  const samples: CalibrationSample[] = [];
  const rows: number[] = [];
  let last: { tMs: number; row: number } | null = null;

  for (const { row, cells } of table.records) {
    const before = errors.length;
    const cell = (i: number, name: string, pattern: RegExp, what: string): number | undefined => {
      const raw = cells[i];
      if (raw === undefined || raw === "") {
        errors.push({ row, column: name, message: `row ${row}: ${name} is missing` });
        return undefined;
      }
      if (!pattern.test(raw)) {
        const shown = raw.length > 24 ? `${raw.slice(0, 24)}…` : raw;
        errors.push({ row, column: name, message: `row ${row}: ${name} "${shown}" is not ${what}` });
        return undefined;
      }
      return Number(raw);
    };
    const extra = cells.slice(table.header.length).filter((c) => c !== "").length;
    if (extra > 0) errors.push({ row, message: `row ${row} has ${cells.length} cells but the header has ${table.header.length}` });
    const tMs = cell(tCol, "time_ms", DECIMAL, "a number");
    const counts = cell(cCol, "counts", WHOLE, "a whole number");
    const velocityCps = vCol === undefined ? undefined : cell(vCol, "velocity_cps", DECIMAL, "a number");
    const sensor = sCol === undefined ? undefined : cell(sCol, "open_sensor", /^[01]$/, "0 or 1");
    if (errors.length > before || tMs === undefined || counts === undefined) continue;

    if (last && tMs < last.tMs) {
      errors.push({ row, column: "time_ms", message: `row ${row}: time_ms ${tMs} is earlier than ${last.tMs} on row ${last.row}; times must increase` });
      continue;
    }
    if (last && tMs === last.tMs) {
      warnings.push({ row, column: "time_ms", message: `row ${row}: time_ms ${tMs} repeats row ${last.row}; the later sample is dropped` });
      continue;
    }
    const s: CalibrationSample = { tMs, counts };
    if (velocityCps !== undefined) s.velocityCps = velocityCps;
    if (sensor !== undefined) s.openSensor = sensor === 1 ? 1 : 0;
    samples.push(s);
    rows.push(row);
    last = { tMs, row };
  }

  if (errors.length) return { ok: false, errors: cap(errors, "error") };
  const all = warnings.concat(jumpWarnings(samples, rows)).sort((a, b) => a.row - b.row);
  return { ok: true, samples, warnings: cap(all, "warning") };
}

function cap(issues: CsvIssue[], noun: string): CsvIssue[] {
  return capProblems(issues, CALIBRATION_MAX_ISSUES, noun, (row, message) => ({ row, message }));
}

function looksLikeData(header: readonly string[]): boolean {
  return header.length > 0 && header.every((h) => DECIMAL.test(h));
}

/**
 * Steps much faster than the run's median moving step rate. The run's own speed is the yardstick; the
 * median, not a high percentile, so that in a short file a glitch cannot become its own yardstick.
 */
function jumpWarnings(samples: readonly CalibrationSample[], rows: readonly number[]): CsvIssue[] {
  const rates: number[] = [];
  for (let i = 1; i < samples.length; i++) {
    const a = samples[i - 1]!;
    const b = samples[i]!;
    if (b.counts !== a.counts) rates.push(Math.abs(b.counts - a.counts) / (b.tMs - a.tMs));
  }
  if (rates.length === 0) return [];
  const usual = median(rates)!;
  const out: CsvIssue[] = [];
  for (let i = 1; i < samples.length; i++) {
    const a = samples[i - 1]!;
    const b = samples[i]!;
    const step = Math.abs(b.counts - a.counts);
    const dt = b.tMs - a.tMs;
    if (step > JUMP_MIN_COUNTS && step > JUMP_FACTOR * usual * dt) {
      out.push({
        row: rows[i]!,
        column: "counts",
        message: `row ${rows[i]}: counts jump by ${step.toLocaleString("en-US")} in ${dt} ms (${Math.round((step / dt) * 1000).toLocaleString("en-US")} counts/s), more than ${JUMP_FACTOR} × the run's typical ${Math.round(usual * 1000).toLocaleString("en-US")} counts/s: a lost encoder edge, a counter overflow or a glitch?`,
      });
    }
  }
  return out;
}
