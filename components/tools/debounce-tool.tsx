"use client";

import { TextField } from "@/components/ui/field";
import { Panel } from "@/components/ui/surface";
import { BOUNCE_MOST_MS, computeDebounce, type DebounceResult } from "@/lib/drive/debounce";
import { formatEngineering as eng, formatNumber as f } from "@/lib/drive/eng-notation";
import { debounceInputSchema, type DebounceInput } from "@/lib/drive/inputs";
import { DebouncePlot } from "./drive-debounce-plot";
import { DebounceSchematic } from "./drive-debounce-schematic";
import { ToolLayout, useToolForm } from "./drive-form";
import { FieldGroup, FixFields, Formulas, KeyFigure, ResultList, WarningList } from "./drive-parts";

const INITIAL = {
  r1Ohm: "10k",
  r2Ohm: "10k",
  cFarad: "1u",
  vcc: "5",
  vtPlus: "3",
  vtMinus: "1.5",
  targetMs: "20",
  samplePeriodMs: "5",
  stableSamples: "4",
};

const ms = (s: number) => `${f(s * 1000, 4)} ms`;

/** Debounce calculator: RC delays for both contact edges, values for a wanted delay, software sampling. */
export function DebounceTool({ initial = {} }: { initial?: Record<string, string> }) {
  const { data, field, values } = useToolForm(debounceInputSchema, { ...INITIAL, ...initial });
  const r = data ? computeDebounce(data) : null;
  const text = { autoComplete: "off", spellCheck: false };
  return (
    <ToolLayout
      form={
        <>
          <FieldGroup legend="Circuit">
            <TextField label="R1, pull-up (Ω)" hint="Engineering notation: 10k, 4k7, 1M" {...text} {...field("r1Ohm")} />
            <TextField label="R2, to the capacitor (Ω)" {...text} {...field("r2Ohm")} />
            <TextField label="C (F)" hint="For example 1u, 470n, 2.2µ" {...text} {...field("cFarad")} />
          </FieldGroup>
          <FieldGroup legend="Schmitt-trigger input">
            <TextField label="Vcc (V)" {...text} {...field("vcc")} />
            <TextField label="VT+, rising threshold (V)" hint="Use the data sheet's lowest figure (shortest opening delay)" {...text} {...field("vtPlus")} />
            <TextField label="VT−, falling threshold (V)" hint="Use the data sheet's highest figure (shortest closing delay)" {...text} {...field("vtMinus")} />
          </FieldGroup>
          <FieldGroup legend="Design (optional)">
            <TextField label="Wanted delay (ms)" hint="Gives the C or R that reaches it" inputMode="decimal" {...text} {...field("targetMs")} />
            <TextField label="Software sample period (ms)" inputMode="decimal" {...text} {...field("samplePeriodMs")} />
            <TextField label="Stable samples to accept" inputMode="numeric" {...text} {...field("stableSamples")} />
          </FieldGroup>
        </>
      }
    >
        <Panel>
          <h2 className="mb-3 text-lg font-semibold">Circuit</h2>
          <DebounceSchematic r1={label(data?.r1Ohm, values.r1Ohm, "Ω")} r2={label(data?.r2Ohm, values.r2Ohm, "Ω")} c={label(data?.cFarad, values.cFarad, "F")} />
          <div className="mt-4">
            <Formulas
              lines={["t_close = R2 · C · ln(Vcc / VT−)", "t_open = (R1 + R2) · C · ln(Vcc / (Vcc − VT+))", "software: accepted after sample period × stable samples"]}
            />
          </div>
        </Panel>
        {r && data ? <DebounceResults r={r} input={data} /> : <FixFields />}
        <Panel>
          <h2 className="mb-2 text-lg font-semibold">How long contacts bounce</h2>
          <p className="text-sm text-loam-600 dark:text-loam-400">
            A published measurement of many switches (recalled from memory, not looked up) found most settled within about {BOUNCE_MOST_MS} ms,
            while a few bounced for tens of milliseconds. Aim the slower of the delays above the
            bounce of the contact you fit; end-stop contacts and worn buttons bounce longer than new tactile switches. Both delays assume the
            capacitor had settled before the edge.
          </p>
        </Panel>
    </ToolLayout>
  );
}

function label(value: number | undefined, raw: string | undefined, unit: string): string {
  return value === undefined ? (raw ?? "") : eng(value, unit);
}

function DebounceResults({ r, input }: { r: DebounceResult; input: DebounceInput }) {
  const rows: [string, string][] = [
    ["Closing time constant R2·C", ms(r.tauCloseS)],
    ["Opening time constant (R1 + R2)·C", ms(r.tauOpenS)],
    ["Steady current, contact closed", eng(r.holdCurrentA, "A")],
    ["Peak current from C at closing", eng(r.peakDischargeA, "A")],
  ];
  const d = r.design;
  if (d) {
    rows.push(
      [`C for ${ms(d.targetS)} closing (R2 as given)`, eng(d.cForCloseF, "F")],
      [`C for ${ms(d.targetS)} opening (R1 + R2 as given)`, eng(d.cForOpenF, "F")],
      [`R2 for ${ms(d.targetS)} closing (C as given)`, eng(d.r2ForCloseOhm, "Ω")],
      [`R1 for ${ms(d.targetS)} opening (C, R2 as given)`, d.r1ForOpenOhm === null ? "not reachable: R2 alone is slower" : eng(d.r1ForOpenOhm, "Ω")],
      ["Preferred C for both edges (E6, rounded up)", `${eng(d.cPreferredF, "F")}: ${ms(d.closeDelayWithPreferredS)} / ${ms(d.openDelayWithPreferredS)}`],
    );
  }
  if (r.software) {
    rows.push(["Software debounce", `${f(r.software.acceptMs)} ms (${f(r.software.samplePeriodMs)} ms × ${r.software.stableSamples}), stable ≥ ${f(r.software.shortestStableMs)} ms`]);
  }
  return (
    <>
      <Panel>
        <h2 className="mb-3 text-lg font-semibold">Result</h2>
        <div className="mb-4 grid gap-3 sm:grid-cols-3">
          <KeyFigure label="Closing delay" value={f(r.closeDelayS * 1000, 4)} unit="ms" />
          <KeyFigure label="Opening delay" value={f(r.openDelayS * 1000, 4)} unit="ms" />
          {r.software && <KeyFigure label="Software debounce" value={f(r.software.acceptMs, 4)} unit="ms" />}
        </div>
        <ResultList rows={rows} />
      </Panel>
      <Panel>
        <h2 className="mb-3 text-lg font-semibold">Input voltage after each edge</h2>
        <DebouncePlot input={input} r={r} />
      </Panel>
      <Panel>
        <h2 className="mb-3 text-lg font-semibold">Checks</h2>
        <WarningList warnings={r.warnings} />
      </Panel>
    </>
  );
}
