// Sketches and versions through the API: create, list with filters and sorting, read, rename,
// delete, versions numbered without gaps, conflicts, forks and what they reveal, the audit trail.
import { and, desc, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as forkRoute from "@/app/api/sketches/[id]/fork/route";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as versionRoute from "@/app/api/sketches/[id]/versions/[number]/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { db } from "@/db";
import { auditEvent, sketchVersion } from "@/db/schema";
import { CURRENT_VERSION, solveFile } from "@/solver";
import { call, makeAccount, makeWorkspace, type Person } from "./helpers";
import { edited, fixture } from "./sketch-fixtures";

let olivia: Person;
let eddie: Person;
let chen: Person;
let outsider: Person;
let ws: string;
let otherWs: string;

async function create(body: Record<string, unknown>, who = eddie, workspaceId = ws) {
  return call(sketchesRoute.POST, { method: "POST", params: { id: workspaceId }, cookie: who.cookie, body });
}

async function save(sketchId: string, baseVersion: number, document: unknown, who = eddie, message = "") {
  return call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie: who.cookie, body: { baseVersion, message, document } });
}

beforeAll(async () => {
  olivia = await makeAccount("olivia");
  eddie = await makeAccount("eddie");
  chen = await makeAccount("chen");
  outsider = await makeAccount("outsider");
  ws = await makeWorkspace("Sketch bay", [
    [olivia, "owner"],
    [eddie, "editor"],
    [chen, "checker"],
  ]);
  otherWs = await makeWorkspace("Elsewhere", [[outsider, "owner"]]);
});

describe("creating and reading a sketch", () => {
  it("stores the document as version 1 with its solve summary, and reads it back", async () => {
    const doc = fixture("pump-skid-discharge");
    const res = await create({ title: "Skid at pier 7", tags: ["Pumps", "pier 7", "pumps"], message: "As drawn from the GA", document: doc });
    expect(res.status).toBe(201);
    expect(res.body.sketch).toMatchObject({ title: "Skid at pier 7", tags: ["pumps", "pier 7"], latestVersion: 1 });
    const id = res.body.sketch.id;

    const read = await call(sketchRoute.GET, { params: { id }, cookie: chen.cookie });
    expect(read.status).toBe(200);
    expect(read.body.sketch).toMatchObject({ id, workspaceId: ws, title: "Skid at pier 7", latestVersion: 1, role: "checker", forkedFrom: null });
    const expected = solveFile(doc);
    if (!expected.ok) throw new Error("fixture does not solve");
    expect(read.body.latest).toMatchObject({ number: 1, message: "As drawn from the GA", status: "holds", authorName: eddie.name, formatVersion: CURRENT_VERSION });
    expect(read.body.latest.largestReaction).toBeCloseTo(expected.bodies.skid.largestReaction, 6);
    expect(read.body.latest.document).toBeUndefined();

    const v1 = await call(versionRoute.GET, { params: { id, number: "1" }, cookie: chen.cookie });
    expect(v1.status).toBe(200);
    // stored as validated: expressions kept, defaults filled in
    expect(v1.body.version.document.parameters).toEqual({ mdot: "12 kg/s" });
    expect(v1.body.version.document.loads).toEqual([]);
    expect(v1.body.version.document.ports[0].pressure).toBe("-20 kPa");
    expect(v1.body.version.summary.bodies.skid.status).toBe("holds");
  });

  it("without a document starts from an empty sketch titled like the sketch", async () => {
    const res = await create({ title: "Blank bend" });
    expect(res.status).toBe(201);
    const v1 = await call(versionRoute.GET, { params: { id: res.body.sketch.id, number: "1" }, cookie: eddie.cookie });
    expect(v1.body.version.document).toMatchObject({ format: "counterpoise.sketch", version: CURRENT_VERSION, title: "Blank bend", bodies: [] });
    expect(v1.body.version.status).toBeNull();
    expect(v1.body.version.message).toBe("First version");
  });

  it("takes the title from the document when none is given", async () => {
    const res = await create({ document: fixture("pipe-bend-anchor") });
    expect(res.status).toBe(201);
    expect(res.body.sketch.title).toBe(fixture("pipe-bend-anchor").title);
  });

  it("records create, save, rename and delete in the audit log", async () => {
    const made = await create({ title: "Audited stack", document: fixture("exhaust-stack-guyed") });
    const id = made.body.sketch.id;
    expect((await save(id, 1, edited("exhaust-stack-guyed", (d) => (d.title = "Stack, taller")), eddie, "raised the stack")).status).toBe(201);
    expect((await call(sketchRoute.PATCH, { method: "PATCH", params: { id }, cookie: eddie.cookie, body: { title: "Guyed stack" } })).status).toBe(200);
    expect((await call(sketchRoute.DELETE, { method: "DELETE", params: { id }, cookie: olivia.cookie })).status).toBe(200);
    const rows = await db.select().from(auditEvent).where(and(eq(auditEvent.workspaceId, ws), eq(auditEvent.targetId, id))).orderBy(auditEvent.id);
    expect(rows.map((r) => [r.action, r.actorId])).toEqual([
      ["sketch.create", eddie.id],
      ["sketch.save", eddie.id],
      // the drawing's title changed in v2: the sketch took it
      ["sketch.rename", eddie.id],
      ["sketch.rename", eddie.id],
      ["sketch.delete", olivia.id],
    ]);
    expect(rows[1].detail).toMatchObject({ number: 2, message: "raised the stack" });
    expect(rows[2].detail).toMatchObject({ title: "Stack, taller", from: "Audited stack", number: 2 });
    expect(rows[3].detail).toMatchObject({ title: "Guyed stack", from: "Stack, taller" });
    // the versions went with the sketch
    expect(await db.select().from(sketchVersion).where(eq(sketchVersion.sketchId, id))).toEqual([]);
  });
});

describe("saving versions", () => {
  it("numbers versions 1, 2, 3 and answers 409 with the latest when the base is stale", async () => {
    const id = (await create({ title: "Monitor trailer", document: fixture("fire-monitor-trailer") })).body.sketch.id;
    const v2 = await save(id, 1, edited("fire-monitor-trailer", (d) => (d.title = "v2")), eddie, "moved the jack 0.3 m forward");
    expect(v2.status).toBe(201);
    expect(v2.body.version).toMatchObject({ number: 2, message: "moved the jack 0.3 m forward" });
    const v3 = await save(id, 2, edited("fire-monitor-trailer", (d) => (d.title = "v3")), olivia, "owner's touch");
    expect(v3.status).toBe(201);

    const stale = await save(id, 2, edited("fire-monitor-trailer", (d) => (d.title = "mine")), eddie, "my edit");
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe("version_conflict");
    expect(stale.body.error.message).toBe(`${olivia.name} saved version 3 since you opened version 2. Nothing was overwritten.`);
    expect(stale.body.error.latest).toMatchObject({ number: 3, message: "owner's touch", authorName: olivia.name });

    const list = await call(versionsRoute.GET, { params: { id }, cookie: chen.cookie });
    expect(list.body.versions.map((v: { number: number; message: string }) => [v.number, v.message])).toEqual([
      [3, "owner's touch"],
      [2, "moved the jack 0.3 m forward"],
      [1, "First version"],
    ]);
    // a base the sketch never had is a wrong number, not a conflict: 400 naming the field
    const ahead = await save(id, 7, fixture("fire-monitor-trailer"));
    expect(ahead.status).toBe(400);
    expect(ahead.body.error.fields).toEqual([{ path: "baseVersion", message: "There is no version 7; the newest is 3." }]);
  });

  it("names the sketch after its drawing when a version changes the drawing's title, and keeps a rename from the details otherwise", async () => {
    const id = (await create({ title: "Bearer check", document: edited("fire-monitor-trailer", (d) => (d.title = "Bearer check")) })).body.sketch.id;
    const title = async () => (await call(sketchRoute.GET, { params: { id }, cookie: eddie.cookie })).body.sketch.title;
    // the Title field changed in the editor: listings, the version page and the calc sheet follow
    const v2 = await save(id, 1, edited("fire-monitor-trailer", (d) => (d.title = "Trailer on the quay")), eddie, "retitled");
    expect(v2.body.version.sketchTitle).toBe("Trailer on the quay");
    expect(await title()).toBe("Trailer on the quay");
    // renamed in the details since; a save that leaves the drawing's title as v2 had it keeps that name
    expect((await call(sketchRoute.PATCH, { method: "PATCH", params: { id }, cookie: eddie.cookie, body: { title: "Quay trailer, jack check" } })).status).toBe(200);
    const v3 = await save(id, 2, edited("fire-monitor-trailer", (d) => ((d.title = "Trailer on the quay"), ((d.parameters as Record<string, unknown>).Q = "1500 gpm"))), eddie, "less flow");
    expect(v3.status).toBe(201);
    expect(v3.body.version.sketchTitle).toBe("Quay trailer, jack check");
    expect(await title()).toBe("Quay trailer, jack check");
    // a blank drawing title names nothing
    await save(id, 3, edited("fire-monitor-trailer", (d) => (d.title = "  ")), eddie, "blank");
    expect(await title()).toBe("Quay trailer, jack check");
  });

  it("refuses to change a saved version, even from SQL", async () => {
    const id = (await create({ title: "Immutable", document: fixture("pipe-bend-anchor") })).body.sketch.id;
    await expect(db.update(sketchVersion).set({ message: "rewritten" }).where(eq(sketchVersion.sketchId, id))).rejects.toThrow();
    const [v] = await db.select().from(sketchVersion).where(eq(sketchVersion.sketchId, id));
    expect(v.message).toBe("First version");
  });

  it("a checker may read but not save; an outsider is told nothing exists", async () => {
    const id = (await create({ title: "Read only for some", document: fixture("pipe-bend-anchor") })).body.sketch.id;
    expect((await save(id, 1, fixture("pipe-bend-anchor"), chen)).status).toBe(403);
    const nope = await save(id, 1, fixture("pipe-bend-anchor"), outsider);
    expect(nope.status).toBe(404);
    expect((await call(versionRoute.GET, { params: { id, number: "1" }, cookie: outsider.cookie })).status).toBe(404);
    expect((await call(versionRoute.GET, { params: { id, number: "9" }, cookie: eddie.cookie })).status).toBe(404);
    const [latest] = await db.select().from(sketchVersion).where(eq(sketchVersion.sketchId, id)).orderBy(desc(sketchVersion.number));
    expect(latest.number).toBe(1);
  });
});

describe("listing", () => {
  let listWs: string;
  beforeAll(async () => {
    listWs = await makeWorkspace("Listing bay", [
      [eddie, "editor"],
      [chen, "viewer"],
    ]);
    const docs: Array<[string, string, string[]]> = [
      ["Anchor for the bend", "pipe-bend-anchor", ["pipework"]],
      ["Thrust stand", "thrust-stand-tips", ["test rig"]],
      ["Skid on bearers", "pump-skid-discharge", ["pumps", "pipework"]],
      ["Stack with one guy", "exhaust-stack-one-guy-tips", []],
    ];
    for (const [title, name, tags] of docs) {
      expect((await create({ title, tags, document: fixture(name), description: `${name} as a listing row` }, eddie, listWs)).status).toBe(201);
      await new Promise((r) => setTimeout(r, 5));
    }
  });
  const list = (query: string, who = chen) => call(sketchesRoute.GET, { params: { id: listWs }, cookie: who.cookie, path: `/api/workspaces/${listWs}/sketches?${query}` });
  const titles = (body: { items: Array<{ title: string }> }) => body.items.map((i) => i.title);

  it("lists newest first with the latest status and who saved it, and the workspace's tags", async () => {
    const res = await list("");
    expect(res.status).toBe(200);
    expect(titles(res.body)).toEqual(["Stack with one guy", "Skid on bearers", "Thrust stand", "Anchor for the bend"]);
    expect(res.body.total).toBe(4);
    expect(res.body.tags).toEqual(["pipework", "pumps", "test rig"]);
    expect(res.body.items[2]).toMatchObject({ title: "Thrust stand", status: "tips", latestVersion: 1, latestReviewState: "draft", updatedBy: { id: eddie.id, name: eddie.name } });
  });

  it("filters by tag, status and text, sorts by title and status, and pages", async () => {
    expect(titles((await list("tag=pipework")).body)).toEqual(["Skid on bearers", "Anchor for the bend"]);
    expect(titles((await list("status=tips&sort=title")).body)).toEqual(["Stack with one guy", "Thrust stand"]);
    expect(titles((await list("q=BEND")).body)).toEqual(["Anchor for the bend"]);
    expect(titles((await list("q=test%20r")).body)).toEqual(["Thrust stand"]); // a tag matches too
    expect(titles((await list("q=100%25")).body)).toEqual([]); // % is literal
    expect(titles((await list("sort=title&dir=asc")).body)).toEqual(["Anchor for the bend", "Skid on bearers", "Stack with one guy", "Thrust stand"]);
    const byStatus = titles((await list("sort=status&dir=asc")).body);
    expect(byStatus.slice(0, 2).sort()).toEqual(["Anchor for the bend", "Skid on bearers"]);
    const page2 = await list("sort=title&pageSize=3&page=2");
    expect(titles(page2.body)).toEqual(["Thrust stand"]);
    expect(page2.body).toMatchObject({ total: 4, page: 2, pageSize: 3 });
  });

  it("filters the sketches whose latest version slips (a warning beside its status)", async () => {
    const slipWs = await makeWorkspace("Slip bay", [[eddie, "editor"]]);
    for (const [title, name] of [["Skid that slips", "pump-skid-slip"], ["Anchor that holds", "pipe-bend-anchor"]]) expect((await create({ title, document: fixture(name) }, eddie, slipWs)).status).toBe(201);
    const res = await call(sketchesRoute.GET, { params: { id: slipWs }, cookie: eddie.cookie, path: `/api/workspaces/${slipWs}/sketches?status=slips` });
    expect(titles(res.body)).toEqual(["Skid that slips"]);
    // …and one that slips is not among those that hold, though every contact bears
    const holds = await call(sketchesRoute.GET, { params: { id: slipWs }, cookie: eddie.cookie, path: `/api/workspaces/${slipWs}/sketches?status=holds` });
    expect(titles(holds.body)).toEqual(["Anchor that holds"]);
    // sorted by status it ranks between holds and lifts, whichever was saved last
    expect((await create({ title: "Stand that tips", document: fixture("thrust-stand-tips") }, eddie, slipWs)).status).toBe(201);
    const sorted = async (dir: string) =>
      titles((await call(sketchesRoute.GET, { params: { id: slipWs }, cookie: eddie.cookie, path: `/api/workspaces/${slipWs}/sketches?sort=status&dir=${dir}` })).body);
    expect(await sorted("asc")).toEqual(["Anchor that holds", "Skid that slips", "Stand that tips"]);
    expect(await sorted("desc")).toEqual(["Stand that tips", "Skid that slips", "Anchor that holds"]);
  });

  it("refuses bad query parameters with their paths", async () => {
    const res = await list("sort=colour&pageSize=500");
    expect(res.status).toBe(400);
    expect(res.body.error.fields.map((f: { path: string }) => f.path).sort()).toEqual(["query.pageSize", "query.sort"]);
  });
});

describe("forks", () => {
  it("copies a version into another workspace and names the origin only to those who may read it", async () => {
    const sharedWs = await makeWorkspace("Fork target", [
      [eddie, "editor"],
      [outsider, "viewer"],
    ]);
    const id = (await create({ title: "Original bend", description: "Riser bend at pier 7", tags: ["pipework", "anchors"], document: fixture("pipe-bend-anchor") })).body.sketch.id;
    await save(id, 1, edited("pipe-bend-anchor", (d) => (d.description = "bend v2")), eddie, "thicker wall");

    const fork = await call(forkRoute.POST, { method: "POST", params: { id }, cookie: eddie.cookie, body: { workspaceId: sharedWs, version: 1 } });
    expect(fork.status).toBe(201);
    const forkId = fork.body.sketch.id;
    expect(fork.body.sketch).toMatchObject({ workspaceId: sharedWs, title: "Original bend (fork)", latestVersion: 1 });

    const v1 = await call(versionRoute.GET, { params: { id: forkId, number: "1" }, cookie: eddie.cookie });
    // the drawing carries the fork's name; everything else is the source's v1
    expect(v1.body.version.document.title).toBe("Original bend (fork)");
    expect(v1.body.version.document.bodies).toEqual(fixture("pipe-bend-anchor").bodies);
    expect(v1.body.version.message).toBe("Forked from “Original bend” v1");

    const seenByEddie = await call(sketchRoute.GET, { params: { id: forkId }, cookie: eddie.cookie });
    // the fork keeps what the sketch says about itself: its description and tags
    expect(seenByEddie.body.sketch).toMatchObject({ description: "Riser bend at pier 7", tags: ["pipework", "anchors"] });
    expect(seenByEddie.body.sketch.forkedFrom).toEqual({ visible: true, sketchId: id, title: "Original bend", workspaceId: ws, versionNumber: 1 });
    const seenByOutsider = await call(sketchRoute.GET, { params: { id: forkId }, cookie: outsider.cookie });
    expect(seenByOutsider.body.sketch.forkedFrom).toEqual({ visible: false, title: "Original bend", versionNumber: 1 });
    expect(JSON.stringify(seenByOutsider.body)).not.toContain(id);
  });

  it("needs read access to the source and an editor's role in the target", async () => {
    const id = (await create({ title: "Source", document: fixture("pipe-bend-anchor") })).body.sketch.id;
    const intoOther = await call(forkRoute.POST, { method: "POST", params: { id }, cookie: eddie.cookie, body: { workspaceId: otherWs } });
    expect(intoOther.status).toBe(404);
    const byChen = await call(forkRoute.POST, { method: "POST", params: { id }, cookie: chen.cookie, body: { workspaceId: ws } });
    expect(byChen.status).toBe(403);
    const byOutsider = await call(forkRoute.POST, { method: "POST", params: { id }, cookie: outsider.cookie, body: { workspaceId: otherWs } });
    expect(byOutsider.status).toBe(404);
    const noVersion = await call(forkRoute.POST, { method: "POST", params: { id }, cookie: eddie.cookie, body: { workspaceId: ws, version: 5 } });
    expect(noVersion.status).toBe(404);
  });
});
