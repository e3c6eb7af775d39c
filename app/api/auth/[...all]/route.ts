import { assertSameOrigin, otherMethods, readBytesCapped } from "@/lib/api";
import { getAuth, MAX_AUTH_BODY_BYTES } from "@/lib/auth";
import { withClientAddress } from "@/lib/client-address";
import { AppError, errorResponse } from "@/lib/errors";
import { withAppErrorShape } from "@/lib/auth-error-shape";

export const dynamic = "force-dynamic";

// better-auth's own endpoints (sign-up, sign-in, sign-out, verification, password reset and
// change, session). It rate-limits the credential paths itself, keyed on the X-Forwarded-For we
// hand it: the client address as TRUSTED_PROXIES says to read it, so a forged entry on the left
// gets no budget of its own. The same cross-origin rule as every other mutation runs first
// (better-auth checks Origin only when cookies are sent, which would let another site sign a
// visitor into an account of its choosing), and the body is capped before it is parsed. Its
// refusals also carry the app's `{ error: { code, message, fields? } }` (withAppErrorShape).
// What better-auth throws instead of answering (its rate limiter reads PostgreSQL before any
// endpoint runs: with the database down it throws) gets the app's answer too: a 503 to retry with
// one log line, not Next's HTML 500 with a stack.
async function handled(req: Request): Promise<Response> {
  try {
    return withAppErrorShape(await getAuth().handler(req));
  } catch (err) {
    return errorResponse(err);
  }
}

export async function GET(req: Request): Promise<Response> {
  return handled(new Request(req, { headers: withClientAddress(req.headers) }));
}

export async function POST(req: Request): Promise<Response> {
  let body: Buffer;
  try {
    assertSameOrigin(req);
    body = await readBytesCapped(
      req,
      MAX_AUTH_BODY_BYTES,
      () => new AppError("payload_too_large", `The request body is larger than the ${MAX_AUTH_BODY_BYTES / 1024} KB the sign-in endpoints accept.`),
    );
  } catch (err) {
    return errorResponse(err);
  }
  const headers = withClientAddress(req.headers);
  headers.delete("content-length"); // the body is now what was read, whatever the header claimed
  return handled(new Request(req.url, { method: "POST", headers, body: new Uint8Array(body), signal: req.signal }));
}

export const { PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET", "POST");
