// Exporting a workspace's sketches (owners): one JSON file, named after the workspace and the day,
// with the latest version of every sketch in the sketch-file format; each file inside parses with
// the solver's own parser (so it re-imports) and is the very document of that version. Other
// members are refused (403), everyone else told nothing exists (404), and the export is logged.
import { and, eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as exportRoute from "@/app/api/workspaces/[id]/export/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import { db } from "@/db";
import { auditEvent } from "@/db/schema";
import { appOrigin } from "@/lib/env";
import { EXPORT_PAGE_SIZE, exportFileName } from "@/lib/workspace-export";
import { parseSketch } from "@/solver";
import { call, makeTeam, type Json, type Person } from "./helpers";
import { edited, fixture } from "./sketch-fixtures";
import { postSketch } from "./sketch-setup";

const get = (ws: string, who?: Person) => call(exportRoute.GET, { params: { id: ws }, cookie: who?.cookie, path: `/api/workspaces/${ws}/export` });

describe("exporting a workspace's sketches", () => {
  let team: { ws: string; owner: Person; editor: Person; checker: Person; viewer: Person };
  let other: { ws: string; stranger: Person };
  let skid: string, bend: string;
  const moved = edited("pump-skid-discharge", (doc) => {
    doc.title = "Dewatering skid, bearer moved";
    (doc.supports as Json[])[0].at = [0.5, 0];
  });

  beforeAll(async () => {
    team = await makeTeam("Pump Station Nord-Öst", { owner: "owner", editor: "editor", checker: "checker", viewer: "viewer" }, { prefix: "export" });
    other = await makeTeam("Other bay", { stranger: "owner" }, { prefix: "export-other" });
    skid = await postSketch(team.ws, team.editor, "Skid on bearers", "pump-skid-discharge", { tags: ["skid"] });
    bend = await postSketch(team.ws, team.editor, "Anchor at the bend", "pipe-bend-anchor");
    const v2 = await call(versionsRoute.POST, { method: "POST", params: { id: skid }, cookie: team.editor.cookie, body: { baseVersion: 1, message: "moved the rear bearer 0.5 m in", document: moved } });
    expect(v2.status).toBe(201);
    await postSketch(other.ws, other.stranger, "Not theirs", "pipe-bend-anchor");
  });

  it("gives the owner one file, named after the workspace and the day, with the latest version of every sketch", async () => {
    const before = new Date();
    const out = await get(team.ws, team.owner);
    expect(out.status).toBe(200);
    expect(out.res.headers.get("content-type")).toMatch(/^application\/json/);
    const day = before.toISOString().slice(0, 10);
    expect(out.res.headers.get("content-disposition")).toBe(`attachment; filename="pump-station-nord-ost-sketches-${day}.json"`);
    expect(out.res.headers.get("cache-control")).toBe("no-store");
    const b = out.body;
    expect(b.format).toBe("counterpoise.workspace-export");
    expect(b.version).toBe(1);
    expect(new Date(b.exportedAt).getTime()).toBeGreaterThanOrEqual(before.getTime() - 1000);
    expect(b.workspace).toEqual({ id: team.ws, name: "Pump Station Nord-Öst" });
    // by title; the skid at v2 (its latest), the bend at v1
    expect(b.sketches.map((s: Json) => [s.title, s.version, s.message])).toEqual([
      ["Anchor at the bend", 1, "First version"],
      ["Dewatering skid, bearer moved", 2, "moved the rear bearer 0.5 m in"],
    ]);
    const s2 = b.sketches.find((s: Json) => s.id === skid);
    expect(s2).toMatchObject({ tags: ["skid"], savedBy: team.editor.name, review: "draft", status: "holds" });
    expect(s2.file.supports[0].at).toEqual([0.5, 0]);
    expect(b.sketches.find((s: Json) => s.id === bend).file.title).toBe(fixture("pipe-bend-anchor").title);
  });

  it("every file in it parses with the solver's parser and re-imports as a new sketch with the same drawing", async () => {
    const { body } = await get(team.ws, team.owner);
    for (const s of body.sketches as Json[]) {
      const parsed = parseSketch(s.file);
      expect(parsed.ok, `${s.title}: ${JSON.stringify(parsed.ok ? [] : parsed.errors)}`).toBe(true);
    }
    const again = await call(sketchesRoute.POST, { method: "POST", params: { id: other.ws }, cookie: other.stranger.cookie, body: { document: body.sketches[1].file } });
    expect(again.status).toBe(201);
    expect(again.body.sketch.title).toBe("Dewatering skid, bearer moved");
  });

  it("refuses the other members with 403 in words, and tells an outsider and the signed-out nothing", async () => {
    for (const who of [team.editor, team.checker, team.viewer]) {
      const out = await get(team.ws, who);
      expect(out.status).toBe(403);
      expect(out.body.error.code).toBe("forbidden");
      expect(out.body.error.message).toContain("export the workspace's sketches");
      expect(out.res.headers.get("content-disposition")).toBeNull();
    }
    const outsider = await get(team.ws, other.stranger);
    expect(outsider.status).toBe(404);
    expect(JSON.stringify(outsider.body)).not.toContain("Skid");
    expect((await get(team.ws)).status).toBe(401);
  });

  it("is written to the audit log with how many sketches went out", async () => {
    const rows = await db.select().from(auditEvent).where(and(eq(auditEvent.workspaceId, team.ws), eq(auditEvent.action, "workspace.export")));
    expect(rows.length).toBeGreaterThanOrEqual(1);
    expect(rows[0]).toMatchObject({ actorId: team.owner.id, targetId: team.ws, detail: { name: "Pump Station Nord-Öst", sketches: 2 } });
  });

  it("an empty workspace exports an empty list", async () => {
    const empty = await makeTeam("Empty bay", { lone: "owner" }, { prefix: "export-empty" });
    const out = await get(empty.ws, empty.lone);
    expect(out.status).toBe(200);
    expect(out.body.sketches).toEqual([]);
  });
});

describe("a large export is streamed, a page of sketches at a time", () => {
  const MANY = 2 * EXPORT_PAGE_SIZE + 11;
  let big: { ws: string; lone: Person };
  const decoder = new TextDecoder();
  // the reply itself, its body unread (`call` reads it whole)
  const download = () => exportRoute.GET(new Request(`${appOrigin()}/api/workspaces/${big.ws}/export`, { headers: { cookie: big.lone.cookie } }), { params: Promise.resolve({ id: big.ws }) });

  beforeAll(async () => {
    big = await makeTeam("Tank farm", { lone: "owner" }, { prefix: "export-big" });
    const template = await postSketch(big.ws, big.lone, "Bay 000", "pipe-bend-anchor");
    // MANY - 1 more sketches, each a copy of the first's saved version (made in SQL: the routes
    // would solve each one again)
    await db.execute(sql`
      WITH made AS (
        INSERT INTO sketch (workspace_id, title, latest_version, created_by)
        SELECT ${big.ws}::uuid, 'Bay ' || lpad(g::text, 3, '0'), 1, ${big.lone.id} FROM generate_series(1, ${MANY - 1}::int) g
        RETURNING id
      )
      INSERT INTO sketch_version (sketch_id, number, message, document, format_version, status, largest_reaction, summary, author_id)
      SELECT made.id, 1, v.message, v.document, v.format_version, v.status, v.largest_reaction, v.summary, v.author_id
      FROM made, sketch_version v WHERE v.sketch_id = ${template}::uuid AND v.number = 1`);
  });

  it("comes as the bundle's head, then one chunk per sketch, then the close, and parses as a whole", async () => {
    const res = await download();
    expect(res.status).toBe(200);
    expect(res.headers.get("content-length")).toBeNull();
    const chunks: string[] = [];
    for await (const chunk of res.body as ReadableStream<Uint8Array>) chunks.push(decoder.decode(chunk));
    expect(chunks).toHaveLength(1 + MANY + 1);
    expect(chunks[0]).toMatch(/^\{"format":"counterpoise\.workspace-export","version":1,.*"sketches":\[$/);
    expect(chunks[1]).toMatch(/^\{"id":"[0-9a-f-]{36}","title":"Bay 000",/);
    expect(chunks[2]).toMatch(/^,\{"id":"[0-9a-f-]{36}","title":"Bay 001",/);
    expect(chunks.at(-1)).toBe("]}");
    const bundle = JSON.parse(chunks.join(""));
    expect(bundle.sketches).toHaveLength(MANY);
    // in order across the pages' seams, none twice
    expect(bundle.sketches.map((s: Json) => s.title)).toEqual(Array.from({ length: MANY }, (_, i) => `Bay ${String(i).padStart(3, "0")}`));
    expect(new Set(bundle.sketches.map((s: Json) => s.id)).size).toBe(MANY);
    for (const s of [bundle.sketches[0], bundle.sketches[MANY - 1]]) expect(parseSketch(s.file).ok).toBe(true);
    expect(bundle.sketches[MANY - 1].file).toEqual(bundle.sketches[0].file);
  });

  it("reads the sketches only as the download asks for them: one saved after the first chunk is read is still in it", async () => {
    const res = await download();
    const reader = (res.body as ReadableStream<Uint8Array>).getReader();
    const first = await reader.read();
    expect(decoder.decode(first.value)).toMatch(/"sketches":\[$/);
    // saved now, after the download began; its title sorts last, on the last page
    await postSketch(big.ws, big.lone, "Zone Z, last bay", "pump-skid-discharge");
    let rest = "";
    for (let got = await reader.read(); !got.done; got = await reader.read()) rest += decoder.decode(got.value);
    const bundle = JSON.parse(decoder.decode(first.value) + rest);
    expect(bundle.sketches).toHaveLength(MANY + 1);
    expect(bundle.sketches.at(-1).title).toBe("Zone Z, last bay");
    // the audit record counts the sketches as the export began
    const [logged] = await db.select().from(auditEvent).where(and(eq(auditEvent.workspaceId, big.ws), eq(auditEvent.action, "workspace.export"))).orderBy(sql`${auditEvent.at} desc`).limit(1);
    expect(logged.detail).toMatchObject({ sketches: MANY });
  });
});

describe("the export's file name", () => {
  it("keeps letters and digits of the workspace's name, accents dropped, and falls back to 'workspace'", () => {
    const at = new Date("2026-12-05T18:00:00Z");
    expect(exportFileName("Pump Station Nord-Öst", at)).toBe("pump-station-nord-ost-sketches-2026-12-05.json");
    expect(exportFileName("“Bay 4” / skids", at)).toBe("bay-4-skids-sketches-2026-12-05.json");
    expect(exportFileName("泵站", at)).toBe("workspace-sketches-2026-12-05.json");
  });
});
