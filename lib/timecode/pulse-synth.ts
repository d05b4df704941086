// Synthetic pulse logs from encoded frames: clean ones, and noisy ones with dropped pulses and
// jittered widths, seeded so tests and examples are repeatable.
import { encodeFrame } from "./frames";
import { pulsesForSymbol, type Pulse } from "./pulse-classify";
import { MINUTE_MS, type EncodeOptions, type Standard } from "./types";

export type SynthOptions = {
  standard: Standard;
  /** UTC ms of the first minute transmitted (DCF77 and MSF send the frame naming the next minute). */
  firstMinuteUtcMs: number;
  minutes: number;
  /** Log time of the first minute's second 0; by default the log starts at 0 ms. */
  startMs?: number;
  /** Seconds of the minute before to include, so the log starts mid-frame as a real one does. */
  leadInSeconds?: number;
  encode?: EncodeOptions;
};

function minutePulses(standard: Standard, sentUtcMs: number, opts: EncodeOptions): Pulse[][] {
  const frame = encodeFrame(standard, standard === "wwvb" ? sentUtcMs : sentUtcMs + MINUTE_MS, opts);
  const a = frame.bits ?? frame.bitsA ?? "";
  const b = frame.bitsB ?? "";
  return Array.from({ length: 60 }, (_, s) => {
    if (standard === "dcf77" && s === 59) return [];
    const sym = standard === "msf" && s === 0 ? "M" : (a[s] ?? "0");
    return pulsesForSymbol(standard, sym, b[s]);
  });
}

/** A clean pulse log: every pulse at its nominal start and width. */
export function synthPulseLog(o: SynthOptions): Pulse[] {
  const lead = Math.min(59, Math.max(0, o.leadInSeconds ?? 0));
  const start = o.startMs ?? lead * 1000;
  const out: Pulse[] = [];
  for (let m = lead ? -1 : 0; m < o.minutes; m++) {
    const seconds = minutePulses(o.standard, o.firstMinuteUtcMs + m * MINUTE_MS, o.encode ?? {});
    seconds.forEach((ps, s) => {
      if (m === -1 && s < 60 - lead) return;
      for (const p of ps) out.push({ startMs: start + m * MINUTE_MS + s * 1000 + p.startMs, widthMs: p.widthMs });
    });
  }
  return out;
}

export type NoiseOptions = {
  seed: number;
  /** Each pulse's start moves by up to ± this many ms. */
  startJitterMs?: number;
  /** Each pulse's width changes by up to ± this many ms. */
  widthJitterMs?: number;
  /** Indexes (into the clean log) of pulses to drop. */
  drop?: number[];
  /** Indexes of pulses whose width is replaced, e.g. to fall between two symbols. */
  widths?: Record<number, number>;
  /** Spurious pulses to add. */
  extra?: Pulse[];
};

/** A small seeded generator (mulberry32), so noise is the same on every run. */
export function seededRandom(seed: number): () => number {
  let t = seed >>> 0;
  return () => {
    t = (t + 0x6d2b79f5) >>> 0;
    let r = Math.imul(t ^ (t >>> 15), 1 | t);
    r = (r + Math.imul(r ^ (r >>> 7), 61 | r)) ^ r;
    return ((r ^ (r >>> 14)) >>> 0) / 4294967296;
  };
}

/** A noisy copy of a pulse log: jitter, dropped pulses, replaced widths and spurious pulses. */
export function addNoise(clean: readonly Pulse[], o: NoiseOptions): Pulse[] {
  const rand = seededRandom(o.seed);
  const jitter = (max = 0) => Math.round((rand() * 2 - 1) * max);
  const drop = new Set(o.drop ?? []);
  const out: Pulse[] = [];
  clean.forEach((p, i) => {
    const dStart = jitter(o.startJitterMs);
    const dWidth = jitter(o.widthJitterMs);
    if (drop.has(i)) return;
    const width = o.widths?.[i] ?? Math.max(1, p.widthMs + dWidth);
    out.push({ startMs: p.startMs + dStart, widthMs: width });
  });
  return [...out, ...(o.extra ?? [])].sort((x, y) => x.startMs - y.startMs);
}
