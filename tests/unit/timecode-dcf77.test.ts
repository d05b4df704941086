import { describe, expect, it } from "vitest";
import { decodeDcf77, encodeDcf77 } from "@/lib/timecode/dcf77";

const flip = (bits: string, i: number) => bits.slice(0, i) + (bits[i] === "1" ? "0" : "1") + bits.slice(i + 1);
const failed = (bits: string) =>
  decodeDcf77(bits)
    .checks.filter((c) => !c.ok)
    .map((c) => c.id);

// Monday 14 July 2025, 13:37 CEST, built by hand from PTB's description of the DCF77 time code
// (bit numbers and weights as PTB lists them). No official PTB bit string was at hand, so each
// group is written out here and checked against the encoder and the decoder.
const HAND_FRAME = [
  "0", // 0: start of minute, always 0
  "00000000000000", // 1–14: civil warning / weather bits, 0 here
  "0", // 15: call bit
  "0", // 16: A1, no change announced
  "10", // 17–18: Z1 Z2 = 10, CEST
  "0", // 19: A2, no leap second
  "1", // 20: start of time, always 1
  "1110110", // 21–27: minutes 37 = 1+2+4 + 10+20 (weights 1,2,4,8,10,20,40)
  "1", // 28: P1, five ones above, even parity needs 1
  "110010", // 29–34: hours 13 = 1+2 + 10
  "1", // 35: P2, three ones
  "001010", // 36–41: day 14 = 4 + 10
  "100", // 42–44: weekday 1 = Monday
  "11100", // 45–49: month 7 = 1+2+4
  "10100100", // 50–57: year 25 = 1+4 + 20
  "1", // 58: P3 over 36–57, nine ones
].join("");

describe("DCF77 frames", () => {
  it("decodes a published received frame to its published date and time", () => {
    // Worked example in a widely reproduced article on decoding the DCF77 signal: the received bit
    // stream below, decoded there as "Tuesday 01/12/1998 16:00". Also checked by hand against the
    // PTB layout: zone 01 (CET), hours 2+4+10, day 1, weekday 2, month 2+10, year 8+10+80.
    const r = decodeDcf77("00000000000000000010100000000011010110000001001001000110011");
    expect(r.ok).toBe(true);
    expect(r.instant).toMatchObject({ year: 1998, month: 12, day: 1, hour: 16, minute: 0, zone: "CET" });
    expect(r.instant.local).toBe("1998-12-01T16:00:00+01:00");
    expect(r.instant.utc).toBe("1998-12-01T15:00:00Z");
  });

  it("encodes the hand-built frame bit for bit and decodes it back", () => {
    expect(HAND_FRAME).toHaveLength(59);
    expect(encodeDcf77(Date.parse("2025-07-14T11:37:00Z")).bits).toBe(HAND_FRAME);
    const r = decodeDcf77(HAND_FRAME);
    expect(r.ok).toBe(true);
    expect(r.instant.local).toBe("2025-07-14T13:37:00+02:00");
    expect(r.instant.utc).toBe("2025-07-14T11:37:00Z");
    expect(r.names).toBe("following minute");
  });

  it("is sent during the minute before the minute it names", () => {
    const f = encodeDcf77(Date.parse("2025-07-14T11:37:00Z"));
    expect(f.sentFrom).toBe("2025-07-14T11:36:00Z");
  });

  it("fails a parity check whenever any single bit from 21 to 58 is flipped", () => {
    for (let i = 21; i <= 58; i++) {
      const ids = failed(flip(HAND_FRAME, i));
      expect(ids.some((id) => id.startsWith("parity")), `bit ${i}`).toBe(true);
    }
  });

  it("names the parity bit that covers the flipped bit", () => {
    expect(failed(flip(HAND_FRAME, 23))).toContain("parity-minute");
    expect(failed(flip(HAND_FRAME, 30))).toContain("parity-hour");
    expect(failed(flip(HAND_FRAME, 50))).toContain("parity-date");
  });

  it("catches a wrong start-of-minute bit, start-of-time bit or zone pair", () => {
    expect(failed(flip(HAND_FRAME, 0))).toEqual(["start-minute"]);
    expect(failed(flip(HAND_FRAME, 20))).toEqual(["start-time"]);
    expect(failed(flip(HAND_FRAME, 17))).toEqual(["zone-bits"]);
    expect(failed(flip(HAND_FRAME, 18))).toEqual(["zone-bits"]);
    expect(decodeDcf77(flip(HAND_FRAME, 17)).instant.utc).toBeNull();
  });

  it("leaves the unprotected flag bits 1–16 and 19 without a check, as the code has none", () => {
    for (const i of [...Array.from({ length: 16 }, (_, k) => k + 1), 19]) expect(decodeDcf77(flip(HAND_FRAME, i)).ok, `bit ${i}`).toBe(true);
  });

  it("reports BCD digits above 9, a month out of range, a day missing from the month and a wrong weekday", () => {
    // Minutes 0b1111 in the units (15) with parity kept even.
    const badDigit = "0".repeat(17) + "1001" + "1111000" + "0" + HAND_FRAME.slice(29);
    expect(failed(badDigit)).toContain("minute-bcd");
    // 31 June 2025: day 31 = 1 + 10 + 20, month 6 = 2 + 4; then fix P3.
    const d = HAND_FRAME.slice(0, 36) + "100011" + "100" + "01100" + "10100100";
    const p3 = (d.slice(36).split("").filter((x) => x === "1").length % 2).toString();
    const june31 = failed(d + p3);
    expect(june31).toContain("day-valid");
    expect(june31).not.toContain("parity-date");
    const month13 = HAND_FRAME.slice(0, 45) + "11001" + HAND_FRAME.slice(50, 58);
    const p3m = (month13.slice(36).split("").filter((x) => x === "1").length % 2).toString();
    expect(failed(month13 + p3m)).toContain("month-range");
    // Weekday 2 (Tuesday) for a Monday, with bit 42 and 43 swapped so P3 still holds.
    const tuesday = HAND_FRAME.slice(0, 42) + "010" + HAND_FRAME.slice(45);
    expect(failed(tuesday)).toEqual(["weekday-date"]);
  });

  it("accepts a 60-bit leap-second minute only when A2 announced it", () => {
    const announced = encodeDcf77(Date.parse("2016-12-31T23:00:00Z"), { leapSecondWarning: true }).bits!;
    expect(decodeDcf77(announced + "0").ok).toBe(true);
    expect(failed(HAND_FRAME + "0")).toEqual(["leap-second"]);
    expect(failed(announced + "1")).toEqual(["leap-second"]);
  });

  it("sets the announcement bit A1 through the hour before the change to CEST", () => {
    // 2026-03-29 01:00 UTC: last Sunday of March (Directive 2000/84/EC Art. 2).
    const change = Date.parse("2026-03-29T01:00:00Z");
    const a1 = (ms: number) => decodeDcf77(encodeDcf77(ms).bits!).flags.zoneChangeAnnounced;
    expect(a1(change - 60 * 60_000)).toBe(false);
    expect(a1(change - 59 * 60_000)).toBe(true);
    expect(a1(change)).toBe(true);
    expect(a1(change + 60_000)).toBe(false);
    expect(decodeDcf77(encodeDcf77(change - 60_000).bits!).instant.local).toBe("2026-03-29T01:59:00+01:00");
    expect(decodeDcf77(encodeDcf77(change).bits!).instant.local).toBe("2026-03-29T03:00:00+02:00");
  });

  it("sets the call bit and A2 when asked", () => {
    const r = decodeDcf77(encodeDcf77(Date.parse("2025-07-14T11:37:00Z"), { callBit: true, leapSecondWarning: true }).bits!);
    expect(r.flags).toMatchObject({ callBit: true, leapSecondAnnounced: true });
    expect(r.ok).toBe(true);
  });

  it("marks each bit-table row with its field and the state of the checks covering it", () => {
    const r = decodeDcf77(flip(HAND_FRAME, 23));
    expect(r.rows).toHaveLength(59);
    expect(r.rows[23]).toMatchObject({ second: 23, symbols: "0", field: "minutes 4", ok: false });
    expect(r.rows[29]).toMatchObject({ field: "hours 1", ok: true });
    expect(r.rows[5]).toMatchObject({ field: "civil warning / weather", ok: null });
  });
});
