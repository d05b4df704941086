import { describe, expect, it } from "vitest";
import { helpHref, parameterAnchor, ruleAnchor } from "@/lib/help/links";

describe("help links", () => {
  it("turns a JSON Pointer or a dotted name into the parameter's anchor", () => {
    expect(parameterAnchor("/stall/thresholdCps")).toBe("param-stall-thresholdCps");
    expect(parameterAnchor("stall.thresholdCps")).toBe("param-stall-thresholdCps");
    expect(parameterAnchor("/closeTravelCounts")).toBe("param-closeTravelCounts");
  });

  it("gives version 1 paths their own anchors", () => {
    expect(parameterAnchor("/stallThresholdCps", 1)).toBe("param-v1-stallThresholdCps");
    expect(helpHref({ parameter: "/schedule/openOffsetMin", version: 1 })).toBe("/help/parameters#param-v1-schedule-openOffsetMin");
  });

  it("links a rule id to its entry on the safety-rules page", () => {
    expect(ruleAnchor("RL-STALL-FRACTION")).toBe("rule-RL-STALL-FRACTION");
    expect(helpHref({ ruleId: "RL-STALL-FRACTION" })).toBe("/help/safety-rules#rule-RL-STALL-FRACTION");
  });

  it("prefers the rule when given both, and falls back to the index", () => {
    expect(helpHref({ ruleId: "RL-CLOSE-TRAVEL", parameter: "/closeTravelCounts" })).toBe("/help/safety-rules#rule-RL-CLOSE-TRAVEL");
    expect(helpHref({ parameter: "/travelTimeoutMs" })).toBe("/help/parameters#param-travelTimeoutMs");
    expect(helpHref({})).toBe("/help");
    expect(helpHref()).toBe("/help");
    expect(helpHref({ parameter: "" })).toBe("/help");
    expect(helpHref({ parameter: "/" })).toBe("/help");
  });
});
