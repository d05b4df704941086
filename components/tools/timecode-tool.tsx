"use client";
import { useState } from "react";
import { SelectField } from "@/components/ui/field";
import { Notice, Panel } from "@/components/ui/surface";
import { STANDARD_LABELS } from "@/lib/timecode/frames";
import { standardSchema } from "@/lib/timecode/inputs";
import { STANDARDS, type Standard } from "@/lib/timecode/types";
import { TimecodeDistance } from "./timecode-distance";
import { TimecodeFrame } from "./timecode-frame";
import { TimecodePulses } from "./timecode-pulses";

/** The time-code tool: one standard chosen, then frames, distance and pulse-log diagnosis for it. */
export function TimecodeTool({ initialTime }: { initialTime: string }) {
  const [standard, setStandard] = useState<Standard>("dcf77");
  return (
    <div className="space-y-6">
      <Panel>
        <div className="max-w-sm">
          <SelectField
            label="Time signal"
            name="standard"
            value={standard}
            onChange={(e) => {
              const parsed = standardSchema.safeParse(e.target.value);
              if (parsed.success) setStandard(parsed.data);
            }}
            options={STANDARDS.map((s) => ({ value: s, label: STANDARD_LABELS[s] }))}
            hint="DCF77 sends CET/CEST, MSF UK time (GMT/BST), WWVB UTC."
          />
        </div>
      </Panel>
      <TimecodeFrame standard={standard} initialTime={initialTime} />
      <TimecodeDistance standard={standard} />
      <TimecodePulses standard={standard} />
      <Notice tone="info" title="Using a decoded time on a door controller">
        <p>
          One frame that passes its checks can still be wrong: WWVB has no parity at all, and DCF77 and MSF parity misses an even number of flipped bits. Accept a time only when two or more consecutive frames agree, one minute apart, and keep the clock running on its own between good frames (common practice).
        </p>
        <p className="mt-2">
          A wrong clock moves the schedule: a door that closes early shuts birds out. Stall detection on the door is a second line of defence, not a guarantee; follow local rules and licensed practice for powered doors where animals or people can be trapped, for mains wiring and for animal welfare.
        </p>
      </Notice>
    </div>
  );
}
