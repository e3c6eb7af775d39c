// Snapping turned off (tracing a drawing whose lines are off the grid) stays off after a reload,
// as the reader's units do; on when nothing is stored.
import { screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it } from "vitest";
import { SNAP_KEY } from "@/components/sketches/format";
import { beam, renderEditor } from "./editor-helpers";

afterEach(() => window.localStorage.clear());

const snapBox = () => screen.getByRole("checkbox", { name: /snap/i });

describe("the snap setting", () => {
  it("is on in a browser that has never turned it off", async () => {
    await renderEditor(beam());
    expect(snapBox()).toBeChecked();
  });

  it("is kept in the browser and read again when the editor opens", async () => {
    const user = userEvent.setup();
    const first = await renderEditor(beam());
    await user.click(snapBox());
    expect(snapBox()).not.toBeChecked();
    expect(window.localStorage.getItem(SNAP_KEY)).toBe("off");
    first.unmount();
    const second = await renderEditor(beam());
    expect(snapBox()).not.toBeChecked();
    await user.click(snapBox());
    expect(window.localStorage.getItem(SNAP_KEY)).toBe("on");
    second.unmount();
    await renderEditor(beam());
    expect(snapBox()).toBeChecked();
  });
});
