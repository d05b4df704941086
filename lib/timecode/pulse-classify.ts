// Turning the pulses of one second into symbols. Nominal widths are the operators' (PTB, NPL,
// NIST); the tolerances are common practice for the filtered output of a receiver module.
import type { Standard } from "./types";

export type Pulse = { startMs: number; widthMs: number };

/** The symbol(s) one second carries: `a` is the DCF77/WWVB bit or MSF A bit; `b` the MSF B bit. */
export type SecondSymbol = { a: string; b?: string; problem?: { kind: "width" | "extra"; message: string } };

export const NOMINAL_WIDTHS_MS: Record<Standard, { label: string; widthMs: number }[]> = {
  dcf77: [
    { label: "0", widthMs: 100 },
    { label: "1", widthMs: 200 },
  ],
  msf: [
    { label: "A0 B0", widthMs: 100 },
    { label: "A1 B0", widthMs: 200 },
    { label: "A1 B1", widthMs: 300 },
    { label: "minute marker", widthMs: 500 },
  ],
  wwvb: [
    { label: "0", widthMs: 200 },
    { label: "1", widthMs: 500 },
    { label: "M", widthMs: 800 },
  ],
};

/** How far a width may stray from nominal and still count (common practice). */
export const WIDTH_TOLERANCE_MS: Record<Standard, number> = { dcf77: 40, msf: 40, wwvb: 80 };

/** How far a pulse may start from its second and be reported as on time (common practice). */
export const TIMING_TOLERANCE_MS = 60;

const near = (width: number, nominal: number, tol: number) => Math.abs(width - nominal) <= tol;

function widthProblem(standard: Standard, width: number): SecondSymbol {
  const fits = NOMINAL_WIDTHS_MS[standard].map((n) => `${n.widthMs} ms (${n.label})`).join(", ");
  return { a: "?", b: standard === "msf" ? "?" : undefined, problem: { kind: "width", message: `width ${Math.round(width)} ms is not within ±${WIDTH_TOLERANCE_MS[standard]} ms of ${fits}` } };
}

const extra = (standard: Standard, n: number): SecondSymbol => ({
  a: "?",
  b: standard === "msf" ? "?" : undefined,
  problem: { kind: "extra", message: `${n} pulses in one second` },
});

/** Classifies the pulses that start within one second (sorted, first at the second's start). */
export function classifySecond(standard: Standard, pulses: readonly Pulse[]): SecondSymbol {
  const tol = WIDTH_TOLERANCE_MS[standard];
  const first = pulses[0]!;
  const w = first.widthMs;
  if (standard === "msf") {
    if (pulses.length === 2) {
      // A0 B1: off 0–100 ms, carrier back 100–200 ms, off again 200–300 ms.
      const second = pulses[1]!;
      if (near(w, 100, tol) && near(second.startMs - first.startMs, 200, tol) && near(second.widthMs, 100, tol)) return { a: "0", b: "1" };
      return extra(standard, 2);
    }
    if (pulses.length > 2) return extra(standard, pulses.length);
    if (near(w, 100, tol)) return { a: "0", b: "0" };
    if (near(w, 200, tol)) return { a: "1", b: "0" };
    if (near(w, 300, tol)) return { a: "1", b: "1" };
    if (near(w, 500, tol)) return { a: "M", b: "M" };
    return widthProblem(standard, w);
  }
  if (pulses.length > 1) return extra(standard, pulses.length);
  for (const n of NOMINAL_WIDTHS_MS[standard]) if (near(w, n.widthMs, tol)) return { a: n.label };
  return widthProblem(standard, w);
}

/** Nominal pulses for one second's symbol(s), offset from the second's start. */
export function pulsesForSymbol(standard: Standard, a: string, b?: string): Pulse[] {
  if (standard === "msf") {
    if (a === "M") return [{ startMs: 0, widthMs: 500 }];
    if (a === "0" && b === "1") return [{ startMs: 0, widthMs: 100 }, { startMs: 200, widthMs: 100 }];
    return [{ startMs: 0, widthMs: a === "1" ? (b === "1" ? 300 : 200) : 100 }];
  }
  const n = NOMINAL_WIDTHS_MS[standard].find((x) => x.label === a);
  return n ? [{ startMs: 0, widthMs: n.widthMs }] : [];
}
