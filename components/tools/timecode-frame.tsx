"use client";
import { useDeferredValue, useMemo, useState, type ChangeEvent } from "react";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice, Panel } from "@/components/ui/surface";
import { decodeFrame, encodeFrame } from "@/lib/timecode/frames";
import { decodeInputSchema, encodeInputSchema } from "@/lib/timecode/inputs";
import type { Standard } from "@/lib/timecode/types";
import { BitTable, FrameSummary } from "./timecode-frame-table";

type Form = { time: string; dut1: string; leapSecondWarning: string; bits: string; bitsA: string; bitsB: string };
type Mode = "encode" | "decode";

function errorsOf(issues: readonly { path: PropertyKey[]; message: string }[] | undefined): Partial<Record<keyof Form, string>> {
  const out: Partial<Record<keyof Form, string>> = {};
  for (const i of issues ?? []) {
    const key = i.path[0] as keyof Form | undefined;
    if (key && !out[key]) out[key] = i.message;
  }
  return out;
}

const BIT_HINT: Record<Standard, string> = {
  dcf77: "59 bits, bit 0 first (60 in a leap-second minute). Spaces are ignored.",
  msf: "",
  wwvb: "60 symbols, second 0 first: 0, 1, and M at 0, 9, 19, 29, 39, 49, 59. Spaces are ignored.",
};

/** Encode a time into a frame or paste a frame to decode; the decoded table updates as you type. */
export function TimecodeFrame({ standard, initialTime }: { standard: Standard; initialTime: string }) {
  const [mode, setMode] = useState<Mode>("encode");
  const [form, setForm] = useState<Form>({ time: initialTime, dut1: "", leapSecondWarning: "no", bits: "", bitsA: "", bitsB: "" });
  const deferred = useDeferredValue(form);
  const set = (name: keyof Form) => (e: ChangeEvent<HTMLInputElement | HTMLSelectElement>) => setForm((f) => ({ ...f, [name]: e.target.value }));

  const encoded = useMemo(() => {
    const parsed = encodeInputSchema.safeParse({ standard, time: deferred.time, dut1: deferred.dut1.trim() || undefined, leapSecondWarning: deferred.leapSecondWarning });
    return parsed.success ? { frame: encodeFrame(standard, parsed.data.time, parsed.data), errors: {} } : { frame: null, errors: errorsOf(parsed.error.issues) };
  }, [standard, deferred.time, deferred.dut1, deferred.leapSecondWarning]);

  const decoded = useMemo(() => {
    if (mode === "encode") return encoded.frame ? { result: decodeFrame(encoded.frame), errors: {} } : { result: null, errors: {} };
    const parsed = decodeInputSchema.safeParse({ standard, bits: deferred.bits, bitsA: deferred.bitsA, bitsB: deferred.bitsB });
    return parsed.success ? { result: decodeFrame(parsed.data), errors: {} } : { result: null, errors: errorsOf(parsed.error.issues) };
  }, [mode, standard, encoded.frame, deferred.bits, deferred.bitsA, deferred.bitsB]);

  const errors = { ...encoded.errors, ...decoded.errors };
  const editEncoded = () => {
    const f = encoded.frame;
    if (!f) return;
    setForm((x) => ({ ...x, bits: f.bits ?? x.bits, bitsA: f.bitsA ?? x.bitsA, bitsB: f.bitsB ?? x.bitsB }));
    setMode("decode");
  };
  const mono = { className: "font-mono", autoComplete: "off", spellCheck: false };

  return (
    <div className="space-y-6">
      <Panel>
        <fieldset className="mb-4 flex flex-wrap gap-4 text-sm">
          <legend className="mb-2 text-sm font-medium">What to do</legend>
          {(["encode", "decode"] as const).map((m) => (
            <label key={m} className="inline-flex items-center gap-2">
              <input type="radio" name="timecode-mode" value={m} checked={mode === m} onChange={() => setMode(m)} />
              {m === "encode" ? "Encode a time" : "Decode bits"}
            </label>
          ))}
        </fieldset>
        <form noValidate onSubmit={(e) => e.preventDefault()} aria-label={mode === "encode" ? "Encode a time" : "Decode bits"} className="grid gap-4 md:grid-cols-3">
          {mode === "encode" ? (
            <>
              <TextField label="Time (ISO-8601)" name="time" value={form.time} onChange={set("time")} error={errors.time} hint="With an offset: 2026-03-29T01:00:00Z or 2026-03-29T03:00+02:00." {...mono} />
              {standard !== "dcf77" && <TextField label="DUT1 (s)" name="dut1" inputMode="decimal" value={form.dut1} onChange={set("dut1")} error={errors.dut1} hint="UT1 − UTC, −0.9 to 0.9 in steps of 0.1; empty for 0." />}
              {standard !== "msf" && (
                <SelectField
                  label="Leap second warning"
                  name="leapSecondWarning"
                  value={form.leapSecondWarning}
                  onChange={set("leapSecondWarning")}
                  error={errors.leapSecondWarning}
                  options={[
                    { value: "no", label: "No" },
                    { value: "yes", label: standard === "dcf77" ? "Yes, at the end of this hour" : "Yes, at the end of this month" },
                  ]}
                />
              )}
            </>
          ) : standard === "msf" ? (
            <>
              <TextField label="A bits" name="bitsA" value={form.bitsA} onChange={set("bitsA")} error={errors.bitsA} hint="60 bits, second 0 first." {...mono} />
              <TextField label="B bits" name="bitsB" value={form.bitsB} onChange={set("bitsB")} error={errors.bitsB} hint="60 bits, second 0 first." {...mono} />
            </>
          ) : (
            <div className="md:col-span-3">
              <TextField label="Bits" name="bits" value={form.bits} onChange={set("bits")} error={errors.bits} hint={BIT_HINT[standard]} {...mono} />
            </div>
          )}
        </form>
        {mode === "encode" && encoded.frame && (
          <div className="mt-4 space-y-2">
            <p className="text-sm text-loam-600 dark:text-loam-400">
              Frame naming {encoded.frame.utc}, sent during the minute from {encoded.frame.sentFrom}:
            </p>
            <pre className="overflow-x-auto rounded-md bg-loam-50 p-3 font-mono text-sm dark:bg-loam-950" aria-label="Encoded bits">
              {encoded.frame.bits ?? `A ${encoded.frame.bitsA}\nB ${encoded.frame.bitsB}`}
            </pre>
            <Button variant="secondary" size="sm" onClick={editEncoded}>
              Edit these bits to see the checks react
            </Button>
          </div>
        )}
      </Panel>

      {decoded.result ? (
        <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
          <Panel>
            <h2 className="mb-3 text-lg font-semibold">Decoded minute</h2>
            <FrameSummary result={decoded.result} />
          </Panel>
          <Panel>
            <h2 className="mb-3 text-lg font-semibold">Bit table</h2>
            <BitTable result={decoded.result} />
          </Panel>
        </div>
      ) : (
        <Notice tone="warn">{mode === "encode" ? "Correct the highlighted fields to see the frame." : "Paste a frame, or encode a time and edit its bits, to see it decoded."}</Notice>
      )}
    </div>
  );
}
