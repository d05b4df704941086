// Finding the start of each minute in a pulse log. A dropped pulse looks like the DCF77 minute gap
// and a misread 1 like a WWVB marker, so candidates must agree on a 60-second rhythm.
import type { SecondGroup } from "./pulses";
import type { Standard } from "./types";

const near = (x: number, target: number, tol: number) => Math.abs(x - target) <= tol;

function groupAt(groups: readonly SecondGroup[], ms: number): SecondGroup | undefined {
  let lo = 0;
  let hi = groups.length - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const g = groups[mid]!;
    if (near(g.startMs, ms, 300)) return g;
    if (g.startMs < ms) lo = mid + 1;
    else hi = mid - 1;
  }
  return undefined;
}

function candidatesOf(standard: Standard, groups: readonly SecondGroup[]): number[] {
  const out: number[] = [];
  groups.forEach((g, i) => {
    const prev = groups[i - 1];
    if (standard === "dcf77") {
      // The missing 59th pulse leaves two seconds between second 58 and second 0.
      if (prev && near(g.startMs - prev.startMs, 2000, 300)) out.push(g.startMs);
    } else if (standard === "msf") {
      if (g.symbol.a === "M") out.push(g.startMs);
    } else if (g.symbol.a === "M" && prev?.symbol.a === "M" && near(g.startMs - prev.startMs, 1000, 200)) {
      out.push(g.startMs);
    }
  });
  return out;
}

/** Local evidence that a candidate is second 0: symbols expected at fixed seconds after it. */
function plausibility(standard: Standard, groups: readonly SecondGroup[], at: number): number {
  const sym = (s: number) => groupAt(groups, at + s * 1000)?.symbol.a;
  if (standard === "dcf77") return (sym(0) === "0" ? 1 : 0) + (sym(20) === "1" ? 1 : 0);
  if (standard === "wwvb") return [9, 19, 29].filter((s) => sym(s) === "M").length;
  return [52, 53, 58, 59].filter((s, i) => sym(s) === ["0", "1", "1", "0"][i]).length;
}

/** Fits a minute step (60 s, or 61 s across a leap second) between two log times. */
function inRhythm(d: number): boolean {
  const n = Math.round(d / 60_000);
  const r = d - n * 60_000;
  return n >= 1 && (Math.abs(r) <= 600 || Math.abs(r - 1000) <= 400);
}

/** Log times (ms) of second 0 of each minute that shows its own minute mark. */
export function findAnchors(standard: Standard, groups: readonly SecondGroup[]): number[] {
  const cands = candidatesOf(standard, groups);
  if (!cands.length) return [];
  let best = cands[0]!;
  let bestScore = -1;
  for (const c of cands) {
    const support = cands.filter((d) => d === c || inRhythm(Math.abs(d - c))).length;
    const score = support * 10 + plausibility(standard, groups, c);
    if (score > bestScore) {
      best = c;
      bestScore = score;
    }
  }
  const accepted = [best];
  let last = best;
  for (const c of cands.filter((x) => x > best)) if (inRhythm(c - last)) accepted.push((last = c));
  last = best;
  for (const c of cands.filter((x) => x < best).reverse()) if (inRhythm(last - c)) accepted.unshift((last = c));
  return accepted;
}
