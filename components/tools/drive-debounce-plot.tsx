import { nodeVoltage, type DebounceResult } from "@/lib/drive/debounce";
import { formatNumber as f } from "@/lib/drive/eng-notation";
import type { DebounceInput } from "@/lib/drive/inputs";

const W = 560;
const H = 220;
const M = { left: 44, right: 14, top: 14, bottom: 36 };
const STEPS = 80;

/** Voltage at the Schmitt input after the contact closes and after it opens, with both thresholds. */
export function DebouncePlot({ input, r }: { input: DebounceInput; r: DebounceResult }) {
  const endS = 1.6 * Math.max(r.closeDelayS, r.openDelayS);
  const x = (s: number) => M.left + (s / endS) * (W - M.left - M.right);
  const y = (v: number) => H - M.bottom - (v / (input.vcc * 1.05)) * (H - M.top - M.bottom);
  const curve = (edge: "close" | "open") =>
    Array.from({ length: STEPS + 1 }, (_, i) => {
      const t = (i / STEPS) * endS;
      return `${x(t).toFixed(1)},${y(nodeVoltage(input, edge, t)).toFixed(1)}`;
    }).join(" ");
  const ms = (s: number) => `${f(s * 1000, 3)} ms`;
  const summary = `After the contact closes the input falls from ${f(input.vcc)} V and crosses VT− = ${f(input.vtMinus)} V at ${ms(r.closeDelayS)}; after it opens the input rises from 0 V and crosses VT+ = ${f(input.vtPlus)} V at ${ms(r.openDelayS)}.`;
  return (
    <figure>
      <svg viewBox={`0 0 ${W} ${H}`} className="w-full text-loam-600 dark:text-loam-400" role="img" aria-labelledby="rc-plot-title rc-plot-desc">
        <title id="rc-plot-title">Input voltage after each contact edge</title>
        <desc id="rc-plot-desc">{summary}</desc>
        {[
          { v: input.vtPlus, label: "VT+" },
          { v: input.vtMinus, label: "VT−" },
        ].map((t) => (
          <g key={t.label}>
            <line x1={x(0)} x2={x(endS)} y1={y(t.v)} y2={y(t.v)} stroke="currentColor" strokeDasharray="5 4" />
            <text x={x(endS) - 4} y={y(t.v) - 4} textAnchor="end" className="fill-current text-[11px]">
              {t.label} {f(t.v)} V
            </text>
          </g>
        ))}
        <polyline points={curve("close")} fill="none" className="stroke-ember-500" strokeWidth={2} />
        <polyline points={curve("open")} fill="none" className="stroke-dusk-600 dark:stroke-dusk-300" strokeWidth={2} />
        <circle cx={x(r.closeDelayS)} cy={y(input.vtMinus)} r={4} className="fill-ember-500" />
        <circle cx={x(r.openDelayS)} cy={y(input.vtPlus)} r={4} className="fill-dusk-600 dark:fill-dusk-300" />
        <line x1={x(0)} x2={x(endS)} y1={y(0)} y2={y(0)} stroke="currentColor" />
        <line x1={x(0)} x2={x(0)} y1={y(0)} y2={y(input.vcc * 1.05)} stroke="currentColor" />
        {[0, 0.25, 0.5, 0.75, 1].map((s) => (
          <text key={s} x={x(s * endS)} y={y(0) + 16} textAnchor="middle" className="fill-current text-[11px]">
            {f(s * endS * 1000, 3)}
          </text>
        ))}
        {[0, input.vcc].map((v) => (
          <text key={v} x={x(0) - 6} y={y(v) + 4} textAnchor="end" className="fill-current text-[11px]">
            {f(v)} V
          </text>
        ))}
        <text x={(x(0) + x(endS)) / 2} y={H - 4} textAnchor="middle" className="fill-current text-[11px]">
          time after the edge (ms) — red: contact closes, violet: contact opens
        </text>
      </svg>
      <figcaption className="mt-2 text-sm text-loam-600 dark:text-loam-400">{summary}</figcaption>
    </figure>
  );
}
