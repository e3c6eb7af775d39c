import "server-only";
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { localDatabaseUrl } from "@/lib/database-url";
import * as schema from "./schema";

const globalForDb = globalThis as unknown as { counterpoisePool?: Pool };

/** One pool per process (hot reload in development would otherwise open a new one per edit). */
export const pool =
  globalForDb.counterpoisePool ??
  new Pool({
    connectionString: process.env.DATABASE_URL || localDatabaseUrl(),
    max: Number(process.env.DB_POOL_MAX || 10),
    // how long a request waits for a connection (a new one, or its turn in a busy pool) before it
    // fails: long enough for a loaded machine; a server that is down refuses at once anyway
    connectionTimeoutMillis: Number(process.env.DB_CONNECT_TIMEOUT_MS || 10000),
  });
if (process.env.NODE_ENV !== "production") globalForDb.counterpoisePool = pool;

export const db = drizzle(pool, { schema, casing: "snake_case" });
export type Db = typeof db;
