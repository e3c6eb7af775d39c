import { otherMethods, route } from "@/lib/api";
import { deleteComment, editComment, resolveThread } from "@/lib/review/comments";
import { commentParams, updateCommentInput } from "@/lib/review/schemas";

export const dynamic = "force-dynamic";

/** `{ body }`: edit your own comment. `{ resolved }`: resolve or reopen a thread (its author, or owners, editors, checkers). */
export const PATCH = route({ params: commentParams, body: updateCommentInput }, async ({ params, body, user }) => ({
  comment: body.body !== undefined ? await editComment(params.commentId, user, body.body) : await resolveThread(params.commentId, user, body.resolved!),
}));

/** Delete your own comment (its text goes; the thread keeps its shape). */
export const DELETE = route({ params: commentParams }, async ({ params, user }) => ({ comment: await deleteComment(params.commentId, user) }));

export const { GET, HEAD, POST, PUT, OPTIONS } = otherMethods("PATCH", "DELETE");
