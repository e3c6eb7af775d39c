import { listVersions } from "@/db/queries/versions";
import { json, otherMethods, parseJsonBody, route } from "@/lib/api";
import { MAX_SKETCH_BYTES, saveVersionInput } from "@/lib/sketch-document";
import { sketchParams } from "@/lib/sketch-schemas";
import { requireSketchRole, saveVersion } from "@/lib/sketches";

export const dynamic = "force-dynamic";

/** Every version, newest first, with its solve summary (no documents). */
export const GET = route({ params: sketchParams }, async ({ params, user }) => {
  await requireSketchRole(params.id, user.id, "sketch.read");
  return { versions: await listVersions(params.id, user.id) };
});

/**
 * Save the next version on top of `baseVersion` (editors, owners); 409 with the latest when someone saved since.
 * The role is checked before the body is read: a viewer or a checker is refused (403) whatever they send.
 */
export const POST = route({ params: sketchParams }, async ({ req, params, user }) => {
  await requireSketchRole(params.id, user.id, "version.save");
  const body = await parseJsonBody(req, saveVersionInput, MAX_SKETCH_BYTES);
  return json({ version: await saveVersion(params.id, user, body) }, 201);
});

export const { PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET", "POST");
