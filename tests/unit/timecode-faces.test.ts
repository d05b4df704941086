import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { GET } from "@/app/api/v1/tools/timecode/route";
import { POST } from "@/app/api/v1/tools/timecode/pulses/route";
import { timecodeCommand } from "@/lib/cli/timecode-command";
import { CliError } from "@/lib/cli/types";
import { describeFlags } from "@/lib/timecode/frames";
import type { EncodedFrame, FrameDecode } from "@/lib/timecode/types";

const DCF = "00000000000000000010100000000011010110000001001001000110011";
const fixturePath = (name: string) => fileURLToPath(new URL(`../fixtures/timecode/${name}`, import.meta.url));
const cliError = (args: string[]) => {
  try {
    timecodeCommand.run(args);
  } catch (e) {
    return e as Error & { code?: string };
  }
  throw new Error("expected the command to fail");
};
const get = (query: string) => GET(new Request(`http://127.0.0.1/api/v1/tools/timecode?${query}`), {});
const post = (body: unknown, type = "application/json") =>
  POST(new Request("http://127.0.0.1/api/v1/tools/timecode/pulses", { method: "POST", headers: { "content-type": type }, body: JSON.stringify(body) }), {});

describe("timecode command", () => {
  it("decodes DCF77 bits and prints the time and every check", () => {
    const r = timecodeCommand.run(["decode", "--standard", "dcf77", "--bits", DCF]);
    expect(r.text).toMatch(/^DCF77 \(Germany\) frame: all 20 checks pass/);
    expect(r.text).toContain("Names 1998-12-01T16:00:00+01:00 (CET) = 1998-12-01T15:00:00Z");
    expect((r.json as FrameDecode).instant.utc).toBe("1998-12-01T15:00:00Z");
  });

  it("encodes MSF as A and B strings that decode back", () => {
    const r = timecodeCommand.run(["encode", "--standard", "msf", "--time", "2025-07-14T12:37+01:00", "--dut1", "0.2"]);
    const f = r.json as EncodedFrame;
    expect(r.text).toContain(`A:    ${f.bitsA}`);
    const d = timecodeCommand.run(["decode", "--standard", "msf", "--bits-a", f.bitsA!, "--bits-b", f.bitsB!]).json as FrameDecode;
    expect(d.instant.local).toBe("2025-07-14T12:37:00+01:00");
    expect(d.flags.dut1Seconds).toBe(0.2);
  });

  it("diagnoses a pulse log file and gives the distance to a transmitter", () => {
    const r = timecodeCommand.run(["pulses", "--standard", "dcf77", "--file", fixturePath("dcf77-noisy.csv")]);
    expect(r.text).toContain("missing: no pulse in second 29");
    expect(timecodeCommand.run(["distance", "--standard", "wwvb", "--lat", "39.74", "--lon", "-104.99"]).text).toMatch(/^WWVB at near Fort Collins.*: \d+ km/);
  });

  it("names the option for bad input", () => {
    expect(cliError(["decode", "--standard", "dcf77", "--bits", DCF.slice(0, 23) + "x" + DCF.slice(24)]).message).toBe("--bits: position 23 is 'x'; use 0 or 1");
    expect(cliError(["decode", "--standard", "msf", "--bits-a", "1".repeat(60)]).message).toBe("--bits-b: is required for msf");
    expect(cliError(["encode", "--standard", "dcf77", "--time", "tomorrow"]).message).toMatch(/^--time: must be ISO-8601/);
    expect(cliError(["encode", "--standard", "gps", "--time", "2026-01-01T00:00Z"]).message).toBe("--standard: must be dcf77, msf or wwvb");
    expect(cliError(["distance", "--standard", "msf", "--lat", "95", "--lon", "0"]).message).toBe("--lat: must be between -90 and 90");
    expect(cliError(["pulses", "--standard", "msf", "--file", "/nonexistent/log.csv"]).message).toBe("--file: cannot read /nonexistent/log.csv");
    expect(cliError(["listen"])).toBeInstanceOf(CliError);
    expect(cliError([]).message).toBe("no action given; use decode, encode, pulses or distance");
    expect(cliError(["decode", "--bitz", "0"]).code).toBe("ERR_PARSE_ARGS_UNKNOWN_OPTION");
  });
});

describe("GET /api/v1/tools/timecode", () => {
  it("encodes a WWVB frame and decodes it back, cacheable", async () => {
    const res = await get("action=encode&standard=wwvb&time=2024-02-29T23:59:00Z&dut1=-0.2");
    expect(res.status).toBe(200);
    expect(res.headers.get("cache-control")).toBe("public, max-age=300");
    const f = (await res.json()) as EncodedFrame;
    const d = (await (await get(`action=decode&standard=wwvb&bits=${f.bits}`)).json()) as FrameDecode;
    expect(d.ok).toBe(true);
    expect(d.instant.utc).toBe("2024-02-29T23:59:00Z");
  });

  it("gives the distance to a transmitter", async () => {
    const body = await (await get("action=distance&standard=dcf77&lat=52.2&lon=0.12")).json();
    expect(body.withinUsualRange).toBe(true);
  });

  it("answers 400 naming the field for bad input", async () => {
    const cases: [string, string, string][] = [
      ["action=listen", "/action", "must be encode, decode or distance"],
      ["action=decode&standard=dcf77&bits=01x", "/bits", "position 2 is 'x'; use 0 or 1"],
      ["action=decode&standard=msf&bitsA=0", "/bitsA", "has 1 bits; each MSF string has 60, second 0 first"],
      ["action=encode&standard=msf&time=2026-01-01", "/time", "must be ISO-8601 with an offset, e.g. 2026-03-29T01:00:00Z or 2026-03-29T03:00+02:00"],
      ["action=distance&standard=msf&lat=10&lon=200", "/lon", "must be between -180 and 180"],
    ];
    for (const [query, path, message] of cases) {
      const res = await get(query);
      expect(res.status, query).toBe(400);
      const body = await res.json();
      expect(body.error).toBe("invalid_request");
      expect(body.issues[0], query).toEqual({ path, message });
    }
  });
});

describe("POST /api/v1/tools/timecode/pulses", () => {
  it("returns the frames of a pulse log", async () => {
    const pulses = Array.from({ length: 59 }, (_, s) => ({ startMs: 5000 + s * 1000, widthMs: DCF[s] === "1" ? 200 : 100 }));
    const res = await post({ standard: "dcf77", pulses: [{ startMs: 3000, widthMs: 100 }, ...pulses, { startMs: 65_000, widthMs: 100 }] });
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.frames[1].decode.instant.local).toBe("1998-12-01T16:00:00+01:00");
    expect(body.frames[1].instantAtMs).toBe(65_000);
  });

  it("answers 400 for a wrong pulse, a wrong content type and a missing standard", async () => {
    const wrong = await post({ standard: "dcf77", pulses: [{ startMs: 0, widthMs: -5 }] });
    expect(wrong.status).toBe(400);
    expect((await wrong.json()).issues).toEqual([{ path: "/pulses/0/widthMs", message: "must be greater than 0" }]);
    expect((await post({ standard: "dcf77", pulses: [] }, "text/plain")).status).toBe(400);
    const noStandard = await post({ pulses: [{ startMs: 0, widthMs: 100 }] });
    expect((await noStandard.json()).issues[0]).toEqual({ path: "/standard", message: "must be dcf77, msf or wwvb" });
  });
});

describe("describeFlags", () => {
  it("puts each flag in words", () => {
    expect(describeFlags({ leapYear: true, dut1Seconds: -0.2, dst: "DST begins today", leapSecondAnnounced: true })).toEqual(["leap second announced", "leap year", "DUT1 −0.2 s", "US DST begins today"]);
    expect(describeFlags({ callBit: false, zoneChangeAnnounced: true, leapSecondAnnounced: false })).toEqual(["CET/CEST change announced"]);
  });
});
