// The "Add" drawer on a phone-width screen lies over the drawing: a pick closes it, whether the
// pick chooses a tool (a click) or adds the element at once (Enter or Space). Wider screens keep
// the tray beside the drawing as it was.
import { act, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it } from "vitest";
import { beam, renderEditor } from "./editor-helpers";

/** A window `width` px wide, as far as CSS media queries of the form (max-width: N px) go. */
function windowWidth(width: number) {
  window.matchMedia = ((query: string) => {
    const max = /\(max-width:\s*(\d+)px\)/.exec(query);
    return {
      matches: max ? width <= Number(max[1]) : false,
      media: query,
      onchange: null,
      addListener() {},
      removeListener() {},
      addEventListener() {},
      removeEventListener() {},
      dispatchEvent: () => false,
    } as MediaQueryList;
  }) as typeof window.matchMedia;
}

afterEach(() => {
  delete (window as { matchMedia?: unknown }).matchMedia;
});

const toggle = () => screen.getByTestId("toggle-tray");
const drawer = () => document.getElementById("tray-panel")!;
/** The drawer is shown on a narrow screen while its class does not hide it there. */
const drawerShown = () => !drawer().className.split(/\s+/).includes("max-sm:hidden");

describe("the Add drawer on a 390 px screen", () => {
  it("closes after a pick that keeps the kind of tool (a pin chosen, then a roller instead)", async () => {
    windowWidth(390);
    const user = userEvent.setup();
    await renderEditor(beam());
    await user.click(toggle());
    expect(toggle()).toHaveAttribute("aria-expanded", "true");
    expect(drawerShown()).toBe(true);
    await user.click(screen.getByTestId("tray-pin"));
    await waitFor(() => expect(toggle()).toHaveAttribute("aria-expanded", "false"));
    expect(drawerShown()).toBe(false);
    // the pin is still the tool; opened again, the drawer closes once the roller is picked
    await user.click(toggle());
    expect(drawerShown()).toBe(true);
    await user.click(screen.getByTestId("tray-roller"));
    await waitFor(() => expect(drawerShown()).toBe(false));
    expect(toggle()).toHaveAttribute("aria-expanded", "false");
    expect(screen.getByTestId("tray-roller")).toHaveAttribute("aria-pressed", "true");
  });

  it("closes after Enter adds the element at once, and leaves the focus on the Add button", async () => {
    windowWidth(390);
    const user = userEvent.setup();
    await renderEditor(beam());
    await user.click(toggle());
    expect(drawerShown()).toBe(true);
    act(() => screen.getByTestId("tray-force").focus());
    await user.keyboard("{Enter}");
    expect(screen.getByTestId("notice")).toHaveTextContent(/^Point force added to Beam/);
    await waitFor(() => expect(drawerShown()).toBe(false));
    expect(toggle()).toHaveAttribute("aria-expanded", "false");
    expect(toggle()).toHaveFocus();
  });

  it("stays open for a greyed item picked before any body exists, which adds nothing", async () => {
    windowWidth(390);
    const user = userEvent.setup();
    await renderEditor({ ...beam(), bodies: [], supports: [], loads: [] });
    await user.click(toggle());
    await user.click(screen.getByTestId("tray-pin"));
    expect(screen.getByTestId("notice")).toHaveTextContent(/^Draw a body first/);
    await new Promise((r) => setTimeout(r, 20));
    expect(drawerShown()).toBe(true);
  });
});

describe("the tray on a 1440 px screen", () => {
  it("is left as it is by a pick, and the focus stays on the item", async () => {
    windowWidth(1440);
    const user = userEvent.setup();
    await renderEditor(beam());
    const settle = () => new Promise((r) => setTimeout(r, 20));
    await user.click(toggle());
    expect(toggle()).toHaveAttribute("aria-expanded", "true");
    const force = screen.getByTestId("tray-force");
    act(() => force.focus());
    await user.keyboard("{Enter}");
    expect(screen.getByTestId("notice")).toHaveTextContent(/^Point force added to Beam/);
    await settle();
    expect(toggle()).toHaveAttribute("aria-expanded", "true");
    expect(force).toHaveFocus();
    // with a placing tool already chosen, picking another kind leaves the tray alone too
    await user.click(screen.getByTestId("tray-pin"));
    await user.click(toggle());
    expect(toggle()).toHaveAttribute("aria-expanded", "true");
    await user.click(screen.getByTestId("tray-roller"));
    await settle();
    expect(toggle()).toHaveAttribute("aria-expanded", "true");
    expect(screen.getByTestId("tray-roller")).toHaveAttribute("aria-pressed", "true");
  });
});
