type Point = { tMs: number; counts: number; velocityCps: number };

/** Position and velocity of a calibration run against time, as an SVG line chart. */
export function RunPlot({ series, title = "Calibration run" }: { series: Point[]; title?: string }) {
  if (series.length < 2) return null;
  const W = 640;
  const H = 220;
  const pad = 36;
  const t0 = series[0]!.tMs;
  const t1 = series[series.length - 1]!.tMs;
  const cMax = Math.max(...series.map((p) => p.counts));
  const cMin = Math.min(...series.map((p) => p.counts));
  const vMax = Math.max(...series.map((p) => Math.abs(p.velocityCps)), 1);
  const x = (t: number) => pad + ((t - t0) / Math.max(1, t1 - t0)) * (W - 2 * pad);
  const yC = (c: number) => H - pad - ((c - cMin) / Math.max(1, cMax - cMin)) * (H - 2 * pad);
  const yV = (v: number) => H / 2 - (v / vMax) * (H / 2 - pad);
  const line = (f: (p: Point) => number) => series.map((p, i) => `${i ? "L" : "M"}${x(p.tMs).toFixed(1)},${f(p).toFixed(1)}`).join("");
  return (
    <figure>
      <svg viewBox={`0 0 ${W} ${H}`} className="w-full max-w-2xl" role="img" aria-labelledby="run-plot-title run-plot-desc">
        <title id="run-plot-title">{title}</title>
        <desc id="run-plot-desc">
          Position from {cMin} to {cMax} counts and velocity up to {Math.round(vMax)} counts per second over {((t1 - t0) / 1000).toFixed(1)} seconds.
        </desc>
        <rect x={pad} y={pad / 2} width={W - 2 * pad} height={H - 1.5 * pad} className="fill-loam-50 dark:fill-loam-900" />
        <line x1={pad} x2={W - pad} y1={H / 2} y2={H / 2} className="stroke-loam-200 dark:stroke-loam-800" />
        <path d={line((p) => yC(p.counts))} fill="none" className="stroke-dusk-600 dark:stroke-dusk-300" strokeWidth="2" />
        <path d={line((p) => yV(p.velocityCps))} fill="none" className="stroke-straw-500" strokeWidth="1.5" strokeDasharray="4 3" />
        <text x={pad} y={H - 8} className="fill-loam-600 text-[11px] dark:fill-loam-400">
          0 s
        </text>
        <text x={W - pad} y={H - 8} textAnchor="end" className="fill-loam-600 text-[11px] dark:fill-loam-400">
          {((t1 - t0) / 1000).toFixed(1)} s
        </text>
      </svg>
      <figcaption className="text-xs text-loam-600 dark:text-loam-400">Solid: position (counts). Dashed: velocity (counts/s, signed).</figcaption>
    </figure>
  );
}
