import { z } from "zod";

/** A controller as a technician registers it. */
export const controllerSchema = z.object({
  serial: z.string().trim().toUpperCase().regex(/^[A-Z0-9][A-Z0-9-]{3,31}$/, "must be 4–32 letters, digits or dashes, e.g. HM350-0001"),
  doorModelId: z.coerce.number().int().positive("Choose a door model"),
  siteId: z.coerce.number().int().positive("Choose a site"),
  firmwareVersion: z.string().trim().regex(/^\d+\.\d+\.\d+$/, "must be a version such as 1.4.2"),
  parameterSetVersion: z.union([z.literal(1), z.literal(2)], { error: "must be 1 or 2" }),
});
