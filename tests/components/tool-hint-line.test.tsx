// The status line while a tool is on: its words come from the tool, so a single placement (which
// hands back to selecting) takes them away with the tray button's pressed state; a refusal said
// under the tool goes with it; a touch screen reads taps and a Done button instead of Shift and Esc.
import { act, fireEvent, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { beam, renderEditor } from "./editor-helpers";
import { measuredAs } from "./canvas-support";

const SIZE = { width: 800, height: 600 };
let mocks: Array<{ mockRestore: () => void }> = [];
beforeEach(() => {
  mocks = [measuredAs(SIZE.width, SIZE.height)];
});
afterEach(() => mocks.splice(0).forEach((m) => m.mockRestore()));

const notice = () => screen.getByTestId("notice");

/** A world point of the drawing on screen (client px), by the view the canvas shows (`data-view`). */
async function onScreen(x: number, y: number): Promise<[number, number]> {
  let view: number[] = [];
  await waitFor(() => {
    view = (screen.getByTestId("sketch-canvas").getAttribute("data-view") ?? "").split(" ").map(Number);
    expect(view).toHaveLength(3);
    // the canvas is loaded on its own (the first time, Konva with it)
  }, { timeout: 8000 });
  const [scale, vx, vy] = view;
  return [vx + x * scale, vy - y * scale];
}

function press(x: number, y: number) {
  act(() => {
    screen.getByTestId("sketch-canvas").dispatchEvent(new MouseEvent("pointerdown", { clientX: x, clientY: y, button: 0, bubbles: true }));
  });
}

describe("the status line's hint follows the tool", () => {
  it("shows the pin's hint and a Done button while the tool is on, and neither once one pin is placed", async () => {
    const user = userEvent.setup();
    await renderEditor(beam());
    await user.click(screen.getByTestId("tray-pin"));
    expect(screen.getByTestId("tray-pin")).toHaveAttribute("aria-pressed", "true");
    expect(notice()).toHaveTextContent("Pin: click on or near a body's outline to place it (Shift+click to place several). Esc to stop.");
    expect(screen.getByTestId("stop-tool")).toHaveTextContent("Done");

    // a click on the beam's bottom edge places one pin and hands back to selecting
    press(...(await onScreen(1, 0)));
    await waitFor(() => expect(screen.getByTestId("tray-pin")).toHaveAttribute("aria-pressed", "false"));
    expect(screen.getByRole("heading", { name: /Elements/ })).toHaveTextContent("(5)");
    expect(notice()).not.toHaveTextContent(/Pin:|Esc to stop|Done stops/);
    expect(screen.queryByTestId("stop-tool")).toBeNull();
  }, 20_000);

  it("a click far from the beam is refused with the hint; Done puts the tool down and the refusal goes with it", async () => {
    const user = userEvent.setup();
    await renderEditor(beam());
    await user.click(screen.getByTestId("tray-roller"));
    // 2 m above the beam (0.5 m deep, 4 m long): empty paper
    press(...(await onScreen(2, 2.5)));
    expect(notice()).toHaveTextContent("Click on or near a body's outline to place a support.");
    expect(screen.getByRole("heading", { name: /Elements/ })).toHaveTextContent("(4)");
    expect(screen.getByTestId("tray-roller")).toHaveAttribute("aria-pressed", "true");
    await user.click(screen.getByTestId("stop-tool"));
    expect(screen.getByTestId("tray-roller")).toHaveAttribute("aria-pressed", "false");
    expect(notice()).toBeEmptyDOMElement();
  }, 20_000);

  it("writes a touch screen's words beside the keyboard's, each shown by its own layout", async () => {
    const user = userEvent.setup();
    await renderEditor(beam());
    await user.click(screen.getByTitle(/^Body \(rectangle\)/));
    const keys = screen.getByText(/^Body: drag a rectangle on the drawing, or click/);
    const touch = screen.getByText(/^Body: drag a rectangle on the drawing, or tap for one of the default size centred there\. Done stops\.$/);
    // the keyboard's words hide on a narrow or coarse-pointer layout, the touch words show only there
    expect(keys.className).toMatch(/max-md:hidden/);
    expect(keys.className).toMatch(/pointer-coarse:hidden/);
    expect(touch.className).toMatch(/(^| )hidden /);
    expect(touch.className).toMatch(/max-md:inline/);
    expect(touch).not.toHaveTextContent(/Esc|Shift/);
    fireEvent.keyDown(window, { key: "Escape" });
    await waitFor(() => expect(screen.queryByText(/^Body: drag a rectangle/)).toBeNull());
  });
});
