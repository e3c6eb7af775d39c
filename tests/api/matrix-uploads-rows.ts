// The authorization matrix's rows for the upload routes: an underlay for a sketch, attachments on
// comments, the file and its thumbnail, deleting.
import sharp from "sharp";
import { addComment } from "@/lib/review/comments";
import { attachToComment, createUnderlay } from "@/lib/uploads/service";
import { appOrigin } from "@/lib/env";
import { call, type Person } from "./helpers";
import type { Fixture, Handler, Row } from "./matrix-types";
import { editors, members } from "./matrix-types";

const tinyPng = () => sharp({ create: { width: 8, height: 6, channels: 3, background: "#ffffff" } }).png().toBuffer();

/** POST a small PNG as multipart form data. */
async function postFile(h: Handler, params: Record<string, string>, p: Person) {
  const form = new FormData();
  form.set("file", new Blob([new Uint8Array(await tinyPng())], { type: "image/png" }), "tiny.png");
  const res = await h(new Request(`${appOrigin()}/api/matrix-upload`, { method: "POST", headers: { cookie: p.cookie, origin: appOrigin() }, body: form }), { params: Promise.resolve(params) });
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : null };
}

/** GET a file route (the answer is the file itself, or a JSON error). */
async function getFile(h: Handler, uploadId: string, p: Person) {
  const res = await h(new Request(`${appOrigin()}/api/uploads/${uploadId}`, { headers: p.cookie ? { cookie: p.cookie } : {} }), { params: Promise.resolve({ uploadId }) });
  const isJson = (res.headers.get("content-type") ?? "").includes("json");
  return { status: res.status, body: isJson ? await res.json() : await res.arrayBuffer().then(() => null) };
}

/** An underlay the editor uploaded to the fixture's sketch. */
async function editorsUnderlay(f: Fixture) {
  const made = await createUnderlay(f.sketchId, f.people.editor, async () => ({ bytes: await tinyPng(), name: "ga.png" }));
  f.extra.uploadId = made.id;
}

/** A comment by the editor on v1 (the editor attaches to it). */
async function editorsComment(f: Fixture) {
  f.extra.commentId = (await addComment(f.sketchId, 1, f.people.editor, { body: "The foot, as built" })).id;
}

/** An attachment on the editor's comment. */
async function editorsAttachment(f: Fixture) {
  await editorsComment(f);
  f.extra.uploadId = (await attachToComment(f.extra.commentId, f.people.editor, async () => ({ bytes: await tinyPng(), name: "foot.png" }))).id;
}

export const UPLOADS_ROWS: Record<string, Row> = {
  "POST /api/sketches/[id]/uploads": { expect: editors(201), run: (h, f, p) => postFile(h, { id: f.sketchId }, p) },
  // only the comment's author attaches (the editor wrote it); other roles learn 403, outsiders 404
  "POST /api/comments/[commentId]/attachments": {
    expect: { owner: 403, editor: 201, checker: 403, viewer: 403, outsider: 404, signedOut: 401 },
    prepare: editorsComment,
    run: (h, f, p) => postFile(h, { commentId: f.extra.commentId }, p),
  },
  "GET /api/uploads/[uploadId]": { expect: members(200), prepare: editorsUnderlay, run: (h, f, p) => getFile(h, f.extra.uploadId, p) },
  "GET /api/uploads/[uploadId]/thumbnail": { expect: members(200), prepare: editorsAttachment, run: (h, f, p) => getFile(h, f.extra.uploadId, p) },
  // an underlay no saved version draws: editors and owners delete it
  "DELETE /api/uploads/[uploadId]": {
    expect: editors(200),
    prepare: editorsUnderlay,
    run: (h, f, p) => call(h, { method: "DELETE", params: { uploadId: f.extra.uploadId }, cookie: p.cookie }),
  },
};
