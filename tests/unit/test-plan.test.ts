// What `npm test` runs (scripts/test.mjs testPlan) and how it starts its long-running children
// (startLongRunning): the local services and the app server load scripts/exit-with-parent.mjs, as
// `npm start`'s do, so a killed `npm test` does not leave them holding their ports for the next run.
// The real check below starts a child through test.mjs's own startLongRunning and kills its parent.
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { describe, expect, it } from "vitest";
// @ts-expect-error — plain .mjs scripts (they run before npm ci) without type declarations
import { startPlan } from "../../scripts/start.mjs";
// @ts-expect-error — plain .mjs scripts (they run before npm ci) without type declarations
import { testPlan } from "../../scripts/test.mjs";
import { guard, killParentWatchChild } from "./guard-check";

const testScript = pathToFileURL(join(__dirname, "../../scripts/test.mjs")).href;
const bin = (name: string) => join(__dirname, "../../node_modules/.bin", name);

describe("what npm test runs", () => {
  it("the local services and the app server on the test port load the guard; the one-off steps do not", () => {
    const plan = testPlan({ appPort: 3177 });
    expect(plan.services).toEqual(["--import", guard, bin("tsx"), "scripts/local-services.ts"]);
    expect(plan.app).toEqual(["--import", guard, "scripts/serve.mjs", "-H", "127.0.0.1", "-p", "3177"]);
    expect(plan.setup).toEqual([bin("tsx"), "scripts/db-setup.ts"]);
    expect(plan.lint).toEqual([bin("eslint"), ".", "--max-warnings=0"]);
    expect(plan.types).toEqual([bin("tsc"), "--noEmit", "-p", "tsconfig.json"]);
    expect(plan.vitest).toEqual([bin("vitest"), "run", "--project", "unit", "--project", "components", "--project", "api"]);
    expect(plan.build).toEqual([bin("next"), "build"]);
    expect(plan.e2e).toEqual([bin("vitest"), "run", "--project", "e2e"]);
    for (const step of [plan.setup, plan.lint, plan.types, plan.vitest, plan.build, plan.e2e]) expect(step).not.toContain("--import");
  });

  it("the same local services as npm start, and the app server on 3100 unless told otherwise", () => {
    expect(testPlan().services).toEqual(startPlan({ dev: false }).services);
    expect(testPlan().app.slice(-2)).toEqual(["-p", "3100"]);
  });
});

describe("a long-running child of npm test when npm test is killed outright", () => {
  it("started by test.mjs's startLongRunning, it runs its own shutdown (SIGTERM) once the parent is gone, and ends", async () => {
    // parent: imports test.mjs (which must not start a test run on import) and starts the child the way it does
    const result = await killParentWatchChild((childArgs) => [
      "--input-type=module",
      "-e",
      `import { startLongRunning } from ${JSON.stringify(testScript)};
        startLongRunning(${JSON.stringify(childArgs)}, { env: process.env });
        setInterval(() => undefined, 1000);`,
    ]);
    expect(result.childPid).toBeGreaterThan(0);
    expect(result.parentWasRunning).toBe(true);
    expect(result.stoppedBy).toBe("SIGTERM");
    expect(result.gone).toBe(true);
  }, 200000);
});
