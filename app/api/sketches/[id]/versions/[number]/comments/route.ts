import { json, otherMethods, parseJsonBody, route } from "@/lib/api";
import { addComment, readComments } from "@/lib/review/comments";
import { createCommentInput } from "@/lib/review/schemas";
import { versionParams } from "@/lib/sketch-schemas";
import { requireSketchRole } from "@/lib/sketches";

export const dynamic = "force-dynamic";

/** The version's comment threads, and the members who can be mentioned. */
export const GET = route({ params: versionParams }, async ({ params, user }) => readComments(params.id, params.number, user.id));

/**
 * A new thread `{ body, pin? }` or a reply `{ body, parentId }` (owners, editors, checkers; not on an approved version).
 * The role is checked before the body is read: a viewer is refused (403) whatever they send.
 */
export const POST = route({ params: versionParams }, async ({ req, params, user }) => {
  await requireSketchRole(params.id, user.id, "comment.create");
  const body = await parseJsonBody(req, createCommentInput);
  return json({ comment: await addComment(params.id, params.number, user, body) }, 201);
});

export const { PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET", "POST");
