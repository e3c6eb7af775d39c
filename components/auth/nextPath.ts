// The page to come back to after signing in, carried through "Create an account", the
// confirmation e-mail and the sign-in that follows it, so a newcomer who was saving a scratch
// sketch lands back in its save dialog rather than on the workspaces list.

/** Where signing in goes when nothing else was asked for (as `safeNext` in lib/session.ts). */
export const DEFAULT_NEXT = "/workspaces";

/** `path` (which may carry a query already) with `next` added, left off when it is the default. */
export function withNext(path: string, next: string | undefined): string {
  if (!next || next === DEFAULT_NEXT) return path;
  return `${path}${path.includes("?") ? "&" : "?"}next=${encodeURIComponent(next)}`;
}
