// Demo controllers: two Henhouse 350 doors per site. Their tokens are written to
// .data/demo-controllers-<database>.json (git-ignored) as [{ serial, token }] for the simulator;
// one file per database, so seeding the test database never spoils the demo's tokens.
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { doorModels, sites, users } from "@/db/schema";
import { createController, getControllerBySerial, rotateToken } from "@/db/queries/controllers";

import { getEnv } from "@/lib/env";

/** Where the seed leaves the demo controllers' tokens for this database. */
export function demoTokensFile(): string {
  const name = new URL(getEnv().DATABASE_URL).pathname.replace(/^\//, "") || "roostline";
  return `.data/demo-controllers-${name}.json`;
}

function readTokens(): { serial: string; token: string }[] {
  try {
    return JSON.parse(readFileSync(demoTokensFile(), "utf8")) as { serial: string; token: string }[];
  } catch {
    return [];
  }
}

export async function seedDemoControllers(log: (line: string) => void) {
  const [model] = await db.select({ id: doorModels.id }).from(doorModels).where(eq(doorModels.code, "HM-350"));
  const [tech] = await db.select({ id: users.id }).from(users).where(eq(users.email, "technician@hollowmere.example"));
  if (!model || !tech) return;
  const known = new Map(readTokens().map((t) => [t.serial, t.token]));
  const all = await db.select({ id: sites.id, slug: sites.slug }).from(sites);
  let n = 0;
  for (const site of all) {
    for (const i of [1, 2]) {
      const serial = `HM350-${site.slug.slice(0, 4).toUpperCase()}-${i}`;
      const existing = await getControllerBySerial({ serial });
      if (!existing) {
        const { token } = await createController({ actorId: tech.id, serial, doorModelId: model.id, siteId: site.id, firmwareVersion: "1.4.2", parameterSetVersion: 2 });
        known.set(serial, token);
        n++;
      } else if (!known.has(serial)) {
        // The token file was lost: issue a fresh token so the simulator can still run.
        known.set(serial, (await rotateToken({ actorId: tech.id, controllerId: existing.id })).token);
      }
    }
  }
  mkdirSync(".data", { recursive: true });
  writeFileSync(demoTokensFile(), JSON.stringify([...known].map(([serial, token]) => ({ serial, token })), null, 2) + "\n", { mode: 0o600 });
  log(`${n} demo controllers registered; tokens in ${demoTokensFile()}`);
}
