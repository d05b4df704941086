import { describe, expect, it } from "vitest";
import { debounceCommand, stallCommand, travelCommand } from "@/lib/cli/drive-commands";
import { CliError, type CliCommand } from "@/lib/cli/types";

const argv = (s: string) => s.split(" ");
const failure = (command: CliCommand, args: string) => {
  try {
    command.run(argv(args));
  } catch (err) {
    return err;
  }
  throw new Error("expected the command to fail");
};

const TRAVEL = "--travel-mm 300 --spool-mm 20 --cord-mm 2 --gear-ratio 30 --ppr 12";

describe("travel command", () => {
  it("prints the counts for the travel", () => {
    const { text, json } = travelCommand.run(argv(`${TRAVEL} --decoding 4`));
    expect(text).toMatch(/Counts for the travel\s+6250 /);
    expect(text).toMatch(/Counts per motor revolution\s+48 \(12 PPR × 4\)/);
    expect(text).toContain("No warnings.");
    expect(json).toMatchObject({ input: { travelMm: 300, decoding: 4 }, result: { countsRounded: 6250, model: "single-layer" } });
  });

  it("adds travel time and a timeout warning when a motor speed and timeout are given", () => {
    const { text, json } = travelCommand.run(argv(`${TRAVEL} --motor-rpm 2000 --timeout-s 3`));
    expect(text).toMatch(/travel time\s+3\.91 s/);
    expect(text).toMatch(/DANGER: The travel takes 3\.91 s/);
    expect(json).toMatchObject({ result: { warnings: [expect.objectContaining({ code: "timeout-exceeded" })] } });
  });

  it("names the option that is wrong", () => {
    const err = failure(travelCommand, `${TRAVEL} --decoding 3`);
    expect(err).toBeInstanceOf(CliError);
    expect((err as Error).message).toBe("--decoding: must be 1, 2 or 4");
    expect((failure(travelCommand, "--travel-mm 300 --spool-mm 0 --gear-ratio 30 --ppr 12") as Error).message).toBe("--spool-mm: must be greater than 0");
    expect((failure(travelCommand, "--travel-mm 300 --gear-ratio 30 --ppr 12") as Error).message).toBe("--spool-mm: is required");
    expect((failure(travelCommand, `${TRAVEL} --gear-ratio=abc`) as Error).message).toBe("--gear-ratio: must be a number");
  });

  it("refuses unknown options and missing values as one-line CliErrors", () => {
    const unknown = failure(travelCommand, `${TRAVEL} --spoolmm 3`);
    expect(unknown).toBeInstanceOf(CliError);
    expect((unknown as Error).message).toContain("--spoolmm");
    const negative = failure(travelCommand, "--travel-mm -5");
    expect(negative).toBeInstanceOf(CliError);
    expect((negative as Error).message).not.toContain("\n");
  });
});

describe("stall command", () => {
  it("prints the threshold, blanking, reaction distance and the caution", () => {
    const { text, json } = stallCommand.run(argv("--nominal-cps 2400 --fraction 0.5 --window-ms 50 --counts-per-mm 20 --ramp-ms 200"));
    expect(text).toMatch(/Threshold\s+1200 counts\/s = 60 counts per 50 ms window/);
    expect(text).toMatch(/Start-up blanking\s+150 ms/);
    expect(text).toMatch(/Reaction distance\s+120 counts = 6 mm/);
    expect(text).toContain("second line of defence");
    expect(json).toMatchObject({ result: { thresholdCps: 1200, blankingMs: 150 }, caution: expect.stringContaining("not a guarantee") });
  });

  it("names a fraction outside (0, 1)", () => {
    const err = failure(stallCommand, "--nominal-cps 2400 --fraction 1.2 --window-ms 50");
    expect(err).toBeInstanceOf(CliError);
    expect((err as Error).message).toBe("--fraction: must be less than 1");
  });
});

describe("debounce command", () => {
  const CIRCUIT = "--r1-ohm 10k --r2-ohm 10k --c-farad 1u --vcc 5 --vt-plus 3 --vt-minus 1.5";

  it("accepts engineering notation and prints both delays", () => {
    const { text, json } = debounceCommand.run(argv(CIRCUIT));
    expect(text).toMatch(/Closing delay\s+12\.04 ms/);
    expect(text).toMatch(/Opening delay\s+18\.33 ms/);
    expect(json).toMatchObject({ input: { r1Ohm: 10000, cFarad: 1e-6 } });
  });

  it("prints the capacitor for a wanted delay and the software debounce time", () => {
    const { text } = debounceCommand.run(argv(`${CIRCUIT} --target-ms 20 --sample-period-ms 5 --stable-samples 4`));
    expect(text).toMatch(/C for 20 ms closing\s+1\.66 µF/);
    expect(text).toMatch(/Preferred C \(E6, rounded up\)\s+2\.20 µF/);
    expect(text).toMatch(/Software debounce\s+20 ms = 5 ms × 4 samples/);
  });

  it("names a threshold out of order", () => {
    const err = failure(debounceCommand, "--r1-ohm 10k --r2-ohm 10k --c-farad 1u --vcc 5 --vt-plus 3 --vt-minus 3.5");
    expect(err).toBeInstanceOf(CliError);
    expect((err as Error).message).toBe("--vt-minus: must be below VT+");
  });
});
