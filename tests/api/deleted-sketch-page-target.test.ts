// A workspace page's address that names a deleted sketch: the not-found page learns who deleted it and
// when, for a member of the workspace it was in (as the API's 404 says it); anyone else, and any other
// workspace's address, gets exactly what a sketch that never was gets.
import { renderToStaticMarkup } from "react-dom/server";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { NoSuchSketch } from "@/components/shell/NotHere";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import { editorPageDeletion, pageTarget } from "@/lib/page-target";
import SavedSketchNotFound from "@/app/sketches/[id]/not-found";
import { SKETCH_NOT_FOUND_MESSAGE } from "@/components/versions/editor/notFound";
import { PATH_HEADER } from "@/lib/request-path";
import { call, makeAccount, makeTeam, makeWorkspace, type Person } from "./helpers";
import { postSketch } from "./sketch-setup";

// the page helpers read the request's cookies and address through next/headers; here they are this test's
const asked = vi.hoisted(() => ({ cookie: "", path: "" }));
vi.mock("next/headers", () => ({ headers: async () => new Headers({ cookie: asked.cookie, "x-counterpoise-path": asked.path }) }));

let olivia: Person;
let vera: Person;
let outsider: Person;
let ws: string;
let elsewhere: string;
let id: string;
let before: number;

beforeAll(async () => {
  ({ ws, olivia, vera } = await makeTeam("Deletions on the page", { olivia: { role: "owner", name: "Olivia Deleter" }, vera: "viewer" }));
  outsider = await makeAccount("outsider");
  elsewhere = await makeWorkspace("Another bay", [
    [vera, "owner"],
    [outsider, "owner"],
  ]);
  id = await postSketch(ws, olivia, "Riser bend", "pipe-bend-anchor");
  before = Date.now();
  expect((await call(sketchRoute.DELETE, { method: "DELETE", params: { id }, cookie: olivia.cookie })).status).toBe(200);
});

async function targetFor(person: Person, path: string) {
  asked.cookie = person.cookie;
  asked.path = path;
  expect(PATH_HEADER).toBe("x-counterpoise-path");
  return pageTarget();
}

describe("the not-found page's target for a deleted sketch", () => {
  it("tells a member of its workspace who deleted it and when, on the sketch's page, a version's and the comparison", async () => {
    for (const path of [`/workspaces/${ws}/sketches/${id}`, `/workspaces/${ws}/sketches/${id}/versions/1`, `/workspaces/${ws}/sketches/${id}/compare?from=1&to=1`]) {
      const target = await targetFor(vera, path);
      expect(target).toMatchObject({ kind: "no-sketch", workspaceId: ws, deleted: { title: "Riser bend", deletedBy: "Olivia Deleter", workspaceId: ws } });
      if (target.kind !== "no-sketch" || !target.deleted) throw new Error("no deletion");
      expect(target.deleted.deletedAt.getTime()).toBeGreaterThanOrEqual(before - 1000);
      expect(target.deleted.deletedAt.getTime()).toBeLessThanOrEqual(Date.now());
      expect(target.deleted.workspaceName).toBe("Deletions on the page");
    }
  });

  it("is said on the page in the API's own sentence, with the way back to the workspace", async () => {
    const target = await targetFor(vera, `/workspaces/${ws}/sketches/${id}`);
    if (target.kind !== "no-sketch" || !target.deleted) throw new Error("no deletion");
    const api = await call(sketchRoute.GET, { params: { id }, cookie: vera.cookie });
    const html = renderToStaticMarkup(await NoSuchSketch({ deleted: target.deleted }));
    expect(/<span data-testid="sketch-deleted">([^<]*)<\/span>/.exec(html)?.[1]).toBe(api.body.error.message);
    expect(html).toContain(`href="/workspaces/${ws}">Back to Deletions on the page</a>`);
    expect(html).toContain("This sketch was deleted");
    // a page's own not-found (a move inside the app) asks the address itself, and says the same
    expect(renderToStaticMarkup(await NoSuchSketch())).toBe(html);
  });

  it("is today's page, naming nothing, for anyone else", async () => {
    const never = renderToStaticMarkup(await NoSuchSketch({ deleted: null }));
    expect(never).toContain("No such sketch here");
    for (const [who, path] of [
      [outsider, `/workspaces/${ws}/sketches/${id}`],
      [vera, `/workspaces/${elsewhere}/sketches/${id}`],
    ] as const) {
      await targetFor(who, path);
      const html = renderToStaticMarkup(await NoSuchSketch());
      expect(html).toBe(never);
      expect(html).not.toContain("Riser bend");
    }
  });

  it("tells someone outside its workspace exactly what a sketch that never was gets", async () => {
    const gone = await targetFor(outsider, `/workspaces/${ws}/sketches/${id}`);
    const never = await targetFor(outsider, `/workspaces/${ws}/sketches/6d656d6f-0000-4000-8000-00000000ffff`);
    expect(gone).toEqual({ kind: "no-sketch", workspaceId: null });
    expect(gone).toEqual(never);
  });

  it("says nothing of it under another workspace's address, even to a member of both", async () => {
    const gone = await targetFor(vera, `/workspaces/${elsewhere}/sketches/${id}`);
    const never = await targetFor(vera, `/workspaces/${elsewhere}/sketches/6d656d6f-0000-4000-8000-00000000ffff`);
    expect(gone).toEqual({ kind: "no-sketch", workspaceId: elsewhere });
    expect(gone).toEqual(never);
  });
});

describe("the editor's address for a deleted sketch", () => {
  it("gives its not-found page who deleted it and when, for a member of its workspace", async () => {
    asked.cookie = vera.cookie;
    for (const path of [`/sketches/${id}`, `/sketches/${id}?case=c1`]) {
      asked.path = path;
      expect(await editorPageDeletion()).toMatchObject({ title: "Riser bend", deletedBy: "Olivia Deleter", workspaceId: ws, workspaceName: "Deletions on the page" });
    }
  });

  it("its page says the API's sentence and leads back to the workspace; anyone else reads the words of a sketch that never was", async () => {
    asked.path = `/sketches/${id}`;
    asked.cookie = vera.cookie;
    const api = await call(sketchRoute.GET, { params: { id }, cookie: vera.cookie });
    const member = renderToStaticMarkup(await SavedSketchNotFound());
    expect(/data-testid="unavailable-message">([^<]*)</.exec(member)?.[1]).toBe(api.body.error.message);
    expect(member).toContain(`href="/workspaces/${ws}">Back to Deletions on the page</a>`);
    asked.cookie = outsider.cookie;
    const stranger = renderToStaticMarkup(await SavedSketchNotFound());
    expect(/data-testid="unavailable-message">([^<]*)</.exec(stranger)?.[1]).toBe(SKETCH_NOT_FOUND_MESSAGE);
    expect(stranger).toContain('href="/workspaces">Your workspaces</a>');
  });

  it("gives nothing to anyone else, nor for a sketch never deleted or another address", async () => {
    asked.cookie = outsider.cookie;
    asked.path = `/sketches/${id}`;
    expect(await editorPageDeletion()).toBeNull();
    asked.cookie = vera.cookie;
    for (const path of ["/sketches/6d656d6f-0000-4000-8000-00000000ffff", "/sketches/new", `/workspaces/${ws}/sketches/${id}`]) {
      asked.path = path;
      expect(await editorPageDeletion()).toBeNull();
    }
  });
});
