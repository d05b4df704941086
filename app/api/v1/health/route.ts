import { sql } from "drizzle-orm";
import { db } from "@/db/client";
import { handle } from "@/lib/http/route";

export const dynamic = "force-dynamic";

/** Liveness and database reachability, for scripts and load balancers; 503 when MariaDB is down. */
export const GET = handle(async () => {
  await db.execute(sql`SELECT 1`);
  return Response.json({ status: "ok" }, { headers: { "cache-control": "no-store" } });
});
