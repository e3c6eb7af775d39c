import { defineConfig } from "drizzle-kit";
import { localDatabaseUrl } from "./lib/database-url";

export default defineConfig({
  dialect: "postgresql",
  schema: "./db/schema.ts",
  out: "./db/migrations",
  dbCredentials: { url: process.env.DATABASE_URL || localDatabaseUrl() },
  casing: "snake_case",
  strict: true,
  verbose: false,
});
