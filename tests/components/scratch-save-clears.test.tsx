// The scratch sketch of /sketches/new once saved to a workspace: its copy in this browser goes,
// so the next "Start a sketch" opens an empty sketch (not the one just saved, still called a
// scratch sketch, which a second save would duplicate). A save that fails keeps it.
import { act, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { SCRATCH_KEY } from "@/canvas/persistence";
import { withModalDialogs } from "./dialog-support";
import { beam, jsonResponse } from "./editor-helpers";
import { router, setSearch } from "../support/navigation";

const { push } = router;
const { NewSketchClient } = await import("@/app/sketches/new/NewSketchClient");

beforeAll(() => {
  withModalDialogs();
});
beforeEach(() => setSearch("workspace=w1"));
afterEach(() => {
  vi.unstubAllGlobals();
  push.mockReset();
});


/** The API: one workspace to save into; creating the sketch answers `created` (or fails). */
function serve(created: "ok" | "fails") {
  const posted: unknown[] = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (path: string, init?: RequestInit) => {
      if (path === "/api/workspaces") return jsonResponse({ workspaces: [{ id: "w1", name: "Bay 4", role: "editor", personal: false }] });
      if (path === "/api/workspaces/w1/sketches" && init?.method === "POST") {
        posted.push(JSON.parse(String(init.body)));
        return created === "ok"
          ? jsonResponse({ sketch: { id: "sk1", workspaceId: "w1", title: "Beam on a pin and a contact" } }, 201)
          : jsonResponse({ error: { code: "internal", message: "The database is not answering." } }, 500);
      }
      return jsonResponse({ error: { code: "not_found", message: "no" } }, 404);
    }),
  );
  return posted;
}

const elementCount = () => screen.getByRole("heading", { name: /Elements/ }).textContent;

async function startASketch() {
  const utils = render(<NewSketchClient />);
  await screen.findByRole("heading", { name: "Add" });
  await act(async () => {});
  return utils;
}

/** Draw something (delete the right pad), then save to the workspace through the dialog. */
async function editAndSave() {
  const user = userEvent.setup();
  const list = screen.getByRole("list", { name: "Elements of the sketch" });
  await user.click(within(list).getByRole("button", { name: /Contact s2/ }));
  fireEvent.keyDown(document.body, { key: "Delete" });
  expect(elementCount()).toBe("Elements (3)");
  await user.click(screen.getByTestId("save-to-workspace"));
  const dialog = await screen.findByTestId("scratch-save-dialog");
  await waitFor(() => expect(within(dialog).getByRole("combobox", { name: "Workspace" })).toHaveValue("w1"));
  await user.click(within(dialog).getByRole("button", { name: "Save as version 1" }));
  return dialog;
}

describe("saving the scratch sketch to a workspace", () => {
  it("clears the scratch copy kept in this browser: the next new sketch starts empty", async () => {
    window.localStorage.setItem(SCRATCH_KEY, JSON.stringify({ savedAt: "", sketch: beam() }));
    const posted = serve("ok");
    const first = await startASketch();
    expect(elementCount()).toBe("Elements (4)");
    await editAndSave();
    await waitFor(() => expect(push).toHaveBeenCalledWith("/sketches/sk1"));
    expect(posted).toHaveLength(1);
    expect((posted[0] as { document: { supports: unknown[] } }).document.supports).toHaveLength(1);
    expect(window.localStorage.getItem(SCRATCH_KEY)).toBeNull();
    // the page moves to the saved sketch: leaving keeps nothing behind (no last autosave)
    first.unmount();
    await act(async () => {});
    expect(window.localStorage.getItem(SCRATCH_KEY)).toBeNull();

    // "Start a sketch" again
    await startASketch();
    expect(elementCount()).toBe("Elements (0)");
    expect(screen.getByTestId("sketch-title")).not.toHaveTextContent("Beam on a pin and a contact");
  });

  it("a save that fails keeps the scratch sketch for the next visit", async () => {
    window.localStorage.setItem(SCRATCH_KEY, JSON.stringify({ savedAt: "", sketch: beam() }));
    serve("fails");
    const first = await startASketch();
    const dialog = await editAndSave();
    expect(await within(dialog).findByText("The database is not answering.")).toBeInTheDocument();
    expect(push).not.toHaveBeenCalled();
    first.unmount();
    await act(async () => {});
    expect(window.localStorage.getItem(SCRATCH_KEY)).not.toBeNull();

    await startASketch();
    // the work drawn before the failed save is still there
    expect(elementCount()).toBe("Elements (3)");
  });

  it("a cancelled save keeps it too", async () => {
    window.localStorage.setItem(SCRATCH_KEY, JSON.stringify({ savedAt: "", sketch: beam() }));
    serve("ok");
    const user = userEvent.setup();
    const first = await startASketch();
    await user.click(screen.getByTestId("save-to-workspace"));
    const dialog = await screen.findByTestId("scratch-save-dialog");
    await user.click(within(dialog).getByRole("button", { name: "Cancel" }));
    first.unmount();
    expect(window.localStorage.getItem(SCRATCH_KEY)).not.toBeNull();
    await startASketch();
    expect(elementCount()).toBe("Elements (4)");
  });
});
