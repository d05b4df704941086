import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { inStage, stageBucket } from "@/lib/fleet/stage";

// An independent implementation of the documented rule, on node:crypto instead of @noble/hashes.
const viaNode = (serial: string) => createHash("sha256").update(serial, "utf8").digest().readUInt32BE(0) % 100;
const serials = Array.from({ length: 10_000 }, (_, i) => `RL-${String(i).padStart(6, "0")}`);

describe("stage buckets", () => {
  it("puts fixed serials in fixed buckets", () => {
    // Values worked with node:crypto: SHA-256("RL-2026-0001") starts c3a6e104 = 3,282,493,700, mod 100 = 0.
    expect(stageBucket("RL-2026-0001")).toBe(0);
    expect(stageBucket("RL-2026-0002")).toBe(59);
    expect(stageBucket("HM350-000123")).toBe(58);
    expect(stageBucket("ABCD")).toBe(98);
  });

  it("follows the published SHA-256 of 'abc'", () => {
    // SHA-256("abc") = ba7816bf 8f01cfea … f20015ad (NIST FIPS 180-2, Appendix B.1, from memory);
    // 0xba7816bf = 3,128,432,319, mod 100 = 19.
    expect(createHash("sha256").update("abc").digest("hex").slice(0, 8)).toBe("ba7816bf");
    expect(stageBucket("abc")).toBe(19);
  });

  it("matches node:crypto for 10,000 serials", () => {
    for (const s of serials) expect(stageBucket(s)).toBe(viaNode(s));
  });

  it("spreads 10,000 serials evenly: each tenth of the buckets holds 8–12 %", () => {
    const deciles = new Array<number>(10).fill(0);
    for (const s of serials) deciles[Math.floor(stageBucket(s) / 10)]!++;
    for (const d of deciles) {
      expect(d).toBeGreaterThanOrEqual(800);
      expect(d).toBeLessThanOrEqual(1200);
    }
  });
});

describe("stages", () => {
  it("only ever adds controllers as the percentage grows", () => {
    for (const s of serials.slice(0, 500)) {
      let was = false;
      for (let p = 0; p <= 100; p++) {
        const now = inStage(s, p);
        if (was) expect(now).toBe(true);
        was = now;
      }
    }
  });

  it("keeps a controller that is in at 10 % in at 50 % and 100 %", () => {
    const early = serials.filter((s) => inStage(s, 10));
    expect(early.length).toBeGreaterThan(800);
    expect(early.every((s) => inStage(s, 50) && inStage(s, 100))).toBe(true);
  });

  it("reaches nobody at 0 % and everybody at 100 %", () => {
    expect(serials.some((s) => inStage(s, 0))).toBe(false);
    expect(serials.every((s) => inStage(s, 100))).toBe(true);
  });

  it("reaches about the stated share of the fleet", () => {
    const share = serials.filter((s) => inStage(s, 30)).length / serials.length;
    expect(share).toBeGreaterThan(0.27);
    expect(share).toBeLessThan(0.33);
  });

  it("refuses a percentage outside 0–100", () => {
    expect(() => inStage("RL-0001", 101)).toThrow("percent must be between 0 and 100");
    expect(() => inStage("RL-0001", Number.NaN)).toThrow(RangeError);
  });
});
