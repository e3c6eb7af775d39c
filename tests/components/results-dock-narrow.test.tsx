// The results dock on a phone: the drawing above it keeps a usable height (at least 45 % of the
// screen) whatever tab is open, the studies included, and the dock scrolls what does not fit;
// the line between them cannot be dragged past that. Wider windows keep their heights.
import { act, cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { createEditorStore } from "@/canvas/store";
import { EditorProvider } from "@/canvas/context";
import { importSketchText } from "@/canvas/files";
import type { ActionContext } from "@/canvas/actions";
import { ActionContextCtx } from "@/components/editor/useActions";
import { DRAWING_SHARE, dockLimit, ResultsDock } from "@/components/results/ResultsDock";
import { beam, mountResultsDock } from "./editor-helpers";

const size = { width: window.innerWidth, height: window.innerHeight };
function windowOf(width: number, height: number) {
  Object.defineProperty(window, "innerWidth", { configurable: true, value: width });
  Object.defineProperty(window, "innerHeight", { configurable: true, value: height });
}
const heightOf = (el: HTMLElement) => parseFloat(el.style.height);

beforeEach(() => window.localStorage.removeItem("counterpoise:results-height"));
afterEach(() => {
  windowOf(size.width, size.height);
  window.localStorage.removeItem("counterpoise:results-height");
});

describe("the results dock on a phone", () => {
  it("leaves the drawing at least 45 % of a 390 × 844 screen with the reactions, the cases or the sweep open", async () => {
    const user = userEvent.setup();
    windowOf(390, 844);
    mountResultsDock(beam());
    const dock = screen.getByTestId("results-dock");
    // unmeasured, the phone's toolbar, sketch name and hint line are taken as 190 px
    const drawing = () => 844 - 190 - heightOf(dock);
    for (const tab of ["Reactions", "Cases", "Sweep", "Hand check"]) {
      await user.click(screen.getByRole("tab", { name: tab }));
      expect(drawing(), tab).toBeGreaterThanOrEqual(DRAWING_SHARE * 844);
      // and the dock still shows its tabs and a line or two, scrolled
      expect(heightOf(dock), tab).toBeGreaterThanOrEqual(120);
    }
    // the line between them does not give the dock more than that
    const line = screen.getByRole("separator", { name: /Resize the results/ });
    const before = heightOf(dock);
    line.focus();
    await user.keyboard("{ArrowUp}{ArrowUp}{ArrowUp}{ArrowUp}");
    expect(heightOf(dock)).toBe(before);
    await user.keyboard("{ArrowDown}");
    expect(heightOf(dock)).toBe(before - 24);
  });

  it("holds a height saved on a laptop to the phone's rule", () => {
    window.localStorage.setItem("counterpoise:results-height", "500");
    windowOf(390, 844);
    mountResultsDock(beam());
    expect(844 - 190 - heightOf(screen.getByTestId("results-dock"))).toBeGreaterThanOrEqual(DRAWING_SHARE * 844);
  });

  describe("measured on the page", () => {
    // the column under the toolbar (148 px on a phone): the drawing (flex-1), the hint line (36 px), the dock
    const real = HTMLElement.prototype.getBoundingClientRect;
    beforeEach(() => {
      HTMLElement.prototype.getBoundingClientRect = function (this: HTMLElement) {
        const dock = this.parentElement?.querySelector<HTMLElement>("[data-testid=results-dock]");
        const id = this.dataset.testid;
        const h = id === "results-dock" ? heightOf(this) : id === "drawing" && dock ? window.innerHeight - 148 - 36 - heightOf(dock) : 0;
        return { x: 0, y: 0, top: 0, left: 0, width: window.innerWidth, height: h, right: window.innerWidth, bottom: h, toJSON: () => ({}) } as DOMRect;
      };
    });
    afterEach(() => {
      HTMLElement.prototype.getBoundingClientRect = real;
      cleanup();
    });

    function mountInColumn() {
      const file = importSketchText(JSON.stringify(beam()));
      if (!file.ok) throw new Error("fixture does not import");
      const ctx = { stores: null as never, controller: null, ui: {} as ActionContext["ui"] };
      render(
        <EditorProvider editor={createEditorStore({ sketch: file.sketch })}>
          <ActionContextCtx.Provider value={() => ctx}>
            <main>
              <div data-testid="drawing" />
              <p>Drag: move · two fingers: zoom and pan</p>
              <ResultsDock />
            </main>
          </ActionContextCtx.Provider>
        </EditorProvider>,
      );
      return screen.getByTestId("results-dock");
    }

    it("gives the drawing 45 % of the screen from the room the drawing and the dock share, and follows the window", async () => {
      const user = userEvent.setup();
      windowOf(390, 844);
      const dock = mountInColumn();
      await user.click(screen.getByRole("tab", { name: "Cases" }));
      // 844 − 148 − 36 = 660 px shared; the drawing keeps 0.45 × 844 = 379.8 px of it
      expect(heightOf(dock)).toBe(280);
      expect(660 - heightOf(dock)).toBeGreaterThanOrEqual(DRAWING_SHARE * 844);
      // a smaller phone (375 × 667): 483 px shared, 300.15 px of it the drawing's
      windowOf(375, 667);
      act(() => void window.dispatchEvent(new Event("resize")));
      expect(heightOf(dock)).toBe(182);
      expect(483 - heightOf(dock)).toBeGreaterThanOrEqual(DRAWING_SHARE * 667);
    });
  });
});

describe("the dock's limit", () => {
  it("is the window less 260 px from a tablet's width up, and keeps 45 % for the drawing below it", () => {
    expect(dockLimit(800, 1280)).toBe(540);
    expect(dockLimit(844, 640)).toBe(584);
    expect(dockLimit(844, 639)).toBe(274);
    expect(dockLimit(844, 390, 660)).toBe(280);
    // a very short phone keeps the dock's tabs
    expect(dockLimit(400, 390, 220)).toBe(120);
  });

  it("leaves a laptop's Cases tab at half the window", async () => {
    const user = userEvent.setup();
    windowOf(1280, 800);
    mountResultsDock(beam());
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    expect(heightOf(screen.getByTestId("results-dock"))).toBe(400);
  });
});
