// Starts the fault suite's own MariaDB (3318, roostline_test rebuilt and seeded), SMTP stand-in
// (2527) and two app instances (3101, 3102), and stops all of them afterwards. Leftovers of an
// earlier run are reused (MariaDB) or replaced (stand-in, apps) through their own pid files. A
// failure is handed to the tests instead of thrown, so the other projects of the run still run.
import type { TestProject } from "vitest/node";
import { A, B, rebuildDatabase, startApp, startDb, startMailSink, stopApp, stopDb, stopMailSink } from "./support";

async function stopAll(): Promise<string[]> {
  const problems: string[] = [];
  const attempt = async (what: string, fn: () => Promise<void>) => {
    try {
      await fn();
    } catch (err) {
      problems.push(`${what}: ${err instanceof Error ? err.message : String(err)}`);
    }
  };
  await Promise.all([attempt("app 3101", () => stopApp(A)), attempt("app 3102", () => stopApp(B))]);
  await attempt("SMTP stand-in", stopMailSink);
  await attempt("MariaDB", stopDb);
  return problems;
}

export default async function setup(project: TestProject) {
  let failure: string | null = null;
  try {
    await Promise.all([stopApp(A), stopApp(B)]);
    await startDb();
    // The stand-in's pool may point at the database about to be dropped: restart it afterwards.
    await stopMailSink();
    await rebuildDatabase();
    await startMailSink();
    await Promise.all([startApp(A, { freshLog: true }), startApp(B, { freshLog: true })]);
  } catch (err) {
    failure = err instanceof Error ? err.message : String(err);
    console.error(`[faults] services did not start: ${failure}`);
  }
  project.provide("faultsSetupError", failure);
  return async () => {
    const problems = await stopAll();
    if (problems.length) console.error(`[faults] teardown: ${problems.join("; ")}`);
  };
}
