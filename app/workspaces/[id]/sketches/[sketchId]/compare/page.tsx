import type { Metadata } from "next";
import { CompareScreen } from "@/components/review/CompareScreen";
import { NoSuchVersion, NothingToCompare } from "@/components/review/NoSuchVersion";
import { loadSketchPage } from "@/lib/sketch-page";
import { compareAsked } from "@/lib/workspace-path";

export const metadata: Metadata = { title: "Compare versions" };

/** `?from=2&to=3` compares two versions; `?to=draft` compares with the changes kept in this browser
 *  (`&draft=<tab>`: the ones that tab kept, as "Kept work" offered them);
 *  `&drawings=overlay` lays the drawings over each other (the link a colleague is sent shows the same). */
export default async function ComparePage({ params, searchParams }: { params: Promise<{ id: string; sketchId: string }>; searchParams: Promise<{ from?: string; to?: string; drawings?: string; draft?: string; open?: string }> }) {
  const { id, sketchId } = await params;
  const q = await searchParams;
  const { data } = await loadSketchPage(id, sketchId, `/workspaces/${id}/sketches/${sketchId}/compare`);
  const latest = data.sketch.latestVersion;
  const asked = compareAsked(q);
  const from = asked.from(latest);
  const to = asked.to(latest);
  const bad = asked.missing(latest);
  const title = data.sketch.title;
  if (bad.length) {
    return <NoSuchVersion workspaceId={id} sketchId={sketchId} sketchTitle={title} latest={latest} asked={bad} here="Compare" />;
  }
  // the default comparison of a sketch with one version would be v1 against itself
  if (latest === 1 && to !== "draft") return <NothingToCompare workspaceId={id} sketchId={sketchId} sketchTitle={title} />;
  return <CompareScreen key={`${from}-${to}`} workspaceId={id} sketchId={sketchId} sketchTitle={title} from={from} to={to} draftTab={typeof q.draft === "string" ? q.draft : undefined} draftOpen={q.open === "1"} layout={q.drawings === "overlay" ? "overlay" : "side"} />;
}
