"use client";
import { useDeferredValue, useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import { Badge, DataTable, Notice, Panel, Td } from "@/components/ui/surface";
import { pulseLogInputSchema } from "@/lib/timecode/inputs";
import type { Pulse } from "@/lib/timecode/pulse-classify";
import { formatPulseCsv, parsePulseCsv } from "@/lib/timecode/pulse-csv";
import { addNoise, synthPulseLog } from "@/lib/timecode/pulse-synth";
import { decodePulseLog, type PulseLogResult } from "@/lib/timecode/pulses";
import type { Standard } from "@/lib/timecode/types";
import { PulsePlot } from "./timecode-pulse-plot";

const EXAMPLE_FROM = Date.UTC(2026, 2, 29, 0, 58);

function example(standard: Standard, noisy: boolean): string {
  const clean = synthPulseLog({ standard, firstMinuteUtcMs: EXAMPLE_FROM, minutes: 4, leadInSeconds: 12, startMs: 20_000 });
  if (!noisy) return formatPulseCsv(clean);
  return formatPulseCsv(addNoise(clean, { seed: 42, startJitterMs: 8, widthJitterMs: 25, drop: [40], widths: { 130: 150 }, extra: [{ startMs: 200_450, widthMs: 30 }] }));
}

/** Paste a receiver's pulse log (CSV) and see each minute frame decoded and diagnosed. */
export function TimecodePulses({ standard }: { standard: Standard }) {
  const [text, setText] = useState("");
  const [selected, setSelected] = useState(0);
  const deferred = useDeferredValue(text);
  const analysis = useMemo((): { error?: string; pulses?: Pulse[]; result?: PulseLogResult } | null => {
    if (!deferred.trim()) return null;
    const csv = parsePulseCsv(deferred);
    if (csv.issues.length) return { error: csv.issues.slice(0, 3).map((i) => i.message).join("; ") };
    const parsed = pulseLogInputSchema.safeParse({ standard, pulses: csv.pulses });
    if (!parsed.success) {
      const i = parsed.error.issues[0]!;
      const [, index, field] = i.path;
      return { error: typeof index === "number" ? `pulse ${index + 1} (${String(field)}): ${i.message}` : `pulses: ${i.message}` };
    }
    return { pulses: parsed.data.pulses, result: decodePulseLog(standard, parsed.data.pulses) };
  }, [standard, deferred]);
  const error = analysis?.error;
  const result = analysis?.result ?? null;
  const frame = result?.frames[Math.min(selected, result.frames.length - 1)];

  return (
    <Panel>
      <h2 className="mb-1 text-lg font-semibold">Diagnose a pulse log</h2>
      <p className="mb-3 text-sm text-loam-600 dark:text-loam-400">
        One pulse a line as <code>start_ms,width_ms</code>: when the receiver output went active and for how long, from the controller&apos;s millisecond clock.
      </p>
      <div className="mb-2 flex flex-wrap gap-2">
        <Button variant="secondary" size="sm" onClick={() => setText(example(standard, false))}>
          Load a clean example
        </Button>
        <Button variant="secondary" size="sm" onClick={() => setText(example(standard, true))}>
          Load a noisy example
        </Button>
      </div>
      <label htmlFor="timecode-pulses" className="mb-1 block text-sm font-medium">
        Pulse log (CSV)
      </label>
      <textarea
        id="timecode-pulses"
        name="pulses"
        rows={8}
        value={text}
        onChange={(e) => setText(e.target.value)}
        spellCheck={false}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? "pulses-error" : "pulses-hint"}
        className="block w-full rounded-md border border-loam-200 bg-white px-3 py-2 font-mono text-sm text-loam-900 shadow-sm aria-[invalid=true]:border-ember-500 dark:border-loam-800 dark:bg-loam-900 dark:text-loam-50"
      />
      <p id="pulses-hint" className="mt-1 text-sm text-loam-600 dark:text-loam-400">
        A header line and # comments are skipped. At most 5000 pulses (about 80 minutes).
      </p>
      {error && (
        <p id="pulses-error" role="alert" className="mt-1 text-sm font-medium text-ember-700 dark:text-ember-100">
          {error}
        </p>
      )}
      {result && (
        <div className="mt-4 space-y-4">
          <p className="text-sm">
            {result.pulseCount} pulses · {result.summary.frames} frames · {result.summary.complete} complete · {result.summary.ok} good
          </p>
          {result.frames.length === 0 ? (
            <Notice tone="warn">No minute mark found: check the standard, and that the log covers at least one full minute.</Notice>
          ) : (
            <DataTable caption="Minute frames found in the log" headers={["Frame", "Second 0 at", "Status", "Names", "Problems"]}>
              {result.frames.map((f) => (
                <tr key={f.index} className={f.index === frame?.index ? "bg-dusk-50 dark:bg-dusk-900/40" : ""}>
                  <Td>
                    <Button variant="ghost" size="sm" onClick={() => setSelected(f.index)} aria-pressed={f.index === frame?.index}>
                      {f.index + 1}
                    </Button>
                  </Td>
                  <Td className="font-mono">{f.startMs} ms</Td>
                  <Td>
                    <Badge tone={f.ok ? "good" : f.complete ? "bad" : "warn"}>{f.ok ? "good" : f.complete ? "failed checks" : "incomplete"}</Badge>
                  </Td>
                  <Td className="font-mono">{f.decode?.instant.local ?? "—"}</Td>
                  <Td>
                    {f.issues.length === 0 ? (
                      "none"
                    ) : (
                      <ul className="list-disc pl-4">
                        {f.issues.map((i, k) => (
                          <li key={k}>{i.message}</li>
                        ))}
                      </ul>
                    )}
                  </Td>
                </tr>
              ))}
            </DataTable>
          )}
          {frame && analysis?.pulses && <PulsePlot standard={standard} frame={frame} pulses={analysis.pulses} />}
        </div>
      )}
    </Panel>
  );
}
