import { parseArgs } from "node:util";
import { computeDebounce } from "@/lib/drive/debounce";
import { formatEngineering as eng, formatNumber as f } from "@/lib/drive/eng-notation";
import { debounceInputSchema, stallInputSchema, travelInputSchema } from "@/lib/drive/inputs";
import { computeStall } from "@/lib/drive/stall";
import { computeTravel, type SpeedCase } from "@/lib/drive/travel";
import { TRAPPING_CAUTION, type DriveWarning } from "@/lib/drive/warnings";
import { CliError, kebabFlag, parseCliInput, type CliCommand } from "./types";

// Options are read as strings and validated by the same schema the page and the route use.
function readOptions(args: string[], keys: string[]): Record<string, string> {
  const options = Object.fromEntries(keys.map((k) => [kebabFlag(k).slice(2), { type: "string" as const }]));
  let values: Record<string, string | boolean | (string | boolean)[] | undefined>;
  try {
    values = parseArgs({ args, options, strict: true, allowPositionals: false }).values;
  } catch (err) {
    throw new CliError(err instanceof Error ? err.message.replace(/\n/g, " ") : String(err));
  }
  const out: Record<string, string> = {};
  for (const k of keys) {
    const v = values[kebabFlag(k).slice(2)];
    if (typeof v === "string") out[k] = v;
  }
  return out;
}

function rows(pairs: [string, string][]): string {
  const width = Math.max(...pairs.map(([label]) => label.length));
  return pairs.map(([label, value]) => `  ${label.padEnd(width)}  ${value}`).join("\n");
}

function warningLines(warnings: DriveWarning[]): string[] {
  if (!warnings.length) return ["No warnings."];
  return ["Warnings:", ...warnings.map((w) => `  ${w.severity === "bad" ? "DANGER" : "warning"}: ${w.message} (${w.basis})`)];
}

function speedRows(label: string, c: SpeedCase): [string, string][] {
  return [
    [`${label}: motor shaft`, `${f(c.motorRpm)} rpm`],
    [`${label}: spool`, `${f(c.spoolRpm)} rpm`],
    [`${label}: count rate`, `${f(c.countRateCps)} counts/s`],
    [`${label}: travel time`, `${f(c.travelTimeS, 3)} s`],
    [`${label}: door speed`, `${f(c.doorSpeedMmS.mean, 3)} mm/s mean, ${f(c.doorSpeedMmS.max, 3)} mm/s at most`],
  ];
}

const travelKeys = Object.keys(travelInputSchema.shape);

export const travelCommand: CliCommand = {
  summary: "Encoder counts, resolution and travel time for a door's travel",
  usage: [
    "Usage: roostline travel --travel-mm N --spool-mm N [--cord-mm N] --gear-ratio N --ppr N [--decoding 1|2|4]",
    "         [--turns-per-layer N | --spool-width-mm N] [--motor-rpm N] [--timeout-s N] [--measured-cps N] [--counts N] [--json]",
    "",
    "  --travel-mm        door travel, open end to closed end (mm)",
    "  --spool-mm         spool core diameter (mm)",
    "  --cord-mm          cord thickness (mm, default 0); effective diameter = spool + cord, +2 × cord per full layer",
    "  --turns-per-layer  turns that fit on one layer (default: everything on one layer)",
    "  --spool-width-mm   or the spool's width: turns per layer = width ÷ cord, rounded down",
    "  --gear-ratio       motor revolutions per spool revolution",
    "  --ppr              encoder pulses per motor-shaft revolution",
    "  --decoding         quadrature edges counted: 1, 2 or 4 (default 4)",
    "  --motor-rpm        motor shaft speed, for travel time and door speed",
    "  --timeout-s        the controller's travel timeout, checked against the travel time",
    "  --measured-cps     a measured count rate, converted to motor speed",
    "  --counts           a count from the open end, converted to travel (mm)",
  ].join("\n"),
  run(args) {
    const input = parseCliInput(travelInputSchema, readOptions(args, travelKeys), kebabFlag);
    const r = computeTravel(input);
    const winding =
      r.model === "single-layer"
        ? `single layer, effective diameter ${f(r.diameterMm.first)} mm`
        : `${r.turnsPerLayer} turns per layer, ${r.layersUsed} layer(s), effective diameter ${f(r.diameterMm.first)}–${f(r.diameterMm.last)} mm`;
    const pairs: [string, string][] = [
      ["Winding", winding],
      ["Counts per motor revolution", `${f(r.countsPerMotorRev)} (${input.ppr} PPR × ${input.decoding})`],
      ["Counts per spool revolution", `${f(r.countsPerSpoolRev)} (× gear ratio ${f(input.gearRatio)})`],
      ["Spool turns for the travel", f(r.spoolTurns)],
      ["Counts for the travel", `${r.countsRounded} (${f(r.counts, 7)})`],
      ["Counts per mm", r.model === "single-layer" ? f(r.countsPerMm.mean) : `${f(r.countsPerMm.mean)} mean (${f(r.countsPerMm.min)}–${f(r.countsPerMm.max)})`],
      ["mm per count", r.model === "single-layer" ? f(r.mmPerCount.mean) : `${f(r.mmPerCount.mean)} mean, ${f(r.mmPerCount.max)} at most`],
    ];
    if (r.fromCounts) {
      pairs.push([`${f(r.fromCounts.counts, 7)} counts`, `${f(r.fromCounts.fromOpenMm)} mm from the open end (${f(r.fromCounts.fromClosedMm)} mm from the closed end)`]);
    }
    if (r.atMotorRpm) pairs.push(...speedRows("At motor speed", r.atMotorRpm));
    if (r.atMeasuredRate) pairs.push(...speedRows("At measured rate", r.atMeasuredRate));
    if (r.timeoutS !== null) pairs.push(["Travel timeout", `${f(r.timeoutS)} s`]);
    const text = [`Door travel ${f(input.travelMm)} mm`, rows(pairs), "", ...warningLines(r.warnings)].join("\n");
    return { text, json: { input, result: r } };
  },
};

const stallKeys = Object.keys(stallInputSchema.shape);

export const stallCommand: CliCommand = {
  summary: "Stall threshold, start-up blanking and reaction distance",
  usage: [
    "Usage: roostline stall --nominal-cps N --fraction F --window-ms N [--counts-per-mm N] [--ramp-ms N] [--latency-ms N] [--json]",
    "",
    "  --nominal-cps    count rate at normal running speed (counts/s)",
    "  --fraction       stall when the speed falls below this share of nominal (0 < F < 1)",
    "  --window-ms      counting window (ms)",
    "  --counts-per-mm  encoder counts per mm of door travel, for the reaction distance in mm",
    "  --ramp-ms        time from rest to nominal speed (default: 250 ms assumed)",
    "  --latency-ms     time to evaluate, cut the drive and coast (default 0)",
  ].join("\n"),
  run(args) {
    const input = parseCliInput(stallInputSchema, readOptions(args, stallKeys), kebabFlag);
    const r = computeStall(input);
    const distance = (counts: number, mm: number | null) => `${f(counts, 3)} counts${mm === null ? "" : ` = ${f(mm, 3)} mm`}`;
    const pairs: [string, string][] = [
      ["Threshold", `${f(r.thresholdCps)} counts/s = ${f(r.thresholdCountsPerWindow)} counts per ${f(input.windowMs)} ms window`],
      ["Nominal per window", `${f(r.nominalCountsPerWindow)} counts`],
      ["Ramp to nominal", `${f(r.rampMs)} ms${r.rampAssumed ? " (assumed)" : ""}; threshold speed after ${f(r.timeToThresholdMs, 3)} ms`],
      ["Start-up blanking", `${f(r.blankingMs, 3)} ms at least (time to threshold + one window)`],
      ["Reaction distance", `${distance(r.reaction.counts, r.reaction.mm)} in ${f(r.reaction.timeMs, 3)} ms (window + latency at nominal speed)`],
      ["If the door slows gradually", `${distance(r.slowingWorstCase.counts, r.slowingWorstCase.mm)} in up to ${f(r.slowingWorstCase.timeMs, 3)} ms`],
    ];
    const text = ["Stall check", rows(pairs), "", ...warningLines(r.warnings), "", `Caution: ${TRAPPING_CAUTION}`].join("\n");
    return { text, json: { input, result: r, caution: TRAPPING_CAUTION } };
  },
};

const debounceKeys = Object.keys(debounceInputSchema.shape);

export const debounceCommand: CliCommand = {
  summary: "RC + Schmitt-trigger debounce delays and software sampling",
  usage: [
    "Usage: roostline debounce --r1-ohm N --r2-ohm N --c-farad N --vcc N --vt-plus N --vt-minus N",
    "         [--target-ms N] [--sample-period-ms N --stable-samples N] [--json]",
    "",
    "  Circuit: Vcc - R1 - contact to ground; R2 from that node to C (to ground) and the Schmitt input.",
    "  t_close = R2·C·ln(Vcc / VT-)      t_open = (R1 + R2)·C·ln(Vcc / (Vcc - VT+))",
    "  Values take engineering notation: 10k, 4k7, 100n, 1u, 2.2uF.",
    "",
    "  --target-ms         a wanted delay: the C (or R) that gives it",
    "  --sample-period-ms  software debounce: time between samples",
    "  --stable-samples    software debounce: equal samples needed to accept a level",
  ].join("\n"),
  run(args) {
    const input = parseCliInput(debounceInputSchema, readOptions(args, debounceKeys), kebabFlag);
    const r = computeDebounce(input);
    const ms = (s: number) => `${f(s * 1000)} ms`;
    const pairs: [string, string][] = [
      ["Closing delay", `${ms(r.closeDelayS)} = R2·C·ln(Vcc/VT-), τ = ${ms(r.tauCloseS)}`],
      ["Opening delay", `${ms(r.openDelayS)} = (R1+R2)·C·ln(Vcc/(Vcc-VT+)), τ = ${ms(r.tauOpenS)}`],
      ["Contact current", `${eng(r.holdCurrentA, "A")} steady through R1; ${eng(r.peakDischargeA, "A")} peak from C through R2 at closing`],
    ];
    if (r.design) {
      const d = r.design;
      pairs.push(
        [`C for ${ms(d.targetS)} closing`, `${eng(d.cForCloseF, "F")} with R2 = ${eng(input.r2Ohm, "Ω")}`],
        [`C for ${ms(d.targetS)} opening`, `${eng(d.cForOpenF, "F")} with R1 + R2 = ${eng(input.r1Ohm + input.r2Ohm, "Ω")}`],
        [`R2 for ${ms(d.targetS)} closing`, `${eng(d.r2ForCloseOhm, "Ω")} with C = ${eng(input.cFarad, "F")}`],
        [`R1 for ${ms(d.targetS)} opening`, d.r1ForOpenOhm === null ? "not reachable: R2 alone already gives a longer delay" : `${eng(d.r1ForOpenOhm, "Ω")} with C and R2 as given`],
        ["Preferred C (E6, rounded up)", `${eng(d.cPreferredF, "F")}: closing ${ms(d.closeDelayWithPreferredS)}, opening ${ms(d.openDelayWithPreferredS)}`],
      );
    }
    if (r.software) {
      const s = r.software;
      pairs.push(["Software debounce", `${f(s.acceptMs)} ms = ${f(s.samplePeriodMs)} ms × ${s.stableSamples} samples (stable at least ${f(s.shortestStableMs)} ms)`]);
    }
    const text = ["Debounce", rows(pairs), "", ...warningLines(r.warnings)].join("\n");
    return { text, json: { input, result: r } };
  },
};
