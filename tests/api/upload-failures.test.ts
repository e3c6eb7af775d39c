// An upload that fails after its first object was stored leaves nothing behind: neither a row in
// the table nor an object in the bucket. Two ways to fail late: the store refuses the second
// object (the thumbnail), and the uploader loses their role while the file was being read.
import { ListObjectsV2Command, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { and, count, eq } from "drizzle-orm";
import sharp from "sharp";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { auditEvent, membership, upload } from "@/db/schema";
import { storageSettings } from "@/lib/env";
import { addComment } from "@/lib/review/comments";
import { createSketch } from "@/lib/sketches";
import { s3 } from "@/lib/storage";
import { attachToComment, createUnderlay } from "@/lib/uploads/service";
import { makeAccount, makeWorkspace, type Person } from "./helpers";
import { parsedFixture } from "./sketch-fixtures";

const globalForS3 = globalThis as unknown as { counterpoiseS3?: S3Client };

let eddie: Person;
let ws: string;
let sketchId: string;
let working: S3Client;

beforeEach(async () => {
  eddie = await makeAccount("upfail-eddie");
  ws = await makeWorkspace("Failing uploads", [[eddie, "editor"]]);
  sketchId = (await createSketch(ws, eddie, { title: "Skid", document: parsedFixture("pump-skid-discharge"), message: "v1" })).sketch.id;
  working = s3();
});

afterEach(() => {
  globalForS3.counterpoiseS3 = working;
  vi.restoreAllMocks();
});

const png = () => sharp({ create: { width: 40, height: 30, channels: 3, background: "#ffffff" } }).png().toBuffer();

async function leftBehind() {
  const rows = Number((await db.select({ n: count() }).from(upload).where(eq(upload.workspaceId, ws)))[0].n);
  const audit = Number((await db.select({ n: count() }).from(auditEvent).where(and(eq(auditEvent.workspaceId, ws), eq(auditEvent.action, "upload.create"))))[0].n);
  const listed = await working.send(new ListObjectsV2Command({ Bucket: storageSettings().bucket, Prefix: `w/${ws}/` }));
  return { rows, audit, objects: listed.KeyCount ?? 0 };
}

/** The real store, except that the `n`th PutObject (counting from 1) fails as a dropped connection would. */
function failingNthPut(n: number): { puts: () => number } {
  let puts = 0;
  const failing = Object.create(working) as S3Client;
  failing.send = (async (command: unknown) => {
    if (command instanceof PutObjectCommand && ++puts === n) throw Object.assign(new Error("socket hang up"), { code: "ECONNRESET" });
    return working.send(command as PutObjectCommand);
  }) as S3Client["send"];
  globalForS3.counterpoiseS3 = failing;
  return { puts: () => puts };
}

describe("an upload that fails late leaves nothing behind", () => {
  it("the store refuses the thumbnail after the file was stored: unavailable (503), no row, no object", async () => {
    const before = await leftBehind();
    vi.spyOn(console, "error").mockImplementation(() => undefined);
    const store = failingNthPut(2);
    const err = await createUnderlay(sketchId, eddie, async () => ({ bytes: await png(), name: "ga.png" })).catch((e: unknown) => e);
    expect(store.puts()).toBe(2);
    expect(err).toMatchObject({ code: "unavailable", message: "The file store is not answering; nothing was kept. Try again shortly." });
    expect(await leftBehind()).toEqual(before);
  });

  it("the same for an attachment on a comment", async () => {
    const commentId = (await addComment(sketchId, 1, eddie, { body: "See the photo" })).id;
    const before = await leftBehind();
    vi.spyOn(console, "error").mockImplementation(() => undefined);
    failingNthPut(2);
    await expect(attachToComment(commentId, eddie, async () => ({ bytes: await png(), name: "foot.png" }))).rejects.toMatchObject({ code: "unavailable" });
    expect(await leftBehind()).toEqual(before);
  });

  it("the uploader is demoted while the file is read: 403, and the objects already stored are deleted", async () => {
    const before = await leftBehind();
    let stored = 0;
    const counting = Object.create(working) as S3Client;
    counting.send = (async (command: unknown) => {
      if (command instanceof PutObjectCommand) stored++;
      return working.send(command as PutObjectCommand);
    }) as S3Client["send"];
    globalForS3.counterpoiseS3 = counting;
    const read = async () => {
      // an owner demotes the uploader while the bytes are still coming in
      await db.update(membership).set({ role: "viewer" }).where(eq(membership.userId, eddie.id));
      return { bytes: await png(), name: "ga.png" };
    };
    await expect(createUnderlay(sketchId, eddie, read)).rejects.toMatchObject({ code: "forbidden" });
    // both objects were stored before the transaction looked again, and both went
    expect(stored).toBe(2);
    expect(await leftBehind()).toEqual(before);
  });
});
