#!/usr/bin/env node
// `npm test`: the whole suite on a fresh machine. Installs what is missing, starts the test run's
// own PostgreSQL (its own port and data folder), resets the test database, lints and type-checks,
// runs vitest (unit, components, API against the real database), builds the app into .next-test,
// serves it and runs the browser tests in Debian's Chromium. Exits non-zero on any failure.
//
//   npm test                 everything
//   npm test -- --skip-e2e   without the build and the browser tests
//   npm test -- --only-e2e   build and browser tests only
import { ensureChromium, ensureInstalled, ensureLocalSecrets, ensurePoppler, log, nodeBin, run, startChild, waitForHttp } from "./common.mjs";
import { startPostgres, stopPostgres } from "./pg.mjs";

const args = process.argv.slice(2);
const skipE2e = args.includes("--skip-e2e");
const onlyE2e = args.includes("--only-e2e");
const keepDb = args.includes("--keep-db");
const appPort = Number(process.env.TEST_APP_PORT || 3100);
// Parallel runs on one machine each set their own TEST_* ports and TEST_DIST_DIR.
const distDir = process.env.TEST_DIST_DIR || ".next-test";

const children = [];
function cleanup() {
  for (const c of children) if (c.exitCode === null) c.kill("SIGTERM");
  if (!keepDb) stopPostgres({ test: true });
}
process.on("SIGINT", () => {
  cleanup();
  process.exit(130);
});

async function main() {
  const t0 = Date.now();
  ensureInstalled();
  if (!skipE2e) ensureChromium();
  ensurePoppler();
  const base = ensureLocalSecrets();
  const dbUrl = startPostgres({ test: true, resetDatabase: true });
  const env = {
    ...base,
    NODE_ENV: "test",
    DATABASE_URL: dbUrl,
    TEST_DATABASE_URL: dbUrl,
    BETTER_AUTH_SECRET: base.BETTER_AUTH_SECRET || "test-secret-test-secret-test-secret-0",
    SMTP_PORT: process.env.TEST_SMTP_PORT || "2526",
    MAILBOX_PORT: process.env.TEST_MAILBOX_PORT || "2527",
    S3_PORT: process.env.TEST_S3_PORT || "4570",
    COUNTERPOISE_LOCAL_STATE: `/tmp/counterpoise-test-state-${appPort}`,
  };
  run(process.execPath, [nodeBin("tsx"), "scripts/db-setup.ts"], { env });

  const services = startChild(process.execPath, [nodeBin("tsx"), "scripts/local-services.ts"], { env, stdio: ["ignore", "inherit", "inherit"] });
  children.push(services);

  if (!onlyE2e) {
    log("test", "lint (eslint .)");
    run(process.execPath, [nodeBin("eslint"), ".", "--max-warnings=0"], { env });
    log("test", "type check (tsc --noEmit)");
    run(process.execPath, [nodeBin("tsc"), "--noEmit", "-p", "tsconfig.json"], { env });
    log("test", "vitest: unit, components, api");
    run(process.execPath, [nodeBin("vitest"), "run", "--project", "unit", "--project", "components", "--project", "api"], { env });
  }

  if (!skipE2e) {
    log("test", `building the app into ${distDir}`);
    const appUrl = `http://127.0.0.1:${appPort}`;
    const appEnv = { ...env, NODE_ENV: "production", NEXT_DIST_DIR: distDir, APP_URL: appUrl, AUTH_RATE_LIMIT_MAX: process.env.AUTH_RATE_LIMIT_MAX || "1000" };
    run(process.execPath, [nodeBin("next"), "build"], { env: appEnv });
    const app = startChild(process.execPath, ["scripts/serve.mjs", "-H", "127.0.0.1", "-p", String(appPort)], {
      env: appEnv,
      stdio: ["ignore", "ignore", "inherit"],
    });
    children.push(app);
    await waitForHttp(`${appUrl}/api/health`, { timeoutMs: 90000, okOnly: true });
    log("test", "vitest: e2e in Chromium");
    run(process.execPath, [nodeBin("vitest"), "run", "--project", "e2e"], { env: { ...appEnv, NODE_ENV: "test", E2E_BASE_URL: appUrl } });
  }
  log("test", `all green in ${Math.round((Date.now() - t0) / 1000)} s`);
}

main()
  .then(() => {
    cleanup();
    process.exit(0);
  })
  .catch((err) => {
    log("test", `FAILED: ${err.message}`);
    cleanup();
    process.exit(err.exitCode || 1);
  });
