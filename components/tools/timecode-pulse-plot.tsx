"use client";
import { NOMINAL_WIDTHS_MS, WIDTH_TOLERANCE_MS, type Pulse } from "@/lib/timecode/pulse-classify";
import type { PulseFrame } from "@/lib/timecode/pulses";
import type { Standard } from "@/lib/timecode/types";

const W = 640;
const H = 220;
const PAD = { l: 44, r: 8, t: 8, b: 28 };

/** Pulse widths of one frame against the nominal widths and their tolerance bands. */
export function PulsePlot({ standard, frame, pulses }: { standard: Standard; frame: PulseFrame; pulses: readonly Pulse[] }) {
  const inFrame = pulses.filter((p) => p.startMs >= frame.startMs - 500 && p.startMs < frame.startMs + frame.seconds * 1000 - 500);
  const maxMs = standard === "wwvb" ? 1000 : 600;
  const x = (s: number) => PAD.l + (s / frame.seconds) * (W - PAD.l - PAD.r);
  const y = (ms: number) => H - PAD.b - (Math.min(ms, maxMs) / maxMs) * (H - PAD.t - PAD.b);
  const tol = WIDTH_TOLERANCE_MS[standard];
  const bad = new Set(frame.issues.filter((i) => i.second !== null && i.kind !== "parity" && i.kind !== "check").map((i) => i.second));
  const titleId = `pulse-plot-title-${frame.index}`;
  const descId = `pulse-plot-desc-${frame.index}`;
  return (
    <figure>
      <svg viewBox={`0 0 ${W} ${H}`} className="w-full" role="img" aria-labelledby={`${titleId} ${descId}`}>
        <title id={titleId}>{`Pulse widths in frame ${frame.index + 1}`}</title>
        <desc id={descId}>{`${inFrame.length} pulses plotted by second against the nominal widths ${NOMINAL_WIDTHS_MS[standard].map((n) => `${n.widthMs} ms`).join(", ")}, each with a ±${tol} ms band. ${bad.size} seconds have a problem; they are listed beside the chart.`}</desc>
        {NOMINAL_WIDTHS_MS[standard].map((n) => (
          <g key={n.label}>
            <rect x={PAD.l} width={W - PAD.l - PAD.r} y={y(n.widthMs + tol)} height={y(n.widthMs - tol) - y(n.widthMs + tol)} className="fill-meadow-100 dark:fill-meadow-700/40" />
            <text x={PAD.l - 4} y={y(n.widthMs) + 4} textAnchor="end" className="fill-loam-600 text-[10px] dark:fill-loam-400">
              {n.widthMs}
            </text>
          </g>
        ))}
        <line x1={PAD.l} x2={W - PAD.r} y1={H - PAD.b} y2={H - PAD.b} className="stroke-loam-400" />
        {[0, 10, 20, 30, 40, 50].map((s) => (
          <text key={s} x={x(s)} y={H - PAD.b + 14} textAnchor="middle" className="fill-loam-600 text-[10px] dark:fill-loam-400">
            {s}
          </text>
        ))}
        <text x={W - PAD.r} y={H - 4} textAnchor="end" className="fill-loam-600 text-[10px] dark:fill-loam-400">
          second of the minute
        </text>
        {inFrame.map((p, k) => {
          const s = (p.startMs - frame.startMs) / 1000;
          const flagged = bad.has(Math.round(s));
          return flagged ? (
            <path key={k} d={`M${x(s) - 4},${y(p.widthMs) - 4}l8,8m0,-8l-8,8`} className="stroke-ember-500" strokeWidth={2} />
          ) : (
            <circle key={k} cx={x(s)} cy={y(p.widthMs)} r={3} className="fill-dusk-600 dark:fill-dusk-300" />
          );
        })}
      </svg>
      <figcaption className="mt-1 text-xs text-loam-600 dark:text-loam-400">Dots: pulses in tolerance; crosses: seconds with a problem. Green bands: nominal width ±{tol} ms (ms on the left).</figcaption>
    </figure>
  );
}
