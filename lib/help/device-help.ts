// The device side of the fleet help page, read from the OpenAPI document the device routes are
// tested against, so the help and the API description say the same thing.
import { openApiDocument, type JsonSchema } from "@/lib/api/openapi";

export const CONFIG_PATH = "/api/v1/controllers/{serial}/config";
export const CHECK_IN_PATH = "/api/v1/controllers/{serial}/check-ins";
export const PUBLIC_KEY_PATH = "/api/v1/device/public-key";

export type Field = { name: string; description: string };

/** The configuration operation's verification instructions: the lead sentence, the numbered steps, and what follows them. */
export function verificationSteps(): { lead: string; steps: string[]; after: string[] } {
  const lines = (openApiDocument.paths[CONFIG_PATH]?.get?.description ?? "").split("\n").map((l) => l.trim()).filter(Boolean);
  const numbered = /^\d+\.\s+/;
  const firstStep = lines.findIndex((l) => numbered.test(l));
  const lastStep = lines.reduce((last, l, i) => (numbered.test(l) ? i : last), -1);
  if (firstStep < 0) return { lead: lines.join(" "), steps: [], after: [] };
  return {
    lead: lines.slice(0, firstStep).join(" "),
    steps: lines.slice(firstStep, lastStep + 1).map((l) => l.replace(numbered, "")),
    after: lines.slice(lastStep + 1),
  };
}

const asSchema = (v: unknown): JsonSchema => (typeof v === "object" && v !== null ? (v as JsonSchema) : {});

function fieldsOf(schema: JsonSchema, prefix = ""): Field[] {
  return Object.entries(asSchema(schema.properties)).flatMap(([name, child]) => {
    const c = asSchema(child);
    if (c.type === "object" && c.properties) return fieldsOf(c, `${prefix}${name}.`);
    return [{ name: `${prefix}${name}`, description: typeof c.description === "string" ? c.description : "" }];
  });
}

/** Every field of a check-in, counters as "counters.doorCycles", with the API's description. */
export function checkInFields(): Field[] {
  return fieldsOf(asSchema(openApiDocument.components.schemas.CheckIn));
}

