// A sweep that drives gravity below zero: those points are not solved, and the panel says
// where (the swept values) and why (the field's message, in the screen's words).
import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { mountResultsDock } from "./editor-helpers";

describe("Sweep tab: points where the sketch is invalid", () => {
  it("lists the stretch of negative gravity with its values and gravity's message", async () => {
    const user = userEvent.setup();
    mountResultsDock({
      format: "counterpoise.sketch",
      version: 3,
      parameters: { grav: "9.81 m/s^2" },
      gravity: "grav",
      bodies: [{ id: "b", outline: [[0, 0], [2, 0], [2, 1], [0, 1]], mass: "100 kg" }],
      supports: [
        { id: "left", body: "b", kind: "contact", at: [0, 0], angle: 90 },
        { id: "right", body: "b", kind: "contact", at: [2, 0], angle: 90 },
      ],
      loads: [],
      ports: [],
      massSources: [],
    });
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    await user.selectOptions(screen.getByRole("combobox", { name: "Parameter to sweep" }), "grav");
    for (const [name, v] of [["From", "2"], ["To", "-2"], ["Points", "5"]]) {
      await user.clear(screen.getByRole("textbox", { name }));
      await user.type(screen.getByRole("textbox", { name }), v);
    }
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    const list = await screen.findByTestId("crossings");
    const invalid = within(list).getAllByTestId("invalid-points");
    // grav = 2, 1, 0 solve; −1 and −2 do not (gravity must not be negative, as when parsing)
    expect(invalid).toHaveLength(1);
    expect(invalid[0].textContent).toBe(
      "Not solved at grav = −1 to −2 m/s² (2 points), where the sketch is invalid: Gravity: must not be negative: to have gravity act another way, give its direction (Gravity direction, −90° by default); 0 turns weights off.",
    );
  });
});
