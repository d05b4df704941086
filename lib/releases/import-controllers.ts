import { z } from "zod";
import { createController } from "@/db/queries/controllers";
import { listDoorModels, listSites } from "@/db/queries/fleet";
import { db } from "@/db/client";
import { controllers } from "@/db/schema";
import type { SessionUser } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { parseControllersCsv } from "@/lib/fleet/controllers-csv";

export const importSchema = z.object({
  csv: z.string().min(1, "The file is empty").max(1024 * 1024, "The file is larger than 1 MiB"),
  onlyGoodRows: z.boolean().default(false),
});

/**
 * Registers the controllers of a CSV file. By default nothing is imported when any row is wrong;
 * with `onlyGoodRows` the good rows are imported and the wrong ones reported.
 */
export async function importControllers({ actor, input }: { actor: SessionUser; input: z.infer<typeof importSchema> }) {
  const [models, sites, existing] = await Promise.all([listDoorModels(), listSites(), db.select({ serial: controllers.serial }).from(controllers)]);
  const parsed = parseControllersCsv(input.csv, { knownDoorModels: models.map((m) => m.code), knownSites: sites.map((s) => s.slug), existingSerials: existing.map((e) => e.serial) });
  const issues = parsed.errors.map((e) => ({ path: `/rows/${e.row}${e.column ? `/${e.column}` : ""}`, message: e.message }));
  if (parsed.errors.length && !input.onlyGoodRows) {
    throw new AppError("invalid_request", `Nothing imported: ${parsed.errors.length} problem${parsed.errors.length > 1 ? "s" : ""} in the file (first: row ${parsed.errors[0]!.row}, ${parsed.errors[0]!.message}).`, { issues });
  }
  const badRows = new Set(parsed.errors.map((e) => e.row));
  const good = parsed.rows.filter((r) => !badRows.has(r.row));
  const modelId = new Map(models.map((m) => [m.code, m.id]));
  const siteId = new Map(sites.map((s) => [s.slug, s.id]));
  const created: { serial: string; token: string }[] = [];
  // One transaction for the whole file: a failure part-way leaves nothing registered.
  await db.transaction(async (tx) => {
    for (const r of good) {
      const { token } = await createController({ actorId: actor.id, serial: r.serial, doorModelId: modelId.get(r.doorModelCode)!, siteId: siteId.get(r.siteSlug)!, firmwareVersion: r.firmwareVersion, parameterSetVersion: r.parameterSetVersion }, tx);
      created.push({ serial: r.serial, token });
    }
  });
  return { imported: created, skipped: issues };
}

