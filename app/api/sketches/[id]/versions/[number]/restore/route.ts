import { json, otherMethods, parseJsonBody, route } from "@/lib/api";
import { restoreInput, versionParams } from "@/lib/sketch-schemas";
import { requireSketchRole, restoreVersion } from "@/lib/sketches";

export const dynamic = "force-dynamic";

/**
 * Make this version the latest again (editors, owners): a new version with its drawing, on top of
 * `baseVersion`; 201 with the new version, 409 `version_conflict` with `error.latest` when someone
 * saved since. The role is checked before the body is read.
 */
export const POST = route({ params: versionParams }, async ({ req, params, user }) => {
  await requireSketchRole(params.id, user.id, "version.save");
  const body = await parseJsonBody(req, restoreInput);
  const version = await restoreVersion(params.id, user, { number: params.number, ...body });
  return json({ version: { ...version, restoredFrom: params.number } }, 201);
});

export const { GET, HEAD, PUT, PATCH, DELETE, OPTIONS } = otherMethods("POST");
