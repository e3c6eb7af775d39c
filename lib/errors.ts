// Typed error codes → HTTP statuses and safe JSON bodies: `{ error: { code, message, fields? } }`.
// Nothing else reaches a response: database and library errors become `internal` with a
// generic message (the details go to the server log).
import { ZodError } from "zod";
import { BUSY_MESSAGE, BUSY_RETRY_SECONDS, firstReport, isDatabaseUnavailable, unavailableReason } from "./db-unavailable";

export const ERROR_STATUS = {
  bad_request: 400,
  invalid_json: 400,
  validation_failed: 400,
  unauthenticated: 401,
  forbidden: 403,
  cross_origin: 403,
  email_mismatch: 403,
  not_found: 404,
  conflict: 409,
  version_conflict: 409,
  review_state: 409,
  already_member: 409,
  last_owner: 409,
  method_not_allowed: 405,
  gone: 410,
  invitation_expired: 410,
  invitation_used: 410,
  invitation_withdrawn: 410,
  payload_too_large: 413,
  unsupported_media_type: 415,
  rate_limited: 429,
  internal: 500,
  unavailable: 503,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

const DEFAULT_MESSAGE: Record<ErrorCode, string> = {
  bad_request: "The request is not valid.",
  invalid_json: "The request body is not valid JSON.",
  validation_failed: "Some fields are not valid.",
  unauthenticated: "Sign in to continue.",
  forbidden: "Your role in this workspace does not allow this.",
  cross_origin: "Requests from another site are refused.",
  email_mismatch: "This invitation was sent to a different e-mail address.",
  not_found: "Not found.",
  conflict: "This conflicts with the current state; reload and try again.",
  version_conflict: "Someone saved a newer version since you opened this one.",
  review_state: "This sign-off step does not apply to the version as it stands.",
  already_member: "That person is already a member of this workspace.",
  last_owner: "A workspace needs at least one owner: make someone else an owner first.",
  method_not_allowed: "This address does not take that method.",
  gone: "This is no longer available.",
  invitation_expired: "This invitation has expired. Ask an owner of the workspace to send a new one.",
  invitation_used: "This invitation has already been used.",
  invitation_withdrawn: "This invitation was withdrawn by an owner of the workspace, or replaced by a newer one to the same address: use the newest invitation mail.",
  payload_too_large: "The request body is too large.",
  unsupported_media_type: "Send the request body as application/json.",
  rate_limited: "Too many requests; wait a moment and try again.",
  internal: "Something went wrong on our side. Try again; if it keeps happening, tell us.",
  unavailable: "A service the app needs is not answering. Try again shortly.",
};

/** A field path (`members.0.email`) and what is wrong with it. */
export type FieldError = { path: string; message: string };

export type ErrorBody = { error: { code: ErrorCode; message: string; fields?: FieldError[] } & Record<string, unknown> };

/** An error that is safe to show: its code picks the status, its message is for people. */
export class AppError extends Error {
  readonly code: ErrorCode;
  readonly fields?: FieldError[];
  readonly headers?: Record<string, string>;
  /** Extra safe facts for the caller, merged into the error object (e.g. the latest version on a 409). */
  readonly extra?: Record<string, unknown>;

  constructor(
    code: ErrorCode,
    message?: string,
    opts: { fields?: FieldError[]; headers?: Record<string, string>; extra?: Record<string, unknown> } = {},
  ) {
    super(message ?? DEFAULT_MESSAGE[code]);
    this.name = "AppError";
    this.code = code;
    this.fields = opts.fields;
    this.headers = opts.headers;
    this.extra = opts.extra;
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }
}

export function defaultMessage(code: ErrorCode): string {
  return DEFAULT_MESSAGE[code];
}

/** Whether `path` names a key its parent object does not have (a field left out of the request). */
function leftOut(input: unknown, path: PropertyKey[]): boolean {
  if (!path.length) return input === undefined;
  let parent: unknown = input;
  for (const key of path.slice(0, -1)) {
    if (parent === null || typeof parent !== "object") return false;
    parent = (parent as Record<PropertyKey, unknown>)[key];
  }
  return parent !== null && typeof parent === "object" && !Array.isArray(parent) && (parent as Record<PropertyKey, unknown>)[path[path.length - 1]] === undefined;
}

/**
 * Each zod issue as a field path and its message. Given the `input` that was parsed, a field left
 * out says so first ("Required: give the sketch a title."): its type message alone ("A version
 * number is a whole number.") would send the reader looking for a value that is not there.
 */
export function fieldErrors(err: ZodError, prefix: string[] = [], input?: unknown): FieldError[] {
  return err.issues.flatMap((issue) => {
    const at = (extra: string[] = []) => [...prefix, ...issue.path.map(String), ...extra].join(".") || "(root)";
    // A strict object names each unknown key as its own field.
    if (issue.code === "unrecognized_keys") return issue.keys.map((key) => ({ path: at([key]), message: "Is not a field here (check the spelling)." }));
    if (input !== undefined && issue.code === "invalid_type" && !issue.path.length && issue.expected === "object") {
      return [{ path: at(), message: `Send a JSON object ({ "name": value, … }), not ${Array.isArray(input) ? "an array" : input === null ? "null" : `a ${typeof input}`}.` }];
    }
    // a left-out choice (an enum: "Choose owner, editor…") is as missing as a left-out number
    if (input !== undefined && (issue.code === "invalid_type" || issue.code === "invalid_value") && issue.path.length && leftOut(input, issue.path)) {
      const own = /^Invalid input\b/.test(issue.message) ? "" : `: ${issue.message.charAt(0).toLowerCase()}${issue.message.slice(1)}`;
      return [{ path: at(), message: `Required${own || "."}` }];
    }
    return [{ path: at(), message: issue.message }];
  });
}

/** The database could not be reached in time: 503 with Retry-After, never a 500 with nothing to do. */
export function busyError(): AppError {
  return new AppError("unavailable", BUSY_MESSAGE, { headers: { "Retry-After": String(BUSY_RETRY_SECONDS) } });
}

/** Any thrown value → the AppError that may be shown for it. */
export function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  if (err instanceof ZodError) return new AppError("validation_failed", undefined, { fields: fieldErrors(err) });
  if (isDatabaseUnavailable(err)) return busyError();
  return new AppError("internal");
}

export function errorBody(err: AppError): ErrorBody {
  return { error: { ...err.extra, code: err.code, message: err.message, ...(err.fields?.length ? { fields: err.fields } : {}) } };
}

/** The JSON response for any thrown value; unexpected errors are logged, never echoed. */
export function errorResponse(err: unknown): Response {
  const appError = toAppError(err);
  if (appError.code === "internal" && !(err instanceof AppError)) {
    console.error("[api] unexpected error", err);
  } else if (appError.code === "unavailable" && !(err instanceof AppError) && firstReport(err)) {
    // load, not a bug: one line (the driver's words), not a stack per refused request, and none
    // when the session lookup already wrote this failure (lib/auth.ts authLog)
    console.warn(`[api] database busy, answered 503: ${unavailableReason(err)}`);
  }
  return Response.json(errorBody(appError), { status: appError.status, headers: appError.headers });
}
