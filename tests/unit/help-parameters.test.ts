// The parameters help page against the JSON Schemas, walked here independently of parameter-info.ts,
// so a parameter added to a schema cannot go missing from the page.
import { readFileSync } from "node:fs";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { ParameterGroupSection } from "@/components/help/parameter-entry";
import { CAUTION_PATHS, CAUTION_SHORT } from "@/lib/help/caution-text";
import { parameterGroups, versionOneRows, versionTwoOnly } from "@/lib/help/parameter-help";
import { TYPICAL_VALUES } from "@/lib/help/typical-values";

type Node = { type?: string; title?: string; description?: string; properties?: Record<string, Node>; oneOf?: Node[]; roostlineSafety?: boolean; default?: unknown };

const schema = (v: 1 | 2): Node => JSON.parse(readFileSync(new URL(`../../schemas/door-params-v${v}.schema.json`, import.meta.url), "utf8")) as Node;

/** Every leaf of a schema as [pointer, node]; the forms of a oneOf contribute their leaves, each pointer once. */
function leaves(node: Node, path = ""): [string, Node][] {
  if (node.oneOf) {
    const seen = new Map<string, Node>();
    for (const form of node.oneOf) for (const [p, n] of leaves(form, path)) if (!seen.has(p)) seen.set(p, n);
    return [...seen];
  }
  if (node.type === "object" && node.properties) return Object.entries(node.properties).flatMap(([k, child]) => leaves(child, `${path}/${k}`));
  return [[path, node]];
}

const groups = parameterGroups();
const entries = groups.flatMap((g) => g.parameters);

describe("the parameters help page data", () => {
  it("has every version 2 schema parameter exactly once", () => {
    const schemaPaths = leaves(schema(2)).map(([p]) => p);
    expect(schemaPaths.length).toBeGreaterThan(15);
    expect(entries.map((e) => e.path).sort()).toEqual([...schemaPaths].sort());
  });

  it("takes title, description and safety flag from the schema", () => {
    const byPath = new Map(leaves(schema(2)));
    for (const e of entries) {
      const node = byPath.get(e.path)!;
      expect(e.title, e.path).toBe(node.title);
      // The schedule form's tag joins the descriptions of every form, so contain rather than equal.
      expect(e.description, e.path).toContain(node.description);
      expect(e.safety, e.path).toBe(node.roostlineSafety === true);
      expect(e.allowed.length, e.path).toBeGreaterThan(0);
    }
  });

  it("gives parameters and groups unique anchors", () => {
    const anchors = [...groups.map((g) => g.anchor), ...entries.map((e) => e.anchor)];
    expect(new Set(anchors).size).toBe(anchors.length);
    expect(entries.find((e) => e.path === "/stall/thresholdCps")?.anchor).toBe("param-stall-thresholdCps");
    for (const a of anchors) expect(a).toMatch(/^param-[A-Za-z0-9-]+$/);
  });

  it("keeps the schema's own groups together under their titles", () => {
    const top = schema(2).properties!;
    for (const [key, node] of Object.entries(top)) {
      if (node.type !== "object") continue;
      const group = groups.find((g) => g.id === key);
      expect(group, key).toBeDefined();
      expect(group!.intro).toContain(node.description!);
      for (const e of entries.filter((x) => x.path.startsWith(`/${key}/`))) expect(group!.parameters).toContain(e);
    }
  });

  it("lists every version 1 parameter with its place in version 2", () => {
    const rows = versionOneRows();
    expect(rows.map((r) => r.v1Path).sort()).toEqual(leaves(schema(1)).map(([p]) => p).sort());
    const anchors = new Set(entries.map((e) => e.anchor));
    for (const r of rows) {
      expect(r.v2Anchor, r.v1Path).not.toBeNull();
      expect(anchors.has(r.v2Anchor!), r.v1Path).toBe(true);
      expect(r.anchor).toMatch(/^param-v1-/);
    }
    expect(rows.find((r) => r.v1Path === "/stallThresholdCps")?.v2Path).toBe("/stall/thresholdCps");
    expect(versionTwoOnly().map((p) => p.path)).toContain("/stall/reopenOnStall");
  });

  it("gives typical values only for real parameters, each marked common practice", () => {
    const paths = new Set(entries.map((e) => e.path));
    for (const [path, text] of Object.entries(TYPICAL_VALUES)) {
      expect(paths.has(path), path).toBe(true);
      expect(text, path).toContain("common practice");
    }
  });

  it("puts the caution beside close travel, the stall threshold and window, and the travel timeout", () => {
    expect([...CAUTION_PATHS].sort()).toEqual(["/closeTravelCounts", "/stall/thresholdCps", "/stall/windowMs", "/travelTimeoutMs"]);
    for (const e of entries) expect(e.caution, e.path).toBe(CAUTION_PATHS.includes(e.path));
  });

  it("renders every anchor and the caution into the page markup", () => {
    const html = groups.map((g) => renderToStaticMarkup(createElement(ParameterGroupSection, { group: g, safetyApprovals: 2 }))).join("");
    for (const a of [...groups.map((g) => g.anchor), ...entries.map((e) => e.anchor)]) expect(html).toContain(`id="${a}"`);
    const stall = renderToStaticMarkup(createElement(ParameterGroupSection, { group: groups.find((g) => g.id === "stall")!, safetyApprovals: 2 }));
    expect(stall.split(CAUTION_SHORT).length - 1).toBe(2);
    expect(stall).toContain("2 approvals from different reviewers");
    expect(stall).toContain('href="/help/safety-rules#rule-RL-STALL-FRACTION"');
  });
});
