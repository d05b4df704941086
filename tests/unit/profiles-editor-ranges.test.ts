import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { ancestorPointers, indexRanges, markRange, pointerAtOffset } from "@/components/profiles/editor/json-pointer-ranges";

const fixtureText = (name: string) => readFileSync(new URL(`../fixtures/profiles/${name}`, import.meta.url), "utf8");

const slice = (text: string, r: { start: number; end: number } | null | undefined) => (r ? text.slice(r.start, r.end) : null);

describe("indexRanges", () => {
  it("finds the key and value of every member of a pretty-printed profile", () => {
    const text = fixtureText("v2-base-henhouse-350.json");
    const index = indexRanges(text);
    if (!index.ok) throw new Error(index.message);
    const threshold = index.nodes.get("/stall/thresholdCps");
    expect(slice(text, threshold?.key)).toBe('"thresholdCps"');
    expect(slice(text, threshold?.value)).toBe("800");
    expect(slice(text, index.nodes.get("/schedule/kind")?.value)).toBe('"sun"');
    expect(slice(text, index.nodes.get("/homeOnPowerUp")?.value)).toBe("true");
    expect(index.nodes.get("")?.value).toEqual({ start: 0, end: text.trimEnd().length });
  });

  it("indexes exactly the pointers JSON.parse produces, for every fixture", () => {
    const pointers = (v: unknown, at = ""): string[] =>
      typeof v === "object" && v !== null
        ? [at, ...Object.entries(v).flatMap(([k, c]) => pointers(c, `${at}/${k.replace(/~/g, "~0").replace(/\//g, "~1")}`))]
        : [at];
    for (const name of ["v1-base-henhouse-350.json", "v2-site-overlay.json", "invalid-v2-wrong-type.json"]) {
      const text = fixtureText(name);
      const index = indexRanges(text);
      if (!index.ok) throw new Error(index.message);
      expect([...index.nodes.keys()].sort()).toEqual(pointers(JSON.parse(text)).sort());
    }
  });

  it("decodes escaped keys and escapes them in pointers (RFC 6901 ~0 and ~1)", () => {
    const text = '{"a/b": 1, "m~n": {"\\u0041": [true, null, -1.5e3]}}';
    const index = indexRanges(text);
    if (!index.ok) throw new Error(index.message);
    expect(slice(text, index.nodes.get("/a~1b")?.value)).toBe("1");
    expect(slice(text, index.nodes.get("/m~0n/A/2")?.value)).toBe("-1.5e3");
    expect(index.nodes.get("/m~0n/A/1")?.kind).toBe("literal");
    expect(index.nodes.get("/m~0n/A/0")?.key).toBeUndefined();
  });

  it("keeps the last of a repeated key, as JSON.parse does", () => {
    const text = '{"x": 1, "x": 22}';
    const index = indexRanges(text);
    if (!index.ok) throw new Error(index.message);
    expect(slice(text, index.nodes.get("/x")?.value)).toBe("22");
    expect(JSON.parse(text)).toEqual({ x: 22 });
  });

  it("counts offsets in UTF-16 code units, as the editor model does", () => {
    const text = '{"note": "🐔 coop", "n": 5}';
    const index = indexRanges(text);
    if (!index.ok) throw new Error(index.message);
    expect(slice(text, index.nodes.get("/n")?.value)).toBe("5");
  });

  it("reports where the text stops being JSON", () => {
    expect(indexRanges('{"a": 1,}')).toMatchObject({ ok: false, offset: 8, message: expect.stringContaining("quoted key") });
    expect(indexRanges('{"a": 01}')).toMatchObject({ ok: false, offset: 7 });
    expect(indexRanges('{"a": tru}')).toMatchObject({ ok: false, offset: 6 });
    expect(indexRanges('{"a": "x\ny"}')).toMatchObject({ ok: false, offset: 6 });
    expect(indexRanges('{"a": 1} x')).toMatchObject({ ok: false, offset: 9 });
    expect(indexRanges('{"a": [1, 2')).toMatchObject({ ok: false, offset: 11, message: expect.stringContaining("text ends") });
    expect(indexRanges("")).toMatchObject({ ok: false, offset: 0 });
  });

  it("agrees with JSON.parse on which texts are JSON", () => {
    const samples = ["{}", "[]", " 1 ", '"s"', "null", "{\"a\":[{}]}", "[1,]", "{'a':1}", "01", "1.", ".5", "-", '"\\x"', "[1 2]", "+1", "1e5", "{\"a\" 1}"];
    for (const s of samples) {
      let parses = true;
      try {
        JSON.parse(s);
      } catch {
        parses = false;
      }
      expect(indexRanges(s).ok, s).toBe(parses);
    }
  });
});

describe("markRange", () => {
  const text = '{\n  "stall": {\n    "windowMs": 5\n  },\n  "schedule": {}\n}\n';
  const index = indexRanges(text);

  it("marks a scalar's value and a group's key", () => {
    expect(slice(text, markRange(index, "/stall/windowMs"))).toBe("5");
    expect(slice(text, markRange(index, "/stall"))).toBe('"stall"');
    expect(markRange(index, "/stall")?.exact).toBe(true);
  });

  it("falls back to the nearest present ancestor for a missing key, saying it is not exact", () => {
    expect(markRange(index, "/schedule/kind")).toMatchObject({ exact: false });
    expect(slice(text, markRange(index, "/schedule/kind"))).toBe('"schedule"');
    expect(slice(text, markRange(index, "/clock/source"))).toBe("{");
  });

  it("marks a member's key when asked, as for an unknown key", () => {
    expect(slice(text, markRange(index, "/stall/windowMs", { key: true }))).toBe('"windowMs"');
    expect(slice(text, markRange(index, "/stall/nothing", { key: true }))).toBe('"stall"');
  });

  it("marks only the opening brace for the document itself", () => {
    expect(markRange(index, "")).toEqual({ start: 0, end: 1, exact: true });
  });

  it("gives nothing for text that does not parse", () => {
    expect(markRange(indexRanges("{"), "")).toBeNull();
  });
});

describe("pointerAtOffset", () => {
  const text = '{"stall": {"windowMs": 50}, "debounceMs": 30}';
  const index = indexRanges(text);

  it("names the deepest member under the cursor, from its key to the end of its value", () => {
    expect(pointerAtOffset(index, text.indexOf("windowMs"))).toBe("/stall/windowMs");
    expect(pointerAtOffset(index, text.indexOf("50") + 2)).toBe("/stall/windowMs");
    expect(pointerAtOffset(index, text.indexOf("{", 1))).toBe("/stall");
    expect(pointerAtOffset(index, text.indexOf("30"))).toBe("/debounceMs");
    expect(pointerAtOffset(index, 0)).toBe("");
  });
});

describe("ancestorPointers", () => {
  it("lists the parents nearest first, ending with the document", () => {
    expect(ancestorPointers("/a/b/c")).toEqual(["/a/b", "/a", ""]);
    expect(ancestorPointers("")).toEqual([]);
  });
});
