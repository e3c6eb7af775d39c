// A saved sketch's save dialog says its input errors in the editor's words before anything is
// sent ("Inlet p1 — area: …", not "ports[0].area"), and so does a refusal from the server (whose
// issue paths are the request's: "document.ports[0].area"). Saving stays as it was: the server
// decides. The calc sheet of the version open is in the File menu too, for screens whose toolbar
// has no room for its link.
import { act, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { withModalDialogs, withResizeObserver } from "./dialog-support";
import { beamWithInlet, jsonResponse } from "./editor-helpers";

const { SavedSketchEditor } = await import("@/components/versions/editor/SavedSketchEditor");

beforeAll(() => {
  withModalDialogs();
  withResizeObserver();
});
afterEach(() => vi.unstubAllGlobals());



/** Sketch sk1 with its v1; a save is refused as the server refuses an inlet of area −1. */
function serve() {
  const posted: unknown[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (path: string, init?: RequestInit) => {
      if (path === "/api/sketches/sk1") return jsonResponse({ sketch: { id: "sk1", workspaceId: "w1", workspaceName: "Bay 4", title: "Beam on a pin and a contact", role: "editor", latestVersion: 1 } });
      if (path === "/api/sketches/sk1/versions/1") return jsonResponse({ version: { number: 1, document: beamWithInlet() } });
      if (path === "/api/sketches/sk1/versions" && init?.method === "POST") {
        posted.push(JSON.parse(String(init.body)));
        return jsonResponse({ error: { code: "validation_failed", message: "Some fields are not valid.", fields: [{ path: "document.ports[0].area", message: "must be more than zero" }] } }, 400);
      }
      return jsonResponse({ error: { code: "not_found", message: "no" } }, 404);
    }),
  );
  return posted;
}

async function openSaved() {
  const posted = serve();
  render(<SavedSketchEditor id="sk1" />);
  await screen.findByTestId("version-bar");
  await act(async () => {});
  return posted;
}

async function setInletArea(value: string) {
  const user = userEvent.setup();
  const list = screen.getByRole("list", { name: "Elements of the sketch" });
  await user.click(within(list).getByRole("button", { name: /Inlet p1/ }));
  const area = await screen.findByTestId("field-area");
  await user.clear(area);
  await user.type(area, `${value}{Enter}`);
}

describe("the save dialog of a saved sketch", () => {
  it("says the input error up front, in words, and the server's refusal in the same words", async () => {
    const posted = await openSaved();
    const user = userEvent.setup();
    await setInletArea("-1");
    await waitFor(() => expect(screen.getByTestId("version-label")).toHaveTextContent("unsaved"));
    fireEvent.keyDown(document.body, { key: "s", ctrlKey: true });
    const dialog = await screen.findByTestId("save-dialog");
    expect(within(dialog).getByTestId("save-input-errors")).toHaveTextContent(
      "This sketch has an input error: Inlet p1 — area: must be more than zero. A version is saved only without input errors: fix it first, or the save is refused.",
    );
    // saving is still the server's to refuse, as before
    await user.click(within(dialog).getByRole("button", { name: "Save v2" }));
    await waitFor(() => expect(posted).toHaveLength(1));
    await within(dialog).findByText("The sketch was not saved: some fields are not valid");
    expect(dialog).toHaveTextContent("Inlet p1 — area: must be more than zero");
    expect(dialog).not.toHaveTextContent("ports[0]");
  });

  it("a sketch without input errors says nothing up front", async () => {
    await openSaved();
    await setInletArea("0.02");
    await waitFor(() => expect(screen.getByTestId("version-label")).toHaveTextContent("unsaved"));
    fireEvent.keyDown(document.body, { key: "s", ctrlKey: true });
    const dialog = await screen.findByTestId("save-dialog");
    expect(within(dialog).queryByTestId("save-input-errors")).toBeNull();
  });
});

describe("the calc sheet in the File menu", () => {
  it("opens the same URL as the toolbar's link, and says unsaved changes are not in it", async () => {
    await openSaved();
    const user = userEvent.setup();
    await user.click(screen.getByTestId("menu-file"));
    const item = within(screen.getByRole("menu", { name: "File" })).getByRole("menuitem", { name: /Calc sheet \(PDF\)/ });
    const link = screen.getByTestId("calc-sheet-link");
    expect(item.getAttribute("href")).toBe("/api/sketches/sk1/versions/1/calc-sheet?units=SI");
    expect(item.getAttribute("href")).toBe(link.getAttribute("href"));
    expect(item).toHaveTextContent("v1 as saved");
    await user.click(screen.getByTestId("menu-file"));
    await setInletArea("0.02");
    await waitFor(() => expect(screen.getByTestId("version-label")).toHaveTextContent("unsaved"));
    await user.click(screen.getByTestId("menu-file"));
    expect(within(screen.getByRole("menu", { name: "File" })).getByRole("menuitem", { name: /Calc sheet \(PDF\)/ })).toHaveTextContent("your unsaved changes are not in it");
  });
});
