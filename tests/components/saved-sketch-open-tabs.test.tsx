// A saved sketch opened in a fresh tab while another tab of this browser still has it open with
// unsaved changes: that tab's draft is its work in progress, so the fresh tab does not offer it as
// "kept work" to bring back (two tabs would then edit copies of one draft); it says the changes
// are open in another tab, and offers them once that tab has closed, or has stopped saying it is
// open (crashed).
import { act, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { draftsOpenElsewhere, keepDraft, keepTabOpen, OPEN_MS, readDraft, tabOpen } from "@/components/versions/editor/drafts";
import { withModalDialogs, withResizeObserver } from "./dialog-support";
import { beam, jsonResponse } from "./editor-helpers";

const { SavedSketchEditor } = await import("@/components/versions/editor/SavedSketchEditor");

beforeAll(() => {
  withModalDialogs();
  withResizeObserver();
});
beforeEach(() => window.localStorage.clear());
afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

function serve() {
  vi.stubGlobal(
    "fetch",
    vi.fn(async (path: string) => {
      if (path === "/api/sketches/sk1") return jsonResponse({ sketch: { id: "sk1", workspaceId: "w1", workspaceName: "Bay 4", title: "Beam on a pin and a contact", role: "editor", latestVersion: 1 } });
      if (/^\/api\/sketches\/sk1\/versions\/\d+$/.test(path)) return jsonResponse({ version: { number: 1, document: beam() } });
      return jsonResponse({ error: { code: "not_found", message: "no" } }, 404);
    }),
  );
}

async function openSaved() {
  serve();
  const utils = render(<SavedSketchEditor id="sk1" />);
  await screen.findByTestId("version-bar");
  await act(async () => {});
  return utils;
}

const theirs = { ...beam(), title: "The other tab's beam" };
/** What the browser tells this tab when another one writes or removes a key. */
const heard = (key: string, newValue: string | null) => act(() => void window.dispatchEvent(new StorageEvent("storage", { key, newValue })));

describe("a fresh tab and the drafts of other tabs", () => {
  it("does not offer the draft of a tab still open: it names it, and offers it once that tab closes", async () => {
    // the other tab: open on the sketch, with unsaved changes kept as it works
    const closeOther = keepTabOpen("othertab");
    keepDraft({ sketchId: "sk1", tab: "othertab", baseVersion: 1, latestVersion: 1, message: "", sketch: theirs });
    await openSaved();
    expect(screen.queryByTestId("kept-work")).toBeNull();
    const note = screen.getByTestId("open-in-another-tab");
    expect(note).toHaveTextContent("Another tab of this browser has unsaved changes to this sketch");
    expect(note).toHaveTextContent("They stay with that tab: save or discard them there. Once that tab is closed, they are offered here.");
    expect(within(note).queryByRole("link", { name: "Bring them back" })).toBeNull();
    // the other tab is closed: its draft is this tab's to bring back now
    closeOther();
    heard("counterpoise:tab-open:othertab", null);
    const kept = await screen.findByTestId("kept-work");
    expect(within(kept).getByRole("link", { name: "Bring them back" }).getAttribute("href")).toBe("/sketches/sk1?restore=1&draft=othertab");
    // and its comparison is of that tab's draft
    expect(within(kept).getByRole("link", { name: /^Compare v1 with them/ }).getAttribute("href")).toBe("/workspaces/w1/sketches/sk1/compare?from=1&to=draft&draft=othertab");
    expect(screen.queryByTestId("open-in-another-tab")).toBeNull();
  });

  it("offers at once the draft of a tab that stopped saying it is open (it crashed)", async () => {
    window.localStorage.setItem("counterpoise:tab-open:crashed", String(Date.now() - OPEN_MS - 1000));
    keepDraft({ sketchId: "sk1", tab: "crashed", baseVersion: 1, latestVersion: 1, message: "", sketch: theirs });
    expect(tabOpen("crashed")).toBe(false);
    await openSaved();
    expect(await screen.findByTestId("kept-work")).toHaveTextContent("Your unsaved changes are kept in this browser");
    expect(screen.queryByTestId("open-in-another-tab")).toBeNull();
  });

  it("an editor tab with unsaved work is open to the others while it is mounted, and closed once it goes", async () => {
    const { unmount } = await openSaved();
    const user = userEvent.setup();
    const field = screen.getByLabelText("Title");
    await user.clear(field);
    await user.type(field, "This tab's beam{Enter}");
    // past the draft keeper's quiet time (500 ms)
    await act(() => new Promise((r) => setTimeout(r, 700)));
    // a second tab opening the sketch now: nothing to bring back, one draft open elsewhere
    expect(readDraft("sk1")).toBeNull();
    const open = draftsOpenElsewhere("sk1", "a-second-tab");
    expect(open.map((d) => d.sketch.title)).toEqual(["This tab's beam"]);
    expect(tabOpen(open[0].tab ?? "")).toBe(true);
    // the first tab closes: its draft is offered
    unmount();
    expect(readDraft("sk1")?.sketch.title).toBe("This tab's beam");
    expect(draftsOpenElsewhere("sk1", "a-second-tab")).toEqual([]);
  });
});
