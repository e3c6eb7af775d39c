// The scratch sketch's "Save to a workspace" while the workspaces are asked for: a calm line, not
// a form with an empty Workspace box that turns into something else; signed out, sign in or create
// an account, each coming back to the dialog; a server that does not answer is said, with a retry.
import { act, cleanup, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { createEditorStore } from "@/canvas/store";
import { EditorProvider } from "@/canvas/context";
import { withModalDialogs } from "./dialog-support";
import { beam, jsonResponse } from "./editor-helpers";
import { setSearch } from "../support/navigation";

const { ScratchSave } = await import("@/components/versions/editor/ScratchSave");

beforeAll(() => withModalDialogs());
beforeEach(() => setSearch("save=1"));
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

/** `/api/workspaces` answers only when `answer` is called. */
function heldWorkspaces() {
  let answer: (r: Response) => void = () => {};
  const fetch = vi.fn(
    (path: string) =>
      new Promise<Response>((resolve) => {
        if (path === "/api/workspaces") answer = resolve;
        else resolve(jsonResponse({ error: { code: "not_found", message: "no" } }, 404));
      }),
  );
  vi.stubGlobal("fetch", fetch);
  return { answer: (r: Response) => act(async () => answer(r)), fetch };
}

function open() {
  render(
    <EditorProvider editor={createEditorStore({ sketch: beam() })}>
      <ScratchSave />
    </EditorProvider>,
  );
  return screen.getByTestId("scratch-save-dialog");
}

describe("saving the scratch sketch while the workspaces load", () => {
  it("says it is finding the workspaces, with no form, then asks a signed-out user to sign in or create an account, each coming back", async () => {
    const api = heldWorkspaces();
    const dialog = open();
    expect(within(dialog).getByRole("status")).toHaveTextContent("Finding your workspaces…");
    expect(within(dialog).queryByRole("combobox", { name: "Workspace" })).toBeNull();
    expect(within(dialog).queryByRole("button", { name: "Save as version 1" })).toBeNull();
    await api.answer(jsonResponse({ error: { code: "unauthorized", message: "Sign in first." } }, 401));
    await waitFor(() => expect(within(dialog).getByRole("heading", { name: "Sign in to save this sketch" })).toBeInTheDocument());
    expect(within(dialog).queryByText("Finding your workspaces…")).toBeNull();
    const back = encodeURIComponent("/sketches/new?save=1");
    expect(within(dialog).getByRole("link", { name: "Sign in" })).toHaveAttribute("href", `/sign-in?next=${back}`);
    expect(within(dialog).getByRole("link", { name: "Create an account" })).toHaveAttribute("href", `/sign-up?next=${back}`);
  });

  it("keeps the workspace asked for in the way back", async () => {
    setSearch("save=1&workspace=w1");
    const api = heldWorkspaces();
    const dialog = open();
    await api.answer(jsonResponse({ error: { code: "unauthorized", message: "Sign in first." } }, 401));
    const back = encodeURIComponent("/sketches/new?save=1&workspace=w1");
    expect(await within(dialog).findByRole("link", { name: "Create an account" })).toHaveAttribute("href", `/sign-up?next=${back}`);
  });

  it("signed in, shows the form once the workspaces are there", async () => {
    const api = heldWorkspaces();
    const dialog = open();
    await api.answer(jsonResponse({ workspaces: [{ id: "w1", name: "Bay 4", role: "editor", personal: false }] }));
    await waitFor(() => expect(within(dialog).getByRole("combobox", { name: "Workspace" })).toHaveValue("w1"));
    expect(within(dialog).getByRole("combobox", { name: "Workspace" })).toBeEnabled();
    expect(within(dialog).queryByText("Finding your workspaces…")).toBeNull();
    expect(within(dialog).getByRole("button", { name: "Save as version 1" })).toBeEnabled();
  });

  it("says when the workspaces cannot be read, and tries again", async () => {
    const user = userEvent.setup();
    // the server's own failure: asked three times (two retries), then said
    const fetch = vi.fn(async () => jsonResponse({ error: { code: "internal", message: "The database is not answering." } }, 500));
    vi.stubGlobal("fetch", fetch);
    const dialog = open();
    const alert = await within(dialog).findByRole("alert", {}, { timeout: 10_000 });
    expect(alert).toHaveTextContent("Your workspaces could not be loaded");
    expect(alert).toHaveTextContent("The database is not answering.");
    expect(within(dialog).queryByRole("combobox", { name: "Workspace" })).toBeNull();
    fetch.mockImplementation(async () => jsonResponse({ workspaces: [{ id: "w1", name: "Bay 4", role: "editor", personal: false }] }));
    await user.click(within(dialog).getByRole("button", { name: "Try again" }));
    await waitFor(() => expect(within(dialog).getByRole("combobox", { name: "Workspace" })).toHaveValue("w1"));
  }, 15_000);
});
