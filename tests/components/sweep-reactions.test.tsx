// The Sweep tab plots each reaction, not only the margins: a pin's Fx and Fy, a contact's tangential
// force and resultant can be ticked (left unticked by default), are plotted, searched by the limit
// finder, and never marked as a crossing (only a margin's zero is a contact lifting).
import { screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { mountResultsDock, setUpSweep } from "./editor-helpers";

/** A weightless 2 m × 1 m block on a pin at (0, 0) and a frictionless contact at (2, 0), pushed
 *  sideways by P at its top (y = 1 m) and down by 10 kN at its middle. */
const block = {
  format: "counterpoise.sketch",
  version: 3,
  parameters: { P: "2 kN" },
  bodies: [{ id: "b", label: "block", outline: [[0, 0], [2, 0], [2, 1], [0, 1]], mass: 0 }],
  supports: [
    { id: "pin", label: "pin", body: "b", kind: "pin", at: [0, 0] },
    { id: "pad", label: "pad", body: "b", kind: "contact", at: [2, 0], angle: 90 },
  ],
  loads: [
    { id: "push", body: "b", kind: "force", at: [0, 1], fx: "P", fy: 0 },
    { id: "down", body: "b", kind: "force", at: [1, 0.5], fx: 0, fy: "-10 kN" },
  ],
  ports: [],
  massSources: [],
};

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
      ["pad: tangential force t", false],
      ["pad: resultant", false],
    ]);
    await user.click(screen.getByRole("checkbox", { name: "pin: Fx" }));
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    // ΣFx = 0 (statics): the pin alone resists P, Fx = −P, crossing zero at P = 0 — not a crossing
    // the plot marks; the pad's margin (its normal force) is the only quantity whose zero is marked.
    // Moments about the pin: n·2 = 10·1 − P·1, so the pad lifts at P = 10 kN, the end of the range.
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
});
