// The copy of a parameter schema handed to Monaco's JSON worker: hover text that names the unit, the
// range, the default and the safety flag, and for overlays a relaxed form that accepts a partial document
// (our own validation checks the merged result instead).

type Node = Record<string, unknown>;

const isNode = (v: unknown): v is Node => typeof v === "object" && v !== null && !Array.isArray(v);

// Characters Markdown would otherwise read as emphasis, code, links or raw HTML.
function escapeMarkdown(text: string): string {
  return text.replace(/([\\`*_[\]<>#|])/g, "\\$1");
}

function rangeText(node: Node): string | null {
  const min = typeof node.minimum === "number" ? node.minimum : null;
  const max = typeof node.maximum === "number" ? node.maximum : null;
  if (min !== null && max !== null) return `${min} to ${max}`;
  if (min !== null) return `at least ${min}`;
  if (max !== null) return `at most ${max}`;
  return null;
}

/** The facts line of a parameter's hover: "Unit: counts · 100 to 200000 · default 17000 · safety-relevant". */
export function parameterFacts(node: Node): string {
  const parts: string[] = [];
  if (typeof node.roostlineUnit === "string") parts.push(`Unit: ${node.roostlineUnit}`);
  const range = rangeText(node);
  if (range) parts.push(range);
  const isScalar = node.default !== undefined && (typeof node.default !== "object" || node.default === null);
  if (isScalar) parts.push(`default ${JSON.stringify(node.default)}`);
  if (node.roostlineSafety === true) parts.push("safety-relevant");
  return parts.join(" · ");
}

function hoverText(node: Node): string | null {
  const description = typeof node.description === "string" ? escapeMarkdown(node.description) : "";
  const facts = parameterFacts(node);
  const text = [description, facts && `*${escapeMarkdown(facts)}*`].filter(Boolean).join("\n\n");
  return text || null;
}

function transform(value: unknown, relaxed: boolean): unknown {
  if (Array.isArray(value)) return value.map((v) => transform(v, relaxed));
  if (!isNode(value)) return value;
  const out: Node = {};
  for (const [key, child] of Object.entries(value)) {
    // Values of these keywords are data, not subschemas: copy them untouched.
    if (key === "default" || key === "enum" || key === "const" || key === "examples") {
      out[key] = child;
      continue;
    }
    if (relaxed && (key === "required" || key === "discriminator")) continue;
    // A partial schedule such as { "stepMinutes": 20 } fits every form; oneOf would call that an error.
    const name = relaxed && key === "oneOf" ? "anyOf" : key;
    out[name] = key === "properties" && isNode(child) ? mapProperties(child, relaxed) : transform(child, relaxed);
  }
  return out;
}

function mapProperties(properties: Node, relaxed: boolean): Node {
  const out: Node = {};
  for (const [name, child] of Object.entries(properties)) {
    const node = transform(child, relaxed);
    if (isNode(node)) {
      const hover = hoverText(node);
      if (hover) node.markdownDescription = hover;
    }
    out[name] = node;
  }
  return out;
}

/**
 * The schema as Monaco should see it, registered under `uri`: every property's hover names its unit,
 * range, default and safety flag; with `relaxed`, nothing is required, so an overlay validates.
 */
export function editorSchema(schema: Record<string, unknown>, options: { uri: string; relaxed: boolean }): Record<string, unknown> {
  const copy = transform(schema, options.relaxed) as Record<string, unknown>;
  copy.$id = options.uri;
  return copy;
}
