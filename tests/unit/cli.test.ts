import { spawnSync } from "node:child_process";
import { describe, expect, it } from "vitest";
import { COMMANDS } from "@/lib/cli/registry";

// Runs the real command line as a person would, through tsx.
function roostline(...args: string[]) {
  const r = spawnSync("node_modules/.bin/tsx", ["scripts/roostline.ts", ...args], { encoding: "utf8", timeout: 30_000 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe("roostline command line", () => {
  it("registers every calculation", () => {
    expect(Object.keys(COMMANDS).sort()).toEqual(["debounce", "stall", "sun", "timecode", "travel"]);
  });

  it("prints one JSON object with --json and exits 0", () => {
    const r = roostline("stall", "--nominal-cps", "2000", "--fraction", "0.5", "--window-ms", "50", "--json");
    expect(r.status).toBe(0);
    expect(typeof JSON.parse(r.stdout)).toBe("object");
  });

  it("exits 1 with one line on stderr naming the wrong option", () => {
    const r = roostline("travel", "--travel-mm", "420", "--spool-mm", "-3", "--gear-ratio", "100", "--ppr", "16");
    expect(r.status).toBe(1);
    expect(r.stdout).toBe("");
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
    expect(r.stderr).toMatch(/--spool-mm/);
  });

  it("exits 1 for an unknown command or option", () => {
    expect(roostline("teleport").status).toBe(1);
    const r = roostline("sun", "--latitude", "50");
    expect(r.status).toBe(1);
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
  });

  it("lists the commands with help", () => {
    const r = roostline("help");
    expect(r.status).toBe(0);
    for (const name of Object.keys(COMMANDS)) expect(r.stdout).toContain(name);
  });
});
