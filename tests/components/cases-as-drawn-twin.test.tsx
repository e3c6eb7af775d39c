// Proposed for tests/components/studies.test.tsx (with the CasesPanel change in /tmp/h13/b-cases-twin.diff):
// a case that is the sketch as drawn over again is said once, as on a version's page and the calc sheet.
import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { EXAMPLES } from "@/canvas/examples";
import { mountResultsDock } from "./editor-helpers";

describe("a case equal to the drawing", () => {
  it("the washing cart's 'aimed down' case restates theta = −75° as drawn: named '…, as drawn' once, and said so", async () => {
    const user = userEvent.setup();
    mountResultsDock(EXAMPLES.find((e) => e.id === "washing-cart")!.sketch);
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    await user.click(screen.getByRole("button", { name: "Run all cases" }));
    expect(await screen.findByTestId("as-drawn-twin")).toHaveTextContent("Lance aimed down at −75° (tank foot), as drawn: this case is the sketch as drawn");
    const stability = screen.getByTestId("stability");
    expect(within(stability).getAllByText(/Lance aimed down at −75° \(tank foot\), as drawn/)).toHaveLength(1);
  });

  it("a sketch with no cases ('Run as drawn') is not called its own twin", async () => {
    const user = userEvent.setup();
    const sketch = { ...EXAMPLES.find((e) => e.id === "pump-skid")!.sketch, cases: undefined };
    mountResultsDock(sketch);
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    await user.click(screen.getByRole("button", { name: "Run as drawn" }));
    await screen.findByTestId("stability");
    expect(screen.queryByTestId("as-drawn-twin")).toBeNull();
  });
});
