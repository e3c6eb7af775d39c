// The underlay's small value fields (top-left x / y, turn): text they cannot read is never thrown
// away, and its error never outlives it. Left with bad text, the field keeps the text and its error
// (naming the field); Escape puts the value back and clears the error; a change of the value from
// elsewhere (the drawing moved or replaced) ends the kept text; entering and leaving moves nothing.
import { act, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it, vi } from "vitest";
import { UnderlayPanel } from "@/components/editor/UnderlayPanel";
import { PersistenceCtx } from "@/components/editor/usePersistence";
import { EditorProvider } from "@/canvas/context";
import { createEditorStore } from "@/canvas/store";
import type { Command } from "@/canvas/commands/define";
import { moveUnderlay } from "@/canvas/commands/underlay";
import type { SketchPersistence } from "@/canvas/persistence";
import { emptySketch } from "@/canvas/model/elements";
import type { SketchFile } from "@/solver/schema";

const UPLOAD = "0b7d1f52-9a51-4c8e-8f4e-2a7b8c1d0e11";

function mount(origin: [number, number] = [0, 2]) {
  const sketch: SketchFile = { ...emptySketch("Skid"), underlay: { upload: UPLOAD, width: 1000, height: 600, origin, metresPerPixel: 0.005, rotation: 0, opacity: 0.6 } };
  const persistence: SketchPersistence = {
    kind: "saved",
    autosave: false,
    describe: () => "Skid · Test bay",
    load: async () => ({ ok: true, sketch, version: 1 }),
    save: async () => ({ ok: true, version: 2, savedAt: new Date().toISOString() }),
    uploadUnderlay: vi.fn(async (file: File) => ({ id: UPLOAD, width: 1000, height: 600, name: file.name })),
  };
  const store = createEditorStore({ sketch });
  render(
    <EditorProvider editor={store}>
      <PersistenceCtx.Provider value={persistence}>
        <UnderlayPanel />
        <button type="button">elsewhere</button>
      </PersistenceCtx.Provider>
    </EditorProvider>,
  );
  return store;
}

const errorOf = (field: HTMLElement) => (field.getAttribute("aria-describedby") ? document.getElementById(field.getAttribute("aria-describedby")!)?.textContent : null);

describe("an underlay value field", () => {
  it("left with text it cannot read, keeps the text and its error, which names the field; nothing is moved", async () => {
    const user = userEvent.setup();
    const store = mount();
    const x = screen.getByTestId("underlay-x");
    await user.clear(x);
    await user.type(x, "ten");
    await user.click(screen.getByText("elsewhere"));
    expect(x).toHaveValue("ten");
    expect(x).toHaveAttribute("aria-invalid", "true");
    expect(errorOf(x)).toBe('Top-left x: unknown name "ten": use a unit such as m, mm, ft, in (the underlay takes values with their units, not the sketch\'s parameters)');
    expect(store.getState().sketch.underlay!.origin).toEqual([0, 2]);
    // back in the field, the text is still there to put right
    await user.click(x);
    expect(x).toHaveValue("ten");
    await user.clear(x);
    await user.type(x, "10 m");
    await user.click(screen.getByText("elsewhere"));
    expect(store.getState().sketch.underlay!.origin).toEqual([10, 2]);
    expect(x).toHaveValue("10");
    expect(x).not.toHaveAttribute("aria-invalid");
    expect(errorOf(x)).toBeNull();
  });

  it("Escape puts the value back and clears the error with the text", async () => {
    const user = userEvent.setup();
    mount();
    const turn = screen.getByTestId("underlay-rotation");
    await user.clear(turn);
    await user.type(turn, "ten{Enter}");
    expect(errorOf(turn)).toMatch(/^Turn: unknown name "ten"/);
    await user.keyboard("{Escape}");
    expect(turn).toHaveValue("0");
    expect(turn).not.toHaveAttribute("aria-invalid");
    expect(errorOf(turn)).toBeNull();
    expect(screen.queryByRole("alert")).toBeNull();
    // and leaving it now commits nothing and says nothing
    await user.click(screen.getByText("elsewhere"));
    expect(turn).toHaveValue("0");
    expect(screen.queryByRole("alert")).toBeNull();
  });

  it("kept bad text ends when the value changes from elsewhere: the field reads the new value, with no error", async () => {
    const user = userEvent.setup();
    const store = mount();
    const y = screen.getByTestId("underlay-y");
    await user.clear(y);
    await user.type(y, "2 kg");
    await user.click(screen.getByText("elsewhere"));
    expect(y).toHaveValue("2 kg");
    expect(errorOf(y)).toMatch(/^Top-left y: /);
    act(() => store.getState().apply(moveUnderlay({ to: [1, 3] }) as Command<unknown>));
    expect(y).toHaveValue("3");
    expect(y).not.toHaveAttribute("aria-invalid");
    expect(screen.queryByRole("alert")).toBeNull();
  });

  it("entered and left without a change, moves nothing (the shown value is rounded to five figures)", async () => {
    const user = userEvent.setup();
    const store = mount([1.23456789, 2]);
    const x = screen.getByTestId("underlay-x");
    await user.click(x);
    expect(x).toHaveValue("1.2346");
    await user.click(screen.getByText("elsewhere"));
    expect(store.getState().sketch.underlay!.origin).toEqual([1.23456789, 2]);
    expect(store.getState().past).toHaveLength(0);
  });
});
