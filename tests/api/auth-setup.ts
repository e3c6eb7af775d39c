// Requests to better-auth's own route (/api/auth/...), as this site's pages send them.
import * as authRoute from "@/app/api/auth/[...all]/route";
import { appOrigin } from "@/lib/env";

/**
 * A poster to /api/auth from client address `ip` (each file its own, so the sign-in budgets of one
 * file do not spend another's): `post(path, body, headers?)` with this site's Origin; `headers`
 * adds or overrides (a foreign Origin, a Referer, a cookie); a string body goes as written.
 */
export function authPoster(ip: string) {
  return (path: string, body: unknown, headers: Record<string, string> = {}): Promise<Response> =>
    authRoute.POST(
      new Request(`${appOrigin()}/api/auth${path}`, {
        method: "POST",
        headers: { "content-type": "application/json", origin: appOrigin(), "x-forwarded-for": ip, ...headers },
        body: typeof body === "string" ? body : JSON.stringify(body),
      }),
    );
}
