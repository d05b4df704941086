import { drizzle } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import { getEnv } from "@/lib/env";
import * as schema from "./schema";

function createDb() {
  const env = getEnv();
  const pool = mysql.createPool({
    uri: env.DATABASE_URL,
    connectionLimit: env.DATABASE_POOL_SIZE,
    waitForConnections: true,
    enableKeepAlive: true,
    timezone: "Z",
    dateStrings: false,
  });
  // "planetscale" mode: the default relational mode emits LATERAL joins, which MariaDB rejects.
  return { pool, db: drizzle(pool, { schema, mode: "planetscale" }) };
}

type DbHandle = ReturnType<typeof createDb>;
const globalForDb = globalThis as unknown as { roostlineDb?: DbHandle };

function handle(): DbHandle {
  // One pool per process, kept across hot reloads in development.
  globalForDb.roostlineDb ??= createDb();
  return globalForDb.roostlineDb;
}

export type Db = DbHandle["db"];
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

/** The app's one Drizzle instance over the one mysql2 pool. */
export const db: Db = new Proxy({} as Db, {
  get(_target, prop) {
    const real = handle().db as unknown as Record<string | symbol, unknown>;
    const value = real[prop];
    return typeof value === "function" ? (value as (...a: unknown[]) => unknown).bind(real) : value;
  },
});

/** The real Drizzle instance behind `db`, for things made once per pool (prepared queries). */
export function currentDb(): Db {
  return handle().db;
}

/** Closes the pool (scripts and tests). */
export async function closeDb(): Promise<void> {
  const h = globalForDb.roostlineDb;
  globalForDb.roostlineDb = undefined;
  if (h) await h.pool.end();
}
