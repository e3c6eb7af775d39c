// Migrate the database, and with --seed load the demo workspace (idempotent).
import { runMigrations } from "../db/migrate";

async function main() {
  await runMigrations();
  console.error("[db] migrations applied");
  if (process.argv.includes("--seed")) {
    const { seedDemo } = await import("../db/seed");
    await seedDemo();
    console.error("[db] demo workspace seeded");
  }
}

main().catch((err) => {
  console.error("[db]", err instanceof Error ? err.message : err);
  process.exit(1);
});
