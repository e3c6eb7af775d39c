import { getVersion } from "@/db/queries/versions";
import { otherMethods, route } from "@/lib/api";
import { AppError } from "@/lib/errors";
import { compareSketches } from "@/lib/review/compare";
import { compareQuery } from "@/lib/review/schemas";
import { sketchParams } from "@/lib/sketch-schemas";
import { requireSketchRole } from "@/lib/sketches";

export const dynamic = "force-dynamic";

/** What changed from version `from` to version `to`: elements, fields with units (`units=SI|US`), parameters, reactions and statuses. */
export const GET = route({ params: sketchParams, query: compareQuery }, async ({ params, query, user }) => {
  await requireSketchRole(params.id, user.id, "sketch.read");
  const [a, b] = await Promise.all([getVersion(params.id, query.from, user.id), getVersion(params.id, query.to, user.id)]);
  if (!a || !b) throw new AppError("not_found", `This sketch has no version ${!a ? query.from : query.to}.`);
  const meta = (v: typeof a) => ({ number: v.number, message: v.message, authorName: v.authorName, createdAt: v.createdAt, status: v.status, reviewState: v.reviewState });
  return { from: meta(a), to: meta(b), comparison: compareSketches(a.document, b.document, query.units) };
});

export const { POST, PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET");
