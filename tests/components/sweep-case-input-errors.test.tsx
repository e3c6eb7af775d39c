// The Sweep tab on a case whose own change does not read (a saved wind speed typed bare, "38"):
// the error names the case and its change as the form does, and the unit to write, not the file's
// paths ("cases[storm].parameters.v", "loads[0].w1").
import { readFileSync } from "node:fs";
import { screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { mountResultsDock } from "./editor-helpers";

describe("Sweep tab: a case that does not read", () => {
  it("says the case's change in the form's words, with the unit to write", async () => {
    const user = userEvent.setup();
    const file = JSON.parse(readFileSync("canvas/examples/exhaust-stack.json", "utf8"));
    file.cases.find((c: { id: string }) => c.id === "storm").parameters.v = "38";
    mountResultsDock(file);
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    // the ballast swept (sweeping v itself would set v at each point: the case's bare 38 stands for nothing)
    await user.selectOptions(screen.getByRole("combobox", { name: "Parameter to sweep" }), "ballast");
    await user.selectOptions(screen.getByRole("combobox", { name: "Case or combination to sweep" }), "case:storm");
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    const alert = await screen.findByRole("alert");
    expect(alert.textContent).toBe(
      "The sketch has 3 input errors, the first: Case Engine stopped, 38 m/s storm — change of v: has no unit; the sketch gives v in m/s: write 38 m/s.",
    );
    expect(alert.textContent).not.toMatch(/cases\[|loads\[|kg \/ m\^2/);
  });
});
