// Applies the committed SQL migrations in db/migrations (run by `npm start` and `npm test`).
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { fileURLToPath } from "node:url";
import { Pool } from "pg";
import { localDatabaseUrl } from "../lib/database-url";

export async function runMigrations(url = process.env.DATABASE_URL || localDatabaseUrl()): Promise<void> {
  const pool = new Pool({ connectionString: url, max: 1 });
  try {
    await migrate(drizzle(pool), { migrationsFolder: fileURLToPath(new URL("./migrations", import.meta.url)) });
  } finally {
    await pool.end();
  }
}
