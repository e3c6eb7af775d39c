// The editor opened on an older version offers what the version's page offers: "Make vN the latest
// again…", to those who may save, while nothing has been changed here. It asks on top of the newest
// version the server knows (a save since the editor opened counts), and once saved the editor is on
// the new version (the same drawing, nothing unsaved, the address no longer naming the old one) and
// says "v5 is now the latest: a copy of v1". A viewer, the latest version, and changed work are not offered it.
import { act, cleanup, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import type { Role } from "@/lib/roles";
import { withModalDialogs, withResizeObserver } from "./dialog-support";
import { beamWithInlet, changeInletArea, jsonResponse } from "./editor-helpers";
import { setSearch } from "../support/navigation";

const { SavedSketchEditor } = await import("@/components/versions/editor/SavedSketchEditor");

beforeAll(() => {
  withModalDialogs();
  withResizeObserver();
});
afterEach(() => vi.unstubAllGlobals());

/** Sketch sk1 whose latest the editor is told is v3 and the server knows is `serverLatest`; a restore answers v(serverLatest + 1). */
function serve(role: Role, serverLatest = 3, oldTitle?: string) {
  const posts: { url: string; body: unknown }[] = [];
  let asked = 0;
  vi.stubGlobal(
    "fetch",
    vi.fn(async (path: string, init?: RequestInit) => {
      if (init?.method === "POST") {
        posts.push({ url: path, body: JSON.parse(String(init.body)) });
        return jsonResponse({ version: { number: serverLatest + 1, restoredFrom: 1, message: "Restored v1 — as quoted", createdAt: "2026-12-01T09:30:00Z" } }, 201);
      }
      if (path === "/api/sketches/sk1") {
        asked += 1;
        // the editor's own load sees v3; asked again (the restore's question), the server's newest
        return jsonResponse({ sketch: { id: "sk1", workspaceId: "w1", workspaceName: "Bay 4", title: "Beam on a pin and a contact", role, latestVersion: asked === 1 ? 3 : serverLatest } });
      }
      const v = /^\/api\/sketches\/sk1\/versions\/(\d)$/.exec(path);
      if (v) {
        const document = oldTitle && v[1] === "1" ? { ...beamWithInlet(), title: oldTitle } : beamWithInlet();
        return jsonResponse({ version: { number: Number(v[1]), message: Number(v[1]) === 1 ? "as quoted" : "later", authorName: "Eddie Editor", createdAt: "2026-11-30T10:00:00Z", document } });
      }
      if (path.endsWith("/signoff")) return jsonResponse({ state: "draft" });
      return jsonResponse({ error: { code: "not_found", message: "no" } }, 404);
    }),
  );
  return posts;
}

async function open(role: Role, version: string, serverLatest = 3, oldTitle?: string) {
  setSearch(version ? `version=${version}` : "");
  window.history.replaceState(null, "", `/sketches/sk1${version ? `?version=${version}` : ""}`);
  const posts = serve(role, serverLatest, oldTitle);
  render(<SavedSketchEditor id="sk1" />);
  await screen.findByTestId("version-bar");
  await act(async () => {});
  return posts;
}

describe("making an older version the latest again from the editor", () => {
  it("an editor on v1 of 3 restores it on top of the newest the server knows, and goes on as the new latest version", async () => {
    // someone saved v4 after the editor opened on "v1 of 3"
    const posts = await open("editor", "1", 4);
    expect(screen.getByTestId("version-label")).toHaveTextContent(/^v1 of 3/);
    await userEvent.click(screen.getByRole("button", { name: "Make v1 the latest again…" }));
    const dialog = await screen.findByTestId("restore-dialog");
    expect(within(dialog).getByText("saved by Eddie Editor", { exact: false })).toBeInTheDocument();
    const confirm = await within(dialog).findByRole("button", { name: "Save as v5" });
    expect(within(dialog).getByTestId("restore-what")).toHaveTextContent("on top of v4");
    await userEvent.click(confirm);
    expect(posts).toEqual([{ url: "/api/sketches/sk1/versions/1/restore", body: { baseVersion: 4 } }]);
    const notice = await screen.findByTestId("made-latest");
    expect(notice).toHaveTextContent("v5 is now the latest: a copy of v1. The editor shows v5; v1 stays in the history.");
    // the editor is on v5 already: nothing to open, nothing unsaved, and a reload opens the latest
    expect(within(notice).queryByRole("button", { name: /Open v/ })).toBeNull();
    expect(screen.getByTestId("version-label")).toHaveTextContent(/^v5\s*✓ saved$/);
    expect(window.location.pathname + window.location.search).toBe("/sketches/sk1");
    // and the editor's own status line says it
    expect(await screen.findByText("v5 is now the latest: a copy of v1.")).toBeInTheDocument();
    // done: not offered twice
    expect(screen.queryByRole("button", { name: /latest again/ })).toBeNull();
    await userEvent.click(within(notice).getByRole("button", { name: "Got it" }));
    expect(screen.queryByTestId("made-latest")).toBeNull();
    expect(screen.getByTestId("version-label")).toHaveTextContent(/^v5\s*✓ saved$/);
  });

  it("an older version saved under an earlier name takes the sketch's present name, as the new version holds it, with nothing unsaved", async () => {
    await open("editor", "1", 3, "Beam, first quote");
    await userEvent.click(screen.getByRole("button", { name: "Make v1 the latest again…" }));
    const dialog = await screen.findByTestId("restore-dialog");
    await userEvent.click(await within(dialog).findByRole("button", { name: "Save as v4" }));
    await screen.findByTestId("made-latest");
    expect(screen.getByTestId("version-label")).toHaveTextContent(/^v4\s*✓ saved$/);
    expect(screen.getByTestId("version-label")).not.toHaveTextContent("unsaved");
  });

  it("is in the File menu too (the toolbar has no room for it below 1280 px), and asks the same question", async () => {
    const posts = await open("editor", "2");
    await userEvent.click(screen.getByTestId("menu-file"));
    const item = await screen.findByRole("menuitem", { name: /Make v2 the latest again…/ });
    expect(item).toHaveTextContent("v2's drawing saved as a new version; nothing is deleted");
    await userEvent.click(item);
    const dialog = await screen.findByTestId("restore-dialog");
    await userEvent.click(await within(dialog).findByRole("button", { name: "Save as v4" }));
    expect(posts).toEqual([{ url: "/api/sketches/sk1/versions/2/restore", body: { baseVersion: 3 } }]);
    await screen.findByTestId("made-latest");
    // done: gone from the menu as from the toolbar
    await userEvent.click(screen.getByTestId("menu-file"));
    expect(screen.queryByRole("menuitem", { name: /latest again/ })).toBeNull();
  });

  it("Cancel saves nothing and leaves the offer in place", async () => {
    const posts = await open("owner", "2");
    await userEvent.click(screen.getByRole("button", { name: "Make v2 the latest again…" }));
    const dialog = await screen.findByTestId("restore-dialog");
    await userEvent.click(await within(dialog).findByRole("button", { name: "Cancel" }));
    await waitFor(() => expect(screen.queryByTestId("restore-dialog")).toBeNull());
    expect(posts).toEqual([]);
    expect(screen.getByRole("button", { name: "Make v2 the latest again…" })).toBeInTheDocument();
  });

  it("is not offered to a viewer or a checker, who read only", async () => {
    for (const role of ["viewer", "checker"] as const) {
      await open(role, "1");
      expect(screen.getByTestId("read-only")).toHaveTextContent(`Read only · ${role}`);
      expect(screen.queryByRole("button", { name: /latest again/ })).toBeNull();
      await userEvent.click(screen.getByTestId("menu-file"));
      expect(screen.queryByRole("menuitem", { name: /latest again/ })).toBeNull();
      cleanup();
    }
  });

  it("is not offered on the latest version", async () => {
    await open("editor", "");
    expect(screen.getByTestId("version-label")).toHaveTextContent(/^v3/);
    expect(screen.queryByRole("button", { name: /latest again/ })).toBeNull();
  });

  it("is withdrawn once the drawing is changed here (Save then offers a fork), and back when the change is undone", async () => {
    await open("editor", "1");
    expect(screen.getByRole("button", { name: "Make v1 the latest again…" })).toBeInTheDocument();
    await changeInletArea();
    expect(screen.queryByRole("button", { name: /latest again/ })).toBeNull();
    fireEvent.keyDown(document.body, { key: "z", ctrlKey: true });
    await waitFor(() => expect(screen.getByTestId("version-label")).not.toHaveTextContent("unsaved"));
    expect(screen.getByRole("button", { name: "Make v1 the latest again…" })).toBeInTheDocument();
  });
});
