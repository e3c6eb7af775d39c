import { json, otherMethods, route } from "@/lib/api";
import { commentParams } from "@/lib/review/schemas";
import { readUploadBody, uploadQuery } from "@/lib/uploads/request";
import { attachToComment } from "@/lib/uploads/service";

export const dynamic = "force-dynamic";

/** Attach an image or a PDF to your own comment: multipart/form-data with a `file` field, or the raw bytes. */
export const POST = route({ params: commentParams, query: uploadQuery }, async ({ req, params, user }) => json({ upload: await attachToComment(params.commentId, user, () => readUploadBody(req)) }, 201));

export const { GET, HEAD, PUT, PATCH, DELETE, OPTIONS } = otherMethods("POST");
