import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { RuleEntry } from "@/components/help/rule-entry";
import { TRAPPING_CAUTION } from "@/lib/drive/warnings";
import { parameterGroups } from "@/lib/help/parameter-help";
import { RULE_HELP, ruleHelpEntries } from "@/lib/help/rule-help";
import { SAFETY_RULES } from "@/lib/profiles/safety";

const ruleIds = SAFETY_RULES.map((r) => r.id);

describe("safety-rule help text", () => {
  it("exists for every rule id", () => {
    const missing = ruleIds.filter((id) => !RULE_HELP[id]);
    expect(missing, `rules without help text in lib/help/rule-help.ts: ${missing.join(", ")}`).toEqual([]);
  });

  it("names no rule that does not exist", () => {
    const unknown = Object.keys(RULE_HELP).filter((id) => !ruleIds.includes(id));
    expect(unknown, `help text for unknown rule ids: ${unknown.join(", ")}`).toEqual([]);
  });

  it("says why each rule matters and what to do when it fires", () => {
    for (const [id, help] of Object.entries(RULE_HELP)) {
      expect(help.why.length, id).toBeGreaterThan(30);
      expect(help.actions.length, id).toBeGreaterThan(0);
      for (const a of help.actions) expect(a.trim().length, id).toBeGreaterThan(10);
    }
  });

  it("keeps the catalog's explanation as what the rule checks, with the caution shown once on the page instead", () => {
    const entries = ruleHelpEntries();
    expect(entries.map((e) => e.id)).toEqual(ruleIds);
    for (const e of entries) {
      const rule = SAFETY_RULES.find((r) => r.id === e.id)!;
      expect(e.checks.length, e.id).toBeGreaterThan(30);
      expect(e.checks, e.id).not.toContain(TRAPPING_CAUTION);
      expect(e.trapping, e.id).toBe(rule.explanation.includes(TRAPPING_CAUTION));
      expect(e.anchor).toBe(`rule-${e.id}`);
    }
    expect(entries.find((e) => e.id === "RL-STALL-REOPEN")?.inVersionOne).toBe(false);
    expect(entries.find((e) => e.id === "RL-STALL-FRACTION")?.inVersionOne).toBe(true);
  });

  it("links each rule's parameters to anchors that exist on the parameters page", () => {
    const groups = parameterGroups();
    const anchors = new Set([...groups.map((g) => g.anchor), ...groups.flatMap((g) => g.parameters.map((p) => p.anchor))]);
    for (const e of ruleHelpEntries()) for (const p of e.parameters) expect(anchors.has(p.anchor), `${e.id} → ${p.path}`).toBe(true);
  });

  it("renders a rule under its anchor with its id, checks and steps", () => {
    const entry = ruleHelpEntries().find((e) => e.id === "RL-CLOSE-TRAVEL")!;
    const html = renderToStaticMarkup(createElement(RuleEntry, { rule: entry }));
    expect(html).toContain('id="rule-RL-CLOSE-TRAVEL"');
    expect(html).toContain("RL-CLOSE-TRAVEL");
    expect(html).toContain('href="/help/parameters#param-closeTravelCounts"');
    for (const a of entry.actions) expect(html).toContain(a.replace(/'/g, "&#x27;"));
  });
});
