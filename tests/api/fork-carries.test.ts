// What a fork carries: the drawing as saved in the version forked, with its own notes (the
// document's description, its cases and sweeps), and what the sketch says about itself
// (description, tags); it says where it came from (origin sketch and version). The origin's review
// stays with the origin: no comment threads, no sign-off record, no checked or approved state,
// no title block names but the forker's; the fork starts its own round. The origin is untouched.
import { beforeAll, describe, expect, it } from "vitest";
import * as commentRoute from "@/app/api/comments/[commentId]/route";
import * as forkRoute from "@/app/api/sketches/[id]/fork/route";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as commentsRoute from "@/app/api/sketches/[id]/versions/[number]/comments/route";
import * as versionRoute from "@/app/api/sketches/[id]/versions/[number]/route";
import * as signoffRoute from "@/app/api/sketches/[id]/versions/[number]/signoff/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { call, makeTeam, makeWorkspace, withMailFake, type Json, type Person } from "./helpers";
import { edited } from "./sketch-fixtures";
import { postSketch } from "./sketch-setup";

let owner: Person;
let author: Person;
let checker: Person;
let ws: string;
let ownWs: string;

withMailFake();
beforeAll(async () => {
  ({ ws, owner, author, checker } = await makeTeam("Fork carry bay", { owner: "owner", author: "editor", checker: "checker" }, { prefix: "forkcarry" }));
  ownWs = await makeWorkspace("Author's own", [[author, "owner"]]);
});

const at = (id: string, n: number) => ({ id, number: String(n) });
const step = (id: string, n: number, who: Person, s: string, note?: string) =>
  call(signoffRoute.POST, { method: "POST", params: at(id, n), cookie: who.cookie, body: { step: s, ...(note ? { note } : {}) } });

describe("a fork of a reviewed version", () => {
  it("carries the drawing and its notes, names its origin, and none of the origin's threads or sign-off", async () => {
    const notes = "Anchor block as quoted by the civil contractor; bolts M20 8.8.";
    const doc = edited("pipe-bend-anchor", (d) => (d.description = notes));
    const id = await postSketch(ws, author, "Bend at pier 7", doc, { description: "Riser bend, east side", tags: ["anchors"] });
    // the origin's review: a resolved thread, an open one, checked and approved with notes
    const asked = await call(commentsRoute.POST, { method: "POST", params: at(id, 1), cookie: checker.cookie, body: { body: "Bolt grade?" } });
    expect(asked.status).toBe(201);
    expect((await call(commentRoute.PATCH, { method: "PATCH", params: { commentId: asked.body.comment.id }, cookie: checker.cookie, body: { resolved: true } })).status).toBe(200);
    expect((await call(commentsRoute.POST, { method: "POST", params: at(id, 1), cookie: checker.cookie, body: { body: "Site to confirm the block size." } })).status).toBe(201);
    expect((await step(id, 1, author, "submit")).status).toBe(200);
    expect((await step(id, 1, checker, "check", "Block size left to site.")).status).toBe(200);
    expect((await step(id, 1, owner, "approve", "Approved with the site question open.")).status).toBe(200);

    const made = await call(forkRoute.POST, { method: "POST", params: { id }, cookie: author.cookie, body: { workspaceId: ownWs, version: 1, title: "Bend at pier 8" } });
    expect(made.status).toBe(201);
    const forkId = made.body.sketch.id;

    // the drawing and its own notes, under the fork's name; the sketch's description and tags
    const v1 = (await call(versionRoute.GET, { params: at(forkId, 1), cookie: author.cookie })).body.version;
    expect(v1.document.description).toBe(notes);
    expect(v1.document.bodies).toEqual((doc as Json).bodies);
    expect(v1.document.title).toBe("Bend at pier 8");
    expect(v1.message).toBe("Forked from “Bend at pier 7” v1");
    const sketch = (await call(sketchRoute.GET, { params: { id: forkId }, cookie: author.cookie })).body.sketch;
    expect(sketch).toMatchObject({ description: "Riser bend, east side", tags: ["anchors"], approvedVersion: null });
    expect(sketch.forkedFrom).toEqual({ visible: true, sketchId: id, title: "Bend at pier 7", workspaceId: ws, versionNumber: 1 });

    // none of the origin's review: no threads, no record, prepared by the forker only
    const comments = (await call(commentsRoute.GET, { params: at(forkId, 1), cookie: author.cookie })).body;
    expect(comments.threads).toEqual([]);
    expect(comments.earlierOpen).toEqual([]);
    expect(comments.locked).toBe(false);
    const signOff = (await call(signoffRoute.GET, { params: at(forkId, 1), cookie: author.cookie })).body;
    expect(signOff.state).toBe("draft");
    expect(signOff.entries).toEqual([]);
    expect(signOff.openThreads).toEqual([]);
    expect(signOff.titleBlock.prepared.name).toBe(author.name);
    expect(signOff.titleBlock.checked).toBeNull();
    expect(signOff.titleBlock.approved).toBeNull();
    const listed = (await call(sketchesRoute.GET, { params: { id: ownWs }, cookie: author.cookie })).body.items.find((s: Json) => s.id === forkId);
    expect(listed).toMatchObject({ forked: true, approvedVersion: null });

    // the origin keeps its review as it was
    const origin = (await call(signoffRoute.GET, { params: at(id, 1), cookie: owner.cookie })).body;
    expect(origin.state).toBe("approved");
    expect(origin.entries.map((e: Json) => e.step)).toEqual(["submit", "check", "approve"]);
    expect((await call(commentsRoute.GET, { params: at(id, 1), cookie: owner.cookie })).body.threads).toHaveLength(2);
  });
});
