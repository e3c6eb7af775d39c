import { json, route } from "@/lib/api";
import { addComment, readComments } from "@/lib/review/comments";
import { createCommentInput } from "@/lib/review/schemas";
import { versionParams } from "@/lib/sketch-schemas";

export const dynamic = "force-dynamic";

/** The version's comment threads, and the members who can be mentioned. */
export const GET = route({ params: versionParams }, async ({ params, user }) => readComments(params.id, params.number, user.id));

/** A new thread `{ body, pin? }` or a reply `{ body, parentId }` (owners, editors, checkers; not on an approved version). */
export const POST = route({ params: versionParams, body: createCommentInput }, async ({ params, body, user }) =>
  json({ comment: await addComment(params.id, params.number, user, body) }, 201),
);
