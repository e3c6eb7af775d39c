// A drawing shown smaller than it was drawn (a phone's column) offers "Enlarge": a dialog with the
// same drawing, marks included, at its own width; at a size where its words read, no button.
import { act, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Enlargeable } from "@/components/review/Enlargeable";
import { withModalDialogs } from "./dialog-support";

let columnWidth = 0;
const observers: Array<() => void> = [];
const saved = globalThis.ResizeObserver;
beforeAll(() => {
  withModalDialogs();
  // the column's width as the browser would report it
  globalThis.ResizeObserver = class {
    constructor(private cb: ResizeObserverCallback) {}
    observe() {
      const fire = () => this.cb([{ contentRect: { width: columnWidth } } as ResizeObserverEntry], this as unknown as ResizeObserver);
      observers.push(fire);
      fire();
    }
    unobserve() {}
    disconnect() {}
  } as unknown as typeof ResizeObserver;
});
afterAll(() => {
  globalThis.ResizeObserver = saved;
});

const drawing = (
  <div data-testid="review-drawing" role="img" aria-label="Version 2">
    <svg width="640" height="400">
      <text>front jack 797.3 N</text>
      <g data-mark="changed" />
    </svg>
  </div>
);

describe("Enlarge on a drawing shown small", () => {
  it("opens the drawing at its own width, and closes", async () => {
    columnWidth = 358;
    render(
      <Enlargeable naturalWidth={640} label="Version 2">
        {drawing}
      </Enlargeable>,
    );
    await userEvent.setup().click(screen.getByRole("button", { name: "Enlarge: Version 2" }));
    const dialog = screen.getByTestId("enlarged-drawing");
    expect(dialog.hasAttribute("open")).toBe(true);
    const copy = dialog.querySelector("svg")!;
    expect(copy.textContent).toBe("front jack 797.3 N");
    expect(copy.querySelector("[data-mark='changed']")).not.toBeNull();
    expect((copy.parentElement!.parentElement as HTMLElement).style.width).toBe("640px");
    // the copy does not pose as the page's drawing
    expect(screen.getAllByTestId("review-drawing")).toHaveLength(1);
    await userEvent.setup().click(screen.getByRole("button", { name: "Close" }));
    expect(dialog.hasAttribute("open")).toBe(false);
  });

  it("offers nothing when the drawing is shown at 80 % of its width or more, and offers it once the column narrows", () => {
    columnWidth = 600;
    render(
      <Enlargeable naturalWidth={640} label="Version 3">
        {drawing}
      </Enlargeable>,
    );
    expect(screen.queryByRole("button", { name: /Enlarge/ })).toBeNull();
    columnWidth = 500;
    act(() => observers.forEach((f) => f()));
    expect(screen.getByRole("button", { name: "Enlarge: Version 3" })).toBeTruthy();
  });
});
