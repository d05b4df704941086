// Prints the calculation benchmarks: a year of sun times for one site, and 1,000 frame decodes per standard.
import { spawnSync } from "node:child_process";

for (const script of ["scripts/bench-sun.ts", "scripts/bench-timecode.ts"]) {
  const r = spawnSync("node_modules/.bin/tsx", [script], { stdio: "inherit" });
  if (r.status !== 0) process.exit(r.status ?? 1);
}
