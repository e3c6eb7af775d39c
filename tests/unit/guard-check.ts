// The real parent/child check behind start-plan.test.ts and test-plan.test.ts: a parent process starts
// a child with scripts/exit-with-parent.mjs loaded, the parent is killed outright (SIGKILL), and the
// child is watched: did its own shutdown (SIGTERM handler) run, and is it gone?
import { spawn } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";

export const guard = pathToFileURL(join(__dirname, "../../scripts/exit-with-parent.mjs")).href;

const poll = async (done: () => boolean) => {
  for (let i = 0; i < 600 && !done(); i++) await new Promise((r) => setTimeout(r, 100));
};

/** Gone: no such process, or only a zombie waiting for whoever adopted it to reap it. */
function gone(pid: number): boolean {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
    return /^[ZX]/.test(stat.slice(stat.lastIndexOf(")") + 2));
  } catch {
    return true;
  }
}

/**
 * `parentArgs(childArgs)`: the node arguments of a parent that starts `node ...childArgs` (the guard
 * and the child's code) its own way, then waits forever. Returns the child's pid, what stopped it
 * (the SIGTERM handler writes "SIGTERM", "" when it never ran) and whether it is gone. The child is
 * killed and the scratch folder removed afterwards whatever happened.
 */
export async function killParentWatchChild(parentArgs: (childArgs: string[]) => string[]) {
  const dir = mkdtempSync(join(tmpdir(), "cp-guard-"));
  const marker = join(dir, "stopped");
  const pidFile = join(dir, "pid");
  let childPid = 0;
  try {
    const childCode = `process.on("SIGTERM", () => { require("fs").writeFileSync(${JSON.stringify(marker)}, "SIGTERM"); process.exit(0); });
      require("fs").writeFileSync(${JSON.stringify(pidFile)}, String(process.pid));
      setInterval(() => undefined, 1000);`;
    const parent = spawn(process.execPath, parentArgs(["--import", guard, "-e", childCode]), { stdio: "inherit" });
    // the child is up with its SIGTERM handler in place once it has written its pid
    await poll(() => existsSync(pidFile) && readFileSync(pidFile, "utf8") !== "");
    childPid = existsSync(pidFile) ? Number(readFileSync(pidFile, "utf8")) : 0;
    const parentWasRunning = parent.exitCode === null && parent.signalCode === null;
    parent.kill("SIGKILL");
    if (childPid) {
      await poll(() => existsSync(marker));
      await poll(() => gone(childPid));
    }
    return {
      childPid,
      parentWasRunning,
      stoppedBy: existsSync(marker) ? readFileSync(marker, "utf8") : "",
      gone: childPid > 0 && gone(childPid),
    };
  } finally {
    if (childPid && !gone(childPid)) process.kill(childPid, "SIGKILL");
    rmSync(dir, { recursive: true, force: true });
  }
}
