/** A small line chart of one value over time (check-in history), with its range as text. */
export function TrendPlot({ points, label, unit }: { points: { t: Date; v: number }[]; label: string; unit: string }) {
  if (points.length < 2) return <p className="text-sm text-loam-600 dark:text-loam-400">Not enough check-ins yet to draw {label.toLowerCase()}.</p>;
  const W = 320;
  const H = 90;
  const p = 6;
  const ts = points.map((x) => x.t.getTime());
  const vs = points.map((x) => x.v);
  const [t0, t1, v0, v1] = [Math.min(...ts), Math.max(...ts), Math.min(...vs), Math.max(...vs)];
  const x = (t: number) => p + ((t - t0) / Math.max(1, t1 - t0)) * (W - 2 * p);
  const y = (v: number) => H - p - ((v - v0) / Math.max(1e-9, v1 - v0)) * (H - 2 * p);
  const d = points.map((pt, i) => `${i ? "L" : "M"}${x(pt.t.getTime()).toFixed(1)},${y(pt.v).toFixed(1)}`).join("");
  return (
    <figure>
      <figcaption className="text-sm font-medium">{label}</figcaption>
      <svg viewBox={`0 0 ${W} ${H}`} className="w-full max-w-sm" role="img" aria-label={`${label}: from ${v0} to ${v1} ${unit} over ${points.length} check-ins`}>
        <rect width={W} height={H} className="fill-loam-50 dark:fill-loam-900" />
        <path d={d} fill="none" strokeWidth="2" className="stroke-dusk-600 dark:stroke-dusk-300" />
      </svg>
      <p className="text-xs text-loam-600 dark:text-loam-400">
        {v0}–{v1} {unit}
      </p>
    </figure>
  );
}
