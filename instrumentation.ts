// Runs once when the server starts: refuse to serve with missing production secrets, then start
// the background sweep of unsaved underlays (not while `next build` loads this file).
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { checkSecretsAtStartup } = await import("./lib/startup");
    checkSecretsAtStartup();
    if (process.env.NEXT_PHASE !== "phase-production-build") {
      const { startUnderlaySweeper } = await import("./lib/uploads/sweep");
      startUnderlaySweeper();
    }
  }
}
