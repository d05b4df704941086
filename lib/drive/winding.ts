// Cord on a spool. The cord is modelled by its centreline: a turn on layer k (0 = on the bare core) has
// the effective diameter  d_k = spool + (2k + 1) · cord  — the core, plus the cord's own thickness, plus
// 2 × cord for every full layer beneath it. A single layer is a helix; its pitch (one cord thickness per
// turn) is neglected: it lengthens a turn by ½·(cord / (π·d))², 0.05 % for a 2 mm cord on an 18 mm core.
// Layers are wound full before the next starts (turns per layer given, or spool width ÷ cord, rounded
// down). The cord starts on the bare core with the door at its closed end.

export type Winding = { spoolMm: number; cordMm: number; turnsPerLayer: number | null };

/** Turns that fit on one layer: given directly, or the spool width divided by the cord, rounded down. */
export function turnsPerLayerOf(opts: { turnsPerLayer?: number; spoolWidthMm?: number; cordMm: number }): number | null {
  if (opts.turnsPerLayer !== undefined) return opts.turnsPerLayer;
  if (opts.spoolWidthMm !== undefined && opts.cordMm > 0) return Math.max(1, Math.floor(opts.spoolWidthMm / opts.cordMm));
  return null;
}

/** Effective winding diameter (mm) of layer k, counted from 0 on the bare core. */
export function layerDiameterMm(w: Winding, layer: number): number {
  return w.spoolMm + (2 * layer + 1) * w.cordMm;
}

// Length of m full layers: N·π·Σ d_k = N·π·m·(spool + cord·m).
function fullLayersLengthMm(w: Winding, n: number, layers: number): number {
  return n * Math.PI * layers * (w.spoolMm + w.cordMm * layers);
}

/** Cord length (mm) taken up by `turns` turns wound onto the bare core. */
export function cordLengthForTurns(w: Winding, turns: number): number {
  const n = w.turnsPerLayer;
  if (n === null) return Math.PI * layerDiameterMm(w, 0) * turns;
  const full = Math.floor(turns / n);
  return fullLayersLengthMm(w, n, full) + (turns - full * n) * Math.PI * layerDiameterMm(w, full);
}

/** Turns needed to wind `lengthMm` of cord onto the bare core (the inverse of cordLengthForTurns). */
export function turnsForCordLength(w: Winding, lengthMm: number): number {
  const n = w.turnsPerLayer;
  if (n === null) return lengthMm / (Math.PI * layerDiameterMm(w, 0));
  const perLayer = lengthMm / (n * Math.PI);
  // Largest m with m·(spool + cord·m) ≤ length / (N·π): the positive root of a quadratic, then nudged
  // because the square root can land a hair either side of a whole layer.
  let m =
    w.cordMm > 0
      ? Math.floor((-w.spoolMm + Math.sqrt(w.spoolMm ** 2 + 4 * w.cordMm * perLayer)) / (2 * w.cordMm))
      : Math.floor(perLayer / w.spoolMm);
  while (fullLayersLengthMm(w, n, m + 1) <= lengthMm) m++;
  while (m > 0 && fullLayersLengthMm(w, n, m) > lengthMm) m--;
  return m * n + (lengthMm - fullLayersLengthMm(w, n, m)) / (Math.PI * layerDiameterMm(w, m));
}

export type LayerRow = { layer: number; diameterMm: number; turns: number; lengthMm: number };

const MAX_ROWS = 100;

/** The layers a winding of `turns` turns occupies, innermost first (at most 100 rows). */
export function layerRows(w: Winding, turns: number): LayerRow[] {
  const n = w.turnsPerLayer;
  if (n === null) return [{ layer: 0, diameterMm: layerDiameterMm(w, 0), turns, lengthMm: cordLengthForTurns(w, turns) }];
  const rows: LayerRow[] = [];
  for (let k = 0; turns - k * n > 1e-9 && rows.length < MAX_ROWS; k++) {
    const t = Math.min(n, turns - k * n);
    const d = layerDiameterMm(w, k);
    rows.push({ layer: k, diameterMm: d, turns: t, lengthMm: t * Math.PI * d });
  }
  return rows;
}

/**
 * How far the door has moved after `spoolTurns` turns, from either end of a travel of `totalTurns`.
 * From the open end the cord unwinds from the outermost layer; past the closed end it would start
 * winding back onto the core the other way, extrapolated here at the core's diameter.
 */
export function distanceForTurns(w: Winding, totalTurns: number, spoolTurns: number): { fromOpenMm: number; fromClosedMm: number } {
  const total = cordLengthForTurns(w, totalTurns);
  const fromOpenMm =
    spoolTurns <= totalTurns
      ? total - cordLengthForTurns(w, totalTurns - spoolTurns)
      : total + (spoolTurns - totalTurns) * Math.PI * layerDiameterMm(w, 0);
  return { fromOpenMm, fromClosedMm: cordLengthForTurns(w, spoolTurns) };
}
