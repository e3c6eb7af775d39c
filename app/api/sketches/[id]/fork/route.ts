import { json, otherMethods, parseJsonBody, route } from "@/lib/api";
import { forkInput, sketchParams } from "@/lib/sketch-schemas";
import { forkSketch, requireSketchRole } from "@/lib/sketches";

export const dynamic = "force-dynamic";

/**
 * Copy a version you can read (the latest unless `version` is given) into a workspace where you may fork.
 * Whether you may read the sketch is checked before the body is read (404 for non-members); the
 * workspace named in the body is checked once it is read.
 */
export const POST = route({ params: sketchParams }, async ({ req, params, user }) => {
  await requireSketchRole(params.id, user.id, "sketch.read");
  const body = await parseJsonBody(req, forkInput);
  const made = await forkSketch(params.id, user, body);
  return json(
    {
      sketch: { id: made.sketch.id, workspaceId: made.sketch.workspaceId, title: made.sketch.title, latestVersion: 1 },
      version: { number: 1, createdAt: made.version.createdAt },
    },
    201,
  );
});

export const { GET, HEAD, PUT, PATCH, DELETE, OPTIONS } = otherMethods("POST");
