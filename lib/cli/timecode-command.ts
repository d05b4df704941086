import { readFileSync } from "node:fs";
import { parseArgs } from "node:util";
import { decodeFrame, describeFlags, encodeFrame, STANDARD_LABELS } from "@/lib/timecode/frames";
import { decodeInputSchema, distanceInputSchema, encodeInputSchema, pulseLogInputSchema } from "@/lib/timecode/inputs";
import { parsePulseCsv } from "@/lib/timecode/pulse-csv";
import { decodePulseLog, type PulseLogResult } from "@/lib/timecode/pulses";
import { transmitterDistance } from "@/lib/timecode/transmitters";
import type { FrameDecode } from "@/lib/timecode/types";
import { CliError, kebabFlag, parseCliInput, type CliCommand, type CliResult } from "./types";

const USAGE = `Usage:
  roostline timecode decode --standard dcf77|wwvb --bits STRING
  roostline timecode decode --standard msf --bits-a STRING --bits-b STRING
  roostline timecode encode --standard dcf77|msf|wwvb --time ISO-8601 [--dut1 SECONDS] [--leap-second-warning yes|no] [--call-bit yes|no]
  roostline timecode pulses --standard dcf77|msf|wwvb --file LOG.csv
  roostline timecode distance --standard dcf77|msf|wwvb --lat DEGREES --lon DEGREES

Bit strings start with second 0; WWVB markers are M; spaces are ignored.
encode prints the frame that names the minute of --time (DCF77 and MSF send it the minute before).
pulses reads a CSV log "start_ms,width_ms" (one pulse a line) and reports each minute frame.
Add --json for the full result.`;

// parseArgs reads "--lon -104.99" as two options; join a negative number to its option first.
const joinNegatives = (args: string[]) =>
  args.reduce<string[]>((out, a, i) => {
    const prev = args[i - 1];
    if (/^-\d/.test(a) && prev?.startsWith("--") && !prev.includes("=")) out[out.length - 1] = `${prev}=${a}`;
    else out.push(a);
    return out;
  }, []);

const parse = (args: string[], names: string[]) =>
  parseArgs({ args: joinNegatives(args), options: Object.fromEntries(names.map((n) => [n, { type: "string" as const }])), strict: true, allowPositionals: false }).values;

function decodeText(r: FrameDecode): string {
  const failed = r.checks.filter((c) => !c.ok);
  const head = `${STANDARD_LABELS[r.standard]} frame: ${failed.length ? `${failed.length} of ${r.checks.length} checks FAILED` : `all ${r.checks.length} checks pass`}`;
  const i = r.instant;
  const when = i.local
    ? `Names ${i.local}${i.zone ? ` (${i.zone})` : ""}${i.utc && i.zone !== "UTC" ? ` = ${i.utc}` : ""}, the ${r.names}`
    : `Fields: ${i.year}-${i.month}-${i.day} ${i.hour}:${i.minute} (not a valid time)`;
  const flags = describeFlags(r.flags);
  const checks = r.checks.map((c) => `  ${c.ok ? "ok    " : "FAILED"}  ${c.label} (${c.detail})`);
  return [head, when, ...(flags.length ? [`Flags: ${flags.join(", ")}`] : []), "Checks:", ...checks].join("\n");
}

function pulsesText(r: PulseLogResult): string {
  const lines = [`${STANDARD_LABELS[r.standard]} pulse log: ${r.pulseCount} pulses, ${r.summary.frames} frames, ${r.summary.complete} complete, ${r.summary.ok} good`];
  for (const f of r.frames) {
    const when = f.decode?.instant.local ? ` names ${f.decode.instant.local}` : "";
    lines.push(`Frame ${f.index + 1} at ${f.startMs} ms: ${f.ok ? "good" : "not usable"}${when}`);
    for (const i of f.issues) lines.push(`  ${i.kind}: ${i.message}`);
  }
  return lines.join("\n");
}

function decode(args: string[]): CliResult {
  const v = parse(args, ["standard", "bits", "bits-a", "bits-b"]);
  const input = parseCliInput(decodeInputSchema, { standard: v.standard, bits: v.bits, bitsA: v["bits-a"], bitsB: v["bits-b"] }, kebabFlag);
  const r = decodeFrame(input);
  return { text: decodeText(r), json: r };
}

function encode(args: string[]): CliResult {
  const v = parse(args, ["standard", "time", "dut1", "leap-second-warning", "call-bit"]);
  const input = parseCliInput(encodeInputSchema, { standard: v.standard, time: v.time, dut1: v.dut1, leapSecondWarning: v["leap-second-warning"], callBit: v["call-bit"] }, kebabFlag);
  const f = encodeFrame(input.standard, input.time, input);
  const bits = f.bits !== undefined ? [`bits: ${f.bits}`] : [`A:    ${f.bitsA}`, `B:    ${f.bitsB}`];
  return { text: [`${STANDARD_LABELS[f.standard]} frame naming ${f.utc}, sent during the minute from ${f.sentFrom}`, ...bits].join("\n"), json: f };
}

function pulses(args: string[]): CliResult {
  const v = parse(args, ["standard", "file"]);
  if (!v.file) throw new CliError("--file: give the path of a CSV pulse log (start_ms,width_ms)");
  let text: string;
  try {
    text = readFileSync(v.file, "utf8");
  } catch {
    throw new CliError(`--file: cannot read ${v.file}`);
  }
  const csv = parsePulseCsv(text);
  if (csv.issues[0]) throw new CliError(`--file: ${csv.issues[0].message}`);
  const parsed = pulseLogInputSchema.safeParse({ standard: v.standard, pulses: csv.pulses });
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    const [key, index, field] = issue.path;
    if (key === "standard") throw new CliError(`--standard: ${issue.message}`);
    throw new CliError(typeof index === "number" ? `--file: pulse ${index + 1} ${String(field)}: ${issue.message}` : `--file: ${issue.message}`);
  }
  const r = decodePulseLog(parsed.data.standard, parsed.data.pulses);
  return { text: pulsesText(r), json: r };
}

function distance(args: string[]): CliResult {
  const v = parse(args, ["standard", "lat", "lon"]);
  const input = parseCliInput(distanceInputSchema, v, kebabFlag);
  const d = transmitterDistance(input.standard, input);
  const t = d.transmitter;
  const text = [
    `${t.callSign} at ${t.site}: ${Math.round(d.distanceKm)} km, bearing ${Math.round(d.bearingDeg)}° from the site`,
    `Lay a ferrite-rod antenna along ${Math.round(d.rodAxisDeg)}°/${Math.round(d.rodAxisDeg + 180)}° (broadside to the transmitter).`,
    d.note,
  ].join("\n");
  return { text, json: d };
}

const ACTIONS: Record<string, (args: string[]) => CliResult> = { decode, encode, pulses, distance };

/** `roostline timecode …`: encode and decode DCF77/MSF/WWVB frames, diagnose pulse logs, transmitter distance. */
export const timecodeCommand: CliCommand = {
  summary: "Encode and decode DCF77, MSF and WWVB frames; diagnose a pulse log; distance to the transmitter",
  usage: USAGE,
  run(args) {
    const [action, ...rest] = args;
    const fn = action ? ACTIONS[action] : undefined;
    if (!fn) throw new CliError(`${action ? `unknown action "${action}"` : "no action given"}; use decode, encode, pulses or distance`);
    return fn(rest);
  },
};
