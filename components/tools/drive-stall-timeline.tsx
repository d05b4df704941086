import { formatNumber as f } from "@/lib/drive/eng-notation";
import type { StallResult } from "@/lib/drive/stall";

const W = 560;
const H = 220;
const M = { left: 48, right: 14, top: 14, bottom: 36 };

/** Start-up of a stall check: speed ramp, threshold, blanking and the counting windows. */
export function StallTimeline({ r, fraction, windowMs }: { r: StallResult; fraction: number; windowMs: number }) {
  const endMs = Math.max(r.blankingMs, r.rampMs) + 3 * windowMs;
  const x = (ms: number) => M.left + (ms / endMs) * (W - M.left - M.right);
  const y = (share: number) => H - M.bottom - (share / 1.1) * (H - M.top - M.bottom);
  const windows = Math.floor(endMs / windowMs);
  const ticks = [0, 0.25, 0.5, 0.75, 1].map((s) => s * endMs);
  const summary = `Speed ramps from rest to nominal in ${f(r.rampMs)} ms${r.rampAssumed ? " (assumed)" : ""} and passes the ${f(fraction * 100, 3)} % threshold after ${f(r.timeToThresholdMs, 3)} ms; stall checks start after ${f(r.blankingMs, 3)} ms of blanking, with a ${f(windowMs)} ms window.`;
  return (
    <figure>
      <svg viewBox={`0 0 ${W} ${H}`} className="w-full text-loam-600 dark:text-loam-400" role="img" aria-labelledby="stall-plot-title stall-plot-desc">
        <title id="stall-plot-title">Start-up of the stall check</title>
        <desc id="stall-plot-desc">{summary}</desc>
        <rect x={x(0)} y={y(1.1)} width={x(r.blankingMs) - x(0)} height={y(0) - y(1.1)} className="fill-straw-100 dark:fill-straw-700/30" />
        <text x={x(r.blankingMs / 2)} y={y(1.02)} textAnchor="middle" className="fill-straw-700 text-[11px] dark:fill-straw-300">
          blanking
        </text>
        {windows <= 80 &&
          Array.from({ length: windows + 1 }, (_, i) => (
            <line key={i} x1={x(i * windowMs)} x2={x(i * windowMs)} y1={y(0)} y2={y(0) - 6} stroke="currentColor" strokeWidth={1} />
          ))}
        <line x1={x(0)} x2={x(endMs)} y1={y(fraction)} y2={y(fraction)} className="stroke-ember-500" strokeDasharray="6 4" strokeWidth={1.5} />
        <text x={x(endMs) - 4} y={y(fraction) - 5} textAnchor="end" className="fill-ember-700 text-[11px] dark:fill-ember-100">
          threshold {f(fraction * 100, 3)} %
        </text>
        <polyline
          points={`${x(0)},${y(0)} ${x(r.rampMs)},${y(1)} ${x(endMs)},${y(1)}`}
          fill="none"
          className="stroke-dusk-600 dark:stroke-dusk-300"
          strokeWidth={2}
        />
        <line x1={x(0)} x2={x(endMs)} y1={y(0)} y2={y(0)} stroke="currentColor" />
        <line x1={x(0)} x2={x(0)} y1={y(0)} y2={y(1.1)} stroke="currentColor" />
        {ticks.map((t) => (
          <text key={t} x={x(t)} y={y(0) + 16} textAnchor="middle" className="fill-current text-[11px]">
            {f(t, 3)}
          </text>
        ))}
        {[0, 0.5, 1].map((s) => (
          <text key={s} x={x(0) - 6} y={y(s) + 4} textAnchor="end" className="fill-current text-[11px]">
            {s * 100}%
          </text>
        ))}
        <text x={(x(0) + x(endMs)) / 2} y={H - 4} textAnchor="middle" className="fill-current text-[11px]">
          time from start (ms); ticks mark the counting windows
        </text>
      </svg>
      <figcaption className="mt-2 text-sm text-loam-600 dark:text-loam-400">{summary}</figcaption>
    </figure>
  );
}
