// A link to a deleted sketch: a member of the workspace it was in is told who deleted it and when
// (still a 404, with `error.deleted`); anyone else gets the same words as for a sketch that never was.
import { beforeAll, describe, expect, it } from "vitest";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as versionRoute from "@/app/api/sketches/[id]/versions/[number]/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import { call, makeAccount, makeTeam, type Person } from "./helpers";
import { postSketch } from "./sketch-setup";

let olivia: Person;
let vera: Person;
let outsider: Person;
let ws: string;
let id: string;
let deletedAt: number;

beforeAll(async () => {
  ({ ws, olivia, vera } = await makeTeam("Deletions", { olivia: { role: "owner", name: "Olivia Deleter" }, vera: "viewer" }));
  outsider = await makeAccount("outsider");
  id = await postSketch(ws, olivia, "Riser bend", "pipe-bend-anchor");
  const before = Date.now();
  expect((await call(sketchRoute.DELETE, { method: "DELETE", params: { id }, cookie: olivia.cookie })).status).toBe(200);
  deletedAt = before;
});

describe("a deleted sketch", () => {
  it("tells a member of its workspace who deleted it and when, on every address under it", async () => {
    for (const out of [
      await call(sketchRoute.GET, { params: { id }, cookie: vera.cookie }),
      await call(versionsRoute.GET, { params: { id }, cookie: vera.cookie }),
      await call(versionRoute.GET, { params: { id, number: "1" }, cookie: vera.cookie }),
    ]) {
      expect(out.status).toBe(404);
      expect(out.body.error.code).toBe("not_found");
      expect(out.body.error.message).toMatch(/^“Riser bend” was deleted by Olivia Deleter on \d{1,2} \w{3} \d{4}, \d\d:\d\d UTC, with all its versions\. Forks of it keep their own copies\.$/);
      expect(out.body.error.deleted).toMatchObject({ title: "Riser bend", deletedBy: "Olivia Deleter" });
      expect(Date.parse(out.body.error.deleted.deletedAt)).toBeGreaterThanOrEqual(deletedAt - 1000);
    }
  });

  it("tells someone outside the workspace nothing: the words of a sketch that never was", async () => {
    const gone = await call(sketchRoute.GET, { params: { id }, cookie: outsider.cookie });
    const never = await call(sketchRoute.GET, { params: { id: "6d656d6f-0000-4000-8000-00000000ffff" }, cookie: outsider.cookie });
    expect(gone.status).toBe(404);
    expect(gone.body).toEqual(never.body);
    expect(JSON.stringify(gone.body)).not.toContain("Riser bend");
  });
});
