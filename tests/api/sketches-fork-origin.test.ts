// A fork whose origin is deleted still says where it came from: the origin's title and version as
// they were when forked, marked deleted and without a link (the sketch page and the listing).
import { beforeAll, describe, expect, it } from "vitest";
import * as forkRoute from "@/app/api/sketches/[id]/fork/route";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { call, makeTeam, makeWorkspace, type Person } from "./helpers";
import { edited } from "./sketch-fixtures";
import { postSketch } from "./sketch-setup";

let olivia: Person;
let eddie: Person;
let ws: string;
let eddiesWs: string;

beforeAll(async () => {
  ({ ws, olivia, eddie } = await makeTeam("Origin bay", { olivia: "owner", eddie: "editor" }));
  eddiesWs = await makeWorkspace("Eddie's own", [[eddie, "owner"]]);
});

describe("a fork whose origin is deleted", () => {
  it("keeps the origin's title and version, marked deleted, on the sketch and in the listing", async () => {
    const id = await postSketch(ws, eddie, "Riser bend", "pipe-bend-anchor");
    const v2 = await call(versionsRoute.POST, {
      method: "POST",
      params: { id },
      cookie: eddie.cookie,
      body: { baseVersion: 1, message: "thicker wall", document: edited("pipe-bend-anchor", (d) => (d.description = "v2")) },
    });
    expect(v2.status).toBe(201);
    const fork = await call(forkRoute.POST, { method: "POST", params: { id }, cookie: eddie.cookie, body: { workspaceId: eddiesWs, version: 2 } });
    expect(fork.status).toBe(201);
    const forkId = fork.body.sketch.id;

    const gone = await call(sketchRoute.DELETE, { method: "DELETE", params: { id }, cookie: olivia.cookie });
    expect(gone.status).toBe(200);

    const read = await call(sketchRoute.GET, { params: { id: forkId }, cookie: eddie.cookie });
    expect(read.status).toBe(200);
    expect(read.body.sketch.forkedFrom).toEqual({ visible: false, deleted: true, title: "Riser bend", versionNumber: 2 });
    expect(JSON.stringify(read.body)).not.toContain(id);

    const list = await call(sketchesRoute.GET, { params: { id: eddiesWs }, cookie: eddie.cookie });
    const item = list.body.items.find((s: { id: string }) => s.id === forkId);
    expect(item.forked).toBe(true);
  });
});

describe("a fork's default title", () => {
  it("counts forks of forks and keeps the suffix within the 120 characters a title may have", async () => {
    const long = `Pump skid ${"x".repeat(110)}`;
    expect(long.length).toBe(120);
    const first = await call(forkRoute.POST, { method: "POST", params: { id: await postSketch(ws, eddie, long, "pipe-bend-anchor") }, cookie: eddie.cookie, body: { workspaceId: eddiesWs } });
    expect(first.body.sketch.title).toHaveLength(120);
    expect(first.body.sketch.title.endsWith("x (fork)")).toBe(true);

    const a = await call(forkRoute.POST, { method: "POST", params: { id: await postSketch(ws, eddie, "Riser bend", "pipe-bend-anchor") }, cookie: eddie.cookie, body: { workspaceId: eddiesWs } });
    expect(a.body.sketch.title).toBe("Riser bend (fork)");
    const b = await call(forkRoute.POST, { method: "POST", params: { id: a.body.sketch.id }, cookie: eddie.cookie, body: { workspaceId: eddiesWs } });
    expect(b.body.sketch.title).toBe("Riser bend (fork 2)");
    const c = await call(forkRoute.POST, { method: "POST", params: { id: b.body.sketch.id }, cookie: eddie.cookie, body: { workspaceId: eddiesWs } });
    expect(c.body.sketch.title).toBe("Riser bend (fork 3)");
  });
});
