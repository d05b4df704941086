// Input schemas shared by the time-code page, HTTP routes and command line.
import { z } from "zod";
import { STANDARDS, type Standard } from "./types";
import { WWVB_MARKERS } from "./wwvb";

export const MAX_PULSES = 5000;

export const standardSchema = z.enum(STANDARDS, { error: "must be dcf77, msf or wwvb" });

// Spaces are allowed for readability when pasting ("0000 0000 …").
const bitText = z.string({ error: "must be a string of bits" }).transform((s) => s.replace(/\s+/g, ""));

const MARKERS = new Set<number>(WWVB_MARKERS);
const MARKER_LIST = "0, 9, 19, 29, 39, 49 and 59";

/** What is wrong with a bit string for a standard, or null; positions count from 0 (second 0). */
export function bitStringProblem(standard: Standard, bits: string): string | null {
  const wwvb = standard === "wwvb";
  for (let i = 0; i < bits.length; i++) {
    const ch = bits[i]!;
    if (ch === "0" || ch === "1") continue;
    if (wwvb && ch === "M") continue;
    return `position ${i} is '${ch}'; use ${wwvb ? "0, 1 or M" : "0 or 1"}`;
  }
  if (standard === "dcf77" && bits.length !== 59 && bits.length !== 60) {
    return `has ${bits.length} bits; a DCF77 frame has 59 (60 in a leap-second minute), bit 0 first`;
  }
  if (standard !== "dcf77" && bits.length !== 60) return `has ${bits.length} bits; ${wwvb ? "a WWVB frame" : "each MSF string"} has 60, second 0 first`;
  if (wwvb) {
    for (let i = 0; i < 60; i++) {
      if (MARKERS.has(i) && bits[i] !== "M") return `position ${i} is '${bits[i]}'; a marker M belongs at ${MARKER_LIST}`;
      if (!MARKERS.has(i) && bits[i] === "M") return `position ${i} is 'M'; markers belong only at ${MARKER_LIST}`;
    }
  }
  return null;
}

/** Decoding one frame: `bits` for DCF77/WWVB, `bitsA` and `bitsB` for MSF. */
export const decodeInputSchema = z
  .object({ standard: standardSchema, bits: bitText.optional(), bitsA: bitText.optional(), bitsB: bitText.optional() })
  .superRefine((v, ctx) => {
    const fields = v.standard === "msf" ? (["bitsA", "bitsB"] as const) : (["bits"] as const);
    for (const f of fields) {
      const value = v[f];
      if (value === undefined || value === "") {
        ctx.addIssue({ code: "custom", path: [f], message: `is required for ${v.standard}` });
        continue;
      }
      const problem = bitStringProblem(v.standard, value);
      if (problem) ctx.addIssue({ code: "custom", path: [f], message: problem });
    }
  });
export type DecodeInput = z.infer<typeof decodeInputSchema>;

const ISO = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,3})?)?(Z|[+-]\d{2}:\d{2})$/;
const FIRST = Date.UTC(2000, 0, 1);
// DCF77 sends local time, up to two hours ahead of UTC; keep every code inside 2000–2099.
const LAST = Date.UTC(2099, 11, 31, 21, 59);

/** An ISO-8601 instant with an offset, as UTC ms, within the two-digit-year range the codes send. */
export const isoTimeSchema = z
  .string({ error: "is required (ISO-8601, e.g. 2026-03-29T01:00:00Z)" })
  .trim()
  .regex(ISO, "must be ISO-8601 with an offset, e.g. 2026-03-29T01:00:00Z or 2026-03-29T03:00+02:00")
  .refine((s) => !Number.isNaN(Date.parse(s)), "is not a real date and time")
  .transform((s) => Date.parse(s))
  .refine((ms) => ms >= FIRST && ms <= LAST, "must be between 2000-01-01T00:00Z and 2099-12-31T21:59Z (the codes send a two-digit year)");

const flagSchema = z
  .union([z.boolean(), z.enum(["true", "false", "yes", "no", "1", "0"])], { error: "must be yes or no" })
  .transform((v) => v === true || v === "true" || v === "yes" || v === "1");

const dut1Schema = z.coerce
  .number({ error: "must be a number of seconds" })
  .min(-0.9, "must be at least -0.9")
  .max(0.9, "must be at most 0.9")
  .refine((v) => Math.abs(Math.round(v * 10) - v * 10) < 1e-9, "must be in steps of 0.1 s");

/** Encoding the frame for a time. */
export const encodeInputSchema = z.object({
  standard: standardSchema,
  time: isoTimeSchema,
  dut1: dut1Schema.optional(),
  leapSecondWarning: flagSchema.optional(),
  callBit: flagSchema.optional(),
});
export type EncodeInput = z.infer<typeof encodeInputSchema>;

const coordinate = (min: number, max: number) =>
  z.preprocess(
    (v) => (typeof v === "string" && v.trim() === "" ? undefined : v),
    z.coerce.number({ error: "must be a number in degrees" }).min(min, `must be between ${min} and ${max}`).max(max, `must be between ${min} and ${max}`),
  );

/** A site for the distance to a transmitter; decimal degrees, north and east positive. */
export const distanceInputSchema = z.object({ standard: standardSchema, lat: coordinate(-90, 90), lon: coordinate(-180, 180) });
export type DistanceInput = z.infer<typeof distanceInputSchema>;

const MAX_LOG_SPAN_MS = 2 * 60 * 60_000;

const pulseSchema = z.object({
  startMs: z.number({ error: "must be a number (ms)" }).min(0, "must be 0 or more").max(MAX_LOG_SPAN_MS * 12, "must be within a day of the log's start"),
  widthMs: z.number({ error: "must be a number (ms)" }).gt(0, "must be greater than 0").max(2000, "must be at most 2000"),
});

/** A pulse log as a controller records it: start and width of each carrier drop, in ms. */
export const pulseLogInputSchema = z.object({
  standard: standardSchema,
  pulses: z
    .array(pulseSchema, { error: "must be a list of { startMs, widthMs }" })
    .min(1, "must hold at least one pulse")
    .max(MAX_PULSES, `must hold at most ${MAX_PULSES} pulses (about 80 minutes)`)
    // The decoder lays a frame on every minute the log spans, so the span is bounded as well as the count.
    .refine((ps) => ps.length < 2 || Math.max(...ps.map((p) => p.startMs)) - Math.min(...ps.map((p) => p.startMs)) <= MAX_LOG_SPAN_MS, {
      message: `must span at most ${MAX_LOG_SPAN_MS / 60_000} minutes from first to last pulse`,
    }),
});
export type PulseLogInput = z.infer<typeof pulseLogInputSchema>;

/** Which calculation the GET route runs. */
export const timecodeActionSchema = z.object({
  action: z.enum(["encode", "decode", "distance"], { error: "must be encode, decode or distance" }),
});
