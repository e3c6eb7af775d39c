// The pages of a deleted workspace: someone who was a member when it was deleted is told who deleted
// it and when, on its own address and on its sketches' (the workspace's and the editor's); anyone
// else gets the words of a workspace that never was.
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { beforeAll, describe, expect, it, vi } from "vitest";
import * as workspaceRoute from "@/app/api/workspaces/[id]/route";
import { WorkspaceDeleted } from "@/components/workspaces/WorkspaceDeleted";
import { editorPageDeletion, pageTarget } from "@/lib/page-target";
import { call, makeAccount, makeTeam, type Person } from "./helpers";
import { postSketch } from "./sketch-setup";

const asked = vi.hoisted(() => ({ cookie: "", path: "" }));
vi.mock("next/headers", () => ({ headers: async () => new Headers({ cookie: asked.cookie, "x-counterpoise-path": asked.path }) }));

let olivia: Person;
let vera: Person;
let outsider: Person;
let ws: string;
let id: string;

beforeAll(async () => {
  ({ ws, olivia, vera } = await makeTeam("Cooling tower 2", { olivia: { role: "owner", name: "Olivia Closer" }, vera: "viewer" }, { prefix: "wsdp" }));
  outsider = await makeAccount("wsdp-outsider");
  id = await postSketch(ws, olivia, "Fan deck", "pipe-bend-anchor");
  expect((await call(workspaceRoute.DELETE, { method: "DELETE", params: { id: ws }, cookie: olivia.cookie, body: { confirmName: "Cooling tower 2" } })).status).toBe(200);
});

async function targetFor(person: Person, path: string) {
  asked.cookie = person.cookie;
  asked.path = path;
  return pageTarget();
}

describe("a deleted workspace's pages", () => {
  it("say to a former member who deleted it, on its address and its sketches' addresses", async () => {
    for (const who of [vera, olivia]) {
      for (const path of [`/workspaces/${ws}`, `/workspaces/${ws}/members`, `/workspaces/${ws}/sketches/${id}`, `/workspaces/${ws}/sketches/${id}/versions/1`]) {
        const target = await targetFor(who, path);
        expect(target).toMatchObject({ kind: "workspace-deleted", deleted: { workspaceId: ws, name: "Cooling tower 2", deletedBy: "Olivia Closer" } });
      }
    }
  });

  it("say nothing to an outsider: the page of a workspace that never was", async () => {
    expect(await targetFor(outsider, `/workspaces/${ws}`)).toEqual({ kind: "no-workspace" });
    expect(await targetFor(outsider, `/workspaces/${ws}/sketches/${id}`)).toEqual({ kind: "no-sketch", workspaceId: null });
  });

  it("on the editor's own address, say the sketch went with the workspace and lead to the workspace's page", async () => {
    asked.cookie = vera.cookie;
    asked.path = `/sketches/${id}`;
    const deleted = await editorPageDeletion();
    expect(deleted).toMatchObject({ title: "Fan deck", withWorkspace: true, workspaceId: ws, workspaceName: "Cooling tower 2", deletedBy: "Olivia Closer" });
    asked.cookie = outsider.cookie;
    expect(await editorPageDeletion()).toBeNull();
  });

  it("render the sentence on the page", async () => {
    const html = renderToStaticMarkup(createElement(WorkspaceDeleted, { deleted: { name: "Cooling tower 2", deletedBy: "Olivia Closer", deletedAt: new Date("2026-03-04T09:05:00Z") } }));
    expect(html).toContain("This workspace was deleted");
    expect(html).toContain("The workspace “Cooling tower 2” was deleted by Olivia Closer on 4 Mar 2026, 09:05 UTC, with its sketches, their versions, comments and files.");
  });
});
