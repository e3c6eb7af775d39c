// The "● unsaved" mark of a saved sketch follows the document, not the count of edits: undoing
// back to the version as loaded (or as last saved) clears it, redo brings it back, and an edit
// undone by hand (moved right, then left again) is no change either. The leave-page prompt
// follows the same rule.
import { act, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { withModalDialogs, withResizeObserver } from "./dialog-support";
import { beam, jsonResponse } from "./editor-helpers";

const { SavedSketchEditor } = await import("@/components/versions/editor/SavedSketchEditor");

beforeAll(() => {
  withModalDialogs();
  withResizeObserver();
});
afterEach(() => vi.unstubAllGlobals());


/** Sketch sk1 with its v1 (the beam); saving makes v2. */
function serve() {
  vi.stubGlobal(
    "fetch",
    vi.fn(async (path: string, init?: RequestInit) => {
      if (path === "/api/sketches/sk1") return jsonResponse({ sketch: { id: "sk1", workspaceId: "w1", workspaceName: "Bay 4", title: "Beam on a pin and a contact", role: "editor", latestVersion: 1 } });
      if (path === "/api/sketches/sk1/versions/1") return jsonResponse({ version: { number: 1, document: beam() } });
      if (path === "/api/sketches/sk1/versions" && init?.method === "POST") return jsonResponse({ version: { number: 2, createdAt: "2026-11-30T10:00:00Z" } }, 201);
      return jsonResponse({ error: { code: "not_found", message: "no" } }, 404);
    }),
  );
}

async function openSaved() {
  serve();
  render(<SavedSketchEditor id="sk1" />);
  await screen.findByTestId("version-bar");
  await act(async () => {});
}

const label = () => screen.getByTestId("version-label");
const key = (k: string, mods: { ctrlKey?: boolean; shiftKey?: boolean } = {}) => fireEvent.keyDown(document.body, { key: k, ...mods });
/** Whether leaving the page now asks first. */
function leavingAsks(): boolean {
  const e = new Event("beforeunload", { cancelable: true });
  window.dispatchEvent(e);
  return e.defaultPrevented;
}

async function selectPin() {
  const list = screen.getByRole("list", { name: "Elements of the sketch" });
  await userEvent.setup().click(within(list).getByRole("button", { name: /Pin s1/ }));
}

describe("the unsaved mark of a saved sketch", () => {
  it("edit: shown; undo back to the version: gone; redo: back", async () => {
    await openSaved();
    expect(label()).toHaveTextContent(/^v1$/);
    expect(leavingAsks()).toBe(false);
    await selectPin();
    key("ArrowRight");
    await waitFor(() => expect(label()).toHaveTextContent("unsaved"));
    expect(leavingAsks()).toBe(true);
    key("ArrowUp");
    key("z", { ctrlKey: true });
    expect(label()).toHaveTextContent("unsaved");
    key("z", { ctrlKey: true });
    await waitFor(() => expect(label()).not.toHaveTextContent("unsaved"));
    expect(leavingAsks()).toBe(false);
    key("y", { ctrlKey: true });
    await waitFor(() => expect(label()).toHaveTextContent("unsaved"));
    expect(leavingAsks()).toBe(true);
    // the calc sheet beside it is the version's as saved, and says the unsaved changes are not in it
    const sheet = screen.getByRole("link", { name: "Calc sheet (PDF)" });
    expect(sheet.getAttribute("href")).toBe("/api/sketches/sk1/versions/1/calc-sheet?units=SI");
    expect(sheet.getAttribute("title")).toBe("The calc sheet (PDF) of v1 as saved: your unsaved changes are not in it");
  });

  it("an edit put back by hand is no change either", async () => {
    await openSaved();
    await selectPin();
    key("ArrowRight");
    await waitFor(() => expect(label()).toHaveTextContent("unsaved"));
    key("ArrowLeft");
    await waitFor(() => expect(label()).not.toHaveTextContent("unsaved"));
    expect(leavingAsks()).toBe(false);
  });

  it("after a save, undoing back to the saved version clears the mark, and undoing past it shows it", async () => {
    await openSaved();
    const user = userEvent.setup();
    await selectPin();
    key("ArrowRight");
    await waitFor(() => expect(label()).toHaveTextContent("unsaved"));
    key("s", { ctrlKey: true });
    const dialog = await screen.findByTestId("save-dialog");
    await user.type(within(dialog).getByLabelText("What changed"), "moved the pin");
    await user.click(within(dialog).getByRole("button", { name: "Save v2" }));
    await waitFor(() => expect(label()).toHaveTextContent(/^v2\s*✓ saved$/));
    key("ArrowRight");
    await waitFor(() => expect(label()).toHaveTextContent("unsaved"));
    key("z", { ctrlKey: true });
    await waitFor(() => expect(label()).not.toHaveTextContent("unsaved"));
    key("z", { ctrlKey: true });
    await waitFor(() => expect(label()).toHaveTextContent("unsaved"));
  });
});
