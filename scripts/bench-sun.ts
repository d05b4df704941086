// Times a whole year of sun events for one site: `npx tsx scripts/bench-sun.ts [lat lon year zone]`.
// Prints figures only; it checks nothing.
import { performance } from "node:perf_hooks";
import { sunDay } from "@/lib/sun/events";
import { sunYearInputSchema } from "@/lib/sun/inputs";
import { sunYear } from "@/lib/sun/year";

const [lat = "52.52", lon = "13.40", year = "2026", tz = "Europe/Berlin"] = process.argv.slice(2);
const input = sunYearInputSchema.parse({ lat, lon, year, tz });
const RUNS = 20;

const coldStart = performance.now();
const first = sunYear(input);
const cold = performance.now() - coldStart;

const times: number[] = [];
for (let i = 0; i < RUNS; i++) {
  const t = performance.now();
  sunYear(input);
  times.push(performance.now() - t);
}
times.sort((a, b) => a - b);
const median = times[Math.floor(RUNS / 2)]!;

const singleStart = performance.now();
for (const d of first.days) sunDay({ lat: input.lat, lon: input.lon, tz: input.tz, date: d.date });
const single = performance.now() - singleStart;

const days = first.days.length;
console.log(`site ${input.lat}, ${input.lon} (${input.tz}), year ${input.year}: ${days} days`);
console.log(`first year (cold, includes Intl set-up): ${cold.toFixed(1)} ms`);
console.log(`year, median of ${RUNS}: ${median.toFixed(2)} ms (min ${times[0]!.toFixed(2)}, max ${times[RUNS - 1]!.toFixed(2)}); mean per day ${((median / days) * 1000).toFixed(1)} µs`);
console.log(`${days} separate one-day calls: ${single.toFixed(1)} ms; mean per day ${((single / days) * 1000).toFixed(1)} µs`);
