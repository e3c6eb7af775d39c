// A role refused an action is told which role it has, what it may not do and who may: "Your role
// does not allow this" leaves a viewer or an integrator guessing which permission was missing.
import { describe, expect, it } from "vitest";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as auditRoute from "@/app/api/workspaces/[id]/audit/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { refusedWords } from "@/lib/roles";
import { call, makeTeam } from "./helpers";
import { edited } from "./sketch-fixtures";
import { postSketch } from "./sketch-setup";

describe("a 403 says the role, the action and who may take it", () => {
  it("a viewer saving, renaming or deleting a sketch, a checker creating one, an editor reading the audit log", async () => {
    const { ws, editor, checker, viewer } = await makeTeam("Words bay", { editor: "editor", checker: "checker", viewer: "viewer" }, { prefix: "words" });
    const id = await postSketch(ws, editor, "Skid");

    const save = await call(versionsRoute.POST, { method: "POST", params: { id }, cookie: viewer.cookie, body: { baseVersion: 1, message: "x", document: edited("pump-skid-discharge", (d) => (d.title = "x")) } });
    expect(save.status).toBe(403);
    expect(save.body.error).toMatchObject({ code: "forbidden", message: "As a viewer in this workspace you may not save versions: that is for owners and editors." });

    const rename = await call(sketchRoute.PATCH, { method: "PATCH", params: { id }, cookie: viewer.cookie, body: { title: "mine" } });
    expect(rename.status).toBe(403);
    expect(rename.body.error.message).toBe("As a viewer in this workspace you may not rename sketches or change their details: that is for owners and editors.");

    const del = await call(sketchRoute.DELETE, { method: "DELETE", params: { id }, cookie: editor.cookie });
    expect(del.status).toBe(403);
    expect(del.body.error.message).toBe("As an editor in this workspace you may not delete sketches: that is for owners.");

    const create = await call(sketchesRoute.POST, { method: "POST", params: { id: ws }, cookie: checker.cookie, body: { title: "Checker's own" } });
    expect(create.status).toBe(403);
    expect(create.body.error.message).toBe(refusedWords("checker", "sketch.create"));
    expect(create.body.error.message).toBe("As a checker in this workspace you may not create sketches: that is for owners and editors.");

    const audit = await call(auditRoute.GET, { params: { id: ws }, cookie: editor.cookie });
    expect(audit.status).toBe(403);
    expect(audit.body.error.message).toBe("As an editor in this workspace you may not read the audit log: that is for owners.");
  });
});
