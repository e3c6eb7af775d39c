// Checks made once when the server starts (called from instrumentation.ts, Node.js runtime only).
import { configuredProxies } from "./client-address";
import { authSecret, MissingSecretError } from "./env";

/** In production a missing BETTER_AUTH_SECRET (and anywhere an unreadable TRUSTED_PROXIES) stops the server at start, with a message that says how to fix it. */
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
  // a mistyped TRUSTED_PROXIES would otherwise surface as a 500 on the first rate-limited request
  try {
    configuredProxies();
  } catch (err) {
    console.error(`\n[counterpoise] ${(err as Error).message}\n`);
    process.exit(1);
  }
}
