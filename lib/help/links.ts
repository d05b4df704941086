// Anchors on the help pages, so findings, editor fields and other pages can link to one parameter or rule.

/** The anchor id of a parameter on /help/parameters: "/stall/thresholdCps" (or "stall.thresholdCps") → "param-stall-thresholdCps"; version 1 paths get "param-v1-…". */
export function parameterAnchor(path: string, version: 1 | 2 = 2): string {
  const tokens = path.includes("/") ? path.split("/").filter(Boolean) : path.split(".").filter(Boolean);
  // JSON Pointer escapes (~1 for "/", ~0 for "~") would be odd in an id; our keys never need them.
  const name = tokens.map((t) => t.replace(/~1/g, "_").replace(/~0/g, "_")).join("-");
  return version === 1 ? `param-v1-${name}` : `param-${name}`;
}

/** The anchor id of a safety rule on /help/safety-rules: "RL-STALL-FRACTION" → "rule-RL-STALL-FRACTION". */
export function ruleAnchor(ruleId: string): string {
  return `rule-${ruleId}`;
}

/** A link into the help: a rule's entry when `ruleId` is given (it wins over `parameter`), a parameter's entry, or the help index. */
export function helpHref({ parameter, ruleId, version = 2 }: { parameter?: string; ruleId?: string; version?: 1 | 2 } = {}): string {
  if (ruleId) return `/help/safety-rules#${ruleAnchor(ruleId)}`;
  if (parameter && parameter.replace(/[/.]/g, "") !== "") return `/help/parameters#${parameterAnchor(parameter, version)}`;
  return "/help";
}
