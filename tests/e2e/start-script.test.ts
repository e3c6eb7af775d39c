// `npm start` for real: scripts/start.mjs as a child process on its own ports (app, local SMTP, local
// S3) and its own database on the test cluster, serving the production build `npm test` has just
// made (NEXT_DIST_DIR, so start.mjs finds it fresh and neither installs nor builds). Ctrl+C stops it
// with every child gone and every port free; it starts again; killed outright (SIGKILL) it leaves
// nothing behind and the next start takes the same ports. This sits in the e2e project because it
// needs that build; it opens no browser. Waits poll with generous limits; nothing asserts a duration.
import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { Client } from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
// @ts-expect-error — plain .mjs scripts (they run before npm ci) without type declarations
import { buildIsFresh, root } from "../../scripts/common.mjs";

const distDir = process.env.NEXT_DIST_DIR || ".next";
const baseDbUrl = process.env.TEST_DATABASE_URL || process.env.DATABASE_URL || "";
const dbName = "counterpoise_start_check";
const started: ChildProcess[] = [];
const output: string[] = [];
let stateDir = "";
let ports = { app: 0, smtp: 0, s3: 0 };

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once("error", reject);
    s.listen(0, "127.0.0.1", () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

async function portIsFree(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const s = createServer();
    s.once("error", () => resolve(false));
    s.listen(port, "127.0.0.1", () => s.close(() => resolve(true)));
  });
}

/** Live processes (zombies count as gone) and their parents, from /proc. */
function processTable(): Map<number, number> {
  const table = new Map<number, number>();
  for (const entry of readdirSync("/proc")) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const stat = readFileSync(`/proc/${entry}/stat`, "utf8");
      const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
      if (fields[0] === "Z" || fields[0] === "X") continue;
      table.set(Number(entry), Number(fields[1]));
    } catch {
      /* gone while reading */
    }
  }
  return table;
}

function descendants(pid: number): number[] {
  const table = processTable();
  const found: number[] = [];
  const walk = (p: number) => {
    for (const [child, parent] of table) {
      if (parent !== p) continue;
      found.push(child);
      walk(child);
    }
  };
  walk(pid);
  return found;
}

const alive = (pids: number[]) => {
  const table = processTable();
  return pids.filter((p) => table.has(p));
};

async function until<T>(what: string, probe: () => Promise<T | undefined> | T | undefined, limitMs = 120000): Promise<T> {
  const end = Date.now() + limitMs;
  for (;;) {
    const v = await probe();
    if (v !== undefined) return v;
    if (Date.now() > end) throw new Error(`${what} did not happen within ${limitMs / 1000} s\n--- npm start said:\n${output.join("").slice(-4000)}`);
    await new Promise((r) => setTimeout(r, 500));
  }
}

function npmStart(): ChildProcess {
  const env: NodeJS.ProcessEnv = { ...process.env };
  // the e2e server's own address and mode are not this run's
  for (const k of ["APP_URL", "E2E_BASE_URL", "NODE_ENV", "SMTP_HOST", "S3_ENDPOINT"]) delete env[k];
  Object.assign(env, {
    PORT: String(ports.app),
    HOST: "127.0.0.1",
    DATABASE_URL: ownDatabaseUrl(),
    SMTP_PORT: String(ports.smtp),
    S3_PORT: String(ports.s3),
    COUNTERPOISE_LOCAL_STATE: stateDir,
    NEXT_DIST_DIR: distDir,
    NEXT_TELEMETRY_DISABLED: "1",
  });
  // its own process group, as a terminal gives it: Ctrl+C reaches the whole group
  const child = spawn(process.execPath, ["scripts/start.mjs"], { cwd: root, env, detached: true, stdio: ["ignore", "pipe", "pipe"] });
  child.stdout?.on("data", (d) => output.push(String(d)));
  child.stderr?.on("data", (d) => output.push(String(d)));
  started.push(child);
  return child;
}

function ownDatabaseUrl(): string {
  const url = new URL(baseDbUrl);
  url.pathname = `/${dbName}`;
  return url.toString();
}

const exited = (c: ChildProcess) => c.exitCode !== null || c.signalCode !== null;

async function healthy(child: ChildProcess): Promise<number> {
  return until("GET /api/health answering 200", async () => {
    if (exited(child)) throw new Error(`npm start exited (${child.exitCode ?? child.signalCode}) before answering\n${output.join("").slice(-4000)}`);
    try {
      const res = await fetch(`http://127.0.0.1:${ports.app}/api/health`);
      return res.status === 200 ? res.status : undefined;
    } catch {
      return undefined;
    }
  });
}

/** Every child gone and every port free again. */
async function nothingLeft(children: number[]) {
  await until("every child of npm start to end", () => (alive(children).length === 0 ? true : undefined));
  for (const port of [ports.app, ports.smtp, ports.s3]) {
    await until(`port ${port} to be free`, async () => ((await portIsFree(port)) ? true : undefined));
  }
}

beforeAll(async () => {
  if (!buildIsFresh(distDir)) {
    throw new Error(`${distDir} holds no production build newer than the sources: npm test builds one before the browser tests (or run next build with NEXT_DIST_DIR=${distDir})`);
  }
  if (!baseDbUrl) throw new Error("TEST_DATABASE_URL (or DATABASE_URL) must point at the test cluster");
  const admin = new Client({ connectionString: baseDbUrl });
  await admin.connect();
  await admin.query(`DROP DATABASE IF EXISTS ${dbName} WITH (FORCE)`);
  await admin.query(`CREATE DATABASE ${dbName}`);
  await admin.end();
  ports = { app: await freePort(), smtp: await freePort(), s3: await freePort() };
  stateDir = mkdtempSync(join(tmpdir(), "cp-start-check-"));
});

afterAll(async () => {
  // whatever happened above, nothing of ours keeps running: each start had its own process group
  for (const c of started) {
    try {
      process.kill(-c.pid!, "SIGKILL");
    } catch {
      /* already gone */
    }
  }
  if (stateDir && existsSync(stateDir)) rmSync(stateDir, { recursive: true, force: true });
  if (baseDbUrl) {
    const admin = new Client({ connectionString: baseDbUrl });
    await admin.connect();
    await admin.query(`DROP DATABASE IF EXISTS ${dbName} WITH (FORCE)`);
    await admin.end();
  }
});

describe("npm start (scripts/start.mjs)", () => {
  it("serves, stops on Ctrl+C leaving nothing behind, starts again, and recovers after being killed outright", { timeout: 600000 }, async () => {
    // 1. start: health answers, with the app server and the local services running under it
    const first = npmStart();
    expect(await healthy(first)).toBe(200);
    const firstChildren = descendants(first.pid!);
    expect(firstChildren.length).toBeGreaterThanOrEqual(2);
    expect(await portIsFree(ports.app)).toBe(false);
    expect(await portIsFree(ports.smtp)).toBe(false);
    expect(await portIsFree(ports.s3)).toBe(false);

    // 2. Ctrl+C (SIGINT to the terminal's process group): start.mjs exits 0 once its children have
    process.kill(-first.pid!, "SIGINT");
    const code = await until("npm start to exit after Ctrl+C", () => (exited(first) ? first.exitCode : undefined));
    expect(code).toBe(0);
    await nothingLeft(firstChildren);

    // 3. start again on the same ports
    const second = npmStart();
    expect(await healthy(second)).toBe(200);
    const secondChildren = descendants(second.pid!);
    expect(secondChildren.length).toBeGreaterThanOrEqual(2);

    // 4. killed outright (only start.mjs itself: nothing forwards a signal to its children)
    process.kill(second.pid!, "SIGKILL");
    await until("npm start to die", () => (exited(second) ? true : undefined));
    await nothingLeft(secondChildren);

    // 5. the next start takes the same ports and answers
    const third = npmStart();
    expect(await healthy(third)).toBe(200);
    const thirdChildren = descendants(third.pid!);

    // 6. and stops cleanly (SIGTERM, as a process manager would)
    process.kill(third.pid!, "SIGTERM");
    expect(await until("npm start to exit after SIGTERM", () => (exited(third) ? third.exitCode : undefined))).toBe(0);
    await nothingLeft(thirdChildren);
  });
});
