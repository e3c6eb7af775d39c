import { getVersion } from "@/db/queries/versions";
import { otherMethods, route } from "@/lib/api";
import { AppError } from "@/lib/errors";
import { versionParams } from "@/lib/sketch-schemas";
import { requireSketchRole } from "@/lib/sketches";

export const dynamic = "force-dynamic";

/** One version with its document. */
export const GET = route({ params: versionParams }, async ({ params, user }) => {
  await requireSketchRole(params.id, user.id, "sketch.read");
  const version = await getVersion(params.id, params.number, user.id);
  if (!version) throw new AppError("not_found", `This sketch has no version ${params.number}.`);
  return { version };
});

export const { POST, PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET");
