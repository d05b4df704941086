"use client";

import { TextField } from "@/components/ui/field";
import { Panel } from "@/components/ui/surface";
import { formatNumber as f } from "@/lib/drive/eng-notation";
import { stallInputSchema } from "@/lib/drive/inputs";
import { computeStall, type Reach } from "@/lib/drive/stall";
import { NUMERIC_INPUT, ToolLayout, useToolForm } from "./drive-form";
import { FieldGroup, FixFields, Formulas, KeyFigure, ResultList, TrappingCaution, WarningList } from "./drive-parts";
import { StallTimeline } from "./drive-stall-timeline";

const INITIAL = { nominalCps: "1600", fraction: "0.5", windowMs: "50", countsPerMm: "20", rampMs: "", latencyMs: "20" };

const distance = (d: Reach) => `${f(d.counts, 3)} counts${d.mm === null ? "" : ` = ${f(d.mm, 3)} mm`} in ${f(d.timeMs, 3)} ms`;

/** Stall-check calculator: threshold, blanking and reaction distance, live. */
export function StallTool({ initial = {} }: { initial?: Record<string, string> }) {
  const { data, field } = useToolForm(stallInputSchema, { ...INITIAL, ...initial });
  const r = data ? computeStall(data) : null;
  const num = NUMERIC_INPUT;
  return (
    <ToolLayout
      form={
        <>
          <FieldGroup legend="Check">
            <TextField label="Nominal velocity (counts/s)" hint="Count rate in normal running; see the drive-train tool" {...num} {...field("nominalCps")} />
            <TextField label="Stall fraction" hint="Stall below this share of nominal, between 0 and 1" {...num} {...field("fraction")} />
            <TextField label="Window (ms)" hint="Counts are totalled over back-to-back windows" {...num} {...field("windowMs")} />
          </FieldGroup>
          <FieldGroup legend="Drive (optional)">
            <TextField label="Counts per mm" hint="For the reaction distance in mm" {...num} {...field("countsPerMm")} />
            <TextField label="Ramp time to nominal (ms)" hint="Empty: 250 ms assumed; measure on a cold day" {...num} {...field("rampMs")} />
            <TextField label="Evaluation latency (ms)" hint="Evaluate, cut the drive and coast to rest" {...num} {...field("latencyMs")} />
          </FieldGroup>
        </>
      }
    >
        {r && data ? (
          <>
            <Panel>
              <h2 className="mb-3 text-lg font-semibold">Result</h2>
              <div className="mb-4 grid gap-3 sm:grid-cols-3">
                <KeyFigure label="Threshold per window" value={f(r.thresholdCountsPerWindow, 4)} unit="counts" />
                <KeyFigure label="Blanking at start" value={f(r.blankingMs, 3)} unit="ms" />
                <KeyFigure
                  label="Reaction distance"
                  value={r.reaction.mm === null ? f(r.reaction.counts, 3) : f(r.reaction.mm, 3)}
                  unit={r.reaction.mm === null ? "counts" : "mm"}
                />
              </div>
              <ResultList
                rows={[
                  ["Threshold velocity", `${f(r.thresholdCps)} counts/s`],
                  ["Counts per window at nominal", f(r.nominalCountsPerWindow)],
                  ["One count of quantisation", `${f(r.quantisationShare * 100, 2)} % of the threshold`],
                  ["Ramp to nominal", `${f(r.rampMs)} ms${r.rampAssumed ? " (assumed)" : ""}`],
                  ["Threshold speed reached after", `${f(r.timeToThresholdMs, 3)} ms`],
                  ["Reaction distance (window + latency)", distance(r.reaction)],
                  ["If the door slows gradually", distance(r.slowingWorstCase)],
                ]}
              />
            </Panel>
            <Panel>
              <h2 className="mb-3 text-lg font-semibold">Start-up</h2>
              <StallTimeline r={r} fraction={data.fraction} windowMs={data.windowMs} />
            </Panel>
            <Panel>
              <h2 className="mb-3 text-lg font-semibold">Checks</h2>
              <WarningList warnings={r.warnings} />
              <div className="mt-3">
                <TrappingCaution />
              </div>
            </Panel>
          </>
        ) : (
          <FixFields />
        )}
        <Panel>
          <h2 className="mb-3 text-lg font-semibold">How it is worked out</h2>
          <Formulas
            lines={[
              "threshold = fraction × nominal   (counts/s)",
              "threshold per window = threshold × window",
              "blanking ≥ fraction × ramp + window",
              "reaction = nominal × (window + latency)",
              "slowing door, at most = nominal × ((1 + fraction) × window + latency)",
            ]}
          />
          <p className="mt-3 text-sm text-loam-600 dark:text-loam-400">
            The blanking rule assumes a linear ramp and that the first window judged must lie wholly after the threshold speed is reached; it is
            common practice, as are the limits of about 4 counts per window at the threshold and a fraction between 0.3 and 0.85. The reaction
            distance is the figure to compare with a bird under the door: a door that slows gradually can pass one window just above the threshold
            and only trip on the next.
          </p>
        </Panel>
    </ToolLayout>
  );
}
