import Link from "next/link";
import { buttonClass, Crumb, EmptyState } from "@/components/shell/controls";

const PRIMARY = buttonClass("primary");
const SECONDARY = buttonClass("secondary");

/** "version v9", "versions v0 and “abc”": the numbers the address gave, as written. */
export function askedVersions(values: string[]): string {
  const names = [...new Set(values)].map((v) => (/^\d+$/.test(v) ? `v${v}` : `“${v}”`));
  return `${names.length > 1 ? "versions" : "version"} ${names.join(" and ")}`;
}

function versionsSoFar(latest: number): string {
  return latest === 1 ? "it has one version so far, v1" : `it has versions v1 to v${latest}`;
}

/** A version number in the address that the sketch does not have (mistyped, or from another sketch). */
export function NoSuchVersion({
  workspaceId,
  sketchId,
  sketchTitle,
  latest,
  asked,
  here,
}: {
  workspaceId: string;
  sketchId: string;
  sketchTitle: string;
  latest: number;
  /** The version numbers the address asked for, as written. */
  asked: string[];
  here: string;
}) {
  const base = `/workspaces/${workspaceId}/sketches/${sketchId}`;
  return (
    <div className="space-y-4" data-testid="no-such-version">
      <Crumb href={base} parent={sketchTitle} here={here} />
      <h1 className="text-2xl font-semibold tracking-tight">No {askedVersions(asked)} of this sketch</h1>
      <EmptyState
        title={`${sketchTitle}: ${versionsSoFar(latest)}`}
        action={
          <div className="flex flex-wrap justify-center gap-2">
            <Link href={`${base}/versions/${latest}`} className={PRIMARY}>
              Review v{latest}
            </Link>
            <Link href={base} className={SECONDARY}>
              History
            </Link>
          </div>
        }
      >
        The address names a version this sketch does not have. Pick one from its history.
      </EmptyState>
    </div>
  );
}

/** The compare page of a sketch that has only its first version. */
export function NothingToCompare({ workspaceId, sketchId, sketchTitle }: { workspaceId: string; sketchId: string; sketchTitle: string }) {
  const base = `/workspaces/${workspaceId}/sketches/${sketchId}`;
  return (
    <div className="space-y-4" data-testid="nothing-to-compare">
      <Crumb href={base} parent={sketchTitle} here="Compare" />
      <h1 className="text-2xl font-semibold tracking-tight">Compare versions</h1>
      <EmptyState
        title="Only one version so far"
        action={
          <div className="flex flex-wrap justify-center gap-2">
            <Link href={`/sketches/${sketchId}`} className={PRIMARY}>
              Open in the editor
            </Link>
            <Link href={base} className={SECONDARY}>
              History
            </Link>
          </div>
        }
      >
        A comparison needs two versions. Save a change in the editor as v2, then compare it with v1 here: the drawings side by side, the reactions before and after, and every input that changed.
      </EmptyState>
    </div>
  );
}
