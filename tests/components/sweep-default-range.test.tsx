// The Sweep tab of the demo pump skid opens on its density, which cannot be 0: the default range
// starts where the sketch solves, so the first run has no "Not solved" stretch at its start.
// Our own rule (components/studies/sweepRange.ts).
import { screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import pumpSkid from "@/canvas/examples/pump-skid.json";
import { mountResultsDock } from "./editor-helpers";

describe("Sweep tab: the default range of the demo pump skid", () => {
  it("starts the density above 0 and plots from its first point; the flow still starts at 0", async () => {
    const user = userEvent.setup();
    mountResultsDock(pumpSkid);
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    const parameter = screen.getByRole("combobox", { name: "Parameter to sweep" }) as HTMLSelectElement;
    expect(parameter.value).toBe("rho");
    // rho = 998 kg/m³: a tenth, to two significant figures, to twice it
    expect((screen.getByRole("textbox", { name: "From" }) as HTMLInputElement).value).toBe("100");
    expect((screen.getByRole("textbox", { name: "To" }) as HTMLInputElement).value).toBe("1996");
    await user.clear(screen.getByRole("textbox", { name: "Points" }));
    await user.type(screen.getByRole("textbox", { name: "Points" }), "11");
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    await screen.findByTestId("crossings");
    expect(screen.queryAllByTestId("invalid-points")).toEqual([]);
    expect(document.body.textContent).not.toMatch(/Not solved/);

    // no flow is a meaningful start: Q keeps 0 … 2 × 1800 L/min
    await user.selectOptions(parameter, "Q");
    expect((screen.getByRole("textbox", { name: "From" }) as HTMLInputElement).value).toBe("0");
    expect((screen.getByRole("textbox", { name: "To" }) as HTMLInputElement).value).toBe("3600");
  });
});
