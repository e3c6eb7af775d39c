import { getAuth } from "@/lib/auth";

export const dynamic = "force-dynamic";

// better-auth's own endpoints (sign-up, sign-in, sign-out, verification, password reset and
// change, session). It checks Origin against APP_URL and rate-limits credential paths itself.
export async function GET(req: Request): Promise<Response> {
  return getAuth().handler(req);
}

export async function POST(req: Request): Promise<Response> {
  return getAuth().handler(req);
}
