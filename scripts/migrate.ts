// Applies the committed SQL migrations in db/migrations to DATABASE_URL.
import "./load-env";
import { migrate } from "drizzle-orm/mysql2/migrator";
import { closeDb, db } from "@/db/client";

async function main() {
  await migrate(db, { migrationsFolder: "db/migrations" });
  const url = new URL(process.env.DATABASE_URL ?? "mysql://x/roostline");
  console.log(`[roostline] migrations applied to database ${url.pathname.slice(1) || "roostline"}`);
}

main()
  .catch((err) => {
    console.error("[roostline] migration failed:", err instanceof Error ? err.message : err);
    process.exitCode = 1;
  })
  .finally(() => closeDb());
