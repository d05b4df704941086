// Reads a comma-separated file with a header row into cells with their line numbers, for the imports
// that then check each cell (controllers, calibration runs). Quoting follows RFC 4180; a UTF-8 byte
// order mark (as spreadsheet programs write) is dropped; blank lines are skipped but still counted, so
// a row number is the line a technician sees in an editor, the header being row 1.
import { CsvError, parse } from "csv-parse/sync";

export type CsvRecord = { row: number; cells: string[] };

export type CsvTable =
  | { ok: true; header: string[]; records: CsvRecord[] }
  | { ok: false; row: number; message: string };

/** The header (trimmed, lower-cased) and the data records of CSV text, or the first thing that stops reading it. */
export function readCsvTable(text: string, opts: { maxRows: number }): CsvTable {
  let records: CsvRecord[];
  try {
    records = readRecords(text);
  } catch (e) {
    if (e instanceof CsvError) {
      const row = typeof e.lines === "number" ? e.lines : 1;
      return { ok: false, row, message: `the file could not be read as CSV near row ${row}: ${plainCsvMessage(e)}` };
    }
    throw e;
  }
  // A spreadsheet writes a blank row as ",,,"; it is skipped like an empty line.
  const [head, ...rest] = records.filter((r) => r.cells.some((c) => c !== ""));
  if (!head) return { ok: false, row: 1, message: "the file is empty: the first row must be the header" };
  if (rest.length > opts.maxRows) {
    return { ok: false, row: rest[opts.maxRows]!.row, message: `the file has ${rest.length.toLocaleString("en-US")} data rows; at most ${opts.maxRows.toLocaleString("en-US")} are accepted` };
  }
  return { ok: true, header: head.cells.map((h) => h.toLowerCase()), records: rest };
}

const BASE = { bom: true, relax_column_count: true, trim: true } as const;

function readRecords(text: string): CsvRecord[] {
  // Without quotes no field spans lines, so every line is one record and its number is its index;
  // csv-parse's per-record info, needed otherwise, makes a 200,000-row file about three times slower.
  if (!text.includes('"')) return parse(text, BASE).map((cells, i) => ({ row: i + 1, cells }));
  // csv-parse's types do not follow the `info` option: each record is then { record, info }.
  const withInfo = parse(text, { ...BASE, info: true }) as unknown as { record: string[]; info: { lines: number } }[];
  return withInfo.map((r) => ({ row: r.info.lines, cells: r.record }));
}

// csv-parse messages start with a code-like title ("Quote Not Closed: …"); keep the explanation.
function plainCsvMessage(e: CsvError): string {
  const text = e.message.replace(/^[A-Za-z ]+:\s*/, "");
  return text.length > 0 ? text : e.code;
}

export type HeaderProblem = { column: string; message: string; unknown: boolean };

/** Where each known column sits; unnamed, repeated, unknown and missing required columns as problems. */
export function mapHeader(header: readonly string[], required: readonly string[], optional: readonly string[]): { index: Map<string, number>; problems: HeaderProblem[] } {
  const index = new Map<string, number>();
  const problems: HeaderProblem[] = [];
  const known = new Set([...required, ...optional]);
  const listed = [...required, ...optional].join(",");
  header.forEach((name, i) => {
    if (name === "") {
      problems.push({ column: `column ${i + 1}`, message: `column ${i + 1} has no name in the header; the columns are ${listed}`, unknown: true });
    } else if (index.has(name)) {
      problems.push({ column: name, message: `column ${name} appears twice in the header`, unknown: false });
    } else if (!known.has(name)) {
      problems.push({ column: name, message: `unknown column ${name}; the columns are ${listed}`, unknown: true });
    } else {
      index.set(name, i);
    }
  });
  for (const name of required) {
    if (!index.has(name)) problems.push({ column: name, message: `the header has no ${name} column (required: ${required.join(",")})`, unknown: false });
  }
  return { index, problems };
}

/** Problems kept to `max`, the rest summed up in one last entry that starts at the first one left out. */
export function capProblems<T extends { row: number; message: string }>(problems: readonly T[], max: number, noun: string, make: (row: number, message: string) => T): T[] {
  if (problems.length <= max) return [...problems];
  const rest = problems.length - max;
  const first = problems[max]!;
  return [...problems.slice(0, max), make(first.row, `and ${rest.toLocaleString("en-US")} more ${noun}${rest === 1 ? "" : "s"}, from row ${first.row} on`)];
}
