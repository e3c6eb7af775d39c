// better-auth's error codes in our own words.
// `error`: the app's own error object, which the auth route adds to better-auth's refusals and
// is all there is on the route's own answers (a database out of reach: 503 `unavailable`).
type AuthError = { status?: number; code?: string; message?: string; error?: { message?: unknown } } | null | undefined;

export function authErrorMessage(err: AuthError, ctx: { email?: string; retryAfter?: number | null } = {}): string {
  if (!err) return "Something went wrong. Try again.";
  if (err.status === 429) {
    const wait = ctx.retryAfter && ctx.retryAfter > 0 ? `${ctx.retryAfter} second${ctx.retryAfter === 1 ? "" : "s"}` : "a few seconds";
    return `Too many attempts from this connection. Wait ${wait} and try again.`;
  }
  const appMessage = typeof err.error?.message === "string" ? err.error.message : undefined;
  if (err.status === 503) return appMessage ?? "The server is busy. Nothing was changed: try again in a few seconds.";
  switch (err.code) {
    case "INVALID_EMAIL_OR_PASSWORD":
      return "That e-mail address and password do not match an account.";
    case "EMAIL_NOT_VERIFIED":
      return `Confirm your e-mail address first: we have sent a new link${ctx.email ? ` to ${ctx.email}` : ""}.`;
    case "INVALID_PASSWORD":
      return "The current password is not right.";
    case "PASSWORD_TOO_SHORT":
      return "Use at least 8 characters.";
    case "PASSWORD_TOO_LONG":
      return "Use at most 128 characters.";
    case "INVALID_EMAIL":
      return "Enter an e-mail address like name@company.com.";
    case "INVALID_TOKEN":
    case "TOKEN_EXPIRED":
      return "This link is not valid any more. Ask for a new one.";
    case "USER_ALREADY_EXISTS":
    case "USER_ALREADY_EXISTS_USE_ANOTHER_EMAIL":
      return "An account with this e-mail address already exists. Sign in instead.";
  }
  if (err.status === 403) return "The request was refused. Reload the page and try again.";
  return err.message || appMessage || "Something went wrong. Try again.";
}
