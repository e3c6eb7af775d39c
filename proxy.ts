// Tells the pages which address was asked for: a layout cannot see it, and a signed-out reader
// sent to sign in must come back to the very page (a version named in a review mail), not to the
// workspace's overview. Only the address goes along; nothing is decided here.
import { NextResponse, type NextRequest } from "next/server";
import { PATH_HEADER } from "@/lib/request-path";

export function proxy(request: NextRequest) {
  const headers = new Headers(request.headers);
  headers.set(PATH_HEADER, request.nextUrl.pathname + request.nextUrl.search);
  return NextResponse.next({ request: { headers } });
}

export const config = {
  // the signed-in pages (not the API, the sign-in pages or static files)
  matcher: ["/workspaces/:path*", "/account/:path*", "/sketches/:path*"],
};
