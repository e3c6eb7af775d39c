import { getSketchForMember } from "@/db/queries/sketches";
import { getVersion } from "@/db/queries/versions";
import { route } from "@/lib/api";
import { AppError } from "@/lib/errors";
import { sketchParams, updateSketchInput } from "@/lib/sketch-schemas";
import { editSketch, removeSketch, requireSketchRole } from "@/lib/sketches";

export const dynamic = "force-dynamic";

/** The sketch, where it was forked from, and its latest version's summary (without the document). */
export const GET = route({ params: sketchParams }, async ({ params, user }) => {
  await requireSketchRole(params.id, user.id, "sketch.read");
  const s = await getSketchForMember(params.id, user.id);
  if (!s) throw new AppError("not_found");
  const latest = await getVersion(params.id, s.latestVersion, user.id);
  const { document: _document, ...latestSummary } = latest ?? { document: null };
  return { sketch: s, latest: latest ? latestSummary : null };
});

/** Rename, describe or re-tag (editors, owners). */
export const PATCH = route({ params: sketchParams, body: updateSketchInput }, async ({ params, body, user }) => ({
  sketch: await editSketch(params.id, user, body),
}));

/** Delete the sketch and its versions (owners). */
export const DELETE = route({ params: sketchParams }, async ({ params, user }) => removeSketch(params.id, user));
