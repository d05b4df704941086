// The parameter-set schemas and their validators. Runs in the browser as well as on the server:
// the schemas are bundled as JSON imports, nothing is fetched ($id values are never resolved). The
// validators are compiled ahead of time (npm run schemas:types), so no code is generated at run time
// and pages need no 'unsafe-eval' in their content security policy.
import validateV1 from "@/schemas/generated/validate-v1";
import validateV2 from "@/schemas/generated/validate-v2";
import v1Schema from "@/schemas/door-params-v1.schema.json";
import v2Schema from "@/schemas/door-params-v2.schema.json";
import type { DoorParamsV1 } from "@/schemas/generated/door-params-v1";
import type { DoorParamsV2 } from "@/schemas/generated/door-params-v2";
import { describeError } from "./messages";
import { isKnownTimeZone, paramFormats } from "./schema-formats";

export type { DoorParamsV1, DoorParamsV2 };
export type ParamsVersion = 1 | 2;
export type ParamsByVersion = { 1: DoorParamsV1; 2: DoorParamsV2 };

export const PARAMS_VERSIONS = [1, 2] as const satisfies readonly ParamsVersion[];
export const LATEST_PARAMS_VERSION: ParamsVersion = 2;

export type SchemaEntry = { version: ParamsVersion; id: string; schema: Record<string, unknown> };

export const SCHEMA_CATALOG: readonly SchemaEntry[] = [
  { version: 1, id: v1Schema.$id, schema: v1Schema },
  { version: 2, id: v2Schema.$id, schema: v2Schema },
];

/** The catalog entry for one parameter-set version; throws for a version we do not have. */
export function getSchema(version: ParamsVersion): SchemaEntry {
  const entry = SCHEMA_CATALOG.find((e) => e.version === version);
  if (!entry) throw new Error(`no parameter schema for version ${String(version)}`);
  return entry;
}

export { isKnownTimeZone, paramFormats };
export { createParamsAjv } from "./params-ajv";

type Validator = ((value: unknown) => boolean) & { errors?: import("ajv").ErrorObject[] | null };

const VALIDATORS: Record<ParamsVersion, Validator> = { 1: validateV1 as Validator, 2: validateV2 as Validator };

function validatorFor(version: ParamsVersion): Validator {
  const validate = VALIDATORS[version];
  if (!validate) throw new Error(`no parameter schema for version ${String(version)}`);
  return validate;
}

export type ValidationIssue = {
  /** ajv's instancePath: a JSON Pointer to the offending value, "" for the document itself. */
  path: string;
  keyword: string;
  message: string;
  /** The property named by a required / additionalProperties issue (which sits at the parent's path). */
  property?: string;
};

export type ValidationResult = { ok: boolean; issues: ValidationIssue[] };

/** Checks a document against one parameter-set version; every issue has a plain-language message. */
export function validateParams(version: ParamsVersion, value: unknown): ValidationResult {
  const validate = validatorFor(version);
  if (validate(value)) return { ok: true, issues: [] };
  const issues = (validate.errors ?? []).map(describeError);
  return { ok: false, issues };
}

/** Type guard form of validateParams. */
export function isValidParams<V extends ParamsVersion>(version: V, value: unknown): value is ParamsByVersion[V] {
  return validatorFor(version)(value) === true;
}
