// Runs once when the server starts: refuse to serve with missing production secrets.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { checkSecretsAtStartup } = await import("./lib/startup");
    checkSecretsAtStartup();
  }
}
