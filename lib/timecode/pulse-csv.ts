// Pulse logs as CSV text ("start_ms,width_ms", one pulse a line), as a controller's serial log gives them.
import type { Pulse } from "./pulse-classify";

export type CsvIssue = { line: number; message: string };

const NUMBER = /^-?\d+(\.\d+)?$/;

/** Parses "start_ms,width_ms" lines; a header line, blank lines and `#` comments are skipped. */
export function parsePulseCsv(text: string): { pulses: Pulse[]; issues: CsvIssue[] } {
  const pulses: Pulse[] = [];
  const issues: CsvIssue[] = [];
  text.split(/\r?\n/).forEach((raw, i) => {
    const line = raw.trim();
    if (!line || line.startsWith("#")) return;
    const cells = line.split(/[,;\t]/).map((c) => c.trim());
    if (i === 0 && !NUMBER.test(cells[0] ?? "")) return;
    if (cells.length < 2) {
      issues.push({ line: i + 1, message: `line ${i + 1}: expected start_ms,width_ms` });
      return;
    }
    const [start, width] = cells as [string, string];
    if (!NUMBER.test(start) || !NUMBER.test(width)) {
      issues.push({ line: i + 1, message: `line ${i + 1}: "${line.slice(0, 40)}" is not two numbers` });
      return;
    }
    pulses.push({ startMs: Number(start), widthMs: Number(width) });
  });
  return { pulses, issues };
}

/** Writes pulses as CSV with a header line. */
export function formatPulseCsv(pulses: readonly Pulse[]): string {
  return ["start_ms,width_ms", ...pulses.map((p) => `${p.startMs},${p.widthMs}`)].join("\n") + "\n";
}
