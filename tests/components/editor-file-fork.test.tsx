// The editor's File menu offers "Fork this sketch…" (as the History page offers Fork) to those who
// may fork: it opens the same fork dialog, for the version open in the editor as saved, and once
// forked offers to open the fork. A viewer is offered it only with a workspace of their own to fork into.
import { act, render, screen, waitFor, within } from "@testing-library/react";
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

/** Sketch sk1 "Skid at pier 7" with v1..v3; a fork answers sketch fk1 in workspace w2. */
function serve(role: Role, ownsElsewhere = true) {
  const posts: { url: string; body: unknown }[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (path: string, init?: RequestInit) => {
      if (init?.method === "POST") {
        const body = JSON.parse(String(init.body)) as { title: string };
        posts.push({ url: path, body });
        return jsonResponse({ sketch: { id: "fk1", workspaceId: "w2", title: body.title, latestVersion: 1 } }, 201);
      }
      if (path === "/api/sketches/sk1") return jsonResponse({ sketch: { id: "sk1", workspaceId: "w1", workspaceName: "Bay 4", title: "Skid at pier 7", role, latestVersion: 3 } });
      if (path === "/api/workspaces")
        return jsonResponse({
          workspaces: [
            { id: "w1", name: "Bay 4", role, personal: false },
            ...(ownsElsewhere ? [{ id: "w2", name: "Olivia's sketches", role: "owner", personal: true }] : []),
          ],
        });
      const v = /^\/api\/sketches\/sk1\/versions\/(\d)$/.exec(path);
      if (v) return jsonResponse({ version: { number: Number(v[1]), message: "m", authorName: "Eddie Editor", createdAt: "2026-11-30T10:00:00Z", document: { ...beamWithInlet(), title: "Skid at pier 7" } } });
      if (path.endsWith("/signoff")) return jsonResponse({ state: "draft" });
      return jsonResponse({ error: { code: "not_found", message: "no" } }, 404);
    }),
  );
  return posts;
}

async function open(role: Role, version: string, ownsElsewhere = true) {
  setSearch(version ? `version=${version}` : "");
  const posts = serve(role, ownsElsewhere);
  render(<SavedSketchEditor id="sk1" />);
  await screen.findByTestId("version-bar");
  await act(async () => {});
  return posts;
}

describe("Fork this sketch… in the editor's File menu", () => {
  it("an editor on v2 forks v2 into the workspace chosen, then is offered the fork", async () => {
    const posts = await open("editor", "2");
    await userEvent.click(screen.getByTestId("menu-file"));
    const item = await screen.findByRole("menuitem", { name: /Fork this sketch…/ });
    expect(item).toHaveTextContent("A new sketch starting from v2");
    await userEvent.click(item);
    const dialog = await screen.findByTestId("fork-dialog");
    expect(within(dialog).getByRole("heading", { name: "Fork v2 of “Skid at pier 7”" })).toBeInTheDocument();
    // this sketch's workspace first, as on the History page
    const select = (await within(dialog).findByRole("option", { name: "Bay 4" })).closest("select")!;
    expect(select.value).toBe("w1");
    await userEvent.selectOptions(select, "w2");
    const title = within(dialog).getByLabelText("Title of the fork");
    await userEvent.clear(title);
    await userEvent.type(title, "Skid at pier 8");
    await userEvent.click(within(dialog).getByRole("button", { name: "Fork" }));
    expect(posts).toEqual([{ url: "/api/sketches/sk1/fork", body: { workspaceId: "w2", version: 2, title: "Skid at pier 8" } }]);
    const notice = await screen.findByTestId("forked-notice");
    expect(notice).toHaveTextContent("“Skid at pier 8” is a new sketch, forked from v2 of this one. This editor stays on “Skid at pier 7”.");
    expect(within(notice).getByRole("link", { name: "Open the fork" })).toHaveAttribute("href", "/sketches/fk1");
    expect(screen.queryByTestId("fork-dialog")).toBeNull();
    // the editor is still on v2 of this sketch
    expect(screen.getByTestId("version-label")).toHaveTextContent(/^v2 of 3/);
    await userEvent.click(within(notice).getByRole("button", { name: "Stay here" }));
    expect(screen.queryByTestId("forked-notice")).toBeNull();
  });

  it("with unsaved changes, says the fork is of the version as saved", async () => {
    await open("owner", "");
    await changeInletArea("0.02");
    await waitFor(() => expect(screen.getByTestId("version-label")).toHaveTextContent("unsaved"));
    await userEvent.click(screen.getByTestId("menu-file"));
    const item = await screen.findByRole("menuitem", { name: /Fork this sketch…/ });
    expect(item).toHaveTextContent("A new sketch from v3 as saved: your unsaved changes are not in it");
    await userEvent.click(item);
    const dialog = await screen.findByTestId("fork-dialog");
    expect(within(dialog).getByRole("heading", { name: "Fork v3 of “Skid at pier 7”" })).toBeInTheDocument();
    expect(dialog).toHaveTextContent("starts from v3 as saved. Your unsaved changes are not in it");
    await userEvent.click(within(dialog).getByRole("button", { name: "Cancel" }));
    expect(screen.queryByTestId("fork-dialog")).toBeNull();
    expect(screen.getByTestId("version-label")).toHaveTextContent("unsaved");
  });

  it("a viewer with nowhere to fork into is not offered it", async () => {
    await open("viewer", "", false);
    await userEvent.click(screen.getByTestId("menu-file"));
    await screen.findByRole("menuitem", { name: /Calc sheet/ });
    expect(screen.queryByRole("menuitem", { name: /Fork/ })).toBeNull();
  });

  it("a viewer here who owns a workspace of their own is offered it, into that workspace (as on the History page)", async () => {
    const posts = await open("viewer", "");
    await userEvent.click(screen.getByTestId("menu-file"));
    await userEvent.click(await screen.findByRole("menuitem", { name: /Fork this sketch/ }));
    const dialog = await screen.findByTestId("fork-dialog");
    expect(within(dialog).getByLabelText("Into the workspace")).toHaveValue("w2");
    await userEvent.click(within(dialog).getByRole("button", { name: /^Fork/ }));
    await waitFor(() => expect(posts).toHaveLength(1));
    expect(posts[0].body).toMatchObject({ workspaceId: "w2", version: 3 });
  });
});
