/*
 * Controllers CSV — registers many controllers at once.
 *
 *   serial,door_model_code,site_slug,firmware_version,parameter_set_version
 *   RL-2026-0001,HM-350,north-barn,1.4.2,2
 *
 * - UTF-8 text, comma separated, one controller a row; a byte order mark at the start is allowed.
 *   Fields may be quoted as in RFC 4180; spaces around a value are ignored. Blank rows (also ",,,,")
 *   are skipped; row numbers in messages are the file's lines, the header being row 1.
 * - The header row is required, with exactly these five columns in any order (names case-blind):
 *     serial                 4–32 characters: capital letters A–Z, digits and single hyphens between
 *                            them, starting and ending with a letter or digit (RL-2026-0001). Unique in
 *                            the file and not already registered.
 *     door_model_code        the code of a door model that exists (exact spelling)
 *     site_slug              the slug of a site that exists (exact spelling)
 *     firmware_version       MAJOR.MINOR.PATCH, whole numbers without leading zeros (1.4.2), as in
 *                            Semantic Versioning 2.0.0 section 2; no pre-release or build suffix
 *     parameter_set_version  1 or 2
 * - At most 5,000 rows a file. Every row is checked and every problem listed (the first 100, then
 *   "and N more"); the caller imports the rows only when there is no error at all.
 */
import { capProblems, mapHeader, readCsvTable } from "./csv-records";

export const CONTROLLER_COLUMNS = ["serial", "door_model_code", "site_slug", "firmware_version", "parameter_set_version"] as const;
export const CONTROLLERS_MAX_ROWS = 5000;
export const CONTROLLERS_MAX_ERRORS = 100;

export const SERIAL_PATTERN = /^[A-Z0-9]+(?:-[A-Z0-9]+)*$/;
export const SERIAL_MIN = 4;
export const SERIAL_MAX = 32;
// Semantic Versioning 2.0.0, section 2: non-negative integers without leading zeros.
const FIRMWARE = /^(0|[1-9]\d{0,5})\.(0|[1-9]\d{0,5})\.(0|[1-9]\d{0,5})$/;

export type ControllerRow = { row: number; serial: string; doorModelCode: string; siteSlug: string; firmwareVersion: string; parameterSetVersion: 1 | 2 };
export type ControllerCsvError = { row: number; column: string | null; message: string };
export type ControllersCsv = { rows: ControllerRow[]; errors: ControllerCsvError[] };
export type ControllersCsvContext = { knownDoorModels: readonly string[]; knownSites: readonly string[]; existingSerials: readonly string[] };

/** Why a serial is refused, or null when it is well-formed. */
export function serialProblem(serial: string): string | null {
  if (serial.length < SERIAL_MIN || serial.length > SERIAL_MAX) return `must be ${SERIAL_MIN}–${SERIAL_MAX} characters long (it has ${serial.length})`;
  if (SERIAL_PATTERN.test(serial)) return null;
  if (SERIAL_PATTERN.test(serial.toUpperCase())) return `must be in capital letters: ${serial.toUpperCase()}`;
  return "may hold only capital letters A–Z, digits and single hyphens between them, and must start and end with a letter or digit";
}

/** Controllers from CSV text, checked against the known door models, sites and registered serials. */
export function parseControllersCsv(text: string, ctx: ControllersCsvContext): ControllersCsv {
  const table = readCsvTable(text, { maxRows: CONTROLLERS_MAX_ROWS });
  if (!table.ok) return { rows: [], errors: [{ row: table.row, column: null, message: table.message }] };
  const { index, problems } = mapHeader(table.header, CONTROLLER_COLUMNS, []);
  if (problems.length) return { rows: [], errors: problems.map((p) => ({ row: 1, column: p.column, message: `row 1: ${p.message}` })) };
  if (table.records.length === 0) return { rows: [], errors: [{ row: 2, column: null, message: "the file has a header but no controllers" }] };

  const models = new Set(ctx.knownDoorModels);
  const sites = new Set(ctx.knownSites);
  const existing = new Set(ctx.existingSerials.map((s) => s.toUpperCase()));
  const firstRowOf = new Map<string, number>();
  const rows: ControllerRow[] = [];
  const errors: ControllerCsvError[] = [];

  for (const { row, cells } of table.records) {
    const before = errors.length;
    const fail = (column: string | null, message: string) => errors.push({ row, column, message: `row ${row}: ${message}` });
    const value = (name: (typeof CONTROLLER_COLUMNS)[number]) => {
      const v = cells[index.get(name)!] ?? "";
      if (v === "") fail(name, `${name} is missing`);
      return v;
    };
    if (cells.slice(table.header.length).some((c) => c !== "")) fail(null, `the row has ${cells.length} cells but the header has ${table.header.length}`);
    const serial = value("serial");
    const doorModelCode = value("door_model_code");
    const siteSlug = value("site_slug");
    const firmwareVersion = value("firmware_version");
    const psv = value("parameter_set_version");

    if (serial) {
      const problem = serialProblem(serial);
      const earlier = firstRowOf.get(serial.toUpperCase());
      if (problem) fail("serial", `serial ${serial} ${problem}`);
      else if (earlier !== undefined) fail("serial", `serial ${serial} is also on row ${earlier}`);
      else if (existing.has(serial)) fail("serial", `serial ${serial} is already registered`);
      if (earlier === undefined) firstRowOf.set(serial.toUpperCase(), row);
    }
    if (doorModelCode && !models.has(doorModelCode)) fail("door_model_code", `unknown door model ${doorModelCode}${didYouMean(doorModelCode, ctx.knownDoorModels)}`);
    if (siteSlug && !sites.has(siteSlug)) fail("site_slug", `unknown site ${siteSlug}${didYouMean(siteSlug, ctx.knownSites)}`);
    if (firmwareVersion && !FIRMWARE.test(firmwareVersion)) fail("firmware_version", `firmware_version ${firmwareVersion} must look like 1.4.2 (three whole numbers without leading zeros)`);
    if (psv && psv !== "1" && psv !== "2") fail("parameter_set_version", `parameter_set_version ${psv} must be 1 or 2`);

    if (errors.length === before) rows.push({ row, serial, doorModelCode, siteSlug, firmwareVersion, parameterSetVersion: psv === "1" ? 1 : 2 });
  }
  return { rows, errors: capProblems(errors, CONTROLLERS_MAX_ERRORS, "error", (row, message) => ({ row, column: null, message })) };
}

// Only a difference of letter case is suggested: anything looser guesses at the wrong site.
function didYouMean(value: string, known: readonly string[]): string {
  const match = known.find((k) => k.toLowerCase() === value.toLowerCase());
  return match ? ` (did you mean ${match}?)` : "";
}
