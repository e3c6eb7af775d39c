// The flow factor scales mass flows and velocities, not port gauge pressures: said where it is set
// (a case's "Flow ×" when the sketch has a port with a pressure, the Sweep tab's hint) and in the
// calc sheet's method (tests/unit/calcsheet/short-of-factor.test.ts reads the sheet).
import { readFileSync } from "node:fs";
import { screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { FLOW_FACTOR_PRESSURES } from "@/solver/cautions";
import { mountResultsDock } from "./editor-helpers";

const bend = () => JSON.parse(readFileSync("canvas/examples/pipe-bend-anchor.json", "utf8"));

describe("the flow factor and port pressures", () => {
  it("a case with a flow factor on a sketch with port pressures says the pressures stay as entered", async () => {
    const user = userEvent.setup();
    const doc = bend();
    doc.cases = [{ id: "surge", name: "Surge flow", flowFactor: 1.3 }];
    mountResultsDock(doc);
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    expect(screen.getByTestId("flow-factor-pressures").textContent).toBe(
      "The flow factor scales mass flows (and velocities), not port gauge pressures: those are as entered; write them as expressions of a parameter if they change with flow.",
    );
  });

  it("no note where no case scales the flow", async () => {
    const user = userEvent.setup();
    const doc = bend();
    doc.cases = [{ id: "hot", name: "Hot", parameters: {} }];
    mountResultsDock(doc);
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    expect(screen.getByTestId("cases-table")).toBeTruthy();
    expect(screen.queryByTestId("flow-factor-pressures")).toBeNull();
  });

  it("the Sweep tab's hint for the flow factor says it too", async () => {
    const user = userEvent.setup();
    mountResultsDock(bend());
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    await user.selectOptions(screen.getByRole("combobox", { name: "Parameter to sweep" }), "flowFactor");
    expect(screen.getByTestId("sweep-unit-hint").textContent).toBe(`The flow factor is a plain number (1: the flow as drawn). ${FLOW_FACTOR_PRESSURES}`);
  });
});
