// Binary-coded decimal fields and parity, as all three codes use them.

export type BcdDecode = { value: number; digitsOk: boolean; badDigits: number[] };

const decadeOf = (weight: number) => (weight >= 100 ? 100 : weight >= 10 ? 10 : 1);

/** The bits of a value in BCD for the given weights, in the order the weights are listed. */
export function bcdBits(value: number, weights: readonly number[]): (0 | 1)[] {
  return weights.map((w) => {
    const decade = decadeOf(w);
    const digit = Math.floor(value / decade) % 10;
    return digit & (w / decade) ? 1 : 0;
  });
}

/** Sums BCD bits by weight and reports any decimal digit above 9. */
export function decodeBcd(bits: readonly number[], weights: readonly number[]): BcdDecode {
  const digits = new Map<number, number>();
  let value = 0;
  weights.forEach((w, i) => {
    if (bits[i] !== 1) return;
    value += w;
    const decade = decadeOf(w);
    digits.set(decade, (digits.get(decade) ?? 0) + w / decade);
  });
  const badDigits = [...digits.values()].filter((d) => d > 9);
  return { value, digitsOk: badDigits.length === 0, badDigits };
}

/** How many bits are 1. */
export function ones(bits: readonly number[]): number {
  return bits.reduce((n, b) => n + (b === 1 ? 1 : 0), 0);
}

/** The even-parity bit for data bits (DCF77): 1 when the data has an odd number of ones. */
export const evenParityBit = (bits: readonly number[]): 0 | 1 => (ones(bits) % 2 === 1 ? 1 : 0);

/** The odd-parity bit for data bits (MSF): 1 when the data has an even number of ones. */
export const oddParityBit = (bits: readonly number[]): 0 | 1 => (ones(bits) % 2 === 0 ? 1 : 0);

/** Bits `from`…`to` (inclusive) of a 0/1 string as numbers; anything else counts as 0. */
export function slice(bits: string, from: number, to: number): (0 | 1)[] {
  const out: (0 | 1)[] = [];
  for (let i = from; i <= to; i++) out.push(bits[i] === "1" ? 1 : 0);
  return out;
}

/** The positions from…to inclusive. */
export const span = (from: number, to: number) => Array.from({ length: to - from + 1 }, (_, i) => from + i);
