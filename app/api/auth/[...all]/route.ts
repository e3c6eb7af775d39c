import { assertSameOrigin } from "@/lib/api";
import { getAuth } from "@/lib/auth";
import { errorResponse } from "@/lib/errors";

export const dynamic = "force-dynamic";

// better-auth's own endpoints (sign-up, sign-in, sign-out, verification, password reset and
// change, session). It rate-limits the credential paths itself; the same cross-origin rule as
// every other mutation runs first (better-auth checks Origin only when cookies are sent, which
// would let another site sign a visitor into an account of its choosing).
export async function GET(req: Request): Promise<Response> {
  return getAuth().handler(req);
}

export async function POST(req: Request): Promise<Response> {
  try {
    assertSameOrigin(req);
  } catch (err) {
    return errorResponse(err);
  }
  return getAuth().handler(req);
}
