#!/usr/bin/env node
// `npm start`: install, start PostgreSQL, migrate, seed the demo workspace, build when stale, serve.
// `npm run dev` (with --dev): the same, then `next dev` with hot reload instead of a build.
import { buildIsFresh, ensureInstalled, ensureLocalSecrets, log, nodeBin, run, startBanner, startChild, waitForHttp } from "./common.mjs";
import { startPostgres } from "./pg.mjs";

const dev = process.argv.includes("--dev");
const port = Number(process.env.PORT || 3000);
const host = process.env.HOST || "127.0.0.1";

async function main() {
  ensureInstalled();
  const env = ensureLocalSecrets();
  env.DATABASE_URL = startPostgres();
  env.APP_URL = env.APP_URL || `http://${host === "0.0.0.0" ? "127.0.0.1" : host}:${port}`;
  env.NODE_ENV = dev ? "development" : "production";

  const children = [];
  const services = startChild(process.execPath, [nodeBin("tsx"), "scripts/local-services.ts"], { env, stdio: ["ignore", "inherit", "inherit"] });
  children.push(services);

  run(process.execPath, [nodeBin("tsx"), "scripts/db-setup.ts", "--seed"], { env });

  if (!dev && !buildIsFresh()) {
    log("start", "building the app (next build)");
    run(process.execPath, [nodeBin("next"), "build"], { env: { ...env, NEXT_DIST_DIR: ".next" } });
  }

  // production goes through scripts/serve.mjs (it records the connecting peer in X-Forwarded-For)
  const serveArgs = dev ? [nodeBin("next"), "dev"] : ["scripts/serve.mjs"];
  const app = startChild(process.execPath, [...serveArgs, "-H", host, "-p", String(port)], { env });
  children.push(app);

  const stop = (code) => {
    for (const c of children) if (c.exitCode === null) c.kill("SIGTERM");
    setTimeout(() => process.exit(code), 300).unref();
  };
  process.on("SIGINT", () => stop(0));
  process.on("SIGTERM", () => stop(0));
  app.on("exit", (code) => stop(code ?? 0));
  services.on("exit", (code) => {
    if (code) {
      log("start", `local mail/storage services stopped (exit ${code})`);
      stop(1);
    }
  });

  await waitForHttp(`${env.APP_URL}/api/health`, { timeoutMs: 120000 });
  console.log(startBanner(env.APP_URL, host));
}

main().catch((err) => {
  log("start", err.message);
  process.exit(err.exitCode || 1);
});
