import { describe, expect, it } from "vitest";
import { decodeMsf, encodeMsf } from "@/lib/timecode/msf";

const flip = (bits: string, i: number) => bits.slice(0, i) + (bits[i] === "1" ? "0" : "1") + bits.slice(i + 1);
const failed = (a: string, b: string) =>
  decodeMsf(a, b)
    .checks.filter((c) => !c.ok)
    .map((c) => c.id);

// Thursday 29 February 2024, 23:59 GMT, DUT1 −0.2 s, built by hand from NPL's "MSF 60 kHz time
// and date code" (fields most significant bit first, odd parity in 54B–57B). No official NPL bit
// string was at hand, so each group is written out here.
const HAND_A = [
  "1", // 0: minute marker (carrier off through the A and B windows)
  "0000000000000000", // 1–16A
  "00100100", // 17–24A: year 24 (80 40 20 10 8 4 2 1)
  "00010", // 25–29A: month 02 (10 8 4 2 1)
  "101001", // 30–35A: day 29 (20 10 8 4 2 1)
  "100", // 36–38A: weekday 4, Thursday (0 = Sunday)
  "100011", // 39–44A: hour 23 (20 10 8 4 2 1)
  "1011001", // 45–51A: minute 59 (40 20 10 8 4 2 1)
  "01111110", // 52–59A: minute identifier
].join("");
const HAND_B = [
  "1", // 0: minute marker
  "00000000", // 1–8B: no positive DUT1
  "11000000", // 9–16B: DUT1 −0.2 s, two ones from 9B
  "0".repeat(36), // 17–52B
  "0", // 53B: no summer-time change soon
  "1", // 54B: year has two ones, odd parity needs 1
  "1", // 55B: month + day have four ones
  "0", // 56B: weekday has one
  "0", // 57B: hour + minute have seven
  "0", // 58B: GMT
  "0", // 59B
].join("");

describe("MSF frames", () => {
  it("encodes the hand-built frame bit for bit and decodes it back", () => {
    expect(HAND_A).toHaveLength(60);
    expect(HAND_B).toHaveLength(60);
    const f = encodeMsf(Date.parse("2024-02-29T23:59:00Z"), { dut1: -0.2 });
    expect(f.bitsA).toBe(HAND_A);
    expect(f.bitsB).toBe(HAND_B);
    const r = decodeMsf(HAND_A, HAND_B);
    expect(r.ok).toBe(true);
    expect(r.instant.local).toBe("2024-02-29T23:59:00+00:00");
    expect(r.instant.zone).toBe("GMT");
    expect(r.instant.utc).toBe("2024-02-29T23:59:00Z");
    expect(r.flags.dut1Seconds).toBe(-0.2);
  });

  it("sends UK summer time with 58B set and names the following minute", () => {
    const f = encodeMsf(Date.parse("2025-07-14T11:37:00Z"));
    const r = decodeMsf(f.bitsA!, f.bitsB!);
    expect(f.bitsB![58]).toBe("1");
    expect(f.sentFrom).toBe("2025-07-14T11:36:00Z");
    expect(r.instant.local).toBe("2025-07-14T12:37:00+01:00");
    expect(r.instant.zone).toBe("BST");
    expect(r.names).toBe("following minute");
  });

  it("fails a parity check whenever any single A bit from 17 to 51 is flipped", () => {
    for (let i = 17; i <= 51; i++) {
      expect(
        failed(flip(HAND_A, i), HAND_B).some((id) => id.startsWith("parity")),
        `bit ${i}A`,
      ).toBe(true);
    }
  });

  it("fails the matching parity check when a parity bit 54B–57B is flipped", () => {
    expect(failed(HAND_A, flip(HAND_B, 54))).toEqual(["parity-year"]);
    expect(failed(HAND_A, flip(HAND_B, 55))).toEqual(["parity-date"]);
    expect(failed(HAND_A, flip(HAND_B, 56))).toEqual(["parity-weekday"]);
    expect(failed(HAND_A, flip(HAND_B, 57))).toEqual(["parity-time"]);
  });

  it("fails the minute identifier when any of 52A–59A is flipped", () => {
    for (let i = 52; i <= 59; i++) expect(failed(flip(HAND_A, i), HAND_B), `bit ${i}A`).toContain("marker-a");
  });

  it("refuses DUT1 bits that are both positive and negative or not a run from the start", () => {
    expect(failed(HAND_A, flip(HAND_B, 1))).toEqual(["dut1"]);
    expect(failed(HAND_A, flip(HAND_B, 12))).toEqual(["dut1"]);
    expect(failed(HAND_A, flip(HAND_B, 11))).toEqual([]);
  });

  it("reports a weekday that does not match the date", () => {
    // Weekday 7 is out of range; weekday 5 (Friday) for a Thursday, parity bit 56B adjusted.
    const friday = HAND_A.slice(0, 36) + "101" + HAND_A.slice(39);
    expect(failed(friday, flip(HAND_B, 56))).toEqual(["weekday-date"]);
  });

  it("sets the summer-time warning 53B in the 61 frames before a change", () => {
    // 2025-10-26 01:00 UTC, the last Sunday of October: BST ends.
    const change = Date.parse("2025-10-26T01:00:00Z");
    const warn = (ms: number) => encodeMsf(ms).bitsB![53] === "1";
    expect(warn(change - 61 * 60_000)).toBe(false);
    expect(warn(change - 60 * 60_000)).toBe(true);
    expect(warn(change)).toBe(true);
    expect(warn(change + 60_000)).toBe(false);
    const last = encodeMsf(change - 60_000);
    expect(decodeMsf(last.bitsA!, last.bitsB!).instant.local).toBe("2025-10-26T01:59:00+01:00");
    const first = encodeMsf(change);
    expect(decodeMsf(first.bitsA!, first.bitsB!).instant.local).toBe("2025-10-26T01:00:00+00:00");
  });

  it("labels A and B fields in the bit table", () => {
    const r = decodeMsf(HAND_A, HAND_B);
    expect(r.rows[54]).toMatchObject({ symbols: "A1 B1", field: "minute identifier 01111110 · B: year parity (odd)", ok: true });
    expect(r.rows[17]).toMatchObject({ field: "year 80" });
  });
});
