// Copy and paste through the browser's clipboard events, as Ctrl+C / Ctrl+V raise them: the editor
// writes its elements as text on copy, reads them back on paste, and leaves typing in fields and
// text selected on the page to the browser.
import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it, vi } from "vitest";
import { beam, renderEditor, storedSketch } from "./editor-helpers";

/** A clipboard event with its own data, as the browser hands one to the page. */
function clipboardEvent(type: "copy" | "cut" | "paste", data: Map<string, string>, target: EventTarget = window) {
  const ev = new Event(type, { bubbles: true, cancelable: true });
  Object.defineProperty(ev, "clipboardData", { value: { setData: (t: string, v: string) => data.set(t, v), getData: (t: string) => data.get(t) ?? "" } });
  target.dispatchEvent(ev);
  return ev;
}

const outline = () => within(screen.getByRole("list", { name: "Elements of the sketch" }));

describe("copy and paste in the editor", () => {
  it("copies the selected body with its elements, pastes a second one beside it, and undo takes it away", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(beam());
    await user.click(outline().getByRole("button", { name: /Body b1/ }));
    const data = new Map<string, string>();
    const copy = clipboardEvent("copy", data);
    expect(copy.defaultPrevented).toBe(true);
    const text = JSON.parse(data.get("text/plain")!);
    expect(text.format).toBe("counterpoise.elements");
    expect(text.bodies.map((b: { id: string }) => b.id)).toEqual(["b1"]);
    expect(await screen.findByText(/Copied 4 elements/)).toBeTruthy();
    const paste = clipboardEvent("paste", data);
    expect(paste.defaultPrevented).toBe(true);
    await waitFor(() => expect(outline().getAllByRole("button", { name: /^Body/ }).length).toBe(2));
    expect(screen.getByText(/Pasted 4 elements/)).toBeTruthy();
    await waitFor(() => expect(storedSketch(mem)?.bodies.length).toBe(2), { timeout: 3000 });
    await user.keyboard("{Control>}z{/Control}");
    await waitFor(() => expect(outline().getAllByRole("button", { name: /^Body/ }).length).toBe(1));
  }, 15_000);

  it("the properties panel's Copy and Paste buttons use the system clipboard the same way", async () => {
    const user = userEvent.setup();
    let held = "";
    const clipboard = { writeText: vi.fn(async (t: string) => void (held = t)), readText: vi.fn(async () => held) };
    Object.defineProperty(navigator, "clipboard", { value: clipboard, configurable: true });
    try {
      await renderEditor(beam());
      await user.click(outline().getByRole("button", { name: /Body b1/ }));
      const actions = within(screen.getByTestId("selection-actions"));
      await user.click(actions.getByRole("button", { name: "Copy" }));
      expect(clipboard.writeText).toHaveBeenCalledTimes(1);
      expect(JSON.parse(held).bodies.map((b: { id: string }) => b.id)).toEqual(["b1"]);
      await user.click(actions.getByRole("button", { name: "Paste" }));
      await waitFor(() => expect(outline().getAllByRole("button", { name: /^Body/ }).length).toBe(2));
    } finally {
      Reflect.deleteProperty(navigator, "clipboard");
    }
  }, 15_000);

  it("a cut removes the selection; text that is not ours, and pastes into a field, are left to the browser", async () => {
    const user = userEvent.setup();
    await renderEditor(beam());
    await user.click(outline().getByRole("button", { name: /Point force l1/ }));
    const data = new Map<string, string>();
    clipboardEvent("cut", data);
    await waitFor(() => expect(outline().queryByRole("button", { name: /Point force l1/ })).toBeNull());
    // in a field, a paste is the field's own
    const title = screen.getByLabelText("Title");
    expect(clipboardEvent("paste", data, title).defaultPrevented).toBe(false);
    // plain text on the page: not ours
    expect(clipboardEvent("paste", new Map([["text/plain", "12 kN"]])).defaultPrevented).toBe(false);
    // back on the drawing: the load returns on the body it was cut from (the only body)
    expect(clipboardEvent("paste", data).defaultPrevented).toBe(true);
    await waitFor(() => expect(outline().getByRole("button", { name: /Point force l1/ })).toBeTruthy());
  }, 15_000);
});
