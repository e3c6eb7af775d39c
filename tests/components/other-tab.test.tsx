// The scratch sketch open in two tabs of one browser: both keep it under one key in local storage,
// so a write from the other tab (heard as a storage event) stops this tab writing until the user
// chooses; nothing either tab drew is replaced unseen.
import { act, fireEvent, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { SCRATCH_KEY } from "@/canvas/persistence";
import type { SketchFile } from "@/solver/schema";
import { beam, renderEditor, storedSketch } from "./editor-helpers";

/** The other tab keeps `sketch` (null: it removed the key), as the browser tells this one. */
function otherTabKeeps(mem: Map<string, string>, sketch: SketchFile | null) {
  const value = sketch ? JSON.stringify({ savedAt: "", sketch }) : null;
  if (value) mem.set(SCRATCH_KEY, value);
  else mem.delete(SCRATCH_KEY);
  act(() => {
    window.dispatchEvent(new StorageEvent("storage", { key: SCRATCH_KEY, newValue: value }));
  });
}

/** Past the autosave's quiet time (350 ms). */
const pause = () => act(() => new Promise((r) => setTimeout(r, 500)));

async function retitle(user: ReturnType<typeof userEvent.setup>, title: string) {
  const field = screen.getByLabelText("Title");
  await user.clear(field);
  await user.type(field, `${title}{Enter}`);
}

afterEach(() => vi.restoreAllMocks());

describe("the scratch sketch changed in another tab", () => {
  it("stops this tab writing over it, and Open the other tab's sketch takes it with Undo back to this one", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam());
    await retitle(user, "Mine");
    await pause();
    expect(storedSketch(mem)?.title).toBe("Mine");

    otherTabKeeps(mem, { ...beam(), title: "Theirs" });
    expect(await screen.findByTestId("other-tab")).toHaveTextContent("This sketch was changed in another tab or window.");
    // an edit here while the question is open is not written over the other tab's
    await retitle(user, "Mine again");
    await pause();
    expect(storedSketch(mem)?.title).toBe("Theirs");

    await user.click(screen.getByRole("button", { name: "Open the other tab’s sketch" }));
    expect(screen.queryByTestId("other-tab")).toBeNull();
    expect(screen.getByLabelText("Title")).toHaveValue("Theirs");
    await pause();
    expect(storedSketch(mem)?.title).toBe("Theirs");
    // this tab's sketch is one Undo away, and kept again once it is back
    fireEvent.keyDown(window, { key: "z", ctrlKey: true });
    await waitFor(() => expect(screen.getByLabelText("Title")).toHaveValue("Mine again"));
    await pause();
    expect(storedSketch(mem)?.title).toBe("Mine again");
  }, 15_000);

  it("Keep this tab's sketch writes it at once, over the other's", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam());
    await retitle(user, "Mine");
    await pause();
    otherTabKeeps(mem, { ...beam(), title: "Theirs" });
    await user.click(await screen.findByRole("button", { name: "Keep this tab’s sketch" }));
    expect(screen.queryByTestId("other-tab")).toBeNull();
    await waitFor(() => expect(storedSketch(mem)?.title).toBe("Mine"));
  });

  it("asks nothing when the other tab keeps the very sketch shown here", async () => {
    const { mem } = await renderEditor(beam());
    otherTabKeeps(mem, beam());
    await pause();
    expect(screen.queryByTestId("other-tab")).toBeNull();
  });

  it("a sketch cleared in the other tab (saved to a workspace there) is not written back unasked", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam());
    otherTabKeeps(mem, null);
    expect(await screen.findByTestId("other-tab")).toHaveTextContent("The sketch kept in this browser was cleared in another tab or window.");
    await user.click(screen.getByRole("button", { name: "Leave it cleared" }));
    await pause();
    expect(mem.has(SCRATCH_KEY)).toBe(false);
    // from this tab's next change it is kept again
    await retitle(user, "Mine");
    await pause();
    expect(storedSketch(mem)?.title).toBe("Mine");
  });
});
