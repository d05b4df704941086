// Resistor and capacitor values are written the way they are printed on parts lists: 10k, 4k7, 100n, 2.2µF.

const PREFIX: Record<string, number> = {
  p: 1e-12,
  n: 1e-9,
  u: 1e-6,
  µ: 1e-6,
  μ: 1e-6,
  m: 1e-3,
  k: 1e3,
  K: 1e3,
  M: 1e6,
  G: 1e9,
};

const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
// Case matters: m is milli, M is mega, so the unit words are spelled out rather than matched case-blind.
const WITH_PREFIX = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*([pnuµμmkKMG]?)\s*(?:Ω|ohms?|Ohms?|F|V|s)?$/;
// "4k7" style (IEC 60062 letter code): the prefix letter stands where the decimal point goes; R marks units.
const LETTER_CODE = /^(\d+)([pnuµμmkKMGR])(\d+)\s*(?:Ω|ohms?|Ohms?|F)?$/;

/** A plain decimal number ("12", "-0.5", "1e3"), or undefined when the text is not one. */
export function parseDecimal(text: string): number | undefined {
  const s = text.trim();
  return DECIMAL.test(s) ? Number(s) : undefined;
}

/** A number in engineering notation ("10k", "4k7", "100n", "2.2 µF", "1e-6"), or undefined. */
export function parseEngineering(text: string): number | undefined {
  const s = text.trim();
  const coded = LETTER_CODE.exec(s);
  if (coded) {
    const [, whole, letter, fraction] = coded as unknown as [string, string, string, string];
    const scale = letter === "R" ? 1 : (PREFIX[letter] ?? 1);
    return Number(`${whole}.${fraction}`) * scale;
  }
  const m = WITH_PREFIX.exec(s);
  if (!m) return undefined;
  const value = Number(m[1]);
  const prefix = m[2] ?? "";
  return prefix ? value * (PREFIX[prefix] ?? 1) : value;
}

const FORMAT_STEPS: [number, string][] = [
  [1e9, "G"],
  [1e6, "M"],
  [1e3, "k"],
  [1, ""],
  [1e-3, "m"],
  [1e-6, "µ"],
  [1e-9, "n"],
  [1e-12, "p"],
];

/** A value with an SI prefix and three significant figures: 1.2e-6, "F" → "1.20 µF". */
export function formatEngineering(value: number, unit: string, digits = 3): string {
  if (!Number.isFinite(value)) return `— ${unit}`;
  if (value === 0) return `0 ${unit}`;
  const abs = Math.abs(value);
  const [scale, prefix] = FORMAT_STEPS.find(([s]) => abs >= s * 0.9995) ?? FORMAT_STEPS[FORMAT_STEPS.length - 1]!;
  return `${(value / scale).toPrecision(digits)} ${prefix}${unit}`;
}

/** A number rounded to `significant` figures for display, without exponent noise ("12.04", "3600"). */
export function formatNumber(value: number, significant = 4): string {
  if (!Number.isFinite(value)) return "—";
  if (value === 0) return "0";
  return String(Number(value.toPrecision(significant)));
}
