// Files attached to comments: images and PDFs (a PDF is kept whole, with a thumbnail of its first
// page), listed with their comment for readers of the workspace, attached only by the comment's
// author, never on an approved version, and gone with their comment.
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { beforeAll, afterAll, describe, expect, it } from "vitest";
import * as attachmentsRoute from "@/app/api/comments/[commentId]/attachments/route";
import * as commentRoute from "@/app/api/comments/[commentId]/route";
import * as commentsRoute from "@/app/api/sketches/[id]/versions/[number]/comments/route";
import * as signoffRoute from "@/app/api/sketches/[id]/versions/[number]/signoff/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import * as uploadRoute from "@/app/api/uploads/[uploadId]/route";
import * as thumbnailRoute from "@/app/api/uploads/[uploadId]/thumbnail/route";
import { db } from "@/db";
import { upload } from "@/db/schema";
import { appOrigin } from "@/lib/env";
import { objectExists } from "@/lib/storage";
import { MAX_ATTACHMENTS } from "@/lib/uploads/service";
import { pdf, png, textPretendingToBePng } from "../fixtures/uploads";
import { call, ensureMailFake, makeAccount, makeWorkspace, type Json, type Person } from "./helpers";
import { fixture } from "./sketch-fixtures";

type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

let eddie: Person;
let chen: Person;
let olivia: Person;
let vera: Person;
let stranger: Person;
let ws: string;
let stopMail: () => Promise<void>;

beforeAll(async () => {
  stopMail = await ensureMailFake();
  [eddie, chen, olivia, vera, stranger] = await Promise.all(["eddie", "chen", "olivia", "vera", "stranger"].map((t) => makeAccount(`att-${t}`)));
  ws = await makeWorkspace("Attachment bay", [
    [olivia, "owner"],
    [eddie, "editor"],
    [chen, "checker"],
    [vera, "viewer"],
  ]);
  await makeWorkspace("Stranger's bay", [[stranger, "viewer"]]);
});
afterAll(async () => stopMail?.());

async function sketchWithComment(by: Person = chen) {
  const made = await call(sketchesRoute.POST, { method: "POST", params: { id: ws }, cookie: eddie.cookie, body: { title: "Skid with attachments", document: fixture("pump-skid-discharge") } });
  const sketchId = made.body.sketch.id as string;
  const c = await call(commentsRoute.POST, { method: "POST", params: { id: sketchId, number: "1" }, cookie: by.cookie, body: { body: "See the vendor's sheet and the photo of the foot." } });
  expect(c.status).toBe(201);
  return { sketchId, commentId: c.body.comment.id as string };
}

async function attach(commentId: string, who: Person, file: Buffer, name: string, type: string) {
  const form = new FormData();
  form.set("file", new Blob([new Uint8Array(file)], { type }), name);
  const req = new Request(`${appOrigin()}/api/comments/${commentId}/attachments`, { method: "POST", headers: { cookie: who.cookie, origin: appOrigin() }, body: form });
  const res = await (attachmentsRoute.POST as Handler)(req, { params: Promise.resolve({ commentId }) });
  return { status: res.status, body: (await res.json()) as Json };
}

async function get(handler: Handler, uploadId: string, who: Person) {
  const res = await handler(new Request(`${appOrigin()}/api/uploads/${uploadId}`, { headers: { cookie: who.cookie } }), { params: Promise.resolve({ uploadId }) });
  return { status: res.status, type: res.headers.get("content-type"), bytes: Buffer.from(await res.arrayBuffer()) };
}

describe("attachments on comments", () => {
  it("a photo and a PDF on a checker's comment: listed with the comment, served to readers, thumbnails for both", async () => {
    const { sketchId, commentId } = await sketchWithComment();
    const photo = await attach(commentId, chen, await png(640, 480, "#8899aa"), "foot.png", "image/png");
    const sheet = await attach(commentId, chen, pdf(2), "pump datasheet.pdf", "application/pdf");
    expect([photo.status, sheet.status]).toEqual([201, 201]);
    expect(photo.body.upload).toMatchObject({ purpose: "attachment", name: "foot.png", storedType: "image/png", width: 640, height: 480 });
    // the PDF is kept whole (all its pages); its thumbnail is the first page
    expect(sheet.body.upload).toMatchObject({ purpose: "attachment", name: "pump datasheet.pdf", sourceType: "application/pdf", storedType: "application/pdf", size: pdf(2).length });

    const list = await call(commentsRoute.GET, { params: { id: sketchId, number: "1" }, cookie: vera.cookie });
    const files = list.body.threads[0].comments[0].attachments as Json[];
    expect(files.map((f) => f.name)).toEqual(["foot.png", "pump datasheet.pdf"]);
    expect(files[1].thumbnailUrl).toBe(`/api/uploads/${sheet.body.upload.id}/thumbnail`);

    const full = await get(uploadRoute.GET as Handler, sheet.body.upload.id, vera);
    expect(full.status).toBe(200);
    expect(full.type).toBe("application/pdf");
    expect(full.bytes.equals(pdf(2))).toBe(true);
    const thumb = await get(thumbnailRoute.GET as Handler, sheet.body.upload.id, vera);
    expect(thumb.type).toBe("image/png");
    expect((await sharp(thumb.bytes).metadata()).width).toBe(320);
    // someone outside the workspace gets 404 for both
    expect((await get(uploadRoute.GET as Handler, photo.body.upload.id, stranger)).status).toBe(404);
    expect((await get(thumbnailRoute.GET as Handler, sheet.body.upload.id, stranger)).status).toBe(404);
  });

  it("only the comment's author attaches; viewers and strangers are refused", async () => {
    const { commentId } = await sketchWithComment();
    const file = await png(10, 10);
    const tries = await Promise.all([olivia, eddie, vera, stranger].map((p) => attach(commentId, p, file, "x.png", "image/png")));
    expect(tries.map((t) => t.status)).toEqual([403, 403, 403, 404]);
    expect(tries[0].body.error.message).toBe("Only its author attaches files to a comment.");
    expect(await db.select().from(upload).where(eq(upload.commentId, commentId))).toHaveLength(0);
  });

  it("refuses what is not an image or a PDF, and more than the limit per comment", async () => {
    const { commentId } = await sketchWithComment();
    const text = await attach(commentId, chen, textPretendingToBePng(), "photo.png", "image/png");
    expect(text.status).toBe(415);
    const file = await png(10, 10);
    for (let i = 0; i < MAX_ATTACHMENTS; i++) expect((await attach(commentId, chen, file, `p${i}.png`, "image/png")).status).toBe(201);
    const over = await attach(commentId, chen, file, "one-more.png", "image/png");
    expect(over.status).toBe(409);
    expect(over.body.error.message).toBe(`A comment carries at most ${MAX_ATTACHMENTS} files.`);
    expect(await db.select().from(upload).where(eq(upload.commentId, commentId))).toHaveLength(MAX_ATTACHMENTS);
  });

  it("an approved version takes no new attachments", async () => {
    const { sketchId, commentId } = await sketchWithComment(olivia);
    const step = (who: Person, s: string) => call(signoffRoute.POST, { method: "POST", params: { id: sketchId, number: "1" }, cookie: who.cookie, body: { step: s } });
    for (const [who, s] of [[eddie, "submit"], [chen, "check"], [olivia, "approve"]] as const) expect((await step(who, s)).status).toBe(200);
    const res = await attach(commentId, olivia, await png(10, 10), "late.png", "image/png");
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/approved/);
  });

  it("removing an attachment, and deleting the comment, take the files out of the bucket", async () => {
    const { sketchId, commentId } = await sketchWithComment();
    const a = (await attach(commentId, chen, await png(12, 12), "a.png", "image/png")).body.upload;
    const b = (await attach(commentId, chen, await png(14, 14), "b.png", "image/png")).body.upload;
    const rows = await db.select().from(upload).where(eq(upload.commentId, commentId));
    const keyOf = (id: string) => rows.find((r) => r.id === id)!;
    expect((await call(uploadRoute.DELETE, { method: "DELETE", params: { uploadId: a.id }, cookie: olivia.cookie })).status).toBe(403);
    expect((await call(uploadRoute.DELETE, { method: "DELETE", params: { uploadId: a.id }, cookie: chen.cookie })).status).toBe(200);
    expect(await objectExists(keyOf(a.id).storageKey)).toBe(false);
    expect(await objectExists(keyOf(b.id).storageKey)).toBe(true);

    expect((await call(commentRoute.DELETE, { method: "DELETE", params: { commentId }, cookie: chen.cookie })).status).toBe(200);
    expect(await db.select().from(upload).where(eq(upload.commentId, commentId))).toHaveLength(0);
    expect(await objectExists(keyOf(b.id).storageKey)).toBe(false);
    expect(await objectExists(keyOf(b.id).thumbnailKey)).toBe(false);
    expect((await get(uploadRoute.GET as Handler, b.id, vera)).status).toBe(404);
    const list = await call(commentsRoute.GET, { params: { id: sketchId, number: "1" }, cookie: vera.cookie });
    expect(list.body.threads).toEqual([]);
  });
});
