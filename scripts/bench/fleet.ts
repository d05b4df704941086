// The benchmark's data: the demo scenario in its own database, N extra controllers with known tokens
// on the Henhouse 350 door model, and one release that gives all of them a configuration.
import { randomBytes } from "node:crypto";
import { spawnSync } from "node:child_process";
import { and, eq, like } from "drizzle-orm";
import { db } from "@/db/client";
import { controllers, controllerTokens, doorModels, profileRevisions, profiles, releases, sites, users } from "@/db/schema";
import { hashToken } from "@/db/queries/controllers";
import type { SessionUser } from "@/lib/auth/guard";
import { createRelease } from "@/lib/releases/service";

export type BenchController = { serial: string; token: string };

const PREFIX = "BENCH-";

/** Rebuilds the benchmark database from the migrations and the demo seed. */
export function rebuildDatabase(root: string, databaseUrl: string, cnf: string) {
  const name = new URL(databaseUrl).pathname.slice(1);
  const sql = `DROP DATABASE IF EXISTS ${name}; CREATE DATABASE ${name} CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci; GRANT ALL ON ${name}.* TO 'roostline'@'127.0.0.1';`;
  run("mariadb", [`--defaults-file=${cnf}`, "-e", sql], root);
  const env = { ...process.env, DATABASE_URL: databaseUrl };
  run("node_modules/.bin/tsx", ["scripts/migrate.ts"], root, env);
  run("node_modules/.bin/tsx", ["scripts/seed.ts"], root, env);
}

function run(cmd: string, args: string[], cwd: string, env: NodeJS.ProcessEnv = process.env) {
  const r = spawnSync(cmd, args, { cwd, env, stdio: ["ignore", "ignore", "inherit"] });
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(" ")} exited with ${r.status}`);
}

/** Registers `count` controllers in batches, each with a fresh token; returns serials and tokens. */
export async function addControllers(count: number): Promise<BenchController[]> {
  const [model] = await db.select({ id: doorModels.id }).from(doorModels).where(eq(doorModels.code, "HM-350"));
  // The approved base keeps Berlin time, so its fleet stands at the demo's Bavarian site.
  const [site] = await db.select({ id: sites.id }).from(sites).where(eq(sites.slug, "lindenhof"));
  if (!model || !site) throw new Error("the demo seed has no HM-350 door model or no lindenhof site");
  const out: BenchController[] = [];
  for (let start = 0; start < count; start += 1_000) {
    const batch = Array.from({ length: Math.min(1_000, count - start) }, (_, k) => {
      const i = start + k;
      return { serial: `${PREFIX}${String(i).padStart(5, "0")}`, token: `rlc_${randomBytes(24).toString("base64url")}`, siteId: site.id };
    });
    await db.insert(controllers).values(batch.map((c) => ({ serial: c.serial, doorModelId: model.id, siteId: c.siteId, firmwareVersion: "1.4.2", parameterSetVersion: 2 })));
    const ids = await db.select({ id: controllers.id, serial: controllers.serial }).from(controllers).where(like(controllers.serial, `${PREFIX}%`));
    const idOf = new Map(ids.map((r) => [r.serial, r.id]));
    await db.insert(controllerTokens).values(batch.map((c) => ({ controllerId: idOf.get(c.serial)!, tokenHash: hashToken(c.token), hint: c.token.slice(-4) })));
    out.push(...batch.map(({ serial, token }) => ({ serial, token })));
  }
  return out;
}

/** Releases the approved Henhouse 350 base to its whole door model's controllers at its site at 100 %, as the demo admin. */
export async function releaseToAll(): Promise<number> {
  const [admin] = await db.select().from(users).where(eq(users.email, "admin@hollowmere.example"));
  const [base] = await db
    .select({ id: profileRevisions.id })
    .from(profileRevisions)
    .innerJoin(profiles, eq(profiles.id, profileRevisions.profileId))
    .innerJoin(doorModels, eq(doorModels.id, profiles.doorModelId))
    .where(and(eq(doorModels.code, "HM-350"), eq(profiles.layer, "base"), eq(profileRevisions.state, "approved")));
  const [site] = await db.select({ id: sites.id }).from(sites).where(eq(sites.slug, "lindenhof"));
  const siteId = site?.id ?? 0;
  if (!admin || !base) throw new Error("the demo seed has no admin or no approved HM-350 base revision");
  const { releaseId } = await createRelease({ actor: admin as unknown as SessionUser, input: { baseRevisionId: base.id, target: { kind: "site", siteId }, percent: 100, note: "benchmark" } });
  const [row] = await db.select({ id: releases.id }).from(releases).where(eq(releases.id, releaseId));
  return row!.id;
}
