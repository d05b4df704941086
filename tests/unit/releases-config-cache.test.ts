import { describe, expect, it } from "vitest";
import { BoundedMap, GenerationCache } from "@/lib/releases/config-cache";

describe("BoundedMap", () => {
  it("forgets the oldest entries beyond its limit", () => {
    const m = new BoundedMap<string, number>(2);
    m.set("a", 1);
    m.set("b", 2);
    m.set("c", 3);
    expect([m.get("a"), m.get("b"), m.get("c"), m.size]).toEqual([undefined, 2, 3, 2]);
  });

  it("counts a rewritten key as new", () => {
    const m = new BoundedMap<string, number>(2);
    m.set("a", 1);
    m.set("b", 2);
    m.set("a", 3);
    m.set("c", 4);
    expect([m.get("a"), m.get("b")]).toEqual([3, undefined]);
  });
});

describe("GenerationCache", () => {
  it("computes once per key within a generation, including null answers", async () => {
    const c = new GenerationCache<string | null>(10);
    let calls = 0;
    const compute = async () => (calls++, null);
    await c.get(1, "k", compute);
    await c.get(1, "k", compute);
    expect(calls).toBe(1);
  });

  it("drops everything when a newer generation arrives", async () => {
    const c = new GenerationCache<number>(10);
    await c.get(1, "k", async () => 1);
    expect(await c.get(2, "k", async () => 2)).toBe(2);
    expect(await c.get(2, "k", async () => 3)).toBe(2);
  });

  it("answers a late request of an older generation without keeping it", async () => {
    const c = new GenerationCache<number>(10);
    await c.get(5, "k", async () => 5);
    expect(await c.get(4, "k", async () => 4)).toBe(4);
    expect(await c.get(5, "k", async () => 99)).toBe(5);
  });

  it("does not keep a value computed while the generation moved on", async () => {
    const c = new GenerationCache<number>(10);
    let release!: () => void;
    const slow = c.get(1, "k", () => new Promise<number>((r) => (release = () => r(1))));
    await c.get(2, "other", async () => 2);
    release();
    expect(await slow).toBe(1);
    expect(await c.get(2, "k", async () => 22)).toBe(22);
  });
});
