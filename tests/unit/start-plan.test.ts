// What `npm start` and `npm run dev` run (scripts/start.mjs startPlan), and the guard that ends their
// long-running children when the script itself is gone (scripts/exit-with-parent.mjs). The whole
// `npm start` lifecycle (Ctrl+C, restart, killed outright) runs for real in tests/e2e/start-script.test.ts;
// `npm run dev` is covered here by its plan, since a next dev compile is too slow for every CI run.
import { spawn } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { afterEach, describe, expect, it } from "vitest";
// @ts-expect-error — plain .mjs scripts (they run before npm ci) without type declarations
import { startPlan } from "../../scripts/start.mjs";

const guard = pathToFileURL(join(__dirname, "../../scripts/exit-with-parent.mjs")).href;
const bin = (name: string) => join(__dirname, "../../node_modules/.bin", name);

describe("what npm start and npm run dev run", () => {
  it("the same local services and the same migrate-and-seed step, then serve.mjs for start and next dev for dev, on the same host and port", () => {
    const start = startPlan({ dev: false, host: "127.0.0.1", port: 3456, buildFresh: true });
    const dev = startPlan({ dev: true, host: "127.0.0.1", port: 3456, buildFresh: true });
    expect(dev.services).toEqual(start.services);
    expect(start.services).toEqual(["--import", guard, bin("tsx"), "scripts/local-services.ts"]);
    expect(dev.setup).toEqual(start.setup);
    expect(start.setup).toEqual([bin("tsx"), "scripts/db-setup.ts", "--seed"]);
    expect(start.app).toEqual(["--import", guard, "scripts/serve.mjs", "-H", "127.0.0.1", "-p", "3456"]);
    expect(dev.app).toEqual(["--import", guard, bin("next"), "dev", "-H", "127.0.0.1", "-p", "3456"]);
    expect(start.nodeEnv).toBe("production");
    expect(dev.nodeEnv).toBe("development");
  });

  it("next build runs for start only when the build is stale, and never for dev", () => {
    expect(startPlan({ dev: false, buildFresh: false }).build).toEqual([bin("next"), "build"]);
    expect(startPlan({ dev: false, buildFresh: true }).build).toBeNull();
    expect(startPlan({ dev: true, buildFresh: false }).build).toBeNull();
  });
});

describe("a long-running child when npm start is killed outright", () => {
  let dir = "";
  let childPid = 0;
  afterEach(() => {
    if (childPid) {
      try {
        process.kill(childPid, "SIGKILL");
      } catch {
        /* already gone */
      }
    }
    rmSync(dir, { recursive: true, force: true });
  });

  it("runs its own shutdown (SIGTERM) once the parent is gone, and ends", async () => {
    dir = mkdtempSync(join(tmpdir(), "cp-guard-"));
    const marker = join(dir, "stopped");
    const pidFile = join(dir, "pid");
    // parent: starts the child the way start.mjs does (guard loaded, IPC channel), then waits forever
    const childCode = `process.on("SIGTERM", () => { require("fs").writeFileSync(${JSON.stringify(marker)}, "SIGTERM"); process.exit(0); });
      require("fs").writeFileSync(${JSON.stringify(pidFile)}, String(process.pid));
      setInterval(() => undefined, 1000);`;
    const parentCode = `const c = require("child_process").spawn(process.execPath, ["--import", ${JSON.stringify(guard)}, "-e", ${JSON.stringify(childCode)}], { stdio: ["ignore", "inherit", "inherit", "ipc"] });
      setInterval(() => undefined, 1000);`;
    const parent = spawn(process.execPath, ["-e", parentCode], { stdio: "inherit" });
    const poll = async (done: () => boolean) => {
      for (let i = 0; i < 600 && !done(); i++) await new Promise((r) => setTimeout(r, 100));
    };
    // the child is up with its SIGTERM handler in place once it has written its pid
    await poll(() => existsSync(pidFile) && readFileSync(pidFile, "utf8") !== "");
    childPid = Number(readFileSync(pidFile, "utf8"));
    expect(childPid).toBeGreaterThan(0);
    parent.kill("SIGKILL");
    await poll(() => existsSync(marker));
    expect(readFileSync(marker, "utf8")).toBe("SIGTERM");
    // gone: no such process, or only a zombie waiting for whoever adopted it to reap it
    const gone = () => {
      try {
        const stat = readFileSync(`/proc/${childPid}/stat`, "utf8");
        return /^[ZX]/.test(stat.slice(stat.lastIndexOf(")") + 2));
      } catch {
        return true;
      }
    };
    await poll(gone);
    expect(gone()).toBe(true);
  });
});
