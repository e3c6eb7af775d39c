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
    connectionTimeoutMillis: 3000,
  });
if (process.env.NODE_ENV !== "production") globalForDb.counterpoisePool = pool;

export const db = drizzle(pool, { schema, casing: "snake_case" });
export type Db = typeof db;
