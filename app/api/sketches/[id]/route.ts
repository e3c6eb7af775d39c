import { otherMethods, parseJsonBody, route } from "@/lib/api";
import { sketchParams, updateSketchInput } from "@/lib/sketch-schemas";
import { editSketch, readSketch, removeSketch, requireSketchRole } from "@/lib/sketches";

export const dynamic = "force-dynamic";

/** The sketch, where it was forked from, and its latest version's summary (without the document). */
export const GET = route({ params: sketchParams }, async ({ params, user }) => readSketch(params.id, user.id));

/** Rename, describe or re-tag (editors, owners). The role is checked before the body is read. */
export const PATCH = route({ params: sketchParams }, async ({ req, params, user }) => {
  await requireSketchRole(params.id, user.id, "sketch.edit");
  const body = await parseJsonBody(req, updateSketchInput);
  return { sketch: await editSketch(params.id, user, body) };
});

/** Delete the sketch and its versions (owners). */
export const DELETE = route({ params: sketchParams }, async ({ params, user }) => removeSketch(params.id, user));

export const { POST, PUT, OPTIONS } = otherMethods("GET", "PATCH", "DELETE");
