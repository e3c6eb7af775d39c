// A request that could not get at the database in time (the pool busy, a connection that took too
// long to open, the server restarting or refusing) is not a fault of the app: the API answers it
// 503 with Retry-After, and a page shows "busy, try again" instead of the generic failure.
// Browser-safe (no imports): the error pages read `BUSY_DIGEST`.

/** The digest a page's busy error carries to its error page (Next keeps a digest it is given). */
export const BUSY_DIGEST = "counterpoise-database-busy";

/** Seconds a client is asked to wait before trying again (the `Retry-After` of a 503). */
export const BUSY_RETRY_SECONDS = 5;

export const BUSY_MESSAGE = "The server is busy and could not reach its database in time. Nothing was changed: try again in a few seconds.";

/** Thrown by the pages' helpers for a database that cannot be reached now; its digest names it to the error page. */
export class DatabaseBusyError extends Error {
  readonly digest = BUSY_DIGEST;
  constructor(cause?: unknown) {
    super(BUSY_MESSAGE, { cause });
    this.name = "DatabaseBusyError";
  }
}

// node-postgres: waiting for a pooled connection past `connectionTimeoutMillis`, a new connection
// that took as long to open, and a connection that dropped; PostgreSQL's own refusals by SQLSTATE
// (53300 too_many_connections, 57P01 admin_shutdown, 57P02 crash_shutdown, 57P03
// cannot_connect_now, class 08 connection exceptions). These name the database wherever they are.
const MESSAGES = [
  /^timeout exceeded when trying to connect$/i,
  /^Connection terminated due to connection timeout$/i,
  /^Connection terminated unexpectedly$/i,
  /^Client has encountered a connection error and is not queryable$/i,
];
const SQLSTATES = /^(53300|57P0[123]|08\d{3})$/;
// A socket's own failures (the server not listening, reset, timed out) say nothing of which server:
// they count only on an error the app's pool marked (`DATABASE_ERROR`) or one drizzle wrapped as a
// failed query, never the file store's or the mail server's.
const SOCKET_CODES = /^(ECONNREFUSED|ECONNRESET|ETIMEDOUT|EPIPE|EAI_AGAIN|ENOTFOUND)$/;

/** The property `db/index.ts` sets on an error from getting a pooled connection. */
export const DATABASE_ERROR = "counterpoiseDatabaseError";

/**
 * Why an error (or anything it wraps: drizzle's "Failed query", better-auth's "Failed to get
 * session" and a connect's AggregateError keep the driver's error as their cause) says the database
 * could not be reached in time, as opposed to a query that is wrong: the driver's words, or null.
 */
export function unavailableReason(err: unknown, fromDatabase = false, depth = 0): string | null {
  if (!err || typeof err !== "object" || depth > 8) return null;
  const e = err as { message?: unknown; code?: unknown; cause?: unknown; errors?: unknown; digest?: unknown; [DATABASE_ERROR]?: unknown };
  const message = typeof e.message === "string" ? e.message : "";
  if (err instanceof DatabaseBusyError || e.digest === BUSY_DIGEST) return unavailableReason(e.cause, true, depth + 1) ?? BUSY_MESSAGE;
  const database = fromDatabase || e[DATABASE_ERROR] === true || message.startsWith("Failed query: ");
  if (typeof e.code === "string" && (SQLSTATES.test(e.code) || (database && SOCKET_CODES.test(e.code)))) return message ? `${e.code}: ${message}` : e.code;
  if (MESSAGES.some((m) => m.test(message))) return message;
  for (const inner of Array.isArray(e.errors) ? e.errors : []) {
    const reason = unavailableReason(inner, database, depth + 1);
    if (reason) return reason;
  }
  return unavailableReason(e.cause, database, depth + 1);
}

export function isDatabaseUnavailable(err: unknown): boolean {
  return unavailableReason(err) !== null;
}

/** The error a page helper throws on: a busy database as `DatabaseBusyError`, anything else as it came. */
export function asBusy(err: unknown): unknown {
  return !(err instanceof DatabaseBusyError) && isDatabaseUnavailable(err) ? new DatabaseBusyError(err) : err;
}

/** Runs a page's database work, turning "could not reach the database in time" into `DatabaseBusyError`. */
export async function orBusy<T>(work: Promise<T>): Promise<T> {
  try {
    return await work;
  } catch (err) {
    throw asBusy(err);
  }
}

// Each database-unavailable error already written to the log, and every error it wraps: one failure
// reaches the log from several places (better-auth's session lookup, its router's error hook, then
// the route that asked for the session), and one line is enough.
const reported = new WeakSet<object>();

/**
 * True the first time a failure is to be logged; false when it, or an error it wraps, was already
 * (`firstReport` marks the whole chain of causes).
 */
export function firstReport(err: unknown): boolean {
  const chain: object[] = [];
  for (let e = err; e && typeof e === "object" && chain.length < 8 && !chain.includes(e); e = (e as { cause?: unknown }).cause) chain.push(e);
  if (chain.some((e) => reported.has(e))) return false;
  for (const e of chain) reported.add(e);
  return true;
}
