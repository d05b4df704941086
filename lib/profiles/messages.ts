// ajv's errors in the words a technician would use, with the unit the schema gives the value.
import type { ErrorObject } from "ajv";
import type { ValidationIssue } from "./schemas";

const TIME_OF_DAY_PATTERN = "^([01][0-9]|2[0-3]):[0-5][0-9]$";

const TYPE_WORDS: Record<string, string> = {
  integer: "a whole number",
  number: "a number",
  string: "text",
  boolean: "true or false",
  object: "a group of parameters (an object)",
  array: "a list",
  null: "null",
};

type SchemaNode = Record<string, unknown>;

const asNode = (v: unknown): SchemaNode => (typeof v === "object" && v !== null ? (v as SchemaNode) : {});

function withUnit(limit: unknown, node: SchemaNode): string {
  const unit = typeof node.roostlineUnit === "string" ? ` ${node.roostlineUnit}` : "";
  return `${String(limit)}${unit}`;
}

const quoted = (values: readonly unknown[]) => values.map((v) => JSON.stringify(v)).join(", ");

function typeMessage(expected: unknown): string {
  const list = Array.isArray(expected) ? expected : [expected];
  return `must be ${list.map((t) => TYPE_WORDS[String(t)] ?? String(t)).join(" or ")}`;
}

function discriminatorValues(node: SchemaNode, tag: string): unknown[] {
  const branches = Array.isArray(node.oneOf) ? node.oneOf : [];
  return branches.map((b) => asNode(asNode(asNode(b).properties)[tag]).const).filter((v) => v !== undefined);
}

function found(data: unknown): string {
  return data === null || ["string", "number", "boolean"].includes(typeof data) ? ` (found ${JSON.stringify(data)})` : "";
}

/** One ajv error as an issue with a plain-language message naming the unit or the allowed values. */
export function describeError(error: ErrorObject): ValidationIssue {
  const node = asNode(error.parentSchema);
  const params = error.params as Record<string, unknown>;
  const base = { path: error.instancePath, keyword: error.keyword };
  switch (error.keyword) {
    case "required": {
      const property = String(params.missingProperty);
      return { ...base, property, message: `"${property}" is required` };
    }
    case "additionalProperties": {
      const property = String(params.additionalProperty);
      return { ...base, property, message: `"${property}" is not a known parameter here` };
    }
    case "type":
      return { ...base, message: typeMessage(params.type) };
    case "maximum":
      return { ...base, message: `must be at most ${withUnit(params.limit, node)}` };
    case "minimum":
      return { ...base, message: `must be at least ${withUnit(params.limit, node)}` };
    case "exclusiveMaximum":
      return { ...base, message: `must be less than ${withUnit(params.limit, node)}` };
    case "exclusiveMinimum":
      return { ...base, message: `must be greater than ${withUnit(params.limit, node)}` };
    case "enum":
      return { ...base, message: `must be one of ${quoted(asArray(params.allowedValues))}` };
    case "const":
      return { ...base, message: `must be ${JSON.stringify(params.allowedValue)}${found(error.data)}` };
    case "pattern":
      return {
        ...base,
        message:
          params.pattern === TIME_OF_DAY_PATTERN
            ? "must be a time of day as HH:MM on the 24-hour clock, 00:00 to 23:59"
            : `must match the pattern ${String(params.pattern)}`,
      };
    case "format":
      return {
        ...base,
        message:
          params.format === "iana-time-zone"
            ? "must be an IANA time zone name such as Europe/Berlin or America/Chicago"
            : `must be a valid ${String(params.format)}`,
      };
    case "discriminator": {
      const tag = String(params.tag);
      const allowed = quoted(discriminatorValues(node, tag));
      return {
        ...base,
        property: tag,
        message: params.error === "tag" ? `"${tag}" is required and must be one of ${allowed}` : `"${tag}" must be one of ${allowed}`,
      };
    }
    default:
      return { ...base, message: error.message ?? `fails the ${error.keyword} check` };
  }
}

function asArray(v: unknown): unknown[] {
  return Array.isArray(v) ? v : [v];
}
