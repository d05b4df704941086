// Pulse-log diagnosis: pulses a controller recorded → seconds → minute frames → decoded times,
// with what went wrong in each frame.
import { decodeFrame } from "./frames";
import { findAnchors } from "./pulse-anchors";
import { classifySecond, TIMING_TOLERANCE_MS, type Pulse, type SecondSymbol } from "./pulse-classify";
import type { FrameDecode, Standard } from "./types";

export type PulseIssueKind = "missing" | "extra" | "width" | "timing" | "parity" | "check" | "partial" | "length" | "sequence";
export type PulseIssue = { second: number | null; kind: PulseIssueKind; message: string };

export type PulseFrame = {
  index: number;
  /** Log time (ms) of second 0, measured or estimated from neighbouring seconds. */
  startMs: number;
  seconds: number;
  complete: boolean;
  /** One symbol per second: 0/1/M, ? unreadable, · not in the log, - no pulse expected. */
  symbols: string;
  symbolsB?: string;
  issues: PulseIssue[];
  decode: FrameDecode | null;
  ok: boolean;
  /** Log time (ms) at which the minute the frame names begins. */
  instantAtMs: number | null;
};

export type PulseLogResult = {
  standard: Standard;
  pulseCount: number;
  frames: PulseFrame[];
  summary: { frames: number; complete: number; ok: number; issues: Record<PulseIssueKind, number> };
};

export type SecondGroup = { startMs: number; endMs: number; pulses: Pulse[]; symbol: SecondSymbol };

// Pulses starting within this window of a second's first pulse belong to that second (MSF sends two).
const GROUP_WINDOW_MS = 700;

/** Groups sorted pulses into seconds and classifies each. */
export function groupSeconds(standard: Standard, pulses: readonly Pulse[]): SecondGroup[] {
  const sorted = [...pulses].sort((x, y) => x.startMs - y.startMs);
  const groups: { startMs: number; pulses: Pulse[] }[] = [];
  for (const p of sorted) {
    const last = groups[groups.length - 1];
    if (last && p.startMs - last.startMs < GROUP_WINDOW_MS) last.pulses.push(p);
    else groups.push({ startMs: p.startMs, pulses: [p] });
  }
  return groups.map((g) => ({ ...g, endMs: Math.max(...g.pulses.map((p) => p.startMs + p.widthMs)), symbol: classifySecond(standard, g.pulses) }));
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length ? s[Math.floor((s.length - 1) / 2)]! : 0;
};

function buildFrame(standard: Standard, index: number, estStart: number, seconds: number, groups: SecondGroup[], logStart: number, logEnd: number): PulseFrame {
  const inFrame = groups.filter((g) => g.startMs >= estStart - 500 && g.startMs < estStart + seconds * 1000 - 500);
  // Refit second 0 from all pulses of the frame, so an estimated start does not drift.
  const start = inFrame.length ? median(inFrame.map((g) => g.startMs - Math.round((g.startMs - estStart) / 1000) * 1000)) : estStart;
  const pulsed = standard === "dcf77" ? seconds - 1 : seconds;
  const bySecond = new Map<number, SecondGroup[]>();
  for (const g of inFrame) {
    const s = Math.round((g.startMs - start) / 1000);
    bySecond.set(s, [...(bySecond.get(s) ?? []), g]);
  }
  const issues: PulseIssue[] = [];
  const a: string[] = [];
  const b: string[] = [];
  let partial = false;
  for (let s = 0; s < seconds; s++) {
    const here = bySecond.get(s) ?? [];
    const at = start + s * 1000;
    if (s >= pulsed) {
      a.push("-");
      b.push("-");
      if (here.length) issues.push({ second: s, kind: "extra", message: `pulse in second ${s}, where ${standard.toUpperCase()} sends none` });
      continue;
    }
    if (!here.length) {
      const observed = at >= logStart - 500 && at <= logEnd + 500;
      if (observed) issues.push({ second: s, kind: "missing", message: `no pulse in second ${s}` });
      else partial = true;
      a.push(observed ? "?" : "·");
      b.push(observed ? "?" : "·");
      continue;
    }
    if (here.length > 1) {
      issues.push({ second: s, kind: "extra", message: `${here.length} pulses start in second ${s}` });
      a.push("?");
      b.push("?");
      continue;
    }
    const g = here[0]!;
    const marker = g.symbol.a === "M";
    if (standard === "msf" && !g.symbol.problem && marker !== (s === 0)) {
      issues.push({ second: s, kind: "width", message: s === 0 ? "second 0 is not the 500 ms minute marker" : `500 ms minute-marker pulse in second ${s}` });
      a.push("?");
      b.push("?");
      continue;
    }
    if (Math.abs(g.startMs - at) > TIMING_TOLERANCE_MS) issues.push({ second: s, kind: "timing", message: `second ${s} starts ${Math.round(g.startMs - at)} ms off the second` });
    if (g.symbol.problem) issues.push({ second: s, kind: g.symbol.problem.kind, message: `second ${s}: ${g.symbol.problem.message}` });
    a.push(g.symbol.a);
    b.push(g.symbol.b ?? "");
  }
  if (partial) issues.unshift({ second: null, kind: "partial", message: start < logStart ? "the log starts during this minute" : "the log ends during this minute" });
  const readable = !a.includes("?") && !a.includes("·");
  let decode: FrameDecode | null = null;
  if (readable && seconds !== 60 && !(standard === "dcf77" && seconds === 61)) {
    issues.push({ second: null, kind: "length", message: `a ${seconds}-second minute is not decoded here` });
  } else if (readable) {
    // The MSF minute marker is off through both the A and the B window.
    const bitsA = a.map((x) => (standard === "msf" && x === "M" ? "1" : x)).join("");
    const bitsB = b.map((x) => (x === "M" ? "1" : x)).join("");
    decode = decodeFrame({ standard, bits: standard === "dcf77" ? bitsA.slice(0, pulsed) : bitsA, bitsA, bitsB });
    for (const c of decode.checks.filter((c) => !c.ok)) issues.push({ second: c.positions[c.positions.length - 1] ?? null, kind: c.id.startsWith("parity") ? "parity" : "check", message: `${c.label}: ${c.detail}` });
  }
  const named = standard === "wwvb" ? start : start + seconds * 1000;
  return {
    index,
    startMs: Math.round(start),
    seconds,
    complete: readable,
    symbols: a.join(""),
    symbolsB: standard === "msf" ? b.join("") : undefined,
    issues,
    decode,
    ok: decode !== null && decode.ok && issues.every((i) => i.kind === "timing"),
    instantAtMs: decode?.instant.utc ? Math.round(named) : null,
  };
}

/** Decodes a pulse log into minute frames with their times and every reception problem found. */
export function decodePulseLog(standard: Standard, pulses: readonly Pulse[]): PulseLogResult {
  const groups = groupSeconds(standard, pulses);
  const frames: PulseFrame[] = [];
  if (groups.length) {
    const logStart = groups[0]!.startMs;
    const logEnd = groups[groups.length - 1]!.startMs;
    for (const f of frameStarts(findAnchors(standard, groups), logStart, logEnd)) {
      frames.push(buildFrame(standard, frames.length, f.startMs, f.seconds, groups, logStart, logEnd));
    }
  }
  checkSequence(frames);
  const issues = Object.fromEntries(["missing", "extra", "width", "timing", "parity", "check", "partial", "length", "sequence"].map((k) => [k, 0])) as Record<PulseIssueKind, number>;
  for (const f of frames) for (const i of f.issues) issues[i.kind]++;
  return {
    standard,
    pulseCount: pulses.length,
    frames,
    summary: { frames: frames.length, complete: frames.filter((f) => f.complete).length, ok: frames.filter((f) => f.ok).length, issues },
  };
}

/** Frame starts and lengths from accepted minute anchors, extrapolating across minutes without one. */
function frameStarts(anchors: number[], logStart: number, logEnd: number): { startMs: number; seconds: number }[] {
  if (!anchors.length) return [];
  const out: { startMs: number; seconds: number }[] = [];
  const first = anchors[0]!;
  for (let t = first - 60_000; t + 60_000 - 500 > logStart; t -= 60_000) out.unshift({ startMs: t, seconds: 60 });
  anchors.forEach((a, k) => {
    const next = anchors[k + 1];
    if (next === undefined) {
      for (let t = a; t <= logEnd + 500; t += 60_000) out.push({ startMs: t, seconds: 60 });
      return;
    }
    const n = Math.max(1, Math.round((next - a) / 60_000));
    for (let i = 0; i < n - 1; i++) out.push({ startMs: a + i * 60_000, seconds: 60 });
    const lastStart = a + (n - 1) * 60_000;
    out.push({ startMs: lastStart, seconds: Math.round((next - lastStart) / 1000) });
  });
  return out;
}

// Frames one minute apart must name times one minute apart. WWVB has no parity, so a misread bit
// shows only here; the time most frames agree on wins.
function checkSequence(frames: PulseFrame[]) {
  const decoded = frames.filter((f) => f.ok && f.decode?.instant.utc);
  const baseOf = (f: PulseFrame) => Date.parse(f.decode!.instant.utc!) - f.index * 60_000;
  const votes = new Map<number, number>();
  for (const f of decoded) votes.set(baseOf(f), (votes.get(baseOf(f)) ?? 0) + 1);
  const [best, count] = [...votes.entries()].reduce((a, b) => (b[1] > a[1] ? b : a), [0, 0]);
  if (decoded.length < 2) return;
  for (const f of decoded) {
    if (count > 1 && baseOf(f) === best) continue;
    const expected = count > 1 ? `the other frames imply ${new Date(best + f.index * 60_000).toISOString().slice(0, 16)}Z` : "no two frames agree on the time";
    f.issues.push({ second: null, kind: "sequence", message: `names ${f.decode!.instant.utc}; ${expected}` });
    f.ok = false;
  }
}
