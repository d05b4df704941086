"use client";

import { SelectField, TextField } from "@/components/ui/field";
import { DataTable, Panel, Td } from "@/components/ui/surface";
import { formatNumber as f } from "@/lib/drive/eng-notation";
import { travelInputSchema } from "@/lib/drive/inputs";
import { computeTravel, type SpeedCase, type TravelResult } from "@/lib/drive/travel";
import { NUMERIC_INPUT, ToolLayout, useToolForm } from "./drive-form";
import { FieldGroup, FixFields, Formulas, KeyFigure, ResultList, TrappingCaution, WarningList } from "./drive-parts";

const INITIAL = {
  travelMm: "300",
  spoolMm: "20",
  cordMm: "2",
  turnsPerLayer: "",
  spoolWidthMm: "",
  gearRatio: "30",
  ppr: "12",
  decoding: "4",
  motorRpm: "2000",
  timeoutS: "10",
  measuredCps: "",
  counts: "",
};

const DECODING_OPTIONS = [
  { value: "1", label: "×1 — one edge of A" },
  { value: "2", label: "×2 — both edges of A" },
  { value: "4", label: "×4 — both edges of A and B" },
];

/** Door travel and drive-train calculator: counts, resolution, travel time and speed, live. */
export function TravelTool({ initial = {} }: { initial?: Record<string, string> }) {
  const { data, field } = useToolForm(travelInputSchema, { ...INITIAL, ...initial });
  const result = data ? computeTravel(data) : null;
  const num = NUMERIC_INPUT;
  return (
    <ToolLayout
      form={
        <>
          <FieldGroup legend="Spool and cord">
            <TextField label="Door travel (mm)" hint="Open end stop to closed position" {...num} {...field("travelMm")} />
            <TextField label="Spool core diameter (mm)" {...num} {...field("spoolMm")} />
            <TextField label="Cord thickness (mm)" hint="0 for a thin line; adds to the winding diameter" {...num} {...field("cordMm")} />
            <TextField label="Turns per layer" hint="Leave this and the width empty for a single layer" {...num} {...field("turnsPerLayer")} />
            <TextField label="Spool width (mm)" hint="Or the width: turns per layer = width ÷ cord" {...num} {...field("spoolWidthMm")} />
          </FieldGroup>
          <FieldGroup legend="Gearbox and encoder">
            <TextField label="Gear ratio" hint="Motor turns per spool turn" {...num} {...field("gearRatio")} />
            <TextField label="Encoder PPR" hint="Pulses per motor-shaft revolution, one channel" {...num} {...field("ppr")} />
            <SelectField label="Decoding" options={DECODING_OPTIONS} {...field("decoding")} />
          </FieldGroup>
          <FieldGroup legend="Speed and timeout (optional)">
            <TextField label="Motor speed (rpm at the motor shaft)" {...num} {...field("motorRpm")} />
            <TextField label="Travel timeout (s)" {...num} {...field("timeoutS")} />
            <TextField label="Measured count rate (counts/s)" hint="From a controller log, to get the real motor speed" {...num} {...field("measuredCps")} />
            <TextField label="Count to convert" hint="Counts from the open end stop" {...num} {...field("counts")} />
          </FieldGroup>
        </>
      }
    >
{result ? <TravelResults r={result} /> : <FixFields />}
    </ToolLayout>
  );
}

function speedRows(label: string, c: SpeedCase): [string, string][] {
  return [
    [`${label}: motor shaft`, `${f(c.motorRpm)} rpm`],
    [`${label}: spool`, `${f(c.spoolRpm)} rpm`],
    [`${label}: count rate`, `${f(c.countRateCps)} counts/s`],
    [`${label}: travel time`, `${f(c.travelTimeS, 3)} s`],
    [`${label}: door speed`, `${f(c.doorSpeedMmS.mean, 3)} mm/s mean, ${f(c.doorSpeedMmS.max, 3)} at most`],
  ];
}

function TravelResults({ r }: { r: TravelResult }) {
  const single = r.model === "single-layer";
  const rows: [string, string][] = [
    ["Winding", single ? `single layer, Ø ${f(r.diameterMm.first)} mm` : `${r.turnsPerLayer} turns/layer, ${r.layersUsed} layers, Ø ${f(r.diameterMm.first)}–${f(r.diameterMm.last)} mm`],
    ["Counts per motor revolution", f(r.countsPerMotorRev)],
    ["Counts per spool revolution", f(r.countsPerSpoolRev)],
    ["Spool turns for the travel", f(r.spoolTurns)],
    ["Counts for the travel (exact)", f(r.counts, 7)],
    ["Counts per mm", single ? f(r.countsPerMm.mean) : `${f(r.countsPerMm.mean)} mean (${f(r.countsPerMm.min)}–${f(r.countsPerMm.max)})`],
    ["mm per count", single ? f(r.mmPerCount.mean) : `${f(r.mmPerCount.mean)} mean, ${f(r.mmPerCount.max)} at most`],
  ];
  if (r.fromCounts) {
    rows.push([`${f(r.fromCounts.counts, 7)} counts from the open end`, `${f(r.fromCounts.fromOpenMm)} mm (${f(r.fromCounts.fromClosedMm)} mm from the closed end)`]);
  }
  if (r.atMotorRpm) rows.push(...speedRows("At motor speed", r.atMotorRpm));
  if (r.atMeasuredRate) rows.push(...speedRows("At measured rate", r.atMeasuredRate));
  const time = r.atMotorRpm ?? r.atMeasuredRate;
  return (
    <>
      <Panel>
        <h2 className="mb-3 text-lg font-semibold">Result</h2>
        <div className="mb-4 grid gap-3 sm:grid-cols-3">
          <KeyFigure label="Counts for the travel" value={String(r.countsRounded)} />
          <KeyFigure label={single ? "Counts per mm" : "Counts per mm, outer layer"} value={f(r.countsPerMm.min, 3)} />
          {time && <KeyFigure label="Travel time" value={f(time.travelTimeS, 3)} unit="s" />}
        </div>
        <ResultList rows={rows} />
      </Panel>
      <Panel>
        <h2 className="mb-3 text-lg font-semibold">Checks</h2>
        <WarningList warnings={r.warnings} />
        <div className="mt-3">
          <TrappingCaution />
        </div>
      </Panel>
      {!single && (
        <DataTable caption="Cord on each layer" headers={["Layer", "Diameter (mm)", "Turns", "Cord (mm)", "Counts per mm"]}>
          {r.layers.map((l) => (
            <tr key={l.layer}>
              <Td>{l.layer + 1}</Td>
              <Td className="font-mono tabular-nums">{f(l.diameterMm)}</Td>
              <Td className="font-mono tabular-nums">{f(l.turns)}</Td>
              <Td className="font-mono tabular-nums">{f(l.lengthMm)}</Td>
              <Td className="font-mono tabular-nums">{f(l.countsPerMm)}</Td>
            </tr>
          ))}
        </DataTable>
      )}
      <Panel>
        <h2 className="mb-3 text-lg font-semibold">How it is worked out</h2>
        <Formulas
          lines={[
            "counts per motor rev = PPR × decoding",
            "counts per spool rev = PPR × decoding × gear ratio",
            "winding diameter, layer k = spool + (2k + 1) × cord   (k = 0 on the bare core)",
            "spool turns: fill layer 0 (turns per layer × π × d₀ of cord), then layer 1, … until the travel is wound",
            "counts = spool turns × counts per spool rev",
            "travel time = spool turns × 60 × gear ratio ÷ motor rpm",
            "motor rpm = counts/s × 60 ÷ (PPR × decoding)",
            "door speed = spool rpm ÷ 60 × π × d",
          ]}
        />
        <p className="mt-3 text-sm text-loam-600 dark:text-loam-400">
          The cord is taken along its centreline and starts on the bare core with the door closed. A single layer is a helix whose pitch is
          ignored (well under 0.1 % for usual cords). ×1 counts one edge of channel A per cycle, ×2 both edges of A, ×4 both edges of A and B.
          Limits on motor speed (about 500–20,000 rpm), door speed (about 100 mm/s) and resolution (1 count per mm) are common practice, not a
          standard.
        </p>
      </Panel>
    </>
  );
}
