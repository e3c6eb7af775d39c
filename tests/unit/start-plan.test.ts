// What `npm start` and `npm run dev` run (scripts/start.mjs startPlan), and the guard that ends their
// long-running children when the script itself is gone (scripts/exit-with-parent.mjs). The whole
// `npm start` lifecycle (Ctrl+C, restart, killed outright) runs for real in tests/e2e/start-script.test.ts;
// `npm run dev` is covered here by its plan, since a next dev compile is too slow for every CI run.
import { join } from "node:path";
import { describe, expect, it } from "vitest";
// @ts-expect-error — plain .mjs scripts (they run before npm ci) without type declarations
import { startPlan } from "../../scripts/start.mjs";
import { guard, killParentWatchChild } from "./guard-check";

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
  it("runs its own shutdown (SIGTERM) once the parent is gone, and ends", async () => {
    // parent: starts the child the way start.mjs does (guard loaded, IPC channel), then waits forever
    const result = await killParentWatchChild((childArgs) => [
      "-e",
      `require("child_process").spawn(process.execPath, ${JSON.stringify(childArgs)}, { stdio: ["ignore", "inherit", "inherit", "ipc"] });
        setInterval(() => undefined, 1000);`,
    ]);
    expect(result.childPid).toBeGreaterThan(0);
    expect(result.stoppedBy).toBe("SIGTERM");
    expect(result.gone).toBe(true);
  }, 200000);
});
