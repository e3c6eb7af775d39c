// The editor without a pointer: Enter or Space on a tray item adds the element at once (a body in
// the middle of the view, a support, load or port on the selected body), and a tray item or a
// shortcut asked for before any body exists says why nothing happened.
import { act, fireEvent, screen, waitFor, within } from "@testing-library/react";
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
    act(() => body.focus());
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
    act(() => pin.focus());
    await user.keyboard("{Enter}");
    expect(outlineRow(/Pin s1/)).toHaveAttribute("aria-pressed", "true");
    expect(pin).toHaveAttribute("aria-pressed", "false");
    expect(screen.getByTestId("notice")).toHaveTextContent(/^Pin added to Body 1 near the left end of its bottom edge \(x = .+ m, y = .+ m\)\. Arrow keys move it .+ m a press, Shift\+arrow .+ m\.$/);
    // an eighth of the body's bottom edge in from its left corner
    await waitFor(() => expect(storedSketch(mem)?.supports).toHaveLength(1));
    const at = storedSketch(mem)!.supports[0].at as number[];
    expect(at[0]).toBeCloseTo(x0 + (x1 - x0) / 8, 9);
    expect(at[1]).toBeCloseTo(y0, 9);
    expect(storedSketch(mem)!.supports[0]).toMatchObject({ kind: "pin", body: "b1" });
  }, 15_000);

  it("two contacts with friction added by Enter stand near the two ends of the base, and the status says where each went", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(emptySketch());
    act(() => screen.getByTestId("tray-body").focus());
    await user.keyboard("{Enter}");
    await waitFor(() => expect(storedSketch(mem)?.bodies).toHaveLength(1));
    const [[x0, y0], [x1]] = corners(storedSketch(mem)!, 0);
    const contact = screen.getByTestId("tray-contact-friction");
    act(() => contact.focus());
    await user.keyboard("{Enter}");
    expect(screen.getByTestId("notice")).toHaveTextContent(/^Contact with friction added to Body 1 near the left end of its bottom edge/);
    // the second goes on the same body (the first is selected), at the other end
    act(() => contact.focus());
    await user.keyboard("{Enter}");
    expect(screen.getByTestId("notice")).toHaveTextContent(/^Contact with friction added to Body 1 near the right end of its bottom edge/);
    await waitFor(() => expect(storedSketch(mem)?.supports).toHaveLength(2));
    const [a, b] = storedSketch(mem)!.supports.map((s) => s.at as number[]);
    expect(a[0]).toBeCloseTo(x0 + (x1 - x0) / 8, 9);
    expect(b[0]).toBeCloseTo(x1 - (x1 - x0) / 8, 9);
    expect(a[1]).toBeCloseTo(y0, 9);
    expect(b[1]).toBeCloseTo(y0, 9);
    // three quarters of the base between them
    expect(b[0] - a[0]).toBeCloseTo(0.75 * (x1 - x0), 9);
  }, 15_000);

  it("Space on the polygon adds a polygon body whose corners are then edited in the properties", async () => {
    const user = userEvent.setup();
    const { mem } = await renderEditor(emptySketch());
    act(() => screen.getByTestId("tray-polygon").focus());
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
    act(() => screen.getByTestId("tray-body").focus());
    await user.keyboard("{Enter}");
    const outlet = screen.getByTestId("tray-outlet");
    act(() => outlet.focus());
    await user.keyboard("{Enter}");
    expect(screen.getByTestId("notice")).toHaveTextContent(/^Outlet added to Body 1 at the middle of its right side \(x = .+\)\. Arrow keys move it/);
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
    act(() => force.focus());
    await user.keyboard("{Enter}");
    expect(screen.getByTestId("notice")).toHaveTextContent(/^Draw a body first/);
    fireEvent.keyDown(document.body, { key: "Escape" });
    expect(screen.getByTestId("notice")).toBeEmptyDOMElement();
    await user.click(force);
    expect(screen.getByTestId("notice")).toHaveTextContent(/^Draw a body first/);
    expect(screen.getByRole("heading", { name: /Elements/ })).toHaveTextContent("(0)");
  });
});

describe("the tray's tooltips for the keyboard", () => {
  it("the focused item's words show under the tray (a title never shows for the keyboard), and go with the focus", async () => {
    const user = userEvent.setup();
    await renderEditor(emptySketch());
    expect(screen.queryByTestId("tray-focus-hint")).toBeNull();
    act(() => screen.getByTestId("tray-pin").focus());
    expect(screen.getByTestId("tray-focus-hint")).toHaveTextContent("Pin (P): draw a body first.");
    act(() => screen.getByTestId("tray-body").focus());
    expect(screen.getByTestId("tray-focus-hint")).toHaveTextContent(/^Body \(rectangle\) \(B\): Drag on the canvas to draw a rectangle.* Enter adds it now\.$/);
    await user.keyboard("{Enter}");
    act(() => screen.getByTestId("tray-contact-friction").focus());
    expect(screen.getByTestId("tray-focus-hint")).toHaveTextContent("Contact with friction (Shift+C): Pushes only, and holds sideways up to μ times the normal force. Enter adds it now.");
    await user.tab();
    expect(screen.getByTestId("tray-focus-hint")).toHaveTextContent(/^Fixed support \(X\)/);
    act(() => screen.getByTestId("tray-fixed").blur());
    expect(screen.queryByTestId("tray-focus-hint")).toBeNull();
  });
});
