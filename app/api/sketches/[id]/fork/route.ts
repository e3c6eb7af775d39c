import { json, route } from "@/lib/api";
import { forkInput, sketchParams } from "@/lib/sketch-schemas";
import { forkSketch } from "@/lib/sketches";

export const dynamic = "force-dynamic";

/** Copy a version you can read (the latest unless `version` is given) into a workspace where you may fork. */
export const POST = route({ params: sketchParams, body: forkInput }, async ({ params, body, user }) => {
  const made = await forkSketch(params.id, user, body);
  return json(
    {
      sketch: { id: made.sketch.id, workspaceId: made.sketch.workspaceId, title: made.sketch.title, latestVersion: 1 },
      version: { number: 1, createdAt: made.version.createdAt },
    },
    201,
  );
});
