import { json, otherMethods, route } from "@/lib/api";
import { sketchParams } from "@/lib/sketch-schemas";
import { readUploadBody, uploadQuery } from "@/lib/uploads/request";
import { createUnderlay } from "@/lib/uploads/service";

export const dynamic = "force-dynamic";

/**
 * Upload a drawing, photo or PDF to trace over in this sketch (editors, owners): multipart/form-data
 * with a `file` field, or the raw bytes (`?name=` for the display name). 10 MB at most.
 */
export const POST = route({ params: sketchParams, query: uploadQuery }, async ({ req, params, user }) => json({ upload: await createUnderlay(params.id, user, () => readUploadBody(req)) }, 201));

export const { GET, HEAD, PUT, PATCH, DELETE, OPTIONS } = otherMethods("POST");
