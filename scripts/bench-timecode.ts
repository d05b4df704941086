// Times 1,000 frame decodes of each time code, plus encodes and a pulse log:
// `npx tsx scripts/bench-timecode.ts [frames]`. Prints figures only; it checks nothing.
import { performance } from "node:perf_hooks";
import { decodeFrame, encodeFrame } from "@/lib/timecode/frames";
import { addNoise, synthPulseLog } from "@/lib/timecode/pulse-synth";
import { decodePulseLog } from "@/lib/timecode/pulses";
import { STANDARDS } from "@/lib/timecode/types";

const N = Number(process.argv[2] ?? 1000);
const FROM = Date.UTC(2026, 0, 1);
const MIN = 60_000;

const ms = (f: () => void) => {
  const t = performance.now();
  f();
  return performance.now() - t;
};

console.log(`${N} consecutive minutes from ${new Date(FROM).toISOString()}`);
for (const standard of STANDARDS) {
  const frames = Array.from({ length: N }, (_, k) => encodeFrame(standard, FROM + k * MIN));
  const encode = ms(() => {
    for (let k = 0; k < N; k++) encodeFrame(standard, FROM + k * MIN);
  });
  let bad = 0;
  const decode = ms(() => {
    for (const f of frames) if (!decodeFrame(f).ok) bad++;
  });
  // A second pass shows the cost once the JIT has compiled the decoder.
  const warm = ms(() => {
    for (const f of frames) decodeFrame(f);
  });
  const each = (t: number) => `${t.toFixed(1).padStart(6)} ms (${((t / N) * 1000).toFixed(1)} µs each)`;
  console.log(`${standard.padEnd(5)}  encode ${each(encode)}  decode ${each(decode)}, again ${each(warm)}  frames failing checks: ${bad}`);
}

const MINUTES = 60;
for (const standard of STANDARDS) {
  const log = addNoise(synthPulseLog({ standard, firstMinuteUtcMs: FROM, minutes: MINUTES, leadInSeconds: 20, startMs: 30_000 }), { seed: 9, startJitterMs: 10, widthJitterMs: 25, drop: [500, 1500] });
  let good = 0;
  const t = ms(() => {
    good = decodePulseLog(standard, log).summary.ok;
  });
  console.log(`${standard.padEnd(5)}  pulse log of ${log.length} pulses (${MINUTES} min, 2 dropped): ${t.toFixed(1)} ms, ${good} good frames`);
}
