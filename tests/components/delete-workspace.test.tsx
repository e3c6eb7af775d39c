// Deleting a workspace from its page (at once and for good): the dialog says so first, what goes,
// offers the workspace's export right there, and deletes
// only once the workspace's name is typed again; a wrong name or the server's refusal is said under
// the field, and what was typed stays.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { ApiError } from "@/lib/api-client";
import { withModalDialogs } from "./dialog-support";
import { router } from "../support/navigation";

const apiFetch = vi.hoisted(() => vi.fn());
vi.mock("@/lib/api-client", async (original) => ({ ...(await original<typeof import("@/lib/api-client")>()), apiFetch }));
const { DeleteWorkspace, whatGoes } = await import("@/components/workspaces/DeleteWorkspace");

withModalDialogs();
const WS = "6d656d6f-0000-4000-8000-000000000009";
const contents = { sketches: 3, versions: 11, approved: 2, comments: 7, uploads: 4, members: 5 };

function show(c = contents) {
  return render(
    <QueryClientProvider client={new QueryClient()}>
      <DeleteWorkspace workspaceId={WS} name="Booster station 4" contents={c} />
    </QueryClientProvider>,
  );
}

beforeEach(() => {
  apiFetch.mockReset();
  router.push.mockReset();
});

describe("deleting a workspace", () => {
  it("lists what goes, one line per kind, and leaves out kinds it has none of", () => {
    expect(whatGoes(contents)).toEqual([
      "3 sketches with 11 versions, 2 of them approved, with their sign-off records",
      "7 comments",
      "4 uploaded files (drawings traced over, attachments)",
      "the membership of 4 other people, who will be told by mail",
    ]);
    expect(whatGoes({ sketches: 1, versions: 1, approved: 0, comments: 0, uploads: 0, members: 1 })).toEqual(["1 sketch with 1 version"]);
    expect(whatGoes({ sketches: 0, versions: 0, approved: 0, comments: 0, uploads: 0, members: 2 })).toEqual(["the membership of 1 other person, who will be told by mail"]);
  });

  it("opens a dialog that says what goes and how to keep copies first", async () => {
    const user = userEvent.setup();
    show();
    await user.click(screen.getByRole("button", { name: "Delete workspace…" }));
    const dialog = screen.getByTestId("delete-workspace-dialog");
    expect(within(dialog).getByRole("heading", { name: "Delete “Booster station 4”?" })).toBeTruthy();
    expect(within(dialog).getByTestId("delete-workspace-contents").textContent).toContain("3 sketches with 11 versions, 2 of them approved");
    // said first, in plain words: at once and for good
    expect(within(dialog).getByTestId("delete-workspace-final").textContent).toBe("This happens at once and cannot be undone: there is no bin to restore it from, for you or anyone else.");
    const copy = within(dialog).getByRole("region", { name: "Keep a copy first" });
    expect(within(copy).getByRole("link", { name: "Download all sketches (JSON)" })).toHaveAttribute("href", `/api/workspaces/${WS}/export`);
    expect(copy.textContent).toContain("calc sheet (PDF)");
    expect(copy.textContent).toContain("Uploaded files are not in the JSON file.");
    expect(dialog.textContent).not.toContain("There is no export");
    expect(within(dialog).getByLabelText("Type the workspace’s name, “Booster station 4”, to confirm")).toBeTruthy();
  });

  it("downloads the copy from inside the dialog and says so there, the name field and Delete untouched", async () => {
    const saved: string[] = [];
    vi.stubGlobal("URL", Object.assign(URL, { createObjectURL: () => "blob:export", revokeObjectURL: () => {} }));
    const click = vi.spyOn(HTMLAnchorElement.prototype, "click").mockImplementation(function (this: HTMLAnchorElement) {
      if (this.download) saved.push(this.download);
    });
    const fetched = vi.fn(async () => new Response('{"sketches":[]}', { status: 200, headers: { "content-disposition": 'attachment; filename="booster-station-4-sketches-2026-12-05.json"' } }));
    vi.stubGlobal("fetch", fetched);
    try {
      const user = userEvent.setup();
      show();
      await user.click(screen.getByRole("button", { name: "Delete workspace…" }));
      const copy = screen.getByRole("region", { name: "Keep a copy first" });
      await user.click(within(copy).getByRole("link", { name: "Download all sketches (JSON)" }));
      expect(await within(copy).findByRole("status")).toHaveTextContent("Downloaded booster-station-4-sketches-2026-12-05.json.");
      expect(fetched).toHaveBeenCalledWith(`/api/workspaces/${WS}/export`, expect.anything());
      expect(saved).toEqual(["booster-station-4-sketches-2026-12-05.json"]);
      expect(screen.getByTestId("delete-workspace-dialog")).toBeVisible();
      expect(apiFetch).not.toHaveBeenCalled();
    } finally {
      click.mockRestore();
      vi.unstubAllGlobals();
    }
  });

  it("offers no copy for a workspace without sketches, and still says it is final", async () => {
    const user = userEvent.setup();
    show({ sketches: 0, versions: 0, approved: 0, comments: 0, uploads: 0, members: 1 });
    await user.click(screen.getByRole("button", { name: "Delete workspace…" }));
    const dialog = screen.getByTestId("delete-workspace-dialog");
    expect(within(dialog).queryByRole("region", { name: "Keep a copy first" })).toBeNull();
    expect(dialog.textContent).toContain("It holds no sketches, comments or files.");
    expect(within(dialog).getByTestId("delete-workspace-final")).toBeTruthy();
  });

  it("refuses a name that does not match under the field, sends nothing, and keeps what was typed", async () => {
    const user = userEvent.setup();
    show();
    await user.click(screen.getByRole("button", { name: "Delete workspace…" }));
    const field = screen.getByLabelText("Type the workspace’s name, “Booster station 4”, to confirm") as HTMLInputElement;
    await user.type(field, "Booster station");
    await user.click(screen.getByRole("button", { name: "Delete the workspace" }));
    expect(apiFetch).not.toHaveBeenCalled();
    expect(field.getAttribute("aria-invalid")).toBe("true");
    expect(document.getElementById(field.getAttribute("aria-describedby")!)!.textContent).toBe("Type “Booster station 4” to confirm.");
    expect(field.value).toBe("Booster station");
  });

  it("deletes with the name typed and goes to the workspaces list, which says so", async () => {
    apiFetch.mockResolvedValue({ workspace: { id: WS, deleted: true } });
    const user = userEvent.setup();
    show();
    await user.click(screen.getByRole("button", { name: "Delete workspace…" }));
    await user.type(screen.getByLabelText("Type the workspace’s name, “Booster station 4”, to confirm"), "Booster station 4");
    await user.click(screen.getByRole("button", { name: "Delete the workspace" }));
    await vi.waitFor(() => expect(router.push).toHaveBeenCalledWith(`/workspaces?deleted=${WS}`));
    expect(apiFetch).toHaveBeenCalledWith(`/api/workspaces/${WS}`, { method: "DELETE", body: { confirmName: "Booster station 4" } });
  });

  it("says the server's refusal under the field (an owner no more), keeping the name typed", async () => {
    apiFetch.mockRejectedValue(new ApiError(403, "forbidden", "As an editor in this workspace you may not delete the workspace: that is for owners.", []));
    const user = userEvent.setup();
    show();
    await user.click(screen.getByRole("button", { name: "Delete workspace…" }));
    const field = screen.getByLabelText("Type the workspace’s name, “Booster station 4”, to confirm") as HTMLInputElement;
    await user.type(field, "Booster station 4");
    await user.click(screen.getByRole("button", { name: "Delete the workspace" }));
    await vi.waitFor(() => expect(field.getAttribute("aria-invalid")).toBe("true"));
    expect(document.getElementById(field.getAttribute("aria-describedby")!)!.textContent).toMatch(/may not delete the workspace: that is for owners\.$/);
    expect(field.value).toBe("Booster station 4");
    expect(router.push).not.toHaveBeenCalled();
  });
});
