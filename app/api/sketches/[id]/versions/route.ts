import { listVersions } from "@/db/queries/versions";
import { json, route } from "@/lib/api";
import { MAX_SKETCH_BYTES, saveVersionInput } from "@/lib/sketch-document";
import { sketchParams } from "@/lib/sketch-schemas";
import { requireSketchRole, saveVersion } from "@/lib/sketches";

export const dynamic = "force-dynamic";

/** Every version, newest first, with its solve summary (no documents). */
export const GET = route({ params: sketchParams }, async ({ params, user }) => {
  await requireSketchRole(params.id, user.id, "sketch.read");
  return { versions: await listVersions(params.id, user.id) };
});

/** Save the next version on top of `baseVersion` (editors, owners); 409 with the latest when someone saved since. */
export const POST = route({ params: sketchParams, body: saveVersionInput, maxBodyBytes: MAX_SKETCH_BYTES }, async ({ params, body, user }) =>
  json({ version: await saveVersion(params.id, user, body) }, 201),
);
