import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { CONTROLLERS_MAX_ERRORS, parseControllersCsv, serialProblem } from "@/lib/fleet/controllers-csv";

const fixture = (name: string) => readFileSync(new URL(`../fixtures/fleet/${name}`, import.meta.url), "utf8");
const ctx = { knownDoorModels: ["HM-350", "HM-420"], knownSites: ["north-barn", "orchard-run"], existingSerials: ["RL-0042"] };
const HEADER = "serial,door_model_code,site_slug,firmware_version,parameter_set_version";

describe("importing controllers", () => {
  it("reads the good fixture with its byte order mark, CRLF line ends, a blank line, quotes and spaces", () => {
    expect(parseControllersCsv(fixture("controllers-good.csv"), ctx)).toEqual({
      rows: [
        { row: 2, serial: "RL-2026-0001", doorModelCode: "HM-350", siteSlug: "north-barn", firmwareVersion: "1.4.2", parameterSetVersion: 2 },
        { row: 3, serial: "RL-2026-0002", doorModelCode: "HM-350", siteSlug: "north-barn", firmwareVersion: "1.4.2", parameterSetVersion: 2 },
        { row: 4, serial: "RL-2026-0003", doorModelCode: "HM-420", siteSlug: "orchard-run", firmwareVersion: "1.3.0", parameterSetVersion: 1 },
        { row: 6, serial: "RL-2026-0004", doorModelCode: "HM-420", siteSlug: "orchard-run", firmwareVersion: "1.4.10", parameterSetVersion: 2 },
      ],
      errors: [],
    });
  });

  it("takes the columns in any order", () => {
    const r = parseControllersCsv("PARAMETER_SET_VERSION,site_slug,serial,firmware_version,door_model_code\n1,north-barn,AB12,0.9.0,HM-350\n", ctx);
    expect(r.rows).toEqual([{ row: 2, serial: "AB12", doorModelCode: "HM-350", siteSlug: "north-barn", firmwareVersion: "0.9.0", parameterSetVersion: 1 }]);
  });

  it("reports every problem of the bad fixture with its row and column", () => {
    const r = parseControllersCsv(fixture("controllers-bad.csv"), ctx);
    expect(r.rows.map((x) => x.serial)).toEqual(["RL-2026-0101"]);
    expect(r.errors).toEqual([
      { row: 3, column: "serial", message: "row 3: serial rl-2026-0102 must be in capital letters: RL-2026-0102" },
      { row: 4, column: "serial", message: "row 4: serial RL-2026-0101 is also on row 2" },
      { row: 5, column: "serial", message: "row 5: serial RL-0042 is already registered" },
      { row: 6, column: "serial", message: "row 6: serial RL--0103 may hold only capital letters A–Z, digits and single hyphens between them, and must start and end with a letter or digit" },
      { row: 6, column: "door_model_code", message: "row 6: unknown door model HM-999" },
      { row: 7, column: "door_model_code", message: "row 7: unknown door model hm-350 (did you mean HM-350?)" },
      { row: 7, column: "site_slug", message: "row 7: unknown site south-barn" },
      { row: 7, column: "firmware_version", message: "row 7: firmware_version 1.4 must look like 1.4.2 (three whole numbers without leading zeros)" },
      { row: 8, column: "firmware_version", message: "row 8: firmware_version 01.4.2 must look like 1.4.2 (three whole numbers without leading zeros)" },
      { row: 8, column: "parameter_set_version", message: "row 8: parameter_set_version 3 must be 1 or 2" },
      { row: 9, column: "door_model_code", message: "row 9: door_model_code is missing" },
      { row: 10, column: null, message: "row 10: the row has 6 cells but the header has 5" },
    ]);
  });

  it("refuses a header with a misspelt column and an extra one, naming both", () => {
    expect(parseControllersCsv(fixture("controllers-bad-header.csv"), ctx)).toEqual({
      rows: [],
      errors: [
        { row: 1, column: "door_model", message: "row 1: unknown column door_model; the columns are serial,door_model_code,site_slug,firmware_version,parameter_set_version" },
        { row: 1, column: "notes", message: "row 1: unknown column notes; the columns are serial,door_model_code,site_slug,firmware_version,parameter_set_version" },
        { row: 1, column: "door_model_code", message: "row 1: the header has no door_model_code column (required: serial,door_model_code,site_slug,firmware_version,parameter_set_version)" },
      ],
    });
  });

  it("refuses an empty file and a file with only the header", () => {
    expect(parseControllersCsv("", ctx).errors).toEqual([{ row: 1, column: null, message: "the file is empty: the first row must be the header" }]);
    expect(parseControllersCsv(`${HEADER}\n`, ctx).errors).toEqual([{ row: 2, column: null, message: "the file has a header but no controllers" }]);
  });

  it("compares with registered serials whatever their letter case", () => {
    expect(parseControllersCsv(`${HEADER}\nRL-7777,HM-350,north-barn,1.0.0,2\n`, { ...ctx, existingSerials: ["rl-7777"] }).errors[0]?.message).toBe("row 2: serial RL-7777 is already registered");
  });

  it(`lists at most ${CONTROLLERS_MAX_ERRORS} errors and sums up the rest`, () => {
    const rows = Array.from({ length: 150 }, (_, i) => `RL-${1000 + i},HM-350,north-barn,1.0,2`);
    const r = parseControllersCsv([HEADER, ...rows].join("\n"), ctx);
    expect(r.errors).toHaveLength(CONTROLLERS_MAX_ERRORS + 1);
    expect(r.errors.at(-1)).toEqual({ row: 102, column: null, message: "and 50 more errors, from row 102 on" });
  });
});

describe("serial format", () => {
  it.each(["RL-2026-0001", "AB12", "A".repeat(32), "0000-A"])("accepts %s", (s) => {
    expect(serialProblem(s)).toBeNull();
  });

  it.each([
    ["ABC", "must be 4–32 characters long (it has 3)"],
    ["A".repeat(33), "must be 4–32 characters long (it has 33)"],
    ["-ABCD", "may hold only"],
    ["ABCD-", "may hold only"],
    ["AB CD", "may hold only"],
    ["ABÇD", "may hold only"],
  ])("refuses %s", (s, message) => {
    expect(serialProblem(s)).toContain(message);
  });
});
