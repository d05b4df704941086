// The string formats the parameter schemas use beyond JSON Schema's own, shared by the ajv instance
// that compiles the validators and by the precompiled validators in schemas/generated/.
import { resolveTimeZone } from "@/lib/sun/time-zone";

/** True when the name is a time zone this runtime's Intl knows, in IANA Area/Location spelling. */
export function isKnownTimeZone(name: string): boolean {
  return resolveTimeZone(name) !== null;
}

/** In the shape ajv keeps formats, which the precompiled validators look up by name. */
export const paramFormats = { "iana-time-zone": { type: "string", validate: isKnownTimeZone } } as const;
