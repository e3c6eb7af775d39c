// The editor without a pointer: Enter or Space on a tray item adds the element at once (a body in
// the middle of the view, a support, load or port on the selected body), and a tray item or a
// shortcut asked for before any body exists says why nothing happened.
import { fireEvent, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { emptySketch } from "@/canvas/model/elements";
import type { SketchFile } from "@/solver/schema";
import { renderEditor, storedSketch } from "./editor-helpers";

const outlineRow = (name: RegExp) => within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name });
const corners = (s: SketchFile, i: number) => s.bodies[i].outline as number[][];

describe("the tray from the keyboard", () => {
  it("Enter on the body adds a 2 m × 1 m body, selected, instead of only choosing the tool; Enter on the pin puts it under that body", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(emptySketch());
    const body = screen.getByTestId("tray-body");
    body.focus();
    await user.keyboard("{Enter}");
    expect(outlineRow(/Body b1/)).toHaveAttribute("aria-pressed", "true");
    // the key placed the body; it did not also click the button (which would choose the drawing tool)
    expect(body).toHaveAttribute("aria-pressed", "false");
    expect(screen.getByTestId("notice")).toHaveTextContent(/Body added in the middle of the view, 2 m × 1 m/);
    await waitFor(() => expect(storedSketch(mem)?.bodies).toHaveLength(1));
    const [[x0, y0], [x1], [, y2]] = corners(storedSketch(mem)!, 0);
    expect(x1 - x0).toBeCloseTo(2, 9);
    expect(y2 - y0).toBeCloseTo(1, 9);

    const pin = screen.getByTestId("tray-pin");
    expect(pin).toHaveAttribute("aria-disabled", "false");
    pin.focus();
    await user.keyboard("{Enter}");
    expect(outlineRow(/Pin s1/)).toHaveAttribute("aria-pressed", "true");
    expect(pin).toHaveAttribute("aria-pressed", "false");
    expect(screen.getByTestId("notice")).toHaveTextContent("Pin added to Body 1.");
    // the middle of the body's bottom edge
    await waitFor(() => expect(storedSketch(mem)?.supports).toHaveLength(1));
    const at = storedSketch(mem)!.supports[0].at as number[];
    expect(at[0]).toBeCloseTo((x0 + x1) / 2, 9);
    expect(at[1]).toBeCloseTo(y0, 9);
    expect(storedSketch(mem)!.supports[0]).toMatchObject({ kind: "pin", body: "b1" });
  }, 15_000);

  it("Space on the polygon adds a polygon body whose corners are then edited in the properties", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(emptySketch());
    screen.getByTestId("tray-polygon").focus();
    await user.keyboard(" ");
    expect(outlineRow(/Body b1/)).toHaveAttribute("aria-pressed", "true");
    expect(screen.getByTestId("tray-polygon")).toHaveAttribute("aria-pressed", "false");
    expect(screen.getByLabelText("Corner 4 y")).toBeInTheDocument();
    await waitFor(() => expect(storedSketch(mem)?.bodies).toHaveLength(1));
    // one body for one key press: the key's click did not add a second or choose a tool
    expect(screen.getAllByRole("button", { name: /^Body b/ })).toHaveLength(1);
  });

  it("the arrow keys then move what was added, as the notice says, with the focus still on the tray", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(emptySketch());
    screen.getByTestId("tray-body").focus();
    await user.keyboard("{Enter}");
    const outlet = screen.getByTestId("tray-outlet");
    outlet.focus();
    await user.keyboard("{Enter}");
    expect(screen.getByTestId("notice")).toHaveTextContent("Outlet added to Body 1. Arrow keys move it");
    await waitFor(() => expect(storedSketch(mem)?.ports).toHaveLength(1));
    const [x, y] = storedSketch(mem)!.ports[0].at as number[];
    // a grid step a press (ten with Shift), the step following the zoom: right, then up
    await user.keyboard("{ArrowRight}");
    await waitFor(() => expect((storedSketch(mem)!.ports[0].at as number[])[0]).toBeGreaterThan(x));
    expect((storedSketch(mem)!.ports[0].at as number[])[1]).toBeCloseTo(y, 9);
    await user.keyboard("{Shift>}{ArrowUp}{/Shift}");
    await waitFor(() => expect((storedSketch(mem)!.ports[0].at as number[])[1]).toBeGreaterThan(y));
    expect(outlet).toHaveFocus();
    // and the tray's own buttons did not take the keys for anything else (no tool chosen)
    expect(outlet).toHaveAttribute("aria-pressed", "false");
  });

  it("a click still only chooses the tool", async () => {
    const user = userEvent.setup();
    await renderEditor(emptySketch());
    await user.click(screen.getByTestId("tray-polygon"));
    expect(screen.getByTestId("tray-polygon")).toHaveAttribute("aria-pressed", "true");
    expect(screen.queryByRole("button", { name: /^Body b/ })).toBeNull();
  });
});

describe("asking for a support before any body exists", () => {
  it("the P shortcut says to draw a body first", async () => {
    await renderEditor(emptySketch());
    expect(screen.getByTestId("notice")).toBeEmptyDOMElement();
    fireEvent.keyDown(document.body, { key: "p" });
    expect(screen.getByTestId("notice")).toHaveTextContent(/^Draw a body first/);
    expect(screen.getByTestId("tray-pin")).toHaveAttribute("aria-pressed", "false");
  });

  it("Enter or a click on a greyed tray item says the same and adds nothing", async () => {
    const user = userEvent.setup();
    await renderEditor(emptySketch());
    const force = screen.getByTestId("tray-force");
    force.focus();
    await user.keyboard("{Enter}");
    expect(screen.getByTestId("notice")).toHaveTextContent(/^Draw a body first/);
    fireEvent.keyDown(document.body, { key: "Escape" });
    expect(screen.getByTestId("notice")).toBeEmptyDOMElement();
    await user.click(force);
    expect(screen.getByTestId("notice")).toHaveTextContent(/^Draw a body first/);
    expect(screen.getByRole("heading", { name: /Elements/ })).toHaveTextContent("(0)");
  });
});
