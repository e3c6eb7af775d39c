#!/usr/bin/env node
// `npm start`: install, start PostgreSQL, migrate, seed the demo workspace, build when stale, serve.
// `npm run dev` (with --dev): the same, then `next dev` with hot reload instead of a build.
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { buildIsFresh, ensureInstalled, ensureLocalSecrets, log, nodeBin, root, run, startBanner, startChild, waitForHttp } from "./common.mjs";
import { startPostgres } from "./pg.mjs";

const guard = pathToFileURL(join(root, "scripts", "exit-with-parent.mjs")).href;

/**
 * What `npm start` (dev false) and `npm run dev` (dev true) run, in order, each a `node` argument
 * list: the local services, migrate + seed, the build when it is stale (never for dev), the
 * app server. The long-running ones load exit-with-parent.mjs, so they end when this script does.
 */
export function startPlan({ dev = false, host = "127.0.0.1", port = 3000, buildFresh = true } = {}) {
  const guarded = (args) => ["--import", guard, ...args];
  return {
    services: guarded([nodeBin("tsx"), "scripts/local-services.ts"]),
    setup: [nodeBin("tsx"), "scripts/db-setup.ts", "--seed"],
    build: !dev && !buildFresh ? [nodeBin("next"), "build"] : null,
    // production goes through scripts/serve.mjs (it records the connecting peer in X-Forwarded-For)
    app: guarded([...(dev ? [nodeBin("next"), "dev"] : ["scripts/serve.mjs"]), "-H", host, "-p", String(port)]),
    nodeEnv: dev ? "development" : "production",
  };
}

async function main() {
  const dev = process.argv.includes("--dev");
  const port = Number(process.env.PORT || 3000);
  const host = process.env.HOST || "127.0.0.1";
  // the build folder `next build` writes and the server reads (next.config.ts reads the same variable)
  const distDir = process.env.NEXT_DIST_DIR || ".next";

  ensureInstalled();
  const env = ensureLocalSecrets();
  env.DATABASE_URL = startPostgres();
  env.APP_URL = env.APP_URL || `http://${host === "0.0.0.0" ? "127.0.0.1" : host}:${port}`;
  const plan = startPlan({ dev, host, port, buildFresh: dev || buildIsFresh(distDir) });
  env.NODE_ENV = plan.nodeEnv;

  // the IPC channel is how a child notices this script is gone (see exit-with-parent.mjs)
  const children = [];
  const services = startChild(process.execPath, plan.services, { env, stdio: ["ignore", "inherit", "inherit", "ipc"] });
  children.push(services);

  run(process.execPath, plan.setup, { env });

  if (plan.build) {
    log("start", `building the app (next build into ${distDir})`);
    run(process.execPath, plan.build, { env: { ...env, NEXT_DIST_DIR: distDir } });
  }

  const app = startChild(process.execPath, plan.app, { env, stdio: ["inherit", "inherit", "inherit", "ipc"] });
  children.push(app);

  // Ctrl+C: ask every child to stop and return only once they have (their ports are free again);
  // one that hangs is killed after a while.
  let stopping = false;
  const stop = (code) => {
    if (stopping) return;
    stopping = true;
    const running = children.filter((c) => c.exitCode === null && c.signalCode === null);
    for (const c of running) c.kill("SIGTERM");
    Promise.all(running.map((c) => new Promise((r) => c.once("exit", r)))).then(() => process.exit(code));
    setTimeout(() => {
      for (const c of running) if (c.exitCode === null && c.signalCode === null) c.kill("SIGKILL");
      process.exit(code);
    }, 15000).unref();
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

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  main().catch((err) => {
    log("start", err.message);
    process.exit(err.exitCode || 1);
  });
}
