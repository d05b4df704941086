/** The debounce circuit the formulas belong to, with the values entered. */
export function DebounceSchematic({ r1, r2, c }: { r1: string; r2: string; c: string }) {
  const ground = (x: number, y: number) => (
    <g>
      <line x1={x - 12} x2={x + 12} y1={y} y2={y} />
      <line x1={x - 8} x2={x + 8} y1={y + 5} y2={y + 5} />
      <line x1={x - 4} x2={x + 4} y1={y + 10} y2={y + 10} />
    </g>
  );
  return (
    <figure>
      <svg viewBox="0 0 470 225" className="w-full max-w-xl text-loam-800 dark:text-loam-100" role="img" aria-labelledby="rc-sch-title rc-sch-desc">
        <title id="rc-sch-title">Debounce circuit</title>
        <desc id="rc-sch-desc">
          R1 runs from Vcc to node X. The contact connects X to ground. R2 runs from X to node Y. Capacitor C runs from Y to ground. Node Y
          drives a Schmitt-trigger input.
        </desc>
        <g stroke="currentColor" strokeWidth={1.6} fill="none">
          <line x1={60} x2={60} y1={26} y2={40} />
          <rect x={52} y={40} width={16} height={44} />
          <line x1={60} x2={60} y1={84} y2={140} />
          <line x1={60} x2={80} y1={140} y2={166} />
          <line x1={60} x2={60} y1={172} y2={195} />
          {ground(60, 195)}
          <line x1={60} x2={120} y1={110} y2={110} />
          <rect x={120} y={102} width={44} height={16} />
          <line x1={164} x2={280} y1={110} y2={110} />
          <line x1={220} x2={220} y1={110} y2={150} />
          <line x1={204} x2={236} y1={150} y2={150} strokeWidth={2.4} />
          <line x1={204} x2={236} y1={158} y2={158} strokeWidth={2.4} />
          <line x1={220} x2={220} y1={158} y2={195} />
          {ground(220, 195)}
          <path d="M280 90 L280 130 L316 110 Z" />
          <path d="M288 116 h8 v-12 h6 M292 116 v-12 h8" strokeWidth={1} />
          <circle cx={320} cy={110} r={4} />
          <line x1={324} x2={372} y1={110} y2={110} />
        </g>
        <g fill="currentColor">
          <circle cx={60} cy={110} r={3} />
          <circle cx={220} cy={110} r={3} />
          <circle cx={60} cy={172} r={2.5} />
        </g>
        <g className="fill-current text-[12px]">
          <text x={60} y={18} textAnchor="middle">Vcc</text>
          <text x={76} y={60}>R1</text>
          <text x={76} y={74} className="text-[11px]">{r1}</text>
          <text x={48} y={106} textAnchor="end">X</text>
          <text x={86} y={160}>contact</text>
          <text x={142} y={96} textAnchor="middle">R2</text>
          <text x={142} y={134} textAnchor="middle" className="text-[11px]">{r2}</text>
          <text x={226} y={104}>Y</text>
          <text x={244} y={152}>C</text>
          <text x={244} y={166} className="text-[11px]">{c}</text>
          <text x={298} y={80} textAnchor="middle" className="text-[11px]">Schmitt (VT+, VT−)</text>
          <text x={378} y={114}>to MCU</text>
        </g>
      </svg>
      <figcaption className="mt-2 text-sm text-loam-600 dark:text-loam-400">
        Closed contact: X is held at ground and C discharges through R2 alone. Open contact: C charges from Vcc through R1 and R2 in series.
      </figcaption>
    </figure>
  );
}
