import "server-only";
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool, type PoolClient } from "pg";
import { localDatabaseUrl } from "@/lib/database-url";
import { DATABASE_ERROR } from "@/lib/db-unavailable";
import * as schema from "./schema";

const globalForDb = globalThis as unknown as { counterpoisePool?: Pool };

/** An error from getting a connection is marked as the database's (lib/db-unavailable.ts: a 503, not a 500). */
function marked(err: unknown): unknown {
  if (err && typeof err === "object") Object.assign(err, { [DATABASE_ERROR]: true });
  return err;
}

/**
 * The pool whose connection errors say they are the database's: a refused or reset socket is then
 * "the database is out of reach" (503), told apart from the file store's. Every query goes through
 * `connect` (a pooled `query` too), so this is the one place a connection is got.
 */
class AppPool extends Pool {
  connect(): Promise<PoolClient>;
  connect(callback: (err: Error | undefined, client: PoolClient | undefined, done: (release?: unknown) => void) => void): void;
  connect(callback?: (err: Error | undefined, client: PoolClient | undefined, done: (release?: unknown) => void) => void): Promise<PoolClient> | void {
    if (callback) return super.connect((err, client, done) => callback(err ? (marked(err) as Error) : err, client, done));
    return super.connect().catch((err: unknown) => {
      throw marked(err);
    });
  }
}

function newPool(): Pool {
  const made = new AppPool({
    connectionString: process.env.DATABASE_URL || localDatabaseUrl(),
    max: Number(process.env.DB_POOL_MAX || 10),
    // how long a request waits for a connection (a new one, or its turn in a busy pool) before it
    // fails: long enough for a loaded machine; a server that is down refuses at once anyway. A
    // request that still fails answers 503 "busy, try again" (lib/db-unavailable.ts), not a 500
    connectionTimeoutMillis: Number(process.env.DB_CONNECT_TIMEOUT_MS || 10000),
    // keep an idle connection a minute (the driver's default is 10 s): a burst of requests after a
    // short pause then finds connections open instead of opening ten at once, which on a loaded
    // machine is what ran past the connect timeout
    idleTimeoutMillis: Number(process.env.DB_IDLE_TIMEOUT_MS || 60000),
  });
  // An idle connection the server closes (a restart, an administrator ending it) is reported here;
  // with no listener Node would treat it as an unhandled error and stop the whole app. The pool has
  // already dropped it and opens a new one for the next request.
  made.on("error", (err) => console.warn(`[db] an idle database connection was closed: ${err.message}`));
  return made;
}

/** One pool per process (hot reload in development would otherwise open a new one per edit). */
export const pool = globalForDb.counterpoisePool ?? newPool();
if (process.env.NODE_ENV !== "production") globalForDb.counterpoisePool = pool;

export const db = drizzle(pool, { schema, casing: "snake_case" });
export type Db = typeof db;
