// Files attached to comments: images and PDFs (a PDF is kept whole, with a thumbnail of its first
// page), listed with their comment for readers of the workspace, attached only by the comment's
// author, never on an approved version, and gone with their comment.
import { execFile } from "node:child_process";
import { mkdtemp, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { promisify } from "node:util";
import { ListObjectsV2Command } from "@aws-sdk/client-s3";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import * as attachmentsRoute from "@/app/api/comments/[commentId]/attachments/route";
import * as commentRoute from "@/app/api/comments/[commentId]/route";
import * as commentsRoute from "@/app/api/sketches/[id]/versions/[number]/comments/route";
import * as signoffRoute from "@/app/api/sketches/[id]/versions/[number]/signoff/route";
import * as uploadRoute from "@/app/api/uploads/[uploadId]/route";
import * as thumbnailRoute from "@/app/api/uploads/[uploadId]/thumbnail/route";
import { db } from "@/db";
import { upload } from "@/db/schema";
import { appOrigin, storageSettings } from "@/lib/env";
import { getObject, objectExists, s3 } from "@/lib/storage";
import { MAX_ATTACHMENTS } from "@/lib/uploads/service";
import { PDF_AUTHOR, PDF_XMP_CREATOR, pdf, photoWithExif, png, textPretendingToBePng } from "../fixtures/uploads";
import { call, withMailFake, makeTeam, type Json, type Person } from "./helpers";
import { postSketch } from "./sketch-setup";

type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

let eddie: Person;
let chen: Person;
let olivia: Person;
let vera: Person;
let stranger: Person;
let ws: string;

withMailFake();
beforeAll(async () => {
  ({ ws, olivia, eddie, chen, vera } = await makeTeam("Attachment bay", { olivia: "owner", eddie: "editor", chen: "checker", vera: "viewer" }, { prefix: "att" }));
  ({ stranger } = await makeTeam("Stranger's bay", { stranger: "viewer" }, { prefix: "att" }));
});

async function sketchWithComment(by: Person = chen) {
  const sketchId = await postSketch(ws, eddie, "Skid with attachments");
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
  return { status: res.status, type: res.headers.get("content-type"), headers: res.headers, bytes: Buffer.from(await res.arrayBuffer()) };
}

/** The page count poppler reads from a PDF. */
async function pdfPages(bytes: Buffer): Promise<number> {
  const dir = await mkdtemp(join(tmpdir(), "cp-test-"));
  try {
    await writeFile(join(dir, "f.pdf"), bytes);
    const { stdout } = await promisify(execFile)("pdfinfo", [join(dir, "f.pdf")]);
    return Number(/^Pages:\s+(\d+)/m.exec(stdout)?.[1]);
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

async function bucketKeys(workspaceId: string): Promise<string[]> {
  const out = await s3().send(new ListObjectsV2Command({ Bucket: storageSettings().bucket, Prefix: `w/${workspaceId}/` }));
  return (out.Contents ?? []).map((o) => o.Key!).sort();
}

describe("attachments on comments", () => {
  it("a photo and a PDF on a checker's comment: listed with the comment, served to readers, thumbnails for both", async () => {
    const { sketchId, commentId } = await sketchWithComment();
    const photo = await attach(commentId, chen, await png(640, 480, "#8899aa"), "foot.png", "image/png");
    const sheet = await attach(commentId, chen, pdf(2), "pump datasheet.pdf", "application/pdf");
    expect([photo.status, sheet.status]).toEqual([201, 201]);
    expect(photo.body.upload).toMatchObject({ purpose: "attachment", name: "foot.png", storedType: "image/png", width: 640, height: 480 });
    // the PDF is kept whole (all its pages); its thumbnail is the first page
    expect(sheet.body.upload).toMatchObject({ purpose: "attachment", name: "pump datasheet.pdf", sourceType: "application/pdf", storedType: "application/pdf" });

    const list = await call(commentsRoute.GET, { params: { id: sketchId, number: "1" }, cookie: vera.cookie });
    const files = list.body.threads[0].comments[0].attachments as Json[];
    expect(files.map((f) => f.name)).toEqual(["foot.png", "pump datasheet.pdf"]);
    expect(files[1].thumbnailUrl).toBe(`/api/uploads/${sheet.body.upload.id}/thumbnail`);

    const full = await get(uploadRoute.GET as Handler, sheet.body.upload.id, vera);
    expect(full.status).toBe(200);
    expect(full.type).toBe("application/pdf");
    expect(full.bytes.length).toBe(sheet.body.upload.size);
    expect(await pdfPages(full.bytes)).toBe(2);
    // a PDF is handed over as a download, sandboxed, never sniffed into something else
    expect(full.headers.get("content-disposition")).toBe(`attachment; filename="pump datasheet.pdf"; filename*=UTF-8''pump%20datasheet.pdf`);
    expect(full.headers.get("content-security-policy")).toMatch(/^sandbox;/);
    expect(full.headers.get("x-content-type-options")).toBe("nosniff");
    // an image is still shown inline
    expect((await get(uploadRoute.GET as Handler, photo.body.upload.id, vera)).headers.get("content-disposition")).toMatch(/^inline;/);
    const thumb = await get(thumbnailRoute.GET as Handler, sheet.body.upload.id, vera);
    expect(thumb.type).toBe("image/png");
    expect((await sharp(thumb.bytes).metadata()).width).toBe(320);
    // someone outside the workspace gets 404 for both
    expect((await get(uploadRoute.GET as Handler, photo.body.upload.id, stranger)).status).toBe(404);
    expect((await get(thumbnailRoute.GET as Handler, sheet.body.upload.id, stranger)).status).toBe(404);
  });

  it("a PDF is stored without its author, title and XMP", async () => {
    const { commentId } = await sketchWithComment();
    const sent = pdf(2, { meta: true });
    const res = await attach(commentId, chen, sent, "sheet.pdf", "application/pdf");
    expect(res.status).toBe(201);
    const [row] = await db.select().from(upload).where(eq(upload.id, res.body.upload.id));
    const stored = await getObject(row.storageKey);
    for (const s of ["/Author", PDF_AUTHOR, PDF_XMP_CREATOR, "/Metadata", "Pump data sheet"]) expect(stored.includes(Buffer.from(s))).toBe(false);
    expect(await pdfPages(stored)).toBe(2);
    expect(row.size).toBe(stored.length);
  });

  it("a site photo loses its EXIF and GPS, is turned upright, and its thumbnail carries none either (read back from storage)", async () => {
    const { sketchId, commentId } = await sketchWithComment();
    const photo = await photoWithExif();
    expect((await sharp(photo).metadata()).exif).toBeDefined();
    const res = await attach(commentId, chen, photo, "foot on the slab.jpg", "image/jpeg");
    expect(res.status).toBe(201);
    expect(res.body.upload).toMatchObject({ storedType: "image/jpeg", width: 40, height: 80 });
    const [row] = await db.select().from(upload).where(eq(upload.id, res.body.upload.id));
    for (const key of [row.storageKey, row.thumbnailKey]) {
      const stored = await getObject(key);
      const meta = await sharp(stored).metadata();
      expect(meta.exif).toBeUndefined();
      expect(meta.orientation).toBeUndefined();
      expect(meta.height! > meta.width!).toBe(true);
      for (const s of ["SomeCamera", "Site photo 2031", "GPS"]) expect(stored.includes(Buffer.from(s))).toBe(false);
    }
    // what readers are served is what was stored; a viewer of another workspace learns nothing
    const full = await get(uploadRoute.GET as Handler, res.body.upload.id, vera);
    expect(full.bytes.equals(await getObject(row.storageKey))).toBe(true);
    const thumb = await get(thumbnailRoute.GET as Handler, res.body.upload.id, vera);
    expect([thumb.status, thumb.type]).toEqual([200, "image/png"]);
    expect((await get(uploadRoute.GET as Handler, res.body.upload.id, stranger)).status).toBe(404);
    expect((await get(thumbnailRoute.GET as Handler, res.body.upload.id, stranger)).status).toBe(404);
    const list = await call(commentsRoute.GET, { params: { id: sketchId, number: "1" }, cookie: vera.cookie });
    expect(list.body.threads[0].comments[0].attachments.map((f: Json) => f.name)).toEqual(["foot on the slab.jpg"]);
  });

  it("an oversized file on a comment: 413 naming the file field, and nothing is kept", async () => {
    const { commentId } = await sketchWithComment();
    const before = await bucketKeys(ws);
    const res = await attach(commentId, chen, Buffer.alloc(10 * 1048576 + 1024, 7), "scan.png", "image/png");
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/10 MB/);
    expect(res.body.error.fields.map((f: Json) => f.path)).toEqual(["file"]);
    expect(await db.select().from(upload).where(eq(upload.commentId, commentId))).toHaveLength(0);
    expect(await bucketKeys(ws)).toEqual(before);
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
    expect(text.body.error.message).toBe("This file is not a PNG, JPEG or WebP image or a PDF (whatever its name says).");
    // a PDF is kept whole, but one with no pages has nothing to show: refused like an underlay
    const empty = await attach(commentId, chen, pdf(0), "blank.pdf", "application/pdf");
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields).toEqual([{ path: "file", message: "The PDF has no pages." }]);
    const file = await png(10, 10);
    for (let i = 0; i < MAX_ATTACHMENTS; i++) expect((await attach(commentId, chen, file, `p${i}.png`, "image/png")).status).toBe(201);
    const before = await bucketKeys(ws);
    const over = await attach(commentId, chen, file, "one-more.png", "image/png");
    expect(over.status).toBe(409);
    expect(over.body.error.message).toBe(`A comment carries at most ${MAX_ATTACHMENTS} files.`);
    expect(await db.select().from(upload).where(eq(upload.commentId, commentId))).toHaveLength(MAX_ATTACHMENTS);
    // refused before anything was stored: the bucket holds what it held
    expect(await bucketKeys(ws)).toEqual(before);
    // the count is checked before the file is even read: not-an-image gets the same 409, not a 415
    expect((await attach(commentId, chen, textPretendingToBePng(), "photo.png", "image/png")).status).toBe(409);
    // two objects (the file and its thumbnail) for each row of the workspace, and no more
    expect(before).toHaveLength(2 * (await db.select().from(upload).where(eq(upload.workspaceId, ws))).length);
  });

  it("an approved version takes no new attachments and keeps the ones it has, until its approval is withdrawn", async () => {
    const { sketchId, commentId } = await sketchWithComment(olivia);
    const early = (await attach(commentId, olivia, await png(11, 11), "before.png", "image/png")).body.upload;
    const step = (who: Person, s: string) => call(signoffRoute.POST, { method: "POST", params: { id: sketchId, number: "1" }, cookie: who.cookie, body: { step: s, note: "The wrong pump curve was used." } });
    for (const [who, s] of [[eddie, "submit"], [chen, "check"], [olivia, "approve"]] as const) expect((await step(who, s)).status).toBe(200);
    const res = await attach(commentId, olivia, await png(10, 10), "late.png", "image/png");
    expect(res.status).toBe(409);
    expect(res.body.error.message).toBe("This version is approved: its comments take no new attachments.");
    // nor does its author take one off: the approved record stays as it was signed
    const off = await call(uploadRoute.DELETE, { method: "DELETE", params: { uploadId: early.id }, cookie: olivia.cookie });
    expect(off.status).toBe(409);
    expect(off.body.error.message).toBe("This version is approved: its comments take no new attachments.");
    expect((await get(uploadRoute.GET as Handler, early.id, vera)).status).toBe(200);
    // withdrawn, the comment is its author's again
    expect((await step(olivia, "withdraw")).status).toBe(200);
    expect((await attach(commentId, olivia, await png(10, 10), "late.png", "image/png")).status).toBe(201);
    expect((await call(uploadRoute.DELETE, { method: "DELETE", params: { uploadId: early.id }, cookie: olivia.cookie })).status).toBe(200);
  });

  it("a deleted comment takes no attachment: 410, nothing stored", async () => {
    const { commentId } = await sketchWithComment();
    expect((await call(commentRoute.DELETE, { method: "DELETE", params: { commentId }, cookie: chen.cookie })).status).toBe(200);
    const before = await bucketKeys(ws);
    const res = await attach(commentId, chen, await png(10, 10), "after.png", "image/png");
    expect(res.status).toBe(410);
    expect(res.body.error.message).toBe("This comment was deleted.");
    expect(await db.select().from(upload).where(eq(upload.commentId, commentId))).toHaveLength(0);
    expect(await bucketKeys(ws)).toEqual(before);
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
