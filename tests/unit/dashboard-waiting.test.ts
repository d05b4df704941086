import { describe, expect, it } from "vitest";
import { countChecks, revisionTodo } from "@/lib/dashboard/waiting";

const clean = { schemaIssues: 0, safetyErrors: 0, warnings: 0 };

describe("what an open revision needs next", () => {
  it("puts schema errors and safety errors first, as they block a submit", () => {
    expect(revisionTodo("draft", { ...clean, schemaIssues: 2 })).toMatchObject({ rank: 0, tone: "bad", status: "2 schema errors" });
    expect(revisionTodo("draft", { ...clean, safetyErrors: 1, warnings: 3 })).toMatchObject({ rank: 0, tone: "bad", status: "1 safety error" });
    expect(revisionTodo("changes_requested", { ...clean, safetyErrors: 1 })).toMatchObject({ rank: 0, status: "1 safety error" });
  });

  it("asks for a new revision when a reviewer sent it back", () => {
    expect(revisionTodo("changes_requested", clean)).toMatchObject({ rank: 1, tone: "warn", status: "Changes requested" });
  });

  it("asks for reasons when only warnings remain, and to submit when the checks pass", () => {
    expect(revisionTodo("draft", { ...clean, warnings: 1 })).toMatchObject({ rank: 2, status: "1 warning", action: "Give reasons, then submit" });
    expect(revisionTodo("draft", clean)).toMatchObject({ rank: 3, tone: "good", action: "Submit for review" });
  });

  it("leaves out revisions that wait on reviewers, and says when a revision was not checked", () => {
    expect(revisionTodo("in_review", clean)).toBeNull();
    expect(revisionTodo("draft", null)).toMatchObject({ status: "Not checked here" });
  });

  it("counts one warning per rule, as a submit asks one reason per rule", () => {
    const findings = [
      { ruleId: "RL-DUSK-CLOSE", severity: "warning" },
      { ruleId: "RL-DUSK-CLOSE", severity: "warning" },
      { ruleId: "RL-POLAR", severity: "warning" },
      { ruleId: "RL-STALL-FRACTION", severity: "error" },
    ];
    expect(countChecks({ schemaIssues: [], findings })).toEqual({ schemaIssues: 0, safetyErrors: 1, warnings: 2 });
  });
});
