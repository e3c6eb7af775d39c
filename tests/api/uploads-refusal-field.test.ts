// Every refusal of an uploaded file names the field it is about, `file`, beside its message, as the
// API's other refusals name theirs: too large, not an image or a PDF, a PDF with no pages, too many
// pixels, empty. Nothing is kept.
import { beforeAll, describe, expect, it } from "vitest";
import * as sketchUploadsRoute from "@/app/api/sketches/[id]/uploads/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { appOrigin } from "@/lib/env";
import { UPLOAD_LIMITS } from "@/lib/uploads/process";
import { pdf, png, textPretendingToBePng } from "../fixtures/uploads";
import { call, makeAccount, makeWorkspace, type Person } from "./helpers";
import { fixture } from "./sketch-fixtures";

type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

let eddie: Person;
let sketchId: string;

beforeAll(async () => {
  eddie = await makeAccount("upfield-eddie");
  const ws = await makeWorkspace("Refused files", [[eddie, "editor"]]);
  sketchId = (await call(sketchesRoute.POST, { method: "POST", params: { id: ws }, cookie: eddie.cookie, body: { title: "Skid", document: fixture("pump-skid-discharge") } })).body.sketch.id;
});

async function send(file: Buffer, name: string, type: string) {
  const body = new FormData();
  body.set("file", new Blob([new Uint8Array(file)], { type }), name);
  const req = new Request(`${appOrigin()}/api/sketches/${sketchId}/uploads`, { method: "POST", headers: { cookie: eddie.cookie, origin: appOrigin() }, body });
  const res = await (sketchUploadsRoute.POST as Handler)(req, { params: Promise.resolve({ id: sketchId }) });
  return { status: res.status, error: (await res.json()).error as { code: string; message: string; fields?: Array<{ path: string; message: string }> } };
}

describe("a refused file names its field", () => {
  const cases: Array<[string, () => Promise<Buffer> | Buffer, string, string, number]> = [
    ["a .png that is really text", textPretendingToBePng, "drawing.png", "image/png", 415],
    ["a PDF with no pages", () => pdf(0), "empty.pdf", "application/pdf", 400],
    ["an image too large in pixels", () => png(12001, 8), "strip.png", "image/png", 400],
    ["an empty file", () => Buffer.alloc(0), "nothing.png", "image/png", 400],
    ["a file over 10 MB", () => Buffer.alloc(UPLOAD_LIMITS.maxBytes + 1024, 7), "scan.png", "image/png", 413],
  ];
  for (const [what, make, name, type, status] of cases) {
    it(`${what}: ${status}, error.fields names "file" with the message`, async () => {
      const { status: got, error } = await send(await make(), name, type);
      expect(got).toBe(status);
      expect(error.fields).toEqual([{ path: "file", message: error.message }]);
    });
  }
});
