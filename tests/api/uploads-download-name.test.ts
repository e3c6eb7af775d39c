// What a reader saves: the served file's name ends in the extension of what is stored. A JPEG
// sent as "….png" and a file sent as raw bytes without a name used to be saved under a name whose
// extension lied about the contents, or under no name at all.
import { beforeAll, describe, expect, it } from "vitest";
import * as sketchUploadsRoute from "@/app/api/sketches/[id]/uploads/route";
import * as uploadRoute from "@/app/api/uploads/[uploadId]/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { appOrigin } from "@/lib/env";
import { photoWithExif, png } from "../fixtures/uploads";
import { call, makeAccount, makeWorkspace, type Person } from "./helpers";
import { fixture } from "./sketch-fixtures";

type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

let eddie: Person;
let sketchId: string;

beforeAll(async () => {
  eddie = await makeAccount("upname-eddie");
  const ws = await makeWorkspace("Download names", [[eddie, "editor"]]);
  const res = await call(sketchesRoute.POST, { method: "POST", params: { id: ws }, cookie: eddie.cookie, body: { title: "Skid", document: fixture("pump-skid-discharge") } });
  sketchId = res.body.sketch.id;
});

/** POST a file as a browser form would, or as raw bytes with no name. */
async function send(file: Buffer, opts: { name?: string; type: string; raw?: boolean }) {
  const headers = new Headers({ cookie: eddie.cookie, origin: appOrigin() });
  let body: BodyInit;
  if (opts.raw) {
    headers.set("content-type", opts.type);
    body = new Uint8Array(file);
  } else {
    body = new FormData();
    body.set("file", new Blob([new Uint8Array(file)], { type: opts.type }), opts.name);
  }
  const res = await (sketchUploadsRoute.POST as Handler)(new Request(`${appOrigin()}/api/sketches/${sketchId}/uploads`, { method: "POST", headers, body }), { params: Promise.resolve({ id: sketchId }) });
  return { status: res.status, body: await res.json() };
}

async function disposition(uploadId: string): Promise<{ type: string | null; disposition: string | null }> {
  const res = await (uploadRoute.GET as Handler)(new Request(`${appOrigin()}/api/uploads/${uploadId}`, { headers: { cookie: eddie.cookie } }), { params: Promise.resolve({ uploadId }) });
  expect(res.status).toBe(200);
  await res.arrayBuffer();
  return { type: res.headers.get("content-type"), disposition: res.headers.get("content-disposition") };
}

describe("the name a served upload is saved under", () => {
  it("a JPEG sent as .png is served as a JPEG named .jpg", async () => {
    const up = await send(await photoWithExif(), { name: "site photo.png", type: "image/png" });
    expect(up.status).toBe(201);
    expect(up.body.upload.name).toBe("site photo.png");
    const got = await disposition(up.body.upload.id);
    expect(got.type).toBe("image/jpeg");
    expect(got.disposition).toBe(`inline; filename="site photo.jpg"; filename*=UTF-8''site%20photo.jpg`);
  });

  it("raw bytes sent without a name are served as file.png, not under no name", async () => {
    const up = await send(await png(40, 30), { raw: true, type: "image/png" });
    expect(up.status).toBe(201);
    expect(up.body.upload.name).toBe("");
    expect((await disposition(up.body.upload.id)).disposition).toBe(`inline; filename="file.png"; filename*=UTF-8''file.png`);
  });
});
