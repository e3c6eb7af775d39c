// The calc sheet route: a PDF of a saved version for its readers, in SI or US units; 404 across
// workspaces; a clear 400 for a bad units value.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET } from "@/app/api/sketches/[id]/versions/[number]/calc-sheet/route";
import { createSketch } from "@/lib/sketches";
import { parseSketch } from "@/solver";
import { call, ensureMailFake, makeAccount, makeWorkspace, type Person } from "./helpers";
import { fixture as sketchFile } from "./sketch-fixtures";

describe("GET /api/sketches/[id]/versions/[number]/calc-sheet", () => {
  let owner: Person;
  let outsider: Person;
  let sketchId: string;
  let stopMail: () => Promise<void>;
  beforeAll(async () => {
    stopMail = await ensureMailFake();
    owner = await makeAccount("calc-owner");
    outsider = await makeAccount("calc-outsider");
    const ws = await makeWorkspace("Calc sheet works", [[owner, "owner"]]);
    const parsed = parseSketch(sketchFile("pipe-bend-anchor"));
    if (!parsed.ok) throw new Error("fixture does not parse");
    const made = await createSketch(ws, owner, { title: "Bend on an anchor", document: parsed, message: "first" });
    sketchId = made.sketch.id;
  }, 60000);
  afterAll(async () => stopMail?.());

  it("answers a PDF attachment named after the sketch, version and units", async () => {
    const { status, res } = await call(GET as never, { params: { id: sketchId, number: "1" }, cookie: owner.cookie, path: `/api/sketches/${sketchId}/versions/1/calc-sheet?units=US` });
    expect(status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toBe('attachment; filename="Bend-on-an-anchor-v1-calc-sheet-US.pdf"');
  }, 60000);

  it("is not found for someone outside the workspace, and for a missing version", async () => {
    expect((await call(GET as never, { params: { id: sketchId, number: "1" }, cookie: outsider.cookie })).status).toBe(404);
    const missing = await call(GET as never, { params: { id: sketchId, number: "9" }, cookie: owner.cookie });
    expect(missing.status).toBe(404);
    expect((missing.body as { error: { message: string } }).error.message).toBe("This sketch has no version 9.");
  });

  it("refuses units other than SI and US, naming the field", async () => {
    const r = await call(GET as never, { params: { id: sketchId, number: "1" }, cookie: owner.cookie, path: `/api/sketches/${sketchId}/versions/1/calc-sheet?units=cgs` });
    expect(r.status).toBe(400);
    expect(JSON.stringify(r.body)).toMatch(/units must be SI or US/);
  });
});
