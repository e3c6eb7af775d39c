// API tests run against the test run's own PostgreSQL (scripts/test.mjs sets DATABASE_URL).
if (!process.env.DATABASE_URL) {
  throw new Error("DATABASE_URL is not set: run the API tests through `npm test` (it starts the test database)");
}
