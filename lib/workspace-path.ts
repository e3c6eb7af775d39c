// What a workspace page's address names: the workspace, a sketch in it, and the version numbers
// a version or compare page asks for. Pure and browser-safe: the workspace layout checks these
// before anything streams (so a missing one answers 404), and the compare page reads its
// versions through the same rule.

/** The version numbers an address asks for, checked against the sketch's latest version. */
export type VersionsAsked = {
  /** The crumb's last word on the not-found page: "Version 9", "Compare". */
  here: string;
  /** The numbers the address gives that the sketch does not have, as written (none: all fine). */
  missing: (latest: number) => string[];
};

export type WorkspacePath = { workspaceId: string; sketchId?: string; versions?: VersionsAsked };

const valid = (n: number, latest: number) => Number.isInteger(n) && n >= 1 && n <= latest;

/** A version page's number: "9", "abc" and "0" name nothing once the sketch is known. */
export function versionPageAsked(number: string): VersionsAsked {
  return { here: `Version ${number}`, missing: (latest) => (valid(Number(number), latest) ? [] : [number]) };
}

/**
 * The compare page's two versions: `from` (default the one before the latest), `to` (default the
 * latest, or `draft`: the changes kept in this browser). A blank value is the default.
 */
export function compareAsked(query: { from?: string | string[] | null; to?: string | string[] | null }): VersionsAsked & {
  from: (latest: number) => number;
  to: (latest: number) => number | "draft";
} {
  // a repeated key (`?from=1&from=2`) counts once, as `URLSearchParams.get` reads it
  const given = (v: string | string[] | null | undefined) => {
    const one = Array.isArray(v) ? v[0] : v;
    return one == null || one === "" ? undefined : one;
  };
  const from = (latest: number) => {
    const v = given(query.from);
    return v === undefined ? Math.max(1, latest - 1) : Number(v);
  };
  const to = (latest: number): number | "draft" => {
    const v = given(query.to);
    return v === "draft" ? "draft" : v === undefined ? latest : Number(v);
  };
  return {
    here: "Compare",
    from,
    to,
    missing: (latest) => {
      const t = to(latest);
      return [!valid(from(latest), latest) ? given(query.from) : undefined, t !== "draft" && !valid(t, latest) ? given(query.to) : undefined].filter(
        (v): v is string => v !== undefined,
      );
    },
  };
}

/** `/workspaces/<id>/sketches/<sketchId>/versions/<n>` and its kin; null for any other address. */
export function parseWorkspacePath(pathWithQuery: string): WorkspacePath | null {
  let url: URL;
  try {
    url = new URL(pathWithQuery, "http://localhost");
  } catch {
    return null;
  }
  const parts = url.pathname.split("/").filter(Boolean).map((p) => {
    try {
      return decodeURIComponent(p);
    } catch {
      return p;
    }
  });
  if (parts[0] !== "workspaces" || !parts[1]) return null;
  const workspaceId = parts[1];
  if (parts[2] !== "sketches" || !parts[3]) return { workspaceId };
  const sketchId = parts[3];
  if (parts[4] === "versions" && parts[5] !== undefined && parts.length === 6) return { workspaceId, sketchId, versions: versionPageAsked(parts[5]) };
  if (parts[4] === "compare" && parts.length === 5) {
    return { workspaceId, sketchId, versions: compareAsked({ from: url.searchParams.get("from"), to: url.searchParams.get("to") }) };
  }
  return { workspaceId, sketchId };
}
