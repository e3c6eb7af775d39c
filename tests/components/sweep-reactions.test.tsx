// The Sweep tab plots each reaction, not only the margins: a pin's Fx and Fy, a contact's tangential
// force and resultant can be ticked (left unticked by default), are plotted, searched by the limit
// finder, and never marked as a crossing (only a margin's zero is a contact lifting).
import { screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { mountResultsDock, setUpSweep } from "./editor-helpers";
import { pinPadBlock } from "../support/pin-pad-block";

/** The block of tests/support/pin-pad-block.ts: pin at (0, 0), frictionless pad at (2, 0), P at its top. */
const block = pinPadBlock();

describe("sweeping a reaction's component", () => {
  it("offers each reaction, ticks the margins and resultants, and finds where the pin's Fx reaches a value", async () => {
    const user = userEvent.setup();
    mountResultsDock(block);
    await setUpSweep(user, "P", ["0", "10", "11"]);
    expect(screen.getAllByRole("checkbox").map((c) => [c.closest("label")?.textContent, (c as HTMLInputElement).checked])).toEqual([
      ["pin: resultant", true],
      ["pin: Fx", false],
      ["pin: Fy", false],
      ["pad: margin", true],
      // a frictionless pad's tangential force is zero at every point: not offered
      ["pad: resultant", false],
    ]);
    await user.click(screen.getByRole("checkbox", { name: "pin: Fx" }));
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    // ΣFx = 0 (statics): the pin alone resists P, Fx = −P, crossing zero at P = 0 — not a crossing
    // the plot marks; the pad's margin (its normal force) is the only quantity whose zero is marked.
    // Moments about the pin: n·2 = 10·1 + P·1, so the pad bears all through P = 0…10 kN (n from 5 to 10 kN).
    const crossings = await screen.findByTestId("crossings");
    expect(crossings.textContent).not.toMatch(/x-reaction/);
    const quantity = screen.getByRole("combobox", { name: "Quantity for the limit" }) as HTMLSelectElement;
    // the plotted quantities, then the body's own limit (on a pad it can tip about the pin; the pin
    // resists sliding, so no sliding as a whole)
    expect([...quantity.options].map((o) => o.textContent)).toEqual(["resultant at pin", "x-reaction at pin", "margin at pad", "block tips"]);
    await user.selectOptions(quantity, "x-reaction at pin");
    await user.clear(screen.getByRole("textbox", { name: "Target value" }));
    await user.type(screen.getByRole("textbox", { name: "Target value" }), "-4");
    await user.click(screen.getByRole("button", { name: "Find" }));
    // Fx = −P reaches −4 kN at P = 4 kN
    expect((await screen.findByTestId("limit-answer")).textContent).toMatch(/^The x-reaction at pin reaches −4 kN at P = 4\.000 kN/);
  });

  it("offers a contact's tangential force and friction margin only when it has friction", async () => {
    const user = userEvent.setup();
    mountResultsDock({ ...block, supports: [block.supports[0], { ...block.supports[1], mu: 0.4 }] });
    await setUpSweep(user, "P", ["0", "10", "11"]);
    expect(screen.getAllByRole("checkbox").map((c) => c.closest("label")?.textContent)).toEqual(["pin: resultant", "pin: Fx", "pin: Fy", "pad: margin", "pad: friction margin", "pad: tangential force t", "pad: resultant"]);
  });
});
