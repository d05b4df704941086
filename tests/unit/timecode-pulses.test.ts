import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { formatPulseCsv, parsePulseCsv } from "@/lib/timecode/pulse-csv";
import { addNoise, synthPulseLog } from "@/lib/timecode/pulse-synth";
import { decodePulseLog, type PulseFrame } from "@/lib/timecode/pulses";
import { STANDARDS, type Standard } from "@/lib/timecode/types";
import { cleanFixture, FIXTURE_FROM_UTC, noisyFixture } from "../fixtures/timecode/generate";

const fixture = (name: string) => readFileSync(new URL(`../fixtures/timecode/${name}.csv`, import.meta.url), "utf8");
const kinds = (f: PulseFrame) => f.issues.map((i) => i.kind);
const FROM = Date.UTC(2026, 6, 14, 11, 30);
const log = (standard: Standard, minutes = 3) => synthPulseLog({ standard, firstMinuteUtcMs: FROM, minutes, leadInSeconds: 5, startMs: 10_000 });

describe("pulse-log fixtures", () => {
  it.each(STANDARDS)("%s fixtures on disk match the generator", (s) => {
    expect(fixture(`${s}-clean`)).toBe(formatPulseCsv(cleanFixture(s)));
    expect(fixture(`${s}-noisy`)).toBe(formatPulseCsv(noisyFixture(s)));
  });

  it.each(STANDARDS)("%s clean fixture decodes four minutes across the summer-time change", (s) => {
    const r = decodePulseLog(s, parsePulseCsv(fixture(`${s}-clean`)).pulses);
    const whole = r.frames.filter((f) => f.complete);
    expect(whole).toHaveLength(4);
    expect(whole.every((f) => f.ok && f.issues.length === 0)).toBe(true);
    // DCF77 and MSF frames sent in minute m name m + 1; WWVB names m.
    const first = s === "wwvb" ? FIXTURE_FROM_UTC : FIXTURE_FROM_UTC + 60_000;
    expect(whole.map((f) => f.decode?.instant.utc)).toEqual([0, 1, 2, 3].map((k) => new Date(first + k * 60_000).toISOString().replace(".000", "")));
    expect(r.frames[0]).toMatchObject({ complete: false, issues: [expect.objectContaining({ kind: "partial" })] });
  });

  it("reports each planted fault of the DCF77 noisy fixture in its frame and second", () => {
    const r = decodePulseLog("dcf77", parsePulseCsv(fixture("dcf77-noisy")).pulses);
    // Pulse 40 is the 29th of the first whole minute (12 lead-in pulses first); 130 is second 1 of the third.
    expect(r.frames[1]!.issues).toEqual([expect.objectContaining({ kind: "missing", second: 29 })]);
    expect(r.frames[2]!.ok).toBe(true);
    expect(r.frames[3]!.issues).toEqual([expect.objectContaining({ kind: "width", second: 1 })]);
    expect(r.frames[4]!.issues).toEqual([expect.objectContaining({ kind: "extra", second: 0 })]);
    expect(r.summary.issues.timing).toBe(0);
  });
});

describe("decodePulseLog", () => {
  it.each(STANDARDS)("%s: a clean log gives one good frame per minute with the log time of each named minute", (s) => {
    const r = decodePulseLog(s, log(s));
    const good = r.frames.filter((f) => f.ok);
    expect(good).toHaveLength(3);
    expect(good[0]!.startMs).toBe(10_000);
    // The named minute begins at the next minute mark (DCF77, MSF) or at this frame's marker (WWVB).
    expect(good[0]!.instantAtMs).toBe(s === "wwvb" ? 10_000 : 70_000);
  });

  it.each(STANDARDS)("%s: jitter inside the tolerances costs nothing", (s) => {
    const r = decodePulseLog(s, addNoise(log(s), { seed: 3, startJitterMs: 20, widthJitterMs: 30 }));
    expect(r.frames.filter((f) => f.ok)).toHaveLength(3);
  });

  it.each(STANDARDS)("%s: a dropped pulse is missing in its second and the other minutes still decode", (s) => {
    // Second 10 of the second whole minute (frame 2; frame 0 is the partial lead-in).
    const clean = log(s);
    const second1 = clean.findIndex((p) => p.startMs === 70_000 + 10_000);
    const r = decodePulseLog(s, addNoise(clean, { seed: 1, drop: [second1] }));
    expect(r.frames[2]!.issues).toEqual([expect.objectContaining({ kind: "missing", second: 10 })]);
    expect(r.frames[2]!.decode).toBeNull();
    expect(r.frames.filter((f) => f.ok)).toHaveLength(2);
  });

  it("does not take the gap of a dropped DCF77 pulse for a minute mark", () => {
    const clean = log("dcf77", 1);
    const i = clean.findIndex((p) => p.startMs === 10_000 + 30_000);
    const r = decodePulseLog("dcf77", addNoise(clean, { seed: 1, drop: [i] }));
    expect(r.frames.map((f) => f.startMs)).toEqual([-50_000, 10_000]);
  });

  it("reports a width between symbols and a spurious pulse", () => {
    const clean = log("dcf77");
    const i = clean.findIndex((p) => p.startMs === 10_000 + 25_000);
    const r = decodePulseLog("dcf77", addNoise(clean, { seed: 1, widths: { [i]: 150 }, extra: [{ startMs: 70_000 + 33_400, widthMs: 20 }] }));
    expect(kinds(r.frames[1]!)).toEqual(["width"]);
    expect(r.frames[1]!.issues[0]!.message).toMatch(/150 ms/);
    expect(r.frames[2]!.issues).toEqual([expect.objectContaining({ kind: "extra", second: 33 })]);
  });

  it("reports a parity failure when a clean-looking pulse carries the wrong bit", () => {
    const clean = log("dcf77");
    // Second 22 carries minutes weight 2; the other width breaks P1.
    const i = clean.findIndex((p) => p.startMs === 10_000 + 22_000);
    const r = decodePulseLog("dcf77", addNoise(clean, { seed: 1, widths: { [i]: clean[i]!.widthMs === 100 ? 200 : 100 } }));
    expect(kinds(r.frames[1]!)).toContain("parity");
    expect(r.frames[1]!.ok).toBe(false);
  });

  it("reports a pulse that starts well off its second", () => {
    const clean = log("wwvb");
    const i = clean.findIndex((p) => p.startMs === 10_000 + 15_000);
    const moved = clean.map((p, k) => (k === i ? { ...p, startMs: p.startMs + 120 } : p));
    const r = decodePulseLog("wwvb", moved);
    expect(r.frames[1]!.issues).toEqual([expect.objectContaining({ kind: "timing", second: 15 })]);
    expect(r.frames[1]!.ok).toBe(true);
  });

  it("flags a WWVB frame whose time disagrees with its neighbours, as WWVB has no parity", () => {
    const clean = log("wwvb");
    // Second 8 (minutes 1) of the second whole minute sent as 500 ms instead of 200 ms, or back.
    const i = clean.findIndex((p) => p.startMs === 70_000 + 8_000);
    const r = decodePulseLog("wwvb", addNoise(clean, { seed: 1, widths: { [i]: clean[i]!.widthMs === 200 ? 500 : 200 } }));
    expect(r.frames[2]!.issues).toEqual([expect.objectContaining({ kind: "sequence" })]);
    expect(r.frames[1]!.ok && r.frames[3]!.ok).toBe(true);
  });

  it("decodes an MSF second with two pulses as A0 B1", () => {
    const r = decodePulseLog("msf", synthPulseLog({ standard: "msf", firstMinuteUtcMs: FROM, minutes: 1, encode: { dut1: 0.3 } }));
    expect(r.frames[0]!.ok).toBe(true);
    expect(r.frames[0]!.symbols.slice(1, 4)).toBe("000");
    expect(r.frames[0]!.symbolsB!.slice(1, 4)).toBe("111");
    expect(r.frames[0]!.decode!.flags.dut1Seconds).toBe(0.3);
  });

  it("decodes a DCF77 leap-second minute of 61 seconds and keeps the following minutes", () => {
    const base = synthPulseLog({ standard: "dcf77", firstMinuteUtcMs: Date.UTC(2016, 11, 31, 23, 58), minutes: 3, encode: { leapSecondWarning: true } });
    // The minute sent from 23:59:00 UTC gets a 0 pulse in second 59; later pulses move one second.
    const leapMinute = 60_000;
    const withLeap = [...base.map((p) => (p.startMs >= leapMinute + 60_000 ? { ...p, startMs: p.startMs + 1000 } : p)), { startMs: leapMinute + 59_000, widthMs: 100 }].sort((a, b) => a.startMs - b.startMs);
    const r = decodePulseLog("dcf77", withLeap);
    expect(r.frames[1]).toMatchObject({ seconds: 61, ok: true });
    expect(r.frames[2]!.startMs).toBe(121_000);
    expect(r.frames.every((f) => f.ok)).toBe(true);
  });

  it("finds no frame in a log without a minute mark", () => {
    const r = decodePulseLog("msf", Array.from({ length: 20 }, (_, k) => ({ startMs: k * 1000, widthMs: 100 })));
    expect(r.frames).toEqual([]);
  });
});

describe("parsePulseCsv", () => {
  it("skips the header, blank lines and comments and names a bad line", () => {
    const r = parsePulseCsv("start_ms,width_ms\n# receiver 1\n\n0,100\n1000;200\n2000,abc\n");
    expect(r.pulses).toEqual([
      { startMs: 0, widthMs: 100 },
      { startMs: 1000, widthMs: 200 },
    ]);
    expect(r.issues).toEqual([{ line: 6, message: 'line 6: "2000,abc" is not two numbers' }]);
  });
});
