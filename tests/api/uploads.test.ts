// Uploads through the API against the test database and the local S3 fake: an underlay for a
// sketch, files served only to readers of their workspace, every refusal a clear 4xx that leaves
// no row and no object behind, metadata stripped from what is stored, unsaved underlays swept.
import { ListObjectsV2Command } from "@aws-sdk/client-s3";
import { and, eq } from "drizzle-orm";
import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import * as sketchUploadsRoute from "@/app/api/sketches/[id]/uploads/route";
import * as uploadRoute from "@/app/api/uploads/[uploadId]/route";
import * as thumbnailRoute from "@/app/api/uploads/[uploadId]/thumbnail/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import * as activityRoute from "@/app/api/sketches/[id]/activity/route";
import { db } from "@/db";
import { auditEvent, upload } from "@/db/schema";
import { appOrigin, storageSettings } from "@/lib/env";
import { getObject, objectExists, s3 } from "@/lib/storage";
import { UPLOAD_LIMITS } from "@/lib/uploads/process";
import { sweepUnusedUnderlays } from "@/lib/uploads/sweep";
import { markedDrawing, pdf, photoWithExif, png, textPretendingToBePng } from "../fixtures/uploads";
import { call, makeAccount, makeWorkspace, type Json, type Person } from "./helpers";
import { fixture } from "./sketch-fixtures";

type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

let eddie: Person;
let vera: Person;
let chen: Person;
let stranger: Person;
let ws: string;
let otherWs: string;

beforeAll(async () => {
  [eddie, vera, chen, stranger] = await Promise.all(["eddie", "vera", "chen", "stranger"].map((t) => makeAccount(`up-${t}`)));
  ws = await makeWorkspace("Upload bay", [
    [eddie, "editor"],
    [vera, "viewer"],
    [chen, "checker"],
  ]);
  // the stranger is a viewer, but of another workspace
  otherWs = await makeWorkspace("Another bay", [
    [stranger, "viewer"],
    [eddie, "editor"],
  ]);
});

async function newSketch(workspace = ws): Promise<string> {
  const res = await call(sketchesRoute.POST, { method: "POST", params: { id: workspace }, cookie: eddie.cookie, body: { title: "Skid over a drawing", document: fixture("pump-skid-discharge") } });
  expect(res.status).toBe(201);
  return res.body.sketch.id;
}

/** POST a file to an upload route: as multipart form data (default) or as the raw body. */
export async function sendFile(
  handler: Handler,
  params: Record<string, string>,
  who: Person,
  file: Buffer,
  opts: { name?: string; type?: string; raw?: boolean; stream?: boolean; path?: string } = {},
): Promise<{ status: number; body: Json }> {
  const headers = new Headers({ cookie: who.cookie, origin: appOrigin() });
  let body: BodyInit;
  if (opts.raw) {
    headers.set("content-type", opts.type ?? "application/octet-stream");
    body = opts.stream
      ? new ReadableStream({
          start(c) {
            // in chunks and with no declared length: the cap must hold while reading
            for (let i = 0; i < file.length; i += 1 << 20) c.enqueue(new Uint8Array(file.subarray(i, i + (1 << 20))));
            c.close();
          },
        })
      : new Uint8Array(file);
  } else {
    const form = new FormData();
    form.set("file", new Blob([new Uint8Array(file)], { type: opts.type ?? "image/png" }), opts.name ?? "drawing.png");
    body = form;
  }
  const req = new Request(`${appOrigin()}${opts.path ?? "/api/upload-test"}`, { method: "POST", headers, body, ...(opts.stream ? { duplex: "half" } : {}) } as RequestInit);
  const res = await handler(req, { params: Promise.resolve(params) });
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : null };
}

const underlay = (sketchId: string, who: Person, file: Buffer, opts: Parameters<typeof sendFile>[4] = {}) =>
  sendFile(sketchUploadsRoute.POST as Handler, { id: sketchId }, who, file, opts);

async function fetchFile(handler: Handler, uploadId: string, who: Person, headers: Record<string, string> = {}) {
  const res = await handler(new Request(`${appOrigin()}/api/uploads/${uploadId}`, { headers: { cookie: who.cookie, ...headers } }), { params: Promise.resolve({ uploadId }) });
  return { status: res.status, headers: res.headers, bytes: Buffer.from(await res.arrayBuffer()) };
}

async function bucketKeys(workspaceId: string): Promise<string[]> {
  const out = await s3().send(new ListObjectsV2Command({ Bucket: storageSettings().bucket, Prefix: `w/${workspaceId}/` }));
  return (out.Contents ?? []).map((o) => o.Key!);
}

const rowsOf = (workspaceId: string) => db.select().from(upload).where(eq(upload.workspaceId, workspaceId));

describe("an underlay upload", () => {
  it("stores the file, answers its size, and serves it and its thumbnail to readers only", async () => {
    const sketchId = await newSketch();
    const file = await markedDrawing();
    const res = await underlay(sketchId, eddie, file, { name: "C:\\drawings\\GA skid rev B.png" });
    expect(res.status).toBe(201);
    const u = res.body.upload;
    expect(u).toMatchObject({ purpose: "underlay", name: "GA skid rev B.png", storedType: "image/png", sourceType: "image/png", width: 1000, height: 600, url: `/api/uploads/${u.id}`, thumbnailUrl: `/api/uploads/${u.id}/thumbnail` });
    expect(u.checksum).toMatch(/^[0-9a-f]{64}$/);
    expect(JSON.stringify(res.body)).not.toMatch(/w\//); // no storage key leaks

    const [row] = await db.select().from(upload).where(eq(upload.id, u.id));
    expect(row).toMatchObject({ workspaceId: ws, uploadedBy: eddie.id, sketchId, commentId: null, size: u.size, purpose: "underlay" });
    expect(row.storageKey).toMatch(new RegExp(`^w/${ws}/[0-9a-f-]{36}\\.png$`));
    expect(await objectExists(row.storageKey)).toBe(true);
    expect(await objectExists(row.thumbnailKey)).toBe(true);

    // a viewer of the workspace reads the file, exactly as stored
    const got = await fetchFile(uploadRoute.GET as Handler, u.id, vera);
    expect(got.status).toBe(200);
    expect(got.headers.get("content-type")).toBe("image/png");
    expect(got.headers.get("cache-control")).toBe("private, max-age=3600");
    expect(got.headers.get("x-content-type-options")).toBe("nosniff");
    expect(got.headers.get("content-disposition")).toContain('filename="GA skid rev B.png"');
    expect(got.bytes.equals(await getObject(row.storageKey))).toBe(true);
    expect((await sharp(got.bytes).metadata()).width).toBe(1000);
    // the browser's copy is good while the checksum holds
    expect((await fetchFile(uploadRoute.GET as Handler, u.id, vera, { "if-none-match": got.headers.get("etag")! })).status).toBe(304);

    const thumb = await fetchFile(thumbnailRoute.GET as Handler, u.id, vera);
    expect(thumb.status).toBe(200);
    expect(thumb.headers.get("content-type")).toBe("image/png");
    const tm = await sharp(thumb.bytes).metadata();
    expect([tm.width, tm.height]).toEqual([320, 192]);

    // a viewer of another workspace, and a signed-out caller, learn nothing
    for (const h of [uploadRoute.GET, thumbnailRoute.GET] as Handler[]) {
      const out = await fetchFile(h, u.id, stranger);
      expect(out.status).toBe(404);
      expect(JSON.parse(out.bytes.toString()).error.code).toBe("not_found");
      expect((await fetchFile(h, u.id, { ...stranger, cookie: "" })).status).toBe(401);
    }
    // a made-up id is the same 404
    expect((await fetchFile(uploadRoute.GET as Handler, "00000000-0000-4000-8000-000000000000", vera)).status).toBe(404);

    // the upload is in the audit log and the sketch's activity
    const audit = await db.select().from(auditEvent).where(and(eq(auditEvent.action, "upload.create"), eq(auditEvent.targetId, sketchId)));
    expect(audit).toHaveLength(1);
    expect(audit[0].detail).toMatchObject({ uploadId: u.id, name: "GA skid rev B.png", purpose: "underlay" });
    const feed = await call(activityRoute.GET, { params: { id: sketchId }, cookie: vera.cookie });
    expect(feed.body.events.map((e: Json) => e.action)).toContain("upload.create");
  });

  it("takes the raw bytes too, with the name from ?name=", async () => {
    const sketchId = await newSketch();
    const res = await underlay(sketchId, eddie, await png(40, 30), { raw: true, type: "image/png", path: "/api/x?name=plan%20view.png" });
    expect(res.status).toBe(201);
    expect(res.body.upload).toMatchObject({ name: "plan view.png", width: 40, height: 30 });
  });

  it("renders a PDF's first page and stores it as a PNG", async () => {
    const sketchId = await newSketch();
    const res = await underlay(sketchId, eddie, pdf(3), { name: "vendor sheet.pdf", type: "application/pdf" });
    expect(res.status).toBe(201);
    expect(res.body.upload).toMatchObject({ sourceType: "application/pdf", storedType: "image/png", width: 417, height: 313 });
    const got = await fetchFile(uploadRoute.GET as Handler, res.body.upload.id, vera);
    expect(got.headers.get("content-type")).toBe("image/png");
    expect(got.headers.get("content-disposition")).toContain('filename="vendor sheet.png"');
  });

  // a JPEG named as one; a WebP whose name and header say PNG (the bytes decide)
  for (const [format, ext, name, type] of [["jpeg", "jpg", "skid.jpg", "image/jpeg"], ["webp", "webp", "skid.png", "image/png"]] as const) {
    it(`strips EXIF and GPS and turns the photo upright, kept as ${format} (read back from storage)`, async () => {
      const sketchId = await newSketch();
      const photo = await photoWithExif(format);
      const sent = await sharp(photo).metadata();
      expect([sent.format, sent.orientation, sent.exif === undefined]).toEqual([format, 6, false]);
      const res = await underlay(sketchId, eddie, photo, { name, type });
      expect(res.status).toBe(201);
      // orientation 6 turned the 80 × 40 photo a quarter turn
      expect(res.body.upload).toMatchObject({ sourceType: `image/${format}`, storedType: `image/${format}`, width: 40, height: 80 });
      const [row] = await db.select().from(upload).where(eq(upload.id, res.body.upload.id));
      expect(row.storageKey.endsWith(`.${ext}`)).toBe(true);
      const stored = await getObject(row.storageKey);
      const meta = await sharp(stored).metadata();
      expect([meta.format, meta.exif, meta.orientation, meta.width, meta.height]).toEqual([format, undefined, undefined, 40, 80]);
      for (const s of ["SomeCamera", "Site photo 2031", "GPS"]) expect(stored.includes(Buffer.from(s))).toBe(false);
      const got = await fetchFile(uploadRoute.GET as Handler, res.body.upload.id, vera);
      expect(got.headers.get("content-type")).toBe(`image/${format}`);
      expect(got.bytes.equals(stored)).toBe(true);
    });
  }

  it("is for editors and owners: a checker and a viewer get 403, an outsider 404", async () => {
    const sketchId = await newSketch();
    const file = await png(20, 20);
    expect((await underlay(sketchId, chen, file)).status).toBe(403);
    expect((await underlay(sketchId, vera, file)).status).toBe(403);
    expect((await underlay(sketchId, stranger, file)).status).toBe(404);
  });
});

describe("refusals leave nothing behind", () => {
  const cases: Array<[string, () => Promise<Buffer>, Parameters<typeof sendFile>[4], number, string, RegExp]> = [
    ["an oversized file (declared length)", async () => Buffer.alloc(UPLOAD_LIMITS.maxBytes + 1024, 7), { raw: true }, 413, "payload_too_large", /larger than the 10 MB/],
    ["an oversized file (streamed, no length)", async () => Buffer.alloc(UPLOAD_LIMITS.maxBytes + 1024, 7), { raw: true, stream: true }, 413, "payload_too_large", /larger than the 10 MB/],
    ["an oversized file in a form", async () => Buffer.alloc(UPLOAD_LIMITS.maxBytes + 1024, 7), {}, 413, "payload_too_large", /larger than the 10 MB/],
    ["a .png that is really text", async () => textPretendingToBePng(), { name: "drawing.png", type: "image/png" }, 415, "unsupported_media_type", /not a PNG, JPEG or WebP image or a PDF \(whatever its name says\)/],
    ["a PDF with no pages", async () => pdf(0), { name: "empty.pdf", type: "application/pdf" }, 400, "validation_failed", /^The PDF has no pages\.$/],
    ["an image too large in pixels", () => png(12001, 8), { name: "strip.png" }, 400, "validation_failed", /12001 × 8 pixels; the limit is 12000 pixels a side/],
    ["an empty file", async () => Buffer.alloc(0), { raw: true }, 400, "validation_failed", /empty/],
    // a few hundred bytes whose page poppler would draw as 30000 px square (or, failing, as one blank pixel)
    ["a tiny PDF with a 5 m page", async () => pdf(1, { page: "/MediaBox [0 0 14400 14400]" }), { name: "huge.pdf", type: "application/pdf" }, 400, "validation_failed", /^The PDF's first page is 5080 × 5080 mm, too large to draw/],
  ];
  for (const [what, make, opts, status, code, message] of cases) {
    it(`${what}: ${status} ${code}`, async () => {
      const bay = await makeWorkspace(`Refusal bay ${what}`, [[eddie, "editor"]]);
      const sketchId = await newSketch(bay);
      const file = await make();
      const t0 = Date.now();
      const res = await underlay(sketchId, eddie, file, opts);
      // each refusal comes before any costly work (a drawn page, a stored object)
      expect(Date.now() - t0).toBeLessThan(3000);
      expect(res.status).toBe(status);
      expect(res.body.error.code).toBe(code);
      expect(res.body.error.message).toMatch(message);
      expect(await rowsOf(bay)).toHaveLength(0);
      expect(await bucketKeys(bay)).toEqual([]);
    });
  }

  it("a form without a file field: 400 naming the field", async () => {
    const sketchId = await newSketch();
    const form = new FormData();
    form.set("picture", "nothing");
    const req = new Request(`${appOrigin()}/x`, { method: "POST", headers: { cookie: eddie.cookie, origin: appOrigin() }, body: form });
    const res = await (sketchUploadsRoute.POST as Handler)(req, { params: Promise.resolve({ id: sketchId }) });
    expect(res.status).toBe(400);
    expect((await res.json()).error.fields).toEqual([{ path: "file", message: "Missing." }]);
  });
});

describe("the underlay and the sketch's versions", () => {
  async function savedWithUnderlay() {
    const sketchId = await newSketch();
    const up = (await underlay(sketchId, eddie, await markedDrawing())).body.upload;
    const document = { ...fixture("pump-skid-discharge"), version: 3, underlay: { upload: up.id, width: up.width, height: up.height, origin: [-1, 2], metresPerPixel: 0.005, rotation: 0, opacity: 0.5, calibration: { a: [300, 520], b: [700, 520], distance: "2.0 m" } } };
    const saved = await call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie: eddie.cookie, body: { baseVersion: 1, message: "traced over the GA drawing", document } });
    return { sketchId, up, saved, document };
  }

  it("a saved version keeps the underlay and its scale; the file it draws cannot be deleted", async () => {
    const { sketchId, up, saved } = await savedWithUnderlay();
    expect(saved.status).toBe(201);
    const v2 = await call((await import("@/app/api/sketches/[id]/versions/[number]/route")).GET, { params: { id: sketchId, number: "2" }, cookie: vera.cookie });
    expect(v2.body.version.document.underlay).toEqual({ upload: up.id, width: 1000, height: 600, origin: [-1, 2], metresPerPixel: 0.005, rotation: 0, opacity: 0.5, calibration: { a: [300, 520], b: [700, 520], distance: "2.0 m" } });
    const del = await call(uploadRoute.DELETE, { method: "DELETE", params: { uploadId: up.id }, cookie: eddie.cookie });
    expect(del.status).toBe(409);
    expect(del.body.error.message).toMatch(/saved versions never change/);
  });

  it("hidden and locked are saved with the version; a later save that leaves the underlay alone keeps it, one that takes it off leaves the earlier versions theirs", async () => {
    const sketchId = await newSketch();
    const up = (await underlay(sketchId, eddie, await markedDrawing())).body.upload;
    const placed = { upload: up.id, width: 1000, height: 600, origin: [-1, 2], metresPerPixel: 0.005, rotation: 12.5, opacity: 0.35, hidden: true, locked: true, calibration: { a: [300, 520], b: [700, 520], distance: "2.0 m" } };
    const versionRoute = await import("@/app/api/sketches/[id]/versions/[number]/route");
    const save = (base: number, document: Json) => call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie: eddie.cookie, body: { baseVersion: base, message: `on v${base}`, document } });
    const read = async (n: number) => (await call(versionRoute.GET, { params: { id: sketchId, number: String(n) }, cookie: vera.cookie })).body.version.document;
    const v2doc = { ...fixture("pump-skid-discharge"), underlay: placed };
    expect((await save(1, v2doc)).status).toBe(201);
    expect((await read(2)).underlay).toEqual(placed);
    // the next save changes the drawing only: the underlay, its scale and its state come along
    const v3doc = { ...(await read(2)), description: "traced, then the discharge moved" };
    expect((await save(2, v3doc)).status).toBe(201);
    expect((await read(3)).underlay).toEqual(placed);
    // v4 takes the underlay off; v2 and v3 still draw it, so its file stays
    const { underlay: _gone, ...v4doc } = await read(3);
    expect((await save(3, v4doc)).status).toBe(201);
    expect((await read(4)).underlay).toBeUndefined();
    expect((await read(2)).underlay).toEqual(placed);
    expect((await call(uploadRoute.DELETE, { method: "DELETE", params: { uploadId: up.id }, cookie: eddie.cookie })).status).toBe(409);
    expect((await fetchFile(uploadRoute.GET as Handler, up.id, vera)).status).toBe(200);
  });

  it("an underlay not yet saved in a version can be deleted by an editor, objects and all", async () => {
    const sketchId = await newSketch();
    const up = (await underlay(sketchId, eddie, await png(30, 30))).body.upload;
    const [row] = await db.select().from(upload).where(eq(upload.id, up.id));
    expect((await call(uploadRoute.DELETE, { method: "DELETE", params: { uploadId: up.id }, cookie: vera.cookie })).status).toBe(403);
    expect((await call(uploadRoute.DELETE, { method: "DELETE", params: { uploadId: up.id }, cookie: stranger.cookie })).status).toBe(404);
    expect((await call(uploadRoute.DELETE, { method: "DELETE", params: { uploadId: up.id }, cookie: eddie.cookie })).status).toBe(200);
    expect(await db.select().from(upload).where(eq(upload.id, up.id))).toHaveLength(0);
    expect(await objectExists(row.storageKey)).toBe(false);
    expect(await objectExists(row.thumbnailKey)).toBe(false);
  });

  it("a version may only draw an underlay of its own workspace", async () => {
    const elsewhere = await newSketch(otherWs);
    const foreign = (await underlay(elsewhere, eddie, await png(30, 30))).body.upload;
    const sketchId = await newSketch();
    const document = { ...fixture("pump-skid-discharge"), version: 3, underlay: { upload: foreign.id, width: 30, height: 30, origin: [0, 0], metresPerPixel: 0.01 } };
    const res = await call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie: eddie.cookie, body: { baseVersion: 1, document } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual([{ path: "document.underlay.upload", message: "No underlay with this id in this workspace." }]);
  });

  it("a fork into another workspace takes its own copy of the file", async () => {
    const { sketchId, up } = await savedWithUnderlay();
    const fork = await call((await import("@/app/api/sketches/[id]/fork/route")).POST, { method: "POST", params: { id: sketchId }, cookie: eddie.cookie, body: { workspaceId: otherWs, version: 2 } });
    expect(fork.status).toBe(201);
    const forkId = fork.body.sketch.id;
    const v1 = await call((await import("@/app/api/sketches/[id]/versions/[number]/route")).GET, { params: { id: forkId, number: "1" }, cookie: stranger.cookie });
    const copyId = v1.body.version.document.underlay.upload;
    expect(copyId).not.toBe(up.id);
    expect(v1.body.version.document.underlay.metresPerPixel).toBe(0.005);
    const [copy] = await db.select().from(upload).where(eq(upload.id, copyId));
    expect(copy).toMatchObject({ workspaceId: otherWs, sketchId: forkId, checksum: up.checksum, width: 1000, height: 600 });
    // the other workspace's viewer reads the copy, never the original
    expect((await fetchFile(uploadRoute.GET as Handler, copyId, stranger)).status).toBe(200);
    expect((await fetchFile(uploadRoute.GET as Handler, up.id, stranger)).status).toBe(404);
  });

  it("deleting a sketch keeps the underlay a fork in the same workspace still draws", async () => {
    const orla = await makeAccount("up-orla");
    const bay = await makeWorkspace("Fork bay", [
      [eddie, "editor"],
      [orla, "owner"],
    ]);
    const origin = await newSketch(bay);
    const up = (await underlay(origin, eddie, await png(40, 40))).body.upload;
    const document = { ...fixture("pump-skid-discharge"), version: 3, underlay: { upload: up.id, width: 40, height: 40, origin: [0, 0], metresPerPixel: 0.01 } };
    expect((await call(versionsRoute.POST, { method: "POST", params: { id: origin }, cookie: eddie.cookie, body: { baseVersion: 1, document } })).status).toBe(201);
    const fork = await call((await import("@/app/api/sketches/[id]/fork/route")).POST, { method: "POST", params: { id: origin }, cookie: eddie.cookie, body: { workspaceId: bay, version: 2 } });
    expect(fork.status).toBe(201);
    const forkId = fork.body.sketch.id;
    // same workspace: the fork draws the same file
    const v1 = await call((await import("@/app/api/sketches/[id]/versions/[number]/route")).GET, { params: { id: forkId, number: "1" }, cookie: eddie.cookie });
    expect(v1.body.version.document.underlay.upload).toBe(up.id);
    const [row] = await db.select().from(upload).where(eq(upload.id, up.id));

    const del = await call((await import("@/app/api/sketches/[id]/route")).DELETE, { method: "DELETE", params: { id: origin }, cookie: orla.cookie });
    expect(del.status).toBe(200);
    // the file now belongs to the fork, and it is still served and in the bucket
    const [after] = await db.select().from(upload).where(eq(upload.id, up.id));
    expect(after.sketchId).toBe(forkId);
    expect((await fetchFile(uploadRoute.GET as Handler, up.id, eddie)).status).toBe(200);
    expect(await objectExists(row.storageKey)).toBe(true);
    // and the fork can be saved again over it
    expect((await call(versionsRoute.POST, { method: "POST", params: { id: forkId }, cookie: eddie.cookie, body: { baseVersion: 1, document } })).status).toBe(201);
  });

  it("underlays never saved in a version are swept once old; saved ones and recent ones stay", async () => {
    const bay = await makeWorkspace("Sweep bay", [[eddie, "editor"]]);
    const sketchId = await newSketch(bay);
    const removed = (await underlay(sketchId, eddie, await png(30, 30))).body.upload;
    const kept = (await underlay(sketchId, eddie, await png(32, 32))).body.upload;
    const recent = (await underlay(sketchId, eddie, await png(34, 34))).body.upload;
    const document = { ...fixture("pump-skid-discharge"), version: 3, underlay: { upload: kept.id, width: 32, height: 32, origin: [0, 0], metresPerPixel: 0.01 } };
    expect((await call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie: eddie.cookie, body: { baseVersion: 1, document } })).status).toBe(201);
    // the first two were uploaded eight days ago (past the seven days an unsaved underlay is kept)
    const eightDaysAgo = new Date(Date.now() - 8 * 24 * 3600_000);
    for (const id of [removed.id, kept.id]) await db.update(upload).set({ createdAt: eightDaysAgo }).where(eq(upload.id, id));
    const [removedRow] = await db.select().from(upload).where(eq(upload.id, removed.id));
    expect(await bucketKeys(bay)).toHaveLength(6);

    // the next upload to the workspace sweeps
    const next = (await underlay(sketchId, eddie, await png(36, 36))).body.upload;
    expect((await rowsOf(bay)).map((r) => r.id).sort()).toEqual([kept.id, recent.id, next.id].sort());
    const keys = await bucketKeys(bay);
    expect(keys).toHaveLength(6);
    expect(keys).not.toContain(removedRow.storageKey);
    expect(keys).not.toContain(removedRow.thumbnailKey);
    expect((await fetchFile(uploadRoute.GET as Handler, removed.id, eddie)).status).toBe(404);
    // the version still draws its file
    expect((await fetchFile(uploadRoute.GET as Handler, kept.id, eddie)).status).toBe(200);
    // a sweep run by hand finds nothing more to take
    expect(await sweepUnusedUnderlays({ workspaceId: bay })).toEqual([]);
  });

  it("deleting the sketch deletes its files from the bucket", async () => {
    const bay = await makeWorkspace("Delete bay", [[eddie, "owner"]]);
    const sketchId = await newSketch(bay);
    await underlay(sketchId, eddie, await png(30, 30));
    expect(await bucketKeys(bay)).toHaveLength(2);
    const del = await call((await import("@/app/api/sketches/[id]/route")).DELETE, { method: "DELETE", params: { id: sketchId }, cookie: eddie.cookie });
    expect(del.status).toBe(200);
    expect(await rowsOf(bay)).toHaveLength(0);
    expect(await bucketKeys(bay)).toEqual([]);
  });
});
