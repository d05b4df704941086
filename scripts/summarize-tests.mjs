// Reads vitest's JSON report and prints the one closing line CI reads: "N passed, N failed".
import { readFileSync } from "node:fs";

const file = process.argv[2] ?? ".artifacts/vitest.json";
let report;
try {
  report = JSON.parse(readFileSync(file, "utf8"));
} catch {
  console.log("0 passed, 1 failed");
  process.exit(1);
}
const passed = report.numPassedTests ?? 0;
// Files that failed to load count as failures even when they ran no test.
const failedSuites = (report.testResults ?? []).filter((r) => r.status === "failed" && (r.assertionResults ?? []).length === 0).length;
const failed = (report.numFailedTests ?? 0) + failedSuites;
const skipped = (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ""}`);
