import { listSketchActivity } from "@/db/queries/review";
import { otherMethods, route } from "@/lib/api";
import { activityQuery } from "@/lib/review/schemas";
import { sketchParams } from "@/lib/sketch-schemas";
import { requireSketchRole } from "@/lib/sketches";

export const dynamic = "force-dynamic";

/** What happened to the sketch, newest first: saves, forks, renames, comments, sign-off steps. `?before=<id>` pages back. */
export const GET = route({ params: sketchParams, query: activityQuery }, async ({ params, query, user }) => {
  const access = await requireSketchRole(params.id, user.id, "sketch.read");
  return listSketchActivity(params.id, access.workspaceId, user.id, query);
});

export const { POST, PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET");
