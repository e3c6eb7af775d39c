#!/usr/bin/env node
// `npm test`: the whole suite on a fresh machine. Installs what is missing, starts the test run's
// own PostgreSQL (its own port and data folder), resets the test database, lints and type-checks,
// runs vitest (unit, components, API against the real database), builds the app into .next-test,
// serves it and runs the browser tests in Debian's Chromium. Exits non-zero on any failure.
//
//   npm test                 everything
//   npm test -- --skip-e2e   without the build and the browser tests
//   npm test -- --only-e2e   build and browser tests only
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { ensureChromium, ensureInstalled, ensureLocalSecrets, ensurePoppler, log, nodeBin, root, run, startChild, waitForHttp } from "./common.mjs";
import { startPostgres, stopPostgres } from "./pg.mjs";

const guard = pathToFileURL(join(root, "scripts", "exit-with-parent.mjs")).href;

/**
 * What `npm test` runs, each a `node` argument list: migrate, the local services, lint, types,
 * vitest (unit, components, api), the build, the app server, vitest e2e. The long-running ones
 * (services, app) load exit-with-parent.mjs, like `npm start`'s, so a killed `npm test` does not
 * leave them holding their ports.
 */
export function testPlan({ appPort = 3100 } = {}) {
  const guarded = (args) => ["--import", guard, ...args];
  return {
    setup: [nodeBin("tsx"), "scripts/db-setup.ts"],
    services: guarded([nodeBin("tsx"), "scripts/local-services.ts"]),
    lint: [nodeBin("eslint"), ".", "--max-warnings=0"],
    types: [nodeBin("tsc"), "--noEmit", "-p", "tsconfig.json"],
    vitest: [nodeBin("vitest"), "run", "--project", "unit", "--project", "components", "--project", "api"],
    build: [nodeBin("next"), "build"],
    app: guarded(["scripts/serve.mjs", "-H", "127.0.0.1", "-p", String(appPort)]),
    e2e: [nodeBin("vitest"), "run", "--project", "e2e"],
  };
}

/**
 * Start one of the plan's long-running children with the IPC channel exit-with-parent.mjs watches
 * (stdin ignored, `stdout` "inherit" or "ignore", stderr inherited).
 */
export function startLongRunning(args, { env, stdout = "inherit" } = {}) {
  return startChild(process.execPath, args, { env, stdio: ["ignore", stdout, "inherit", "ipc"] });
}

const args = process.argv.slice(2);
const skipE2e = args.includes("--skip-e2e");
const onlyE2e = args.includes("--only-e2e");
const keepDb = args.includes("--keep-db");
const appPort = Number(process.env.TEST_APP_PORT || 3100);
// Parallel runs on one machine each set their own TEST_* ports and TEST_DIST_DIR.
const distDir = process.env.TEST_DIST_DIR || ".next-test";

const children = [];
/** Stop the children and wait until they have gone (their ports free; one that hangs is killed), then the test cluster. */
async function cleanup() {
  const running = children.filter((c) => c.exitCode === null && c.signalCode === null);
  for (const c of running) c.kill("SIGTERM");
  const killLate = setTimeout(() => {
    for (const c of running) if (c.exitCode === null && c.signalCode === null) c.kill("SIGKILL");
  }, 15000);
  await Promise.all(running.map((c) => (c.exitCode === null && c.signalCode === null ? new Promise((r) => c.once("exit", r)) : null)));
  clearTimeout(killLate);
  if (!keepDb) stopPostgres({ test: true });
}
let stopping = false;
const stopOn = (code) => () => {
  if (stopping) return;
  stopping = true;
  cleanup().finally(() => process.exit(code));
};

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
    S3_PORT: process.env.TEST_S3_PORT || "4570",
    COUNTERPOISE_LOCAL_STATE: `/tmp/counterpoise-test-state-${appPort}`,
  };
  const plan = testPlan({ appPort });
  run(process.execPath, plan.setup, { env });

  children.push(startLongRunning(plan.services, { env }));

  if (!onlyE2e) {
    log("test", "lint (eslint .)");
    run(process.execPath, plan.lint, { env });
    log("test", "type check (tsc --noEmit)");
    run(process.execPath, plan.types, { env });
    log("test", "vitest: unit, components, api");
    run(process.execPath, plan.vitest, { env });
  }

  if (!skipE2e) {
    log("test", `building the app into ${distDir}`);
    const appUrl = `http://127.0.0.1:${appPort}`;
    const appEnv = { ...env, NODE_ENV: "production", NEXT_DIST_DIR: distDir, APP_URL: appUrl, AUTH_RATE_LIMIT_MAX: process.env.AUTH_RATE_LIMIT_MAX || "1000" };
    run(process.execPath, plan.build, { env: appEnv });
    children.push(startLongRunning(plan.app, { env: appEnv, stdout: "ignore" }));
    await waitForHttp(`${appUrl}/api/health`, { timeoutMs: 90000, okOnly: true });
    log("test", "vitest: e2e in Chromium");
    run(process.execPath, plan.e2e, { env: { ...appEnv, NODE_ENV: "test", E2E_BASE_URL: appUrl } });
  }
  log("test", `all green in ${Math.round((Date.now() - t0) / 1000)} s`);
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  process.on("SIGINT", stopOn(130));
  process.on("SIGTERM", stopOn(143));
  main()
    .then(stopOn(0))
    .catch((err) => {
      log("test", `FAILED: ${err.message}`);
      stopOn(err.exitCode || 1)();
    });
}
