// Generated inputs against the calculations behind the tool routes and the calibration upload,
// through the same zod schemas the routes parse with: an input either parses and computes without
// throwing, with finite numbers only, or is refused with a message for each problem.
import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { z } from "zod";
import { GET as debounceGet } from "@/app/api/v1/tools/debounce/route";
import { GET as stallGet } from "@/app/api/v1/tools/stall/route";
import { GET as sunGet } from "@/app/api/v1/tools/sun/route";
import { POST as pulsesPost } from "@/app/api/v1/tools/timecode/pulses/route";
import { GET as timecodeGet } from "@/app/api/v1/tools/timecode/route";
import { GET as travelGet } from "@/app/api/v1/tools/travel/route";
import { analyseRun } from "@/lib/calibration/analyse";
import { parseCalibrationCsv } from "@/lib/calibration/csv";
import { calibrationContext, suggestParameters } from "@/lib/calibration/suggest";
import { computeDebounce } from "@/lib/drive/debounce";
import { debounceInputSchema, stallInputSchema, travelInputSchema } from "@/lib/drive/inputs";
import { computeStall } from "@/lib/drive/stall";
import { computeTravel } from "@/lib/drive/travel";
import { uploadSchema } from "@/lib/releases/calibration";
import { sunDay } from "@/lib/sun/events";
import { sunQuerySchema } from "@/lib/sun/inputs";
import { sunYear } from "@/lib/sun/year";
import { decodeFrame, encodeFrame } from "@/lib/timecode/frames";
import { decodeInputSchema, distanceInputSchema, encodeInputSchema, pulseLogInputSchema, timecodeActionSchema } from "@/lib/timecode/inputs";
import { synthPulseLog } from "@/lib/timecode/pulse-synth";
import { decodePulseLog } from "@/lib/timecode/pulses";
import { transmitterDistance } from "@/lib/timecode/transmitters";
import { STANDARDS } from "@/lib/timecode/types";

const SEED = 20_260_302;
const fcParams = (numRuns: number) => ({ seed: SEED, numRuns });

// ---------------------------------------------------------------------------------------------
// Checks shared by every tool.

/** Every number anywhere in a result, with where it sits. */
function numbersIn(value: unknown, path = "", out: [string, number][] = []): [string, number][] {
  if (typeof value === "number") out.push([path || "/", value]);
  else if (Array.isArray(value)) value.forEach((v, i) => numbersIn(v, `${path}/${i}`, out));
  else if (value && typeof value === "object") for (const [k, v] of Object.entries(value)) numbersIn(v, `${path}/${k}`, out);
  return out;
}

function expectFinite(result: unknown, input: unknown) {
  const bad = numbersIn(result).filter(([, n]) => !Number.isFinite(n));
  expect(bad, `non-finite numbers for ${JSON.stringify(input)}`).toEqual([]);
}

function expectRefusal(error: z.ZodError) {
  expect(error.issues.length).toBeGreaterThan(0);
  for (const issue of error.issues) {
    expect(typeof issue.message).toBe("string");
    expect(issue.message.trim().length).toBeGreaterThan(0);
  }
}

/** Parses like the route does, then computes; returns whether the input was accepted. */
function parseThenCompute<S extends z.ZodType>(schema: S, input: unknown, compute: (value: z.infer<S>) => unknown): boolean {
  const parsed = schema.safeParse(input);
  if (!parsed.success) {
    expectRefusal(parsed.error);
    return false;
  }
  expectFinite(compute(parsed.data), input);
  return true;
}

/** The route answers 200, or 400 with an error code and a message, never 5xx. */
async function expectRouteAnswer(res: Response, accepted: boolean) {
  const body = (await res.json()) as Record<string, unknown>;
  expect(res.status, JSON.stringify(body)).toBe(accepted ? 200 : 400);
  if (!accepted) {
    expect(body.error).toBe("invalid_request");
    expect(typeof body.message === "string" && body.message.length > 0).toBe(true);
  }
}

const query = (path: string, fields: Record<string, string>) => new Request(`http://127.0.0.1:3100${path}?${new URLSearchParams(fields).toString()}`);

// ---------------------------------------------------------------------------------------------
// Text the way a query string or a form field delivers it.

const loneSurrogate = fc.integer({ min: 0xd800, max: 0xdfff }).map((c) => String.fromCharCode(c));
const EDGE_TEXT = ["", " ", "0", "-0", "+0", "-1", "1e308", "-1e308", "1e400", "1e-308", "5e-324", "NaN", "Infinity", "-Infinity", "0x10", "0b1", "1_000", " 5 ", "5 ", "\t7", "١٢٣", "１２", "1".repeat(400), `0.${"0".repeat(300)}1`, "1e3", ".5", "5.", "+5", "--5", "5e+2", "1,5", "null", "true", "[]", "{}", "\u0000", "\u202e5", "9007199254740993"];
const ENG_TEXT = ["4k7", "10k", "100n", "2.2µF", "2.2μ", "1M", "1G", "1m", "470p", "1R5", "10 kΩ", "3.3V", "1e3k", "1kk", "k", "4k7k", "0k", "1e308G", "1e-300p"];

const positiveText = fc.oneof(
  fc.double({ min: 1e-3, max: 1e5, noNaN: true }).map((n) => String(n)),
  fc.integer({ min: 1, max: 100_000 }).map(String),
  fc.double({ min: 1e-3, max: 1e3, noNaN: true }).map((n) => n.toFixed(2)),
);
const numericText = (realistic: fc.Arbitrary<string> = positiveText) =>
  fc.oneof(
    { arbitrary: realistic, weight: 6 },
    { arbitrary: fc.constantFrom(...EDGE_TEXT), weight: 3 },
    { arbitrary: fc.double().map(String), weight: 1 },
    { arbitrary: fc.string({ maxLength: 12 }), weight: 1 },
    { arbitrary: fc.string({ unit: loneSurrogate, maxLength: 3 }), weight: 1 },
  );

const own = (o: Record<string, string>, key: string, value: string) => Object.defineProperty(o, key, { value, enumerable: true, writable: true, configurable: true });

type FieldOp = { kind: "drop" | "set" | "add"; at: number; key: string; value: string };
const fieldOp: fc.Arbitrary<FieldOp> = fc.record({
  kind: fc.constantFrom("drop", "set", "set", "add"),
  at: fc.nat(),
  key: fc.oneof(fc.constantFrom("__proto__", "constructor", "x", ""), fc.string({ maxLength: 6 })),
  value: numericText(),
});

/**
 * A query-like object: the realistic value of every field (optional ones present half the time), then
 * up to three changes: a field dropped, a field set to odd text, or an unknown field added.
 */
function fields(model: Record<string, fc.Arbitrary<string>>, optional: readonly string[] = []): fc.Arbitrary<Record<string, string>> {
  const keys = Object.keys(model);
  return fc
    .tuple(
      fc.tuple(...keys.map((k) => fc.tuple(fc.boolean(), model[k]!))),
      fc.oneof({ arbitrary: fc.constant([] as FieldOp[]), weight: 2 }, { arbitrary: fc.array(fieldOp, { minLength: 1, maxLength: 3 }), weight: 3 }),
    )
    .map(([values, ops]) => {
      const out: Record<string, string> = {};
      values.forEach(([include, v], i) => {
        if (include || !optional.includes(keys[i]!)) own(out, keys[i]!, v);
      });
      for (const op of ops) {
        const present = Object.keys(out);
        if (op.kind === "add") own(out, op.key, op.value);
        else if (present.length && op.kind === "drop") delete out[present[op.at % present.length]!];
        else if (present.length) own(out, present[op.at % present.length]!, op.value);
      }
      return out;
    });
}

// ---------------------------------------------------------------------------------------------

describe("drive tools", () => {
  const travel = fields({
    travelMm: fc.integer({ min: 50, max: 3000 }).map(String),
    spoolMm: fc.integer({ min: 5, max: 200 }).map(String),
    cordMm: fc.constantFrom("0", "0.8", "1.5", "2", "3"),
    turnsPerLayer: fc.integer({ min: 1, max: 60 }).map(String),
    spoolWidthMm: fc.integer({ min: 1, max: 100 }).map(String),
    gearRatio: fc.integer({ min: 1, max: 500 }).map(String),
    ppr: fc.integer({ min: 1, max: 2048 }).map(String),
    decoding: fc.constantFrom("1", "2", "4", "3"),
    motorRpm: fc.integer({ min: 100, max: 30_000 }).map(String),
    timeoutS: fc.integer({ min: 1, max: 120 }).map(String),
    measuredCps: fc.integer({ min: 10, max: 50_000 }).map(String),
    counts: fc.integer({ min: 0, max: 200_000 }).map(String),
  }, ["cordMm", "turnsPerLayer", "spoolWidthMm", "decoding", "motorRpm", "timeoutS", "measuredCps", "counts"]);

  it("travel: computes finite counts and times for every accepted input, refuses the rest with messages", () => {
    let accepted = 0;
    fc.assert(
      fc.property(travel, (input) => {
        if (parseThenCompute(travelInputSchema, input, computeTravel)) accepted++;
      }),
      fcParams(600),
    );
    expect(accepted).toBeGreaterThan(20);
  });

  const stall = fields({
    nominalCps: fc.integer({ min: 10, max: 50_000 }).map(String),
    fraction: fc.constantFrom("0.3", "0.5", "0.85", "0.99", "1", "0.01"),
    windowMs: fc.integer({ min: 1, max: 2000 }).map(String),
    countsPerMm: fc.double({ min: 0.1, max: 100, noNaN: true }).map(String),
    rampMs: fc.integer({ min: 0, max: 2000 }).map(String),
    latencyMs: fc.integer({ min: 0, max: 500 }).map(String),
  }, ["countsPerMm", "rampMs", "latencyMs"]);

  it("stall: computes finite thresholds and reaction distances for every accepted input, refuses the rest with messages", () => {
    let accepted = 0;
    fc.assert(
      fc.property(stall, (input) => {
        if (parseThenCompute(stallInputSchema, input, computeStall)) accepted++;
      }),
      fcParams(600),
    );
    expect(accepted).toBeGreaterThan(20);
  });

  const eng = (realistic: fc.Arbitrary<string>) => fc.oneof({ arbitrary: realistic, weight: 3 }, { arbitrary: fc.constantFrom(...ENG_TEXT), weight: 1 });
  const debounce = fields({
    r1Ohm: eng(fc.constantFrom("10k", "4k7", "1k", "100", "1M")),
    r2Ohm: eng(fc.constantFrom("100k", "47k", "1k", "220")),
    cFarad: eng(fc.constantFrom("100n", "1u", "10n", "470p", "2.2µ")),
    vcc: eng(fc.constantFrom("3.3", "5", "12")),
    vtPlus: eng(fc.constantFrom("2", "2.5", "1.9", "3")),
    vtMinus: eng(fc.constantFrom("0.8", "1", "1.5", "2.5")),
    targetMs: fc.integer({ min: 1, max: 500 }).map(String),
    samplePeriodMs: fc.integer({ min: 1, max: 50 }).map(String),
    stableSamples: fc.integer({ min: 1, max: 20 }).map(String),
  }, ["targetMs", "samplePeriodMs", "stableSamples"]);

  it("debounce: computes finite delays and component values for every accepted input, refuses the rest with messages", () => {
    let accepted = 0;
    fc.assert(
      fc.property(debounce, (input) => {
        if (parseThenCompute(debounceInputSchema, input, computeDebounce)) accepted++;
      }),
      fcParams(600),
    );
    expect(accepted).toBeGreaterThan(20);
  });

  it("the travel, stall and debounce routes answer 200 or 400 with a message, never 5xx", async () => {
    await fc.assert(
      fc.asyncProperty(fc.oneof(travel.map((q) => ["travel", q] as const), stall.map((q) => ["stall", q] as const), debounce.map((q) => ["debounce", q] as const)), async ([tool, input]) => {
        const [route, schema] = tool === "travel" ? [travelGet, travelInputSchema] : tool === "stall" ? [stallGet, stallInputSchema] : [debounceGet, debounceInputSchema];
        await expectRouteAnswer(await route(query(`/api/v1/tools/${tool}`, input), undefined), (schema as z.ZodType).safeParse(input).success);
      }),
      fcParams(300),
    );
  });
});

// ---------------------------------------------------------------------------------------------

const ZONES = ["Europe/Berlin", "Europe/London", "Europe/Oslo", "America/Denver", "Australia/Melbourne", "Pacific/Kiritimati", "Pacific/Chatham", "Asia/Kathmandu", "UTC", "Etc/GMT+12", "america/denver", " Europe/Berlin ", "Mars/Olympus", "EST5EDT", "Europe/Kyiv", "Europe/Kiev"];
const lat = fc.double({ min: -90, max: 90, noNaN: true }).map(String);
const lon = fc.double({ min: -180, max: 180, noNaN: true }).map(String);

describe("sun tool", () => {
  const date = fc.oneof(
    fc.date({ min: new Date("1899-12-25T00:00:00Z"), max: new Date("2101-01-05T00:00:00Z"), noInvalidDate: true }).map((d) => d.toISOString().slice(0, 10)),
    fc.constantFrom("2026-02-29", "2024-02-29", "2026-06-21", "2026-12-21", "2026-13-01", "2026-00-10", "2026-1-1", "26-01-01", "2026-03-29T00:00", "", "today"),
  );
  const day = fields({ lat, lon, date, tz: fc.oneof(fc.constantFrom(...ZONES), fc.string({ maxLength: 20 })) });
  const year = fields({ lat, lon, year: fc.integer({ min: 1890, max: 2110 }).map(String), tz: fc.constantFrom(...ZONES) });

  it("one day: every accepted site and date gives finite results; the rest is refused with messages", () => {
    fc.assert(
      fc.property(day, (input) => {
        parseThenCompute(sunQuerySchema, input, (q) => (q.kind === "day" ? sunDay(q) : sunYear(q)));
      }),
      fcParams(400),
    );
  });

  it("whole years, including polar sites, give finite results", () => {
    const polar = fc.record({ lat: fc.constantFrom("89.9", "-89.9", "78.22", "69.65", "-77.85", "66.56", "0"), lon: lon, year: fc.integer({ min: 1900, max: 2100 }).map(String), tz: fc.constantFrom(...ZONES) });
    fc.assert(
      fc.property(fc.oneof(year, polar), (input) => {
        parseThenCompute(sunQuerySchema, input, (q) => (q.kind === "day" ? sunDay(q) : sunYear(q)));
      }),
      fcParams(25),
    );
  }, 60_000);

  it("the sun route answers 200 or 400 with a message, never 5xx", async () => {
    await fc.assert(
      fc.asyncProperty(day, async (input) => {
        await expectRouteAnswer(await sunGet(query("/api/v1/tools/sun", input), undefined), sunQuerySchema.safeParse(input).success);
      }),
      fcParams(150),
    );
  });
});

// ---------------------------------------------------------------------------------------------

describe("time-code tools", () => {
  const standard = fc.oneof({ arbitrary: fc.constantFrom(...STANDARDS), weight: 5 }, { arbitrary: fc.constantFrom("DCF77", "jjy", "", "msf "), weight: 1 });
  const instant = fc.oneof(
    fc.date({ min: new Date("1999-12-31T00:00:00Z"), max: new Date("2100-01-01T00:00:00Z"), noInvalidDate: true }).map((d) => d.toISOString()),
    fc.date({ min: new Date("2000-01-01T00:00:00Z"), max: new Date("2099-12-31T00:00:00Z"), noInvalidDate: true }).map((d) => d.toISOString().slice(0, 16) + "+02:00"),
    fc.constantFrom("2026-03-29T01:00:00Z", "2026-10-25T00:59:00Z", "2016-12-31T23:59:60Z", "2026-02-30T10:00Z", "2026-03-29T25:00Z", "2026-03-29T01:00", "2099-12-31T21:59Z", "2099-12-31T22:00Z", "", "now"),
  );
  const flag = fc.constantFrom("true", "false", "yes", "no", "1", "0", "maybe", "");
  const dut1 = fc.constantFrom("0", "0.1", "-0.9", "0.9", "0.3", "-0.4", "0.15", "1");

  const bitsFor = (std: string, ms: number) => {
    try {
      const f = encodeFrame(std as (typeof STANDARDS)[number], ms);
      return { bits: f.bits ?? "", bitsA: f.bitsA ?? "", bitsB: f.bitsB ?? "" };
    } catch {
      return { bits: "", bitsA: "", bitsB: "" };
    }
  };
  const flip = (s: string, at: number, ch: string) => (s.length ? s.slice(0, at % s.length) + ch + s.slice((at % s.length) + 1) : s);
  const decodeQuery = fc
    .tuple(fc.constantFrom(...STANDARDS), fc.integer({ min: Date.UTC(2000, 0, 1), max: Date.UTC(2099, 11, 1) }), fc.array(fc.tuple(fc.nat(), fc.constantFrom("0", "1", "M", "2", " ", "")), { maxLength: 3 }), fc.constantFrom("none", "truncate", "extend", "spaces"))
    .map(([std, ms, flips, change]) => {
      const b = bitsFor(std, Math.floor(ms / 60_000) * 60_000);
      const apply = (s: string) => {
        let out = flips.reduce((acc, [at, ch]) => flip(acc, at, ch), s);
        if (change === "truncate") out = out.slice(0, out.length - 1);
        if (change === "extend") out += "0";
        if (change === "spaces") out = out.replace(/(.{8})/g, "$1 ");
        return out;
      };
      return std === "msf" ? { action: "decode", standard: std, bitsA: apply(b.bitsA), bitsB: apply(b.bitsB) } : { action: "decode", standard: std, bits: apply(b.bits) };
    });
  const encodeQuery = fields({ action: fc.constant("encode"), standard, time: instant, dut1, leapSecondWarning: flag, callBit: flag }, ["dut1", "leapSecondWarning", "callBit"]);
  const distanceQuery = fields({ action: fc.constant("distance"), standard, lat, lon });
  const anyQuery = fc.oneof(encodeQuery, decodeQuery, distanceQuery, fields({ action: fc.constantFrom("encode", "decode", "distance", "Encode", ""), standard, bits: fc.string({ maxLength: 70 }), bitsA: fc.string({ maxLength: 70 }), bitsB: fc.string({ maxLength: 70 }) }, ["bits", "bitsA", "bitsB"]));

  /** The route's own dispatch: the action first, then that action's schema. */
  function timecode(input: Record<string, string>): boolean {
    const action = timecodeActionSchema.safeParse(input);
    if (!action.success) {
      expectRefusal(action.error);
      return false;
    }
    if (action.data.action === "encode") return parseThenCompute(encodeInputSchema, input, (v) => encodeFrame(v.standard, v.time, v));
    if (action.data.action === "decode") return parseThenCompute(decodeInputSchema, input, decodeFrame);
    return parseThenCompute(distanceInputSchema, input, (v) => transmitterDistance(v.standard, v));
  }

  it("encode, decode and distance: accepted queries compute finite results, the rest is refused with messages", () => {
    let accepted = 0;
    fc.assert(
      fc.property(anyQuery, (input) => {
        if (timecode(input as Record<string, string>)) accepted++;
      }),
      fcParams(600),
    );
    expect(accepted).toBeGreaterThan(50);
  });

  it("the time-code route answers 200 or 400 with a message, never 5xx", async () => {
    await fc.assert(
      fc.asyncProperty(anyQuery, async (input) => {
        const fieldsIn = input as Record<string, string>;
        const action = timecodeActionSchema.safeParse(fieldsIn);
        const schema = !action.success ? null : action.data.action === "encode" ? encodeInputSchema : action.data.action === "decode" ? decodeInputSchema : distanceInputSchema;
        await expectRouteAnswer(await timecodeGet(query("/api/v1/tools/timecode", fieldsIn), undefined), !!schema && schema.safeParse(fieldsIn).success);
      }),
      fcParams(200),
    );
  });

  type PulseOp = { kind: "drop" | "dup" | "width" | "start" | "swap"; at: number; value: number };
  const pulseOp: fc.Arbitrary<PulseOp> = fc.record({
    kind: fc.constantFrom("drop", "dup", "width", "start", "swap"),
    at: fc.nat(),
    value: fc.oneof(fc.double({ min: -100, max: 3000, noNaN: true }), fc.constantFrom(0, -0, 1e-9, 2000, 2000.0001, 1e308, 5e-324, Number.MAX_SAFE_INTEGER)),
  });
  const pulseLog = fc
    .tuple(fc.constantFrom(...STANDARDS), fc.integer({ min: Date.UTC(2000, 0, 1), max: Date.UTC(2099, 10, 1) }), fc.integer({ min: 1, max: 3 }), fc.integer({ min: 0, max: 59 }), fc.array(pulseOp, { maxLength: 12 }))
    .map(([standard, ms, minutes, leadInSeconds, ops]) => {
      const pulses = synthPulseLog({ standard, firstMinuteUtcMs: Math.floor(ms / 60_000) * 60_000, minutes, leadInSeconds, startMs: 5000 }).map((p) => ({ ...p }));
      for (const op of ops) {
        if (!pulses.length) break;
        const i = op.at % pulses.length;
        if (op.kind === "drop") pulses.splice(i, 1);
        else if (op.kind === "dup") pulses.splice(i, 0, { ...pulses[i]! });
        else if (op.kind === "width") pulses[i]!.widthMs = op.value;
        else if (op.kind === "start") pulses[i]!.startMs = op.value;
        else if (i + 1 < pulses.length) [pulses[i], pulses[i + 1]] = [pulses[i + 1]!, pulses[i]!];
      }
      return { standard, pulses };
    });
  const oddLog = fc.oneof(
    fc.record({ standard: fc.constantFrom(...STANDARDS), pulses: fc.array(fc.record({ startMs: fc.double({ min: 0, max: 1e7, noNaN: true }), widthMs: fc.double({ min: 1e-6, max: 2000, noNaN: true }) }), { maxLength: 300 }) }),
    fc.jsonValue({ maxDepth: 3 }),
    fc.record({ standard: fc.constantFrom(...STANDARDS), pulses: fc.constantFrom([], [{ startMs: 0, widthMs: 100 }], [{ startMs: 1e308, widthMs: 2000 }], [{ startMs: 0 }], [null], "[]") }),
  );

  // The decoder builds one frame for every minute between the first and the last pulse, so the time a
  // log spans, not its length, decides the work: a log the schema accepts must span at most a day.
  const DAY_MS = 86_400_000;
  const spanMs = (pulses: readonly { startMs: number }[]) => (pulses.length ? Math.max(...pulses.map((p) => p.startMs)) - Math.min(...pulses.map((p) => p.startMs)) : 0);
  const decodeBounded = (v: z.infer<typeof pulseLogInputSchema>) => {
    expect(spanMs(v.pulses), "an accepted pulse log spans more than a day").toBeLessThanOrEqual(DAY_MS);
    return decodePulseLog(v.standard, v.pulses);
  };

  it("pulse logs: every accepted log decodes with finite numbers; the rest is refused with messages", () => {
    fc.assert(
      fc.property(fc.oneof({ arbitrary: pulseLog, weight: 3 }, { arbitrary: oddLog, weight: 1 }), (input) => {
        parseThenCompute(pulseLogInputSchema, input, decodeBounded);
      }),
      fcParams(250),
    );
  }, 60_000);

  it.each([1e9, 1e12, 1e308])("refuses a short pulse log whose last pulse starts at %d ms, which would take the decoder a frame per minute up to there", (far) => {
    const clean = synthPulseLog({ standard: "dcf77", firstMinuteUtcMs: Date.UTC(2026, 6, 14, 11, 30), minutes: 2, leadInSeconds: 5, startMs: 10_000 });
    const parsed = pulseLogInputSchema.safeParse({ standard: "dcf77", pulses: [...clean, { startMs: far, widthMs: 100 }] });
    expect(parsed.success).toBe(false);
  });

  it("the pulse-log route answers 200 or 400 with a message, never 5xx", async () => {
    await fc.assert(
      fc.asyncProperty(fc.oneof(pulseLog, oddLog), async (input) => {
        const parsed = pulseLogInputSchema.safeParse(input);
        // Logs spanning more than a day are the refusal checked above; decoding one here could take the worker down.
        if (parsed.success && spanMs(parsed.data.pulses) > DAY_MS) return;
        const req = new Request("http://127.0.0.1:3100/api/v1/tools/timecode/pulses", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(input) });
        await expectRouteAnswer(await pulsesPost(req, undefined), pulseLogInputSchema.safeParse(input).success);
      }),
      fcParams(60),
    );
  }, 60_000);
});

// ---------------------------------------------------------------------------------------------

describe("calibration runs", () => {
  const example = readFileSync(new URL("../fixtures/calibration/example-run.csv", import.meta.url), "utf8");
  const lines = example.trimEnd().split("\n");
  const CELL = ["", " ", "abc", "-1", "1.5", "1e308", "-1e308", "99999999999999999999999", "NaN", "Infinity", "2", "0", '"5"', '"', "1,2", "\u0000", "\ufeff0", "0x10", "-0", "9007199254740993"];
  type CsvOp = { kind: "drop" | "dup" | "swap" | "cell" | "line" | "header" | "truncate"; at: number; col: number; text: string };
  const csvOp: fc.Arbitrary<CsvOp> = fc.record({
    kind: fc.constantFrom("drop", "dup", "swap", "cell", "cell", "line", "header", "truncate"),
    at: fc.nat(),
    col: fc.nat({ max: 5 }),
    text: fc.oneof(fc.constantFrom(...CELL), fc.string({ maxLength: 10 }), fc.integer({ min: -1_000_000, max: 1_000_000 }).map(String)),
  });
  const HEADERS = ["time_ms,counts", "TIME_MS,Counts,velocity_cps,open_sensor", "counts,time_ms,open_sensor", "time_ms,counts,velocity_cps,open_sensor,extra", "time_ms,velocity_cps", "0,0,0,1", "time_ms,time_ms,counts", ""];
  const runCsv = fc.tuple(fc.array(csvOp, { maxLength: 8 }), fc.constantFrom("\n", "\r\n"), fc.boolean(), fc.integer({ min: 20, max: lines.length })).map(([ops, eol, bom, keep]) => {
    const rows = lines.slice(0, keep);
    for (const op of ops) {
      const i = 1 + (op.at % Math.max(1, rows.length - 1));
      if (op.kind === "drop") rows.splice(i, 1);
      else if (op.kind === "dup") rows.splice(i, 0, rows[i] ?? "");
      else if (op.kind === "swap" && i + 1 < rows.length) [rows[i], rows[i + 1]] = [rows[i + 1]!, rows[i]!];
      else if (op.kind === "cell" && rows[i] !== undefined) {
        const cells = rows[i]!.split(",");
        cells[op.col % cells.length] = op.text;
        rows[i] = cells.join(",");
      } else if (op.kind === "line") rows.splice(i, 0, op.text);
      else if (op.kind === "header") rows[0] = HEADERS[op.at % HEADERS.length]!;
      else if (op.kind === "truncate") rows.splice(Math.max(1, i), rows.length);
    }
    return (bom ? "\ufeff" : "") + rows.join(eol);
  });
  const stallFraction = fc.option(fc.oneof(fc.double({ min: 0.3, max: 0.85, noNaN: true }), fc.constantFrom(0, 0.29, 0.86, 1, -0, 1e308)), { nil: undefined });

  it("every accepted run is analysed and gives finite suggestions; a refused one names rows with messages", () => {
    let analysed = 0;
    fc.assert(
      fc.property(fc.oneof({ arbitrary: runCsv, weight: 5 }, { arbitrary: fc.string({ maxLength: 200 }), weight: 1 }), stallFraction, (csv, fraction) => {
        const input = uploadSchema.safeParse({ fileName: "run.csv", csv, ...(fraction === undefined ? {} : { stallFraction: fraction }) });
        if (!input.success) return expectRefusal(input.error);
        const parsed = parseCalibrationCsv(input.data.csv);
        if (!parsed.ok) {
          expect(parsed.errors.length).toBeGreaterThan(0);
          for (const e of parsed.errors) {
            expect(Number.isInteger(e.row) && e.row >= 0).toBe(true);
            expect(e.message.trim().length).toBeGreaterThan(0);
          }
          return;
        }
        const result = analyseRun(parsed.samples);
        if (!result.ok) {
          expect(result.errors.length).toBeGreaterThan(0);
          for (const m of result.errors) expect(m.trim().length).toBeGreaterThan(0);
          return;
        }
        analysed++;
        const suggested = suggestParameters(result.analysis, input.data.stallFraction ? { stallFraction: input.data.stallFraction } : {});
        expectFinite({ analysis: result.analysis, suggested, calibration: calibrationContext(result.analysis) }, csv.slice(0, 200));
      }),
      fcParams(150),
    );
    expect(analysed).toBeGreaterThan(10);
  }, 60_000);
});
