import { describe, expect, it } from "vitest";
import { decodeWwvb, encodeWwvb, WWVB_MARKERS } from "@/lib/timecode/wwvb";

const set = (bits: string, i: number, ch: string) => bits.slice(0, i) + ch + bits.slice(i + 1);
const failed = (bits: string) =>
  decodeWwvb(bits)
    .checks.filter((c) => !c.ok)
    .map((c) => c.id);

// Thursday 29 February 2024 (day 60), 23:59 UTC, DUT1 −0.2 s, built by hand from NIST Special
// Publication 432 and NIST's "WWVB Time Code Format" (markers every ten seconds, weights as listed
// there). No official NIST bit string was at hand, so each group is written out here.
const HAND = [
  "M", // 0: frame reference marker
  "101", // 1–3: minutes 40 20 10 → 50
  "0", // 4
  "1001", // 5–8: minutes 8 4 2 1 → 9
  "M", // 9
  "00", // 10–11
  "10", // 12–13: hours 20 10 → 20
  "0", // 14
  "0011", // 15–18: hours 8 4 2 1 → 3
  "M", // 19
  "00", // 20–21
  "00", // 22–23: day of year 200 100
  "0", // 24
  "0110", // 25–28: day of year 80 40 20 10 → 60
  "M", // 29
  "0000", // 30–33: day of year 8 4 2 1
  "00", // 34–35
  "010", // 36–38: DUT1 sign negative
  "M", // 39
  "0010", // 40–43: DUT1 0.8 0.4 0.2 0.1 → 0.2
  "0", // 44
  "0010", // 45–48: year 80 40 20 10 → 20
  "M", // 49
  "0100", // 50–53: year 8 4 2 1 → 4
  "0", // 54
  "1", // 55: leap year
  "0", // 56: no leap second
  "00", // 57–58: standard time (US DST 2024 began 10 March)
  "M", // 59
].join("");

describe("WWVB frames", () => {
  it("encodes the hand-built frame bit for bit and decodes it back", () => {
    expect(HAND).toHaveLength(60);
    expect(encodeWwvb(Date.parse("2024-02-29T23:59:00Z"), { dut1: -0.2 }).bits).toBe(HAND);
    const r = decodeWwvb(HAND);
    expect(r.ok).toBe(true);
    expect(r.instant).toMatchObject({ year: 2024, month: 2, day: 29, hour: 23, minute: 59, zone: "UTC" });
    expect(r.instant.local).toBe("2024-02-29T23:59:00Z");
    expect(r.instant.utc).toBe("2024-02-29T23:59:00Z");
    expect(r.flags).toMatchObject({ leapYear: true, dut1Seconds: -0.2, dst: "standard time", leapSecondAnnounced: false });
  });

  it("names the current minute: it is sent during the minute it names", () => {
    const f = encodeWwvb(Date.parse("2024-02-29T23:59:30Z"));
    expect(f.utc).toBe("2024-02-29T23:59:00Z");
    expect(f.sentFrom).toBe(f.utc);
    expect(decodeWwvb(f.bits!).names).toBe("current minute");
  });

  it("checks every marker position and refuses a marker elsewhere", () => {
    for (const m of WWVB_MARKERS) expect(failed(set(HAND, m, "0")), `marker ${m}`).toContain("markers");
    expect(failed(set(HAND, 4, "M"))).toContain("markers");
  });

  it("reports a 1 in an unused second", () => {
    for (const i of [4, 10, 11, 14, 20, 21, 24, 34, 35, 44, 54]) expect(failed(set(HAND, i, "1")), `second ${i}`).toEqual(["unused-zero"]);
  });

  it("refuses a DUT1 sign other than 101 or 010", () => {
    expect(failed(set(HAND, 36, "1"))).toEqual(["dut1-sign"]);
  });

  it("reports a day of year beyond the year and a leap-year bit that disagrees with the year", () => {
    // Day 366 with the leap-year bit cleared.
    const d366 = HAND.slice(0, 22) + "110" + "0110" + "M" + "0110" + HAND.slice(34);
    expect(decodeWwvb(d366).instant.month).toBe(12);
    expect(failed(set(d366, 55, "0"))).toEqual(expect.arrayContaining(["leap-year", "doy-valid"]));
    // Minute units 0b1010 = 10: a BCD digit above 9.
    expect(failed(HAND.slice(0, 5) + "1010" + HAND.slice(9))).toContain("minute-bcd");
  });

  it("sets the DST bits 57 and 58 through the US change days", () => {
    // 2024: DST from Sunday 10 March to Sunday 3 November (Energy Policy Act of 2005 §110).
    const dst = (iso: string) => decodeWwvb(encodeWwvb(Date.parse(iso)).bits!).flags.dst;
    expect(dst("2024-03-09T12:00:00Z")).toBe("standard time");
    expect(dst("2024-03-10T00:00:00Z")).toBe("DST begins today");
    expect(dst("2024-03-10T23:59:00Z")).toBe("DST begins today");
    expect(dst("2024-03-11T00:00:00Z")).toBe("DST in effect");
    expect(dst("2024-11-02T23:59:00Z")).toBe("DST in effect");
    expect(dst("2024-11-03T00:00:00Z")).toBe("DST ends today");
    expect(dst("2024-11-04T00:00:00Z")).toBe("standard time");
  });

  it("agrees with the time-zone database on DST at 00:00 and 24:00 UTC of each day", () => {
    // Reference: the IANA time-zone database as bundled with Node's ICU (America/Denver).
    const isMdt = (ms: number) => new Intl.DateTimeFormat("en-US", { timeZone: "America/Denver", timeZoneName: "shortOffset" }).format(new Date(ms)).endsWith("GMT-6");
    for (let day = Date.UTC(2023, 0, 1); day < Date.UTC(2025, 0, 1); day += 86_400_000) {
      const bits = encodeWwvb(day + 12 * 3_600_000).bits!;
      expect(bits[57] === "1", new Date(day).toISOString()).toBe(isMdt(day + 86_400_000 - 1000));
      expect(bits[58] === "1", new Date(day).toISOString()).toBe(isMdt(day));
    }
  });

  it("decodes the zero DUT1 with the positive sign and the leap-second warning when set", () => {
    const r = decodeWwvb(encodeWwvb(Date.parse("2016-12-15T10:00:00Z"), { leapSecondWarning: true }).bits!);
    expect(r.flags).toMatchObject({ dut1Seconds: 0, leapSecondAnnounced: true, leapYear: true });
    expect(r.ok).toBe(true);
  });
});
