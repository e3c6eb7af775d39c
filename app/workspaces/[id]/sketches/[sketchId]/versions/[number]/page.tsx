import type { Metadata } from "next";
import { NoSuchVersion } from "@/components/review/NoSuchVersion";
import { VersionReview } from "@/components/review/VersionReview";
import { loadSketchPage } from "@/lib/sketch-page";
import { can } from "@/lib/roles";
import { versionPageAsked } from "@/lib/workspace-path";

export const metadata: Metadata = { title: "Review a version" };

export default async function VersionReviewPage({ params }: { params: Promise<{ id: string; sketchId: string; number: string }> }) {
  const { id, sketchId, number } = await params;
  const { session, role, data } = await loadSketchPage(id, sketchId, `/workspaces/${id}/sketches/${sketchId}/versions/${number}`);
  const asked = versionPageAsked(number);
  const missing = asked.missing(data.sketch.latestVersion);
  if (missing.length) {
    return <NoSuchVersion workspaceId={id} sketchId={sketchId} sketchTitle={data.sketch.title} latest={data.sketch.latestVersion} asked={missing} here={asked.here} />;
  }
  const n = Number(number);
  return <VersionReview workspaceId={id} sketchId={sketchId} sketchTitle={data.sketch.title} number={n} latest={data.sketch.latestVersion} viewerId={session.user.id} canEdit={can(role, "version.save")} />;
}
