import "server-only";
import { ZodObject, type z } from "zod";
import { getRole } from "@/db/queries/workspaces";
import { getWorkspaceDeletion } from "@/db/queries/workspace-deletion";
import { workspaceDeletionSentence } from "@/components/workspaces/format";
import type { AuthSession } from "./auth";
import { appOrigin } from "./env";
import { AppError, errorResponse, fieldErrors } from "./errors";
import { can, refusedWords, type Permission, type Role } from "./roles";
import { sessionFrom } from "./session";

/**
 * One route handler's contract. Every handler runs the same steps, in this order:
 *   1. refuse cross-origin mutations (Origin against APP_URL),
 *   2. read the session (401 when it is required and missing),
 *   3. parse the path parameters (a malformed id names nothing: 404),
 *   4. load the caller's role in the workspace (not a member: 404; role lacks the permission: 403),
 *   5. parse the query and the JSON body with zod (400 with field paths; 413 over the size cap),
 *   6. act, and return JSON.
 * The session comes before parsing so a signed-out caller learns nothing but "sign in".
 */
export type RouteSpec = {
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
  /** "required" (default), "optional" (session may be null) or "none" (not read at all). */
  auth?: "required" | "optional" | "none";
  /** Workspace-scoped routes: which path parameter holds the workspace id, and what the caller must be allowed. */
  workspace?: { param: string; permission: Permission };
  /** Request body cap in bytes (default 64 KiB). */
  maxBodyBytes?: number;
};

type Out<T> = T extends z.ZodType ? z.output<T> : undefined;
type SessionFor<S extends RouteSpec> = S["auth"] extends "none" ? null : S["auth"] extends "optional" ? AuthSession | null : AuthSession;

export type RouteContext<S extends RouteSpec> = {
  req: Request;
  params: Out<S["params"]>;
  query: Out<S["query"]>;
  body: Out<S["body"]>;
  session: SessionFor<S>;
  user: SessionFor<S> extends AuthSession ? AuthSession["user"] : AuthSession["user"] | null;
  /** The caller's role in the route's workspace (set when the spec names a workspace). */
  role: S["workspace"] extends object ? Role : undefined;
};

type NextRouteContext = { params: Promise<Record<string, string | string[] | undefined>> };

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);
const DEFAULT_MAX_BODY = 64 * 1024;

/** JSON with no-store caching (every answer depends on who asks). */
export function json(data: unknown, status = 200, headers: Record<string, string> = {}): Response {
  return Response.json(data, { status, headers: { "Cache-Control": "no-store", ...headers } });
}

/**
 * Refuse a state-changing request that a browser sent from another site. Browsers send Origin
 * (and Sec-Fetch-Site) on every such request; a request with neither is not from a browser
 * page (curl, scripts), and its cookies were not sent by a third-party site.
 */
export function assertSameOrigin(req: Request): void {
  if (SAFE_METHODS.has(req.method.toUpperCase())) return;
  const origin = req.headers.get("origin");
  if (origin !== null) {
    if (origin !== appOrigin()) throw new AppError("cross_origin");
    return;
  }
  const site = req.headers.get("sec-fetch-site");
  if (site !== null && site !== "same-origin" && site !== "none") throw new AppError("cross_origin");
}

/** The request body, refused with `tooLarge()` as soon as it passes `max` bytes (declared or read). */
export async function readBytesCapped(req: Request, max: number, tooLarge: () => AppError): Promise<Buffer> {
  const declared = Number(req.headers.get("content-length"));
  if (Number.isFinite(declared) && declared > max) throw tooLarge();
  if (!req.body) return Buffer.alloc(0);
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > max) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge();
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

async function readBodyCapped(req: Request, max: number): Promise<string> {
  return (await readBytesCapped(req, max, () => tooLarge(max))).toString("utf8");
}

function tooLarge(max: number): AppError {
  const limit = max >= 1024 * 1024 ? `${(max / (1024 * 1024)).toFixed(0)} MB` : `${Math.round(max / 1024)} KB`;
  return new AppError("payload_too_large", `The request body is larger than the ${limit} this endpoint accepts.`);
}

/** Parse the JSON body against a schema: 415 when not JSON, 400 for bad JSON or bad fields (with their paths). */
export async function parseJsonBody<T extends z.ZodType>(req: Request, schema: T, max = DEFAULT_MAX_BODY): Promise<z.output<T>> {
  const type = req.headers.get("content-type") ?? "";
  if (!/^application\/([\w.+-]+\+)?json\b/i.test(type)) throw new AppError("unsupported_media_type");
  const text = await readBodyCapped(req, max);
  let data: unknown;
  try {
    data = text.trim() === "" ? undefined : JSON.parse(text);
  } catch (err) {
    // the parser's own words say where it broke ("… at position 12 (line 1 column 13)")
    throw new AppError("invalid_json", err instanceof SyntaxError ? `The request body is not valid JSON: ${err.message}` : undefined);
  }
  if (data === undefined) throw new AppError("invalid_json", "The request needs a JSON body.");
  const parsed = schema.safeParse(data);
  if (!parsed.success) throw new AppError("validation_failed", undefined, { fields: fieldErrors(parsed.error, [], data) });
  return parsed.data;
}

/**
 * Parse the query against a schema: 400 with `query.<name>` paths for a bad value, a missing one,
 * one given more than once, or a name the endpoint does not read (a mistyped `limit` for `pageSize` would otherwise be
 * ignored without a word, and the answer look like the default).
 */
export function parseQuery<T extends z.ZodType>(req: Request, schema: T): z.output<T> {
  const url = new URL(req.url);
  const given = Object.fromEntries(url.searchParams);
  const known = schema instanceof ZodObject ? Object.keys(schema.shape) : null;
  const unknown = known ? Object.keys(given).filter((key) => !known.includes(key)) : [];
  // each parameter is read once: the last of several would otherwise win without a word
  const repeated = [...new Set(url.searchParams.keys())].filter((key) => url.searchParams.getAll(key).length > 1 && (!known || known.includes(key)));
  const parsed = schema.safeParse(given);
  const fields = [
    ...unknown.map((key) => ({ path: `query.${key}`, message: `Is not a query parameter here (check the spelling): this address reads ${known!.join(", ")}.` })),
    ...repeated.map((key) => ({ path: `query.${key}`, message: `Is given ${url.searchParams.getAll(key).length} times: send it once.` })),
    ...(parsed.success ? [] : fieldErrors(parsed.error, ["query"], given)),
  ];
  if (fields.length || !parsed.success) throw new AppError("validation_failed", "Some query parameters are not valid.", { fields });
  return parsed.data;
}

/**
 * A route that reads no query parameters refuses any it is sent, by name, as `parseQuery` does for
 * one it does not know (`POST /api/solve?units=US` would otherwise answer in SI without a word).
 */
function refuseAnyQuery(req: Request): undefined {
  const keys = [...new Set(new URL(req.url).searchParams.keys())];
  if (keys.length) {
    throw new AppError("validation_failed", "Some query parameters are not valid.", {
      fields: keys.map((key) => ({ path: `query.${key}`, message: "Is not a query parameter here: this address reads none." })),
    });
  }
  return undefined;
}

/** The caller's role where a permission is needed: 404 for non-members (nothing leaks), 403 for a role without it. */
export async function requireWorkspaceRole(workspaceId: string, userId: string, permission: Permission): Promise<Role> {
  const role = await getRole(workspaceId, userId);
  if (!role) {
    // someone who was a member when it was deleted is told so (an open page's next request)
    const gone = await getWorkspaceDeletion(workspaceId, userId);
    if (gone) throw new AppError("not_found", workspaceDeletionSentence(gone), { extra: { workspaceDeleted: gone } });
    throw new AppError("not_found", "No such workspace, or you are not a member of it.");
  }
  if (!can(role, permission)) throw new AppError("forbidden", refusedWords(role, permission));
  return role;
}

/** The methods an API address may be asked with (OPTIONS is answered for every route). */
export const HTTP_METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE"] as const;
type HttpMethod = (typeof HTTP_METHODS)[number];
/** A route that serves GET serves HEAD too (Next answers it from GET). */
type Served<A extends HttpMethod> = A | (A extends "GET" ? "HEAD" : never);
/** A handler of `otherMethods`: the tests that walk every route's methods skip these. */
export type NotAllowedHandler = ((req: Request) => Response) & { readonly notAllowed: true };

/**
 * The answers of a route for the methods it does not serve: 405 with the JSON error, naming the
 * methods it does serve in the message, in `error.allow` and in the `Allow` header; and OPTIONS,
 * answered with the same `Allow`. (Left to Next, a method a route leaves out gets a bare 405 with no
 * body and no `Allow`.) Put in every route file, after its handlers:
 *
 *     export const { PUT, PATCH, DELETE, HEAD, OPTIONS } = otherMethods("GET", "POST");
 */
export function otherMethods<const A extends Exclude<HttpMethod, "HEAD">>(...served: A[]): Record<Exclude<HttpMethod, Served<A>> | "OPTIONS", NotAllowedHandler> {
  const allow = [...HTTP_METHODS.filter((m) => (served as string[]).includes(m) || (m === "HEAD" && (served as string[]).includes("GET"))), "OPTIONS"];
  const header = { Allow: allow.join(", ") };
  const mark = (fn: (req: Request) => Response): NotAllowedHandler => Object.assign(fn, { notAllowed: true as const });
  const out: Record<string, NotAllowedHandler> = {
    OPTIONS: mark(() => new Response(null, { status: 204, headers: header })),
  };
  for (const m of HTTP_METHODS) {
    if (allow.includes(m)) continue;
    out[m] = mark((req) =>
      errorResponse(
        new AppError("method_not_allowed", `${req.method.toUpperCase()} is not a method of this address: it takes ${allow.filter((a) => a !== "OPTIONS").join(", ")}.`, {
          headers: header,
          extra: { allow },
        }),
      ),
    );
  }
  return out as Record<Exclude<HttpMethod, Served<A>> | "OPTIONS", NotAllowedHandler>;
}

// better-auth's session cookie (`cookiePrefix: "counterpoise"` in lib/auth.ts; `__Secure-` over https)
const SESSION_COOKIE = /(?:^|;)\s*(?:__Secure-)?counterpoise\.session_token=[^;\s]/;

/**
 * The 401 for a request without a session, saying which: no session cookie at all ("Sign in to continue."), or
 * one that no longer names a session (it expired, the person signed out, or a password reset ended
 * every session), so a script or a tab left open knows its cookie is stale rather than missing.
 */
export function unauthenticated(req: Request): AppError {
  if (SESSION_COOKIE.test(req.headers.get("cookie") ?? "")) {
    return new AppError("unauthenticated", "Your session has ended (it expired, you signed out, or your password was changed): sign in again.", {
      extra: { reason: "session_ended" },
    });
  }
  return new AppError("unauthenticated");
}

/** Wrap a route handler in the shared steps above. */
export function route<const S extends RouteSpec>(spec: S, handler: (ctx: RouteContext<S>) => Promise<unknown>) {
  return async (req: Request, next?: NextRouteContext): Promise<Response> => {
    try {
      assertSameOrigin(req);
      const auth = spec.auth ?? "required";
      const session = auth === "none" ? null : await sessionFrom(req.headers);
      if (auth === "required" && !session) throw unauthenticated(req);

      const rawParams = (await next?.params) ?? {};
      let params: unknown = rawParams;
      if (spec.params) {
        const parsed = spec.params.safeParse(rawParams);
        if (!parsed.success) throw new AppError("not_found");
        params = parsed.data;
      }

      let role: Role | undefined;
      if (spec.workspace) {
        if (!session) throw unauthenticated(req);
        const workspaceId = String((params as Record<string, unknown>)[spec.workspace.param]);
        role = await requireWorkspaceRole(workspaceId, session.user.id, spec.workspace.permission);
      }

      const query = spec.query ? parseQuery(req, spec.query) : refuseAnyQuery(req);
      const body = spec.body ? await parseJsonBody(req, spec.body, spec.maxBodyBytes ?? DEFAULT_MAX_BODY) : undefined;

      const result = await handler({ req, params, query, body, session, user: session?.user ?? null, role } as RouteContext<S>);
      return result instanceof Response ? result : json(result ?? { ok: true });
    } catch (err) {
      return errorResponse(err);
    }
  };
}
