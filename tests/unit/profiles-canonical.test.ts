import { createHash } from "node:crypto";
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { CanonicalJsonError, canonicalJson, contentHash, sha256Hex } from "@/lib/profiles/canonical";

const fixture = (name: string): unknown =>
  JSON.parse(readFileSync(new URL(`../fixtures/profiles/${name}`, import.meta.url), "utf8"));

const nodeSha256 = (text: string) => createHash("sha256").update(text, "utf8").digest("hex");

describe("SHA-256", () => {
  // FIPS 180-2, Secure Hash Standard, Appendix B (SHA-256 examples), NIST.
  it('hashes "abc" to the FIPS 180-2 one-block example (B.1)', () => {
    expect(sha256Hex("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  });

  it("hashes the 448-bit two-block message to the FIPS 180-2 example (B.2)", () => {
    expect(sha256Hex("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq")).toBe(
      "248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1",
    );
  });

  it('hashes one million "a" to the FIPS 180-2 long-message example (B.3)', () => {
    expect(sha256Hex("a".repeat(1_000_000))).toBe("cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0");
  });

  it("hashes the empty string to the well-known empty-input digest (from memory; checked against node:crypto)", () => {
    expect(sha256Hex("")).toBe("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
    expect(sha256Hex("")).toBe(nodeSha256(""));
  });

  it("agrees with node:crypto on UTF-8 text beyond ASCII", () => {
    for (const text of ["Hühnerstall", "pop-hole door – 17 112 counts", "🐔 roost", "\u0000\u007f\u0080\u07ff\u0800\uffff"]) {
      expect(sha256Hex(text)).toBe(nodeSha256(text));
    }
  });
});

describe("canonical JSON", () => {
  it("sorts keys at every depth and leaves out whitespace", () => {
    expect(canonicalJson({ b: 1, a: { d: [3, { z: true, y: null }], c: "x" } })).toBe('{"a":{"c":"x","d":[3,{"y":null,"z":true}]},"b":1}');
  });

  it("sorts keys by UTF-16 code units", () => {
    // Hand-worked: a (U+0061) < z (U+007A) < é (U+00E9) < 🐔 (high surrogate U+D83D) < ｆ (U+FF46).
    expect(canonicalJson({ "ｆ": 5, "🐔": 4, "é": 3, z: 2, a: 1 })).toBe('{"a":1,"z":2,"é":3,"🐔":4,"ｆ":5}');
  });

  it("writes numbers as JSON.stringify does", () => {
    expect(canonicalJson([0.1, -0, 1e21, 1.5e-7, 17112, -120])).toBe("[0.1,0,1e+21,1.5e-7,17112,-120]");
  });

  it("keeps list order, since order in a list is meaning", () => {
    expect(canonicalJson([2, 1])).not.toBe(canonicalJson([1, 2]));
  });

  it.each([
    ["NaN", { stall: { thresholdCps: Number.NaN } }, "/stall/thresholdCps"],
    ["Infinity", { travelTimeoutMs: Number.POSITIVE_INFINITY }, "/travelTimeoutMs"],
    ["undefined in an object", { debounceMs: undefined }, "/debounceMs"],
    ["undefined in a list", [1, undefined], "/1"],
    ["a hole in a list", [1, , 3], "/1"],
    ["a function", { f: () => 1 }, "/f"],
    ["a bigint", { n: BigInt(1) }, "/n"],
    ["a Date", { at: new Date(0) }, "/at"],
    ["undefined itself", undefined, ""],
  ])("refuses %s, naming where it is", (_label, value, path) => {
    expect(() => canonicalJson(value)).toThrow(CanonicalJsonError);
    expect(() => canonicalJson(value)).toThrow(expect.objectContaining({ path }));
  });
});

describe("content hash", () => {
  it("does not change when keys are reordered", () => {
    const doc = fixture("v2-base-henhouse-350.json") as Record<string, unknown>;
    const reversed = JSON.parse(JSON.stringify(Object.fromEntries(Object.entries(doc).reverse())));
    expect(Object.keys(reversed)[0]).not.toBe(Object.keys(doc)[0]);
    expect(contentHash(reversed)).toBe(contentHash(doc));
  });

  it("changes when any value changes", () => {
    const doc = fixture("v2-base-henhouse-350.json") as { stall: { thresholdCps: number } };
    const before = contentHash(doc);
    doc.stall.thresholdCps += 1;
    expect(contentHash(doc)).not.toBe(before);
  });

  it("is the SHA-256 of the canonical UTF-8 text, as node:crypto computes it", () => {
    const doc = fixture("v1-base-henhouse-350.json");
    expect(contentHash(doc)).toBe(nodeSha256(canonicalJson(doc)));
    expect(contentHash(doc)).toMatch(/^[0-9a-f]{64}$/);
  });
});
