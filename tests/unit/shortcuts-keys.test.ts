import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { navFor } from "@/lib/nav";
import { goTargets, IDLE, isTypingTarget, matchKey, SEQUENCE_TIMEOUT_MS, shortcutGroups, type GoTarget, type KeyInput, type SequenceState } from "@/lib/shortcuts";

/** Feeds keys at the given times (ms) and returns the last action. */
function press(targets: GoTarget[], keys: [KeyInput | string, number][]) {
  let state: SequenceState = IDLE;
  let action = { kind: "none" } as ReturnType<typeof matchKey>["action"];
  for (const [k, at] of keys) {
    const r = matchKey(state, typeof k === "string" ? { key: k } : k, targets, at);
    state = r.state;
    action = r.action;
  }
  return action;
}

const admin = goTargets(navFor("admin"));

describe("key-sequence matcher", () => {
  it("goes to an area with g then its letter", () => {
    expect(press(admin, [["g", 0], ["r", 300]])).toEqual({ kind: "go", href: "/reviews" });
    expect(press(admin, [["g", 0], ["l", 300]])).toEqual({ kind: "go", href: "/releases" });
    expect(press(admin, [["g", 0], ["o", 300]])).toEqual({ kind: "go", href: "/" });
    expect(press(admin, [["g", 0], ["h", 300]])).toEqual({ kind: "go", href: "/help" });
  });

  it("waits after g and forgets it once the second key comes too late", () => {
    expect(press(admin, [["g", 0]])).toEqual({ kind: "wait" });
    expect(press(admin, [["g", 0], ["p", SEQUENCE_TIMEOUT_MS + 1]])).toEqual({ kind: "none" });
    expect(press(admin, [["g", 0], ["p", SEQUENCE_TIMEOUT_MS]])).toEqual({ kind: "go", href: "/profiles" });
  });

  it("does nothing for g then a letter with no area, and starts over afterwards", () => {
    expect(press(admin, [["g", 0], ["x", 100]])).toEqual({ kind: "none" });
    expect(press(admin, [["g", 0], ["x", 100], ["p", 200]])).toEqual({ kind: "none" });
    expect(press(admin, [["g", 0], ["x", 100], ["g", 200], ["p", 300]])).toEqual({ kind: "go", href: "/profiles" });
  });

  it("offers only the areas the role's menu has", () => {
    const viewer = goTargets(navFor("viewer"));
    expect(viewer.map((t) => t.key)).not.toContain("r");
    expect(press(viewer, [["g", 0], ["r", 100]])).toEqual({ kind: "none" });
    expect(press(viewer, [["g", 0], ["t", 100]])).toEqual({ kind: "go", href: "/tools" });
    expect(goTargets(navFor("reviewer")).map((t) => t.key)).toContain("r");
    expect(admin.map((t) => t.key).join("")).toBe("oprclsth");
  });

  it("opens the list with ? and the search with /", () => {
    expect(press(admin, [["?", 0]])).toEqual({ kind: "help" });
    expect(press(admin, [["/", 0]])).toEqual({ kind: "search" });
  });

  it("leaves Ctrl, Cmd and Alt chords alone, and a chord cancels a pending g", () => {
    expect(press(admin, [[{ key: "/", ctrlKey: true }, 0]])).toEqual({ kind: "none" });
    expect(press(admin, [[{ key: "g", metaKey: true }, 0]])).toEqual({ kind: "none" });
    expect(press(admin, [["g", 0], [{ key: "p", altKey: true }, 100]])).toEqual({ kind: "none" });
    expect(press(admin, [["g", 0], [{ key: "p", ctrlKey: true }, 100], ["p", 200]])).toEqual({ kind: "none" });
  });

  it("treats G (shift) as a different key from g", () => {
    expect(press(admin, [["G", 0], ["p", 100]])).toEqual({ kind: "none" });
  });

  it("does not wait after g when the menu offers nothing", () => {
    expect(press([], [["g", 0]])).toEqual({ kind: "none" });
  });
});

describe("typing targets", () => {
  it("counts text fields, text areas, selects, contenteditable and the code editor as typing", () => {
    expect(isTypingTarget({ tag: "INPUT" })).toBe(true);
    expect(isTypingTarget({ tag: "input", type: "search" })).toBe(true);
    expect(isTypingTarget({ tag: "INPUT", type: "number" })).toBe(true);
    expect(isTypingTarget({ tag: "TEXTAREA" })).toBe(true);
    expect(isTypingTarget({ tag: "SELECT" })).toBe(true);
    expect(isTypingTarget({ tag: "DIV", editable: true })).toBe(true);
    expect(isTypingTarget({ tag: "DIV", inCodeEditor: true })).toBe(true);
  });

  it("does not count buttons, checkboxes, links or the page itself", () => {
    expect(isTypingTarget({ tag: "INPUT", type: "checkbox" })).toBe(false);
    expect(isTypingTarget({ tag: "INPUT", type: "radio" })).toBe(false);
    expect(isTypingTarget({ tag: "BUTTON" })).toBe(false);
    expect(isTypingTarget({ tag: "A" })).toBe(false);
    expect(isTypingTarget({ tag: "BODY" })).toBe(false);
  });
});

describe("the shortcuts overlay", () => {
  const rows = shortcutGroups(admin).flatMap((g) => g.rows);
  const keysOf = (what: RegExp) => rows.find((r) => what.test(r.what))?.keys;

  it("lists every go-to shortcut of the menu", () => {
    for (const t of admin) expect(keysOf(new RegExp(`^Go to ${t.label}$`))).toEqual([["g", t.key]]);
  });

  it("lists the editor's own keys, as the workbench declares them", () => {
    const workbench = readFileSync(path.resolve(process.cwd(), "components/profiles/editor/profile-workbench.tsx"), "utf8");
    expect(workbench).toContain('aria-keyshortcuts="Control+S Meta+S"');
    expect(workbench).toContain('aria-keyshortcuts="Control+Enter Meta+Enter"');
    expect(keysOf(/^Save the revision$/)).toEqual([["Ctrl+S"], ["⌘+S"]]);
    expect(keysOf(/^Submit the revision for review$/)).toEqual([["Ctrl+Enter"], ["⌘+Enter"]]);
  });

  it("lists ? and / themselves", () => {
    expect(keysOf(/^Show this list$/)).toEqual([["?"]]);
    expect(keysOf(/search or filter/)).toEqual([["/"]]);
  });
});
