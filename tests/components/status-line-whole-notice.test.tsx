// The status line is two lines tall, always: a longer notice is cut there. Its whole text opens
// over the foot of the drawing from a "More" button, so keyboard and touch users read it too (a
// tooltip shows to a mouse only), and the line itself does not grow or move. The notice here is a
// delete's: it names each kept sweep it changed by its range, in the parameter's unit.
import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { skidWithKeptSweeps } from "../fixtures/skid-kept-sweeps";
import { renderEditor } from "./editor-helpers";

const skid = () => skidWithKeptSweeps(true);

// jsdom lays nothing out: the notice's two lines hold 30 px, and a text longer than 90 characters
// runs past them (the browser measures the same way: scrollHeight above clientHeight)
const LINES = 30;
const saved = {
  scroll: Object.getOwnPropertyDescriptor(HTMLElement.prototype, "scrollHeight"),
  client: Object.getOwnPropertyDescriptor(HTMLElement.prototype, "clientHeight"),
};
beforeAll(() => {
  Object.defineProperty(HTMLElement.prototype, "clientHeight", { configurable: true, get: () => LINES });
  Object.defineProperty(HTMLElement.prototype, "scrollHeight", {
    configurable: true,
    get(this: HTMLElement) {
      return (this.textContent ?? "").length > 90 ? LINES * 2 : LINES;
    },
  });
});
afterAll(() => {
  for (const [key, d] of [["scrollHeight", saved.scroll], ["clientHeight", saved.client]] as const) {
    if (d) Object.defineProperty(HTMLElement.prototype, key, d);
    else Reflect.deleteProperty(HTMLElement.prototype, key);
  }
});

const outline = () => within(screen.getByRole("list", { name: "Elements of the sketch" }));
const WHOLE =
  "Deleted 1 element. The kept sweep of p from 0 to 10 bar no longer plots front pad; the kept sweep of p from 0 to 20 bar plotted only front pad and is gone. Undo brings them back.";

describe("a notice longer than the status line", () => {
  it("gets a More button that opens the whole text over the drawing; Escape folds it and gives the focus back", async () => {
    const user = userEvent.setup();
    await renderEditor(skid());
    await user.click(outline().getByRole("button", { name: /front pad/ }));
    // a short notice fits: no button
    expect(screen.queryByTestId("notice-more")).toBeNull();
    await user.keyboard("{Delete}");
    const notice = screen.getByTestId("notice");
    await waitFor(() => expect(notice).toHaveTextContent(WHOLE));
    const more = await screen.findByRole("button", { name: "More of the message" });
    expect(more).toHaveTextContent("More");
    expect(more).toHaveAttribute("aria-expanded", "false");
    expect(screen.queryByRole("region", { name: "The whole message" })).toBeNull();

    // the keyboard reaches it and opens it
    more.focus();
    await user.keyboard("{Enter}");
    const whole = screen.getByRole("region", { name: "The whole message" });
    expect(whole).toHaveTextContent(WHOLE);
    expect(more).toHaveAttribute("aria-expanded", "true");
    expect(more).toHaveAttribute("aria-controls", whole.id);
    expect(more).toHaveAccessibleName("Less of the message");
    // laid over the drawing: the status line keeps its height, the live region its clamp
    expect(whole.className).toMatch(/\babsolute\b/);
    expect(whole.className).toMatch(/\bbottom-full\b/);
    expect(notice.className).toMatch(/\bline-clamp-2\b/);
    expect(document.getElementById("canvas-help")!.className).toMatch(/\bh-9\b/);

    // Escape folds it, and only that: the deleted support stays deleted, the focus comes back
    await user.keyboard("{Escape}");
    expect(screen.queryByRole("region", { name: "The whole message" })).toBeNull();
    expect(more).toHaveFocus();
    expect(more).toHaveAttribute("aria-expanded", "false");
    expect(outline().queryByRole("button", { name: /front pad/ })).toBeNull();

    // a click opens it too, and a second one folds it
    await user.click(more);
    expect(screen.getByRole("region", { name: "The whole message" })).toHaveTextContent(WHOLE);
    await user.click(screen.getByRole("button", { name: "Less of the message" }));
    expect(screen.queryByRole("region", { name: "The whole message" })).toBeNull();
  }, 20_000);

  it("goes when a notice that fits replaces it, and the next long one starts folded", async () => {
    const user = userEvent.setup();
    await renderEditor(skid());
    await user.click(outline().getByRole("button", { name: /front pad/ }));
    await user.keyboard("{Delete}");
    await user.click(await screen.findByRole("button", { name: "More of the message" }));
    expect(screen.getByRole("region", { name: "The whole message" })).toBeInTheDocument();
    // Undo says a short thing: the button and the open text go with the long notice
    await user.keyboard("{Control>}z{/Control}");
    await waitFor(() => expect(screen.queryByTestId("notice-more")).toBeNull());
    expect(screen.queryByRole("region", { name: "The whole message" })).toBeNull();
    expect(screen.getByTestId("notice").textContent!.length).toBeLessThanOrEqual(90);
    // the same delete again: cut short, folded
    await user.click(outline().getByRole("button", { name: /front pad/ }));
    await user.keyboard("{Delete}");
    expect(await screen.findByRole("button", { name: "More of the message" })).toHaveAttribute("aria-expanded", "false");
    expect(screen.queryByRole("region", { name: "The whole message" })).toBeNull();
  }, 20_000);
});
