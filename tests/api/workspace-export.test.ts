// Exporting a workspace's sketches (owners): one JSON file, named after the workspace and the day,
// with the latest version of every sketch in the sketch-file format; each file inside parses with
// the solver's own parser (so it re-imports) and is the very document of that version. Other
// members are refused (403), everyone else told nothing exists (404), and the export is logged.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as exportRoute from "@/app/api/workspaces/[id]/export/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import { db } from "@/db";
import { auditEvent } from "@/db/schema";
import { exportFileName } from "@/lib/workspace-export";
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

describe("the export's file name", () => {
  it("keeps letters and digits of the workspace's name, accents dropped, and falls back to 'workspace'", () => {
    const at = new Date("2026-12-05T18:00:00Z");
    expect(exportFileName("Pump Station Nord-Öst", at)).toBe("pump-station-nord-ost-sketches-2026-12-05.json");
    expect(exportFileName("“Bay 4” / skids", at)).toBe("bay-4-skids-sketches-2026-12-05.json");
    expect(exportFileName("泵站", at)).toBe("workspace-sketches-2026-12-05.json");
  });
});
