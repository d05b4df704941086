import { z } from "zod";
import { parseDecimal, parseEngineering } from "./eng-notation";

// Query strings, the command line and form fields all deliver text: an empty field means "not given",
// anything that is not a plain number is refused rather than coerced (no hex, no "Infinity").
const fromText = (parse: (s: string) => number | undefined) => (v: unknown) => {
  if (typeof v !== "string") return v;
  if (v.trim() === "") return undefined;
  return parse(v) ?? Number.NaN;
};

const numberType = () =>
  z.number({ error: (issue) => (issue.input === undefined ? "is required" : "must be a number") });

const decimal = <T extends z.ZodType>(inner: T) => z.preprocess(fromText(parseDecimal), inner);
const engineering = <T extends z.ZodType>(inner: T) => z.preprocess(fromText(parseEngineering), inner);

// Cross-field rules also run while another field is wrong, so every message shows at once; they only
// compare fields that did parse.
const always = { when: () => true };
const isNum = (v: unknown): v is number => typeof v === "number" && Number.isFinite(v);

// Bounds far outside any door, so that no input reaches the overflow or underflow of a double.
const LARGEST = 1e9;
const SMALLEST = 1e-9;
const positive = () => numberType().positive("must be greater than 0").gte(SMALLEST, `must be at least ${SMALLEST}`).lte(LARGEST, `must be at most ${LARGEST}`);
const nonNegative = () => numberType().nonnegative("must be 0 or more").lte(LARGEST, `must be at most ${LARGEST}`);
const wholePositive = () => numberType().int("must be a whole number").positive("must be greater than 0").lte(LARGEST, `must be at most ${LARGEST}`);

export const DECODINGS = [1, 2, 4] as const;

export const travelInputSchema = z
  .strictObject({
    travelMm: decimal(positive()),
    spoolMm: decimal(positive()),
    cordMm: decimal(nonNegative().default(0)),
    turnsPerLayer: decimal(wholePositive().optional()),
    spoolWidthMm: decimal(positive().optional()),
    gearRatio: decimal(positive()),
    ppr: decimal(wholePositive()),
    decoding: decimal(z.literal(DECODINGS, { error: "must be 1, 2 or 4" }).default(4)),
    motorRpm: decimal(positive().optional()),
    timeoutS: decimal(positive().optional()),
    measuredCps: decimal(positive().optional()),
    counts: decimal(nonNegative().optional()),
  })
  .superRefine((v, ctx) => {
    if (!isNum(v.spoolWidthMm)) return;
    if (v.turnsPerLayer !== undefined) {
      ctx.addIssue({ code: "custom", path: ["spoolWidthMm"], message: "give either turns per layer or spool width, not both" });
    } else if (v.cordMm === 0) {
      ctx.addIssue({ code: "custom", path: ["cordMm"], message: "must be greater than 0 when the spool width is given" });
    } else if (isNum(v.cordMm) && v.spoolWidthMm < v.cordMm) {
      ctx.addIssue({ code: "custom", path: ["spoolWidthMm"], message: "must be at least the cord thickness" });
    }
  }, always);

export type TravelInput = z.infer<typeof travelInputSchema>;

export const stallInputSchema = z.strictObject({
  nominalCps: decimal(positive()),
  fraction: decimal(positive().lt(1, "must be less than 1")),
  windowMs: decimal(positive()),
  countsPerMm: decimal(positive().optional()),
  rampMs: decimal(nonNegative().optional()),
  latencyMs: decimal(nonNegative().default(0)),
});

export type StallInput = z.infer<typeof stallInputSchema>;

export const debounceInputSchema = z
  .strictObject({
    r1Ohm: engineering(positive()),
    r2Ohm: engineering(positive()),
    cFarad: engineering(positive()),
    vcc: engineering(positive()),
    vtPlus: engineering(positive()),
    vtMinus: engineering(positive()),
    targetMs: decimal(positive().optional()),
    samplePeriodMs: decimal(positive().optional()),
    stableSamples: decimal(wholePositive().optional()),
  })
  .superRefine((v, ctx) => {
    if (isNum(v.vtPlus) && isNum(v.vcc) && v.vtPlus >= v.vcc) ctx.addIssue({ code: "custom", path: ["vtPlus"], message: "must be below Vcc" });
    if (isNum(v.vtMinus) && isNum(v.vtPlus) && v.vtMinus >= v.vtPlus) ctx.addIssue({ code: "custom", path: ["vtMinus"], message: "must be below VT+" });
    if (v.samplePeriodMs !== undefined && v.stableSamples === undefined) {
      ctx.addIssue({ code: "custom", path: ["stableSamples"], message: "is required when a sample period is given" });
    }
    if (v.stableSamples !== undefined && v.samplePeriodMs === undefined) {
      ctx.addIssue({ code: "custom", path: ["samplePeriodMs"], message: "is required when a number of stable samples is given" });
    }
  }, always);

export type DebounceInput = z.infer<typeof debounceInputSchema>;

/** The first message for each top-level field of a failed parse ("" holds messages about the whole input). */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? String(issue.path[0]) : "";
    out[key] ??= issue.message;
  }
  return out;
}

/** The string values of `keys` in a query-like object (a page's search params), to prefill a form. */
export function pickTextFields(source: Record<string, string | string[] | undefined>, keys: string[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const k of keys) {
    const v = source[k];
    if (typeof v === "string") out[k] = v;
  }
  return out;
}
