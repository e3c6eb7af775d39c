// The authorization matrix's rows for the review routes: comparison, activity, comments, sign-off.
import { addComment } from "@/lib/review/comments";
import { call } from "./helpers";
import { members, type Row } from "./matrix-types";

const V = (id: string) => ({ id, number: "1" });
const commenters = { owner: 201, editor: 201, checker: 201, viewer: 403, outsider: 404, signedOut: 401 };

/** A thread on v1 opened by the editor (the fixture's author). */
async function editorsThread(f: Parameters<NonNullable<Row["prepare"]>>[0]) {
  const made = await addComment(f.sketchId, 1, f.people.editor, { body: "A remark to act upon" });
  f.extra.commentId = made.id;
}

export const REVIEW_ROWS: Record<string, Row> = {
  "GET /api/sketches/[id]/activity": { expect: members(200), run: (h, f, p) => call(h, { params: { id: f.sketchId }, cookie: p.cookie }) },
  "GET /api/sketches/[id]/compare": {
    expect: members(200),
    run: (h, f, p) => call(h, { params: { id: f.sketchId }, cookie: p.cookie, path: `/api/sketches/${f.sketchId}/compare?from=1&to=1` }),
  },
  "GET /api/sketches/[id]/versions/[number]/comments": { expect: members(200), run: (h, f, p) => call(h, { params: V(f.sketchId), cookie: p.cookie }) },
  "POST /api/sketches/[id]/versions/[number]/comments": {
    expect: commenters,
    run: (h, f, p) => call(h, { method: "POST", params: V(f.sketchId), cookie: p.cookie, body: { body: "Check the rear contact", pin: { kind: "element", elementId: "rear" } } }),
  },
  // resolving a thread: its author (the editor), or a role that may resolve threads
  "PATCH /api/comments/[commentId]": {
    expect: { owner: 200, editor: 200, checker: 200, viewer: 403, outsider: 404, signedOut: 401 },
    prepare: editorsThread,
    run: (h, f, p) => call(h, { method: "PATCH", params: { commentId: f.extra.commentId }, cookie: p.cookie, body: { resolved: true } }),
  },
  // deleting: only your own comment
  "DELETE /api/comments/[commentId]": {
    expect: { owner: 403, editor: 200, checker: 403, viewer: 403, outsider: 404, signedOut: 401 },
    prepare: editorsThread,
    run: (h, f, p) => call(h, { method: "DELETE", params: { commentId: f.extra.commentId }, cookie: p.cookie }),
  },
  "GET /api/sketches/[id]/versions/[number]/signoff": { expect: members(200), run: (h, f, p) => call(h, { params: V(f.sketchId), cookie: p.cookie }) },
  // submitting v1 (prepared by the editor): its author, or an editor or owner
  "POST /api/sketches/[id]/versions/[number]/signoff": {
    expect: { owner: 200, editor: 200, checker: 403, viewer: 403, outsider: 404, signedOut: 401 },
    run: (h, f, p) => call(h, { method: "POST", params: V(f.sketchId), cookie: p.cookie, body: { step: "submit" } }),
  },
};
