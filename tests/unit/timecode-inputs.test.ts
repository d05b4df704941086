import { describe, expect, it } from "vitest";
import { decodeInputSchema, distanceInputSchema, encodeInputSchema, MAX_PULSES, pulseLogInputSchema } from "@/lib/timecode/inputs";
import { encodeWwvb } from "@/lib/timecode/wwvb";

const issues = (r: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) => (r.error?.issues ?? []).map((i) => ({ path: i.path.join("/"), message: i.message }));
const DCF = "00000000000000000010100000000011010110000001001001000110011";
const WWVB = encodeWwvb(Date.parse("2024-02-29T23:59:00Z")).bits!;

describe("decodeInputSchema", () => {
  it("names the position and the symbols to use for an illegal bit", () => {
    const bad = DCF.slice(0, 23) + "x" + DCF.slice(24);
    expect(issues(decodeInputSchema.safeParse({ standard: "dcf77", bits: bad }))).toEqual([{ path: "bits", message: "position 23 is 'x'; use 0 or 1" }]);
    expect(issues(decodeInputSchema.safeParse({ standard: "wwvb", bits: WWVB.replace("M", "2") }))).toEqual([{ path: "bits", message: "position 0 is '2'; use 0, 1 or M" }]);
  });

  it("gives the right length for each standard", () => {
    expect(issues(decodeInputSchema.safeParse({ standard: "dcf77", bits: DCF.slice(1) }))[0]!.message).toBe("has 58 bits; a DCF77 frame has 59 (60 in a leap-second minute), bit 0 first");
    expect(issues(decodeInputSchema.safeParse({ standard: "wwvb", bits: WWVB + "0" }))[0]!.message).toMatch(/^has 61 bits; a WWVB frame has 60/);
    expect(issues(decodeInputSchema.safeParse({ standard: "msf", bitsA: "1".repeat(60), bitsB: "0".repeat(59) }))).toEqual([{ path: "bitsB", message: "has 59 bits; each MSF string has 60, second 0 first" }]);
  });

  it("requires WWVB markers at their seconds and nowhere else", () => {
    expect(issues(decodeInputSchema.safeParse({ standard: "wwvb", bits: "0" + WWVB.slice(1) }))[0]!.message).toBe("position 0 is '0'; a marker M belongs at 0, 9, 19, 29, 39, 49 and 59");
    expect(issues(decodeInputSchema.safeParse({ standard: "wwvb", bits: WWVB.slice(0, 4) + "M" + WWVB.slice(5) }))[0]!.message).toBe("position 4 is 'M'; markers belong only at 0, 9, 19, 29, 39, 49 and 59");
    expect(issues(decodeInputSchema.safeParse({ standard: "dcf77", bits: "M" + DCF.slice(1) }))[0]!.message).toBe("position 0 is 'M'; use 0 or 1");
  });

  it("requires A and B for MSF and bits for the others, and ignores spaces", () => {
    expect(issues(decodeInputSchema.safeParse({ standard: "msf" }))).toEqual([
      { path: "bitsA", message: "is required for msf" },
      { path: "bitsB", message: "is required for msf" },
    ]);
    expect(issues(decodeInputSchema.safeParse({ standard: "dcf77", bits: "" }))).toEqual([{ path: "bits", message: "is required for dcf77" }]);
    expect(decodeInputSchema.safeParse({ standard: "dcf77", bits: DCF.replace(/(.{10})/g, "$1 ") }).data?.bits).toBe(DCF);
  });

  it("refuses an unknown standard", () => {
    expect(issues(decodeInputSchema.safeParse({ standard: "jjy", bits: DCF }))).toEqual([{ path: "standard", message: "must be dcf77, msf or wwvb" }]);
  });
});

describe("encodeInputSchema", () => {
  it("reads ISO-8601 with an offset, with or without seconds", () => {
    expect(encodeInputSchema.parse({ standard: "dcf77", time: "2026-03-29T03:00+02:00" }).time).toBe(Date.parse("2026-03-29T01:00:00Z"));
    expect(encodeInputSchema.parse({ standard: "dcf77", time: "2026-03-29T01:00:00.000Z" }).time).toBe(Date.parse("2026-03-29T01:00:00Z"));
  });

  it("refuses a time without an offset, an impossible date and one outside 2000–2099", () => {
    const msg = (time: string) => issues(encodeInputSchema.safeParse({ standard: "msf", time }))[0];
    expect(msg("2026-03-29T01:00:00")).toEqual({ path: "time", message: "must be ISO-8601 with an offset, e.g. 2026-03-29T01:00:00Z or 2026-03-29T03:00+02:00" });
    expect(msg("2026-13-40T01:00:00Z")?.message).toBe("is not a real date and time");
    expect(msg("1999-12-31T23:59:00Z")?.message).toMatch(/^must be between 2000-01-01T00:00Z and 2099-12-31T21:59Z/);
    expect(issues(encodeInputSchema.safeParse({ standard: "msf" }))[0]).toEqual({ path: "time", message: "is required (ISO-8601, e.g. 2026-03-29T01:00:00Z)" });
  });

  it("checks DUT1 range and step and reads yes/no flags", () => {
    const base = { standard: "wwvb", time: "2026-01-01T00:00:00Z" };
    expect(issues(encodeInputSchema.safeParse({ ...base, dut1: "1.2" }))).toEqual([{ path: "dut1", message: "must be at most 0.9" }]);
    expect(issues(encodeInputSchema.safeParse({ ...base, dut1: "0.25" }))).toEqual([{ path: "dut1", message: "must be in steps of 0.1 s" }]);
    expect(issues(encodeInputSchema.safeParse({ ...base, dut1: "abc" }))).toEqual([{ path: "dut1", message: "must be a number of seconds" }]);
    expect(issues(encodeInputSchema.safeParse({ ...base, leapSecondWarning: "maybe" }))).toEqual([{ path: "leapSecondWarning", message: "must be yes or no" }]);
    expect(encodeInputSchema.parse({ ...base, dut1: "-0.3", leapSecondWarning: "yes", callBit: "no" })).toMatchObject({ dut1: -0.3, leapSecondWarning: true, callBit: false });
  });
});

describe("distanceInputSchema and pulseLogInputSchema", () => {
  it("names a latitude or longitude out of range or missing", () => {
    expect(issues(distanceInputSchema.safeParse({ standard: "msf", lat: "91", lon: "0" }))).toEqual([{ path: "lat", message: "must be between -90 and 90" }]);
    expect(issues(distanceInputSchema.safeParse({ standard: "msf", lat: "52", lon: "" }))).toEqual([{ path: "lon", message: "must be a number in degrees" }]);
  });

  it("names the pulse and field that is wrong and limits the log size", () => {
    expect(issues(pulseLogInputSchema.safeParse({ standard: "dcf77", pulses: [{ startMs: 0, widthMs: 100 }, { startMs: 1000, widthMs: 0 }] }))).toEqual([{ path: "pulses/1/widthMs", message: "must be greater than 0" }]);
    expect(issues(pulseLogInputSchema.safeParse({ standard: "dcf77", pulses: [] }))).toEqual([{ path: "pulses", message: "must hold at least one pulse" }]);
    const many = Array.from({ length: MAX_PULSES + 1 }, (_, k) => ({ startMs: k * 1000, widthMs: 100 }));
    expect(issues(pulseLogInputSchema.safeParse({ standard: "dcf77", pulses: many }))[0]!.message).toMatch(/^must hold at most 5000 pulses/);
  });
});
