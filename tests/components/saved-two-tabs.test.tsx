// A saved sketch open in two tabs of one browser: a save in one tab is said in the other (heard as
// a storage event, as the browser tells a tab of another tab's write), and each tab keeps its own
// unsaved draft, so neither tab's unsaved work replaces the other's; a later visit is offered the
// newest draft of any tab.
import { act, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { discardDraft, keepDraft, readDraft } from "@/components/versions/editor/drafts";
import { withModalDialogs, withResizeObserver } from "./dialog-support";
import { beam, jsonResponse } from "./editor-helpers";
import { setSearch } from "../support/navigation";

const { SavedSketchEditor } = await import("@/components/versions/editor/SavedSketchEditor");

beforeAll(() => {
  withModalDialogs();
  withResizeObserver();
});
beforeEach(() => {
  window.localStorage.clear();
});
afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

/** Sketch sk1 with its v1 (the beam), `latest` the newest version (the beam again); saving makes v2. */
function serve(latest = 1) {
  vi.stubGlobal(
    "fetch",
    vi.fn(async (path: string, init?: RequestInit) => {
      if (path === "/api/sketches/sk1") return jsonResponse({ sketch: { id: "sk1", workspaceId: "w1", workspaceName: "Bay 4", title: "Beam on a pin and a contact", role: "editor", latestVersion: latest } });
      if (/^\/api\/sketches\/sk1\/versions\/\d+$/.test(path)) return jsonResponse({ version: { number: Number(path.split("/").pop()), document: beam() } });
      if (path === "/api/sketches/sk1/versions" && init?.method === "POST") return jsonResponse({ version: { number: 2, createdAt: "2026-11-30T10:00:00Z" } }, 201);
      return jsonResponse({ error: { code: "not_found", message: "no" } }, 404);
    }),
  );
}

async function openSaved(latest = 1) {
  serve(latest);
  const utils = render(<SavedSketchEditor id="sk1" />);
  await screen.findByTestId("version-bar");
  await act(async () => {});
  return utils;
}

/** The other tab saved `version`, as the browser tells this one (the writing tab hears nothing). */
function otherTabSaved(version: number) {
  const value = JSON.stringify({ version, at: "2026-11-30T10:05:00Z" });
  window.localStorage.setItem("counterpoise:saved:sk1", value);
  act(() => {
    window.dispatchEvent(new StorageEvent("storage", { key: "counterpoise:saved:sk1", newValue: value }));
  });
}

/** Every draft of sk1 kept in this browser, whatever its key. */
function keptDrafts(): { title: string; baseVersion: number }[] {
  const out: { title: string; baseVersion: number }[] = [];
  for (let i = 0; i < window.localStorage.length; i++) {
    const k = window.localStorage.key(i) ?? "";
    if (!k.startsWith("counterpoise:draft:sk1")) continue;
    const d = JSON.parse(window.localStorage.getItem(k) ?? "{}") as { sketch?: SketchFile; baseVersion: number };
    if (d.sketch) out.push({ title: d.sketch.title ?? "", baseVersion: d.baseVersion });
  }
  return out.sort((a, b) => a.title.localeCompare(b.title));
}

const key = (k: string, mods: { ctrlKey?: boolean } = {}) => fireEvent.keyDown(document.body, { key: k, ...mods });
/** Past the draft keeper's quiet time (500 ms). */
const pause = () => act(() => new Promise((r) => setTimeout(r, 700)));

async function retitle(title: string) {
  const user = userEvent.setup();
  const field = screen.getByLabelText("Title");
  await user.clear(field);
  await user.type(field, `${title}{Enter}`);
}

describe("a version saved in another tab", () => {
  it("a tab with no unsaved changes is told, and Open v2 reloads the sketch without asking", async () => {
    await openSaved();
    expect(screen.queryByTestId("saved-elsewhere")).toBeNull();
    otherTabSaved(2);
    const notice = await screen.findByTestId("saved-elsewhere");
    expect(notice).toHaveTextContent("v2 was saved in another tab");
    expect(notice).toHaveTextContent("this tab shows v1 and has no unsaved changes.");
    expect(screen.getByTestId("version-label")).toHaveTextContent(/^v1 of 2$/);
    const assign = vi.fn();
    vi.stubGlobal("location", { ...window.location, assign });
    await userEvent.setup().click(within(notice).getByRole("button", { name: "Open v2" }));
    expect(assign).toHaveBeenCalledWith("/sketches/sk1");
  });

  it("a tab with unsaved work is told what Save will do, and its save dialog knows v2 is newer", async () => {
    await openSaved();
    await userEvent.setup().click(within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name: /Pin s1/ }));
    key("ArrowRight");
    await waitFor(() => expect(screen.getByTestId("version-label")).toHaveTextContent("unsaved"));
    otherTabSaved(2);
    const notice = await screen.findByTestId("saved-elsewhere");
    expect(notice).toHaveTextContent("v2 was saved in another tab");
    expect(notice).toHaveTextContent("this tab’s work is based on v1. Save will offer to fork it or to reload and compare.");
    expect(within(notice).queryByRole("button", { name: "Open v2" })).toBeNull();
    key("s", { ctrlKey: true });
    expect(await screen.findByTestId("save-dialog")).toHaveTextContent("You opened v1, and v2 is newer");
  });

  it("says nothing of a version this tab already has", async () => {
    await openSaved(2);
    otherTabSaved(2);
    await act(async () => {});
    expect(screen.queryByTestId("saved-elsewhere")).toBeNull();
  });

  it("a save here is announced to the other tabs", async () => {
    await openSaved();
    await retitle("Beam, pads moved");
    key("s", { ctrlKey: true });
    const dialog = await screen.findByTestId("save-dialog");
    const user = userEvent.setup();
    await user.type(within(dialog).getByLabelText("What changed"), "moved the pads");
    await user.click(within(dialog).getByRole("button", { name: "Save v2" }));
    await waitFor(() => expect(screen.getByTestId("version-label")).toHaveTextContent(/^v2/));
    expect(JSON.parse(window.localStorage.getItem("counterpoise:saved:sk1") ?? "null")).toEqual({ version: 2, at: "2026-11-30T10:00:00Z" });
  });
});

describe("unsaved drafts of two tabs", () => {
  const theirs = { ...beam(), title: "The other tab's beam" };

  it("this tab's draft does not replace the other tab's, and a later visit is offered the newest", async () => {
    const { unmount } = await openSaved();
    // the other tab, open on v1 too, keeps its unsaved work
    keepDraft({ sketchId: "sk1", tab: "othertab", baseVersion: 1, latestVersion: 1, message: "", sketch: theirs });
    await retitle("This tab's beam");
    await pause();
    expect(keptDrafts()).toEqual([
      { title: "The other tab's beam", baseVersion: 1 },
      { title: "This tab's beam", baseVersion: 1 },
    ]);
    // a crash, then the sketch opened again: the newest draft of any tab is offered
    unmount();
    expect(readDraft("sk1")?.sketch.title).toBe("This tab's beam");
    await openSaved();
    expect(await screen.findByTestId("kept-work")).toHaveTextContent("Your unsaved changes are kept in this browser");
    // discarding it leaves the other tab's, offered on the next visit
    await userEvent.setup().click(within(screen.getByTestId("kept-work")).getByRole("button", { name: "Discard" }));
    expect(keptDrafts()).toEqual([{ title: "The other tab's beam", baseVersion: 1 }]);
  });

  it("Bring them back opens that tab's draft, which this tab then keeps as its own", async () => {
    keepDraft({ sketchId: "sk1", tab: "othertab", baseVersion: 1, latestVersion: 1, message: "", sketch: theirs });
    const { unmount } = await openSaved();
    const back = within(await screen.findByTestId("kept-work")).getByRole("link", { name: "Bring them back" });
    expect(back.getAttribute("href")).toBe("/sketches/sk1?restore=1&draft=othertab");
    // a newer draft of a third tab does not take its place
    keepDraft({ sketchId: "sk1", tab: "third", baseVersion: 1, latestVersion: 1, message: "", sketch: { ...beam(), title: "A third tab's beam" } });
    unmount();
    setSearch("restore=1&draft=othertab");
    await openSaved();
    await waitFor(() => expect(screen.getByLabelText("Title")).toHaveValue("The other tab's beam"));
    expect(readDraft("sk1", "othertab")).toBeNull();
    expect(keptDrafts().map((d) => d.title)).toEqual(["A third tab's beam", "The other tab's beam"]);
  });

  it("a draft kept before drafts had tabs is still offered and discarded", () => {
    window.localStorage.setItem("counterpoise:draft:sk1", JSON.stringify({ sketchId: "sk1", baseVersion: 1, latestVersion: 2, message: "m", keptAt: "2026-11-30T09:00:00Z", sketch: theirs }));
    expect(readDraft("sk1")).toMatchObject({ tab: "", baseVersion: 1, message: "m" });
    discardDraft("sk1");
    expect(readDraft("sk1")).toBeNull();
  });
});
