// A save that meets a newer version offers a way to stay: "Stay and bring v4 in" merges what v4
// changed since the version the work started from into the work in the editor (nothing typed is
// lost; a field both changed keeps mine and is named), the editor goes on based on v4, and the next
// save goes on top of it. "Compare v4 with my changes" opens the comparison in a new tab, the
// changes kept where it reads them, and changes nothing here.
import { act, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { withModalDialogs, withResizeObserver } from "./dialog-support";
import { beamWithInlet, changeInletArea, jsonResponse } from "./editor-helpers";
import { SavedSketchEditor } from "@/components/versions/editor/SavedSketchEditor";

beforeAll(() => {
  withModalDialogs();
  withResizeObserver();
});
afterEach(() => {
  vi.unstubAllGlobals();
  localStorage.clear();
});

/** v3 is the beam as drawn; v4, saved by a colleague meanwhile, changed the inlet (`theirs`). */
function serve(theirs: (s: SketchFile) => SketchFile) {
  const posts: Array<{ baseVersion: number; message: string; document: SketchFile }> = [];
  const v4 = theirs(beamWithInlet());
  vi.stubGlobal(
    "fetch",
    vi.fn(async (path: string, init?: RequestInit) => {
      if (init?.method === "POST") {
        const body = JSON.parse(String(init.body));
        posts.push(body);
        if (body.baseVersion === 3)
          return jsonResponse({ error: { code: "version_conflict", message: "Chen Checker saved version 4 since you opened version 3.", latest: { number: 4, message: "faster inlet", authorName: "Chen Checker", createdAt: "2026-12-05T13:38:00.000Z" } } }, 409);
        return jsonResponse({ version: { number: 5, createdAt: "2026-12-05T14:00:00.000Z" } }, 201);
      }
      if (path === "/api/sketches/sk1") return jsonResponse({ sketch: { id: "sk1", workspaceId: "w1", workspaceName: "Bay 4", title: "Beam on a pin and a contact", role: "editor", latestVersion: 3 } });
      const v = /^\/api\/sketches\/sk1\/versions\/(\d)$/.exec(path);
      if (v) return jsonResponse({ version: { number: Number(v[1]), message: "", authorName: "Eddie Editor", createdAt: "2026-11-30T10:00:00Z", document: v[1] === "4" ? v4 : beamWithInlet() } });
      if (path.endsWith("/signoff")) return jsonResponse({ state: "draft" });
      if (path === "/api/workspaces") return jsonResponse({ workspaces: [] });
      return jsonResponse({ error: { code: "not_found", message: "no" } }, 404);
    }),
  );
  return posts;
}

/** Open v3, change the inlet's area to 0.02 m², and try to save it: the conflict dialog. */
async function saveIntoConflict() {
  window.history.replaceState(null, "", "/sketches/sk1");
  render(<SavedSketchEditor id="sk1" />);
  await screen.findByTestId("version-bar");
  await act(async () => {});
  await changeInletArea("0.02");
  const user = userEvent.setup();
  await user.click(screen.getByTestId("save-version"));
  const save = await screen.findByTestId("save-dialog");
  await user.type(within(save).getByLabelText("What changed"), "bigger inlet");
  await user.click(within(save).getByRole("button", { name: "Save v4" }));
  return { user, dialog: await screen.findByTestId("conflict-dialog") };
}

const port = (d: SketchFile) => d.ports[0] as { area: unknown; velocity: unknown };

// each walks the editor through an edit, two dialogs and a save: more than the default 5 s on a busy machine
describe("staying on the sketch after a save conflict", { timeout: 30000 }, () => {
  it("brings v4's change in beside mine, and the next save goes on top of v4 with both", async () => {
    const posts = serve((s) => ({ ...s, ports: [{ ...s.ports[0], velocity: 6 }] }) as SketchFile);
    const { user, dialog } = await saveIntoConflict();
    await user.click(within(dialog).getByRole("button", { name: "Stay and bring v4 in" }));
    const notice = await screen.findByTestId("merged-here");
    expect(notice.textContent).toBe(
      "v4 is merged into your changes: what it changed since v3 is here too, and the next save goes on top of v4. Check, then save. Undo takes the merge back out.Got it",
    );
    expect(screen.queryByTestId("conflict-dialog")).toBeNull();
    // based on v4 now, with unsaved changes (mine)
    expect(screen.getByTestId("version-label")).toHaveTextContent(/^v4\s*●\s*unsaved/);

    await user.click(screen.getByTestId("save-version"));
    const save = await screen.findByTestId("save-dialog");
    expect(within(save).getByRole("heading").textContent).toBe("Save version 5 of “Beam on a pin and a contact”");
    await user.type(within(save).getByLabelText("What changed"), "bigger inlet, on top of v4");
    await user.click(within(save).getByRole("button", { name: "Save v5" }));
    await waitFor(() => expect(posts).toHaveLength(2));
    expect(posts[1].baseVersion).toBe(4);
    // mine (the area) and theirs (the velocity), both
    expect(port(posts[1].document)).toMatchObject({ area: 0.02, velocity: 6 });
    await waitFor(() => expect(screen.getByTestId("version-label")).toHaveTextContent(/^v5/));
  });

  it("a field both changed keeps mine and is named", async () => {
    serve((s) => ({ ...s, ports: [{ ...s.ports[0], area: 0.015 }] }) as SketchFile);
    const { user, dialog } = await saveIntoConflict();
    await user.click(within(dialog).getByRole("button", { name: "Stay and bring v4 in" }));
    // named as the screens name it, with both values and their unit: 0.02 m² typed here, 0.015 m² in v4, as the area field shows them
    const notice = (await screen.findByTestId("merged-here")).textContent;
    expect(notice).toContain("You and v4 both changed these, and yours are kept — check them before saving: Inlet p1: area (yours 20,000 mm²; v4 has 15,000 mm²).");
    expect(notice).not.toContain("ports[");
    await user.click(screen.getByRole("button", { name: "Got it" }));
    expect(screen.queryByTestId("merged-here")).toBeNull();
  });

  it("the comparison opens in a new tab with the changes kept where it reads them, and the dialog stays", async () => {
    serve((s) => s);
    const { user, dialog } = await saveIntoConflict();
    const link = within(dialog).getByRole("link", { name: "Compare v4 with my changes (opens in a new tab)" });
    expect(link.getAttribute("target")).toBe("_blank");
    const href = new URL(link.getAttribute("href")!, "http://x");
    expect(href.pathname).toBe("/workspaces/w1/sketches/sk1/compare");
    expect(href.searchParams.get("from")).toBe("4");
    expect(href.searchParams.get("to")).toBe("draft");
    expect(href.searchParams.get("open")).toBe("1");
    const tab = href.searchParams.get("draft")!;
    // jsdom opens no tab: the click keeps the changes, and nothing here moves
    link.addEventListener("click", (e) => e.preventDefault());
    await user.click(link);
    const kept = JSON.parse(localStorage.getItem(`counterpoise:draft:sk1:${tab}`)!);
    expect(kept).toMatchObject({ baseVersion: 3, latestVersion: 4, message: "bigger inlet" });
    expect(port(kept.sketch).area).toBe(0.02);
    expect(screen.getByTestId("conflict-dialog")).toBeTruthy();
  });
});
