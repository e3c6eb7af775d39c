// Checks made once when the server starts (called from instrumentation.ts, Node.js runtime only).
import { authSecret, MissingSecretError } from "./env";

/** In production a missing BETTER_AUTH_SECRET stops the server at start, with a message that says how to fix it. */
export function checkSecretsAtStartup(): void {
  try {
    authSecret();
  } catch (err) {
    if (err instanceof MissingSecretError) {
      console.error(`\n[counterpoise] ${err.message}\n`);
      process.exit(1);
    }
    throw err;
  }
}
