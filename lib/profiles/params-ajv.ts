import Ajv2020, { type Options } from "ajv/dist/2020";
import addFormats from "ajv-formats";
import { paramFormats } from "./schema-formats";

/** A fresh ajv instance with our annotation keywords and formats, in strict mode (`code` for the validator generator). */
export function createParamsAjv(code?: Options["code"]): Ajv2020 {
  // verbose: errors carry their schema node, so messages can name the unit and the allowed values.
  const ajv = new Ajv2020({ allErrors: true, strict: true, discriminator: true, verbose: true, ...(code ? { code } : {}) });
  addFormats(ajv);
  ajv.addKeyword({ keyword: "roostlineUnit", schemaType: "string" });
  ajv.addKeyword({ keyword: "roostlineSafety", schemaType: "boolean" });
  ajv.addFormat("iana-time-zone", paramFormats["iana-time-zone"]);
  return ajv;
}
