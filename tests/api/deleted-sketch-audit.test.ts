// The owners' audit log after a sketch is deleted: its earlier entries (created, saved, renamed) are
// marked `targetDeleted`, so the log offers no link to a 404; a sketch still there keeps its links.
import { describe, expect, it } from "vitest";
import * as auditRoute from "@/app/api/workspaces/[id]/audit/route";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import { call, makeAccount, makeWorkspace } from "./helpers";
import { edited } from "./sketch-fixtures";
import { postSketch } from "./sketch-setup";

type Entry = { action: string; targetId: string | null; targetDeleted: boolean };

describe("the audit log's entries about a deleted sketch", () => {
  it("are marked as such in one listing; a kept sketch's and other entries are not", async () => {
    const olivia = await makeAccount("olivia", { name: "Olivia Auditor" });
    const ws = await makeWorkspace("Audit after deletion", [[olivia, "owner"]]);
    const gone = await postSketch(ws, olivia, "Riser bend", "pipe-bend-anchor");
    const kept = await postSketch(ws, olivia, "Pump skid", "pipe-bend-anchor");
    for (const id of [gone, kept]) {
      const saved = await call(versionsRoute.POST, {
        method: "POST",
        params: { id },
        cookie: olivia.cookie,
        body: { baseVersion: 1, message: "moved the anchor", document: edited("pipe-bend-anchor", (d) => (d.description = "moved")) },
      });
      expect(saved.status).toBe(201);
    }
    expect((await call(sketchRoute.DELETE, { method: "DELETE", params: { id: gone }, cookie: olivia.cookie })).status).toBe(200);

    const log = await call(auditRoute.GET, { params: { id: ws }, cookie: olivia.cookie });
    expect(log.status).toBe(200);
    const events = log.body.events as Entry[];
    const about = (id: string) => events.filter((e) => e.targetId === id).map((e) => [e.action, e.targetDeleted]);
    expect(about(gone)).toEqual([
      ["sketch.delete", true],
      ["sketch.save", true],
      ["sketch.create", true],
    ]);
    expect(about(kept)).toEqual([
      ["sketch.save", false],
      ["sketch.create", false],
    ]);
    // entries about no sketch (the workspace's own, sign-ins) are never marked
    expect(events.filter((e) => e.targetId !== gone && e.targetId !== kept).every((e) => e.targetDeleted === false)).toBe(true);
  });
});
