// The results panel's hand check: every number by one rule (4 significant figures, trailing zeros
// kept, the points where forces act too), the two sums of each equation printed alike when they
// agree, and the difference given as a figure or as rounding, never a bare 0 beside two figures.
import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { beam, mountResultsDock } from "./editor-helpers";
import { G0 } from "@/solver/constants";

describe("hand check figures", () => {
  it("the beam: terms, sums and points to 4 significant figures", async () => {
    const user = userEvent.setup();
    mountResultsDock(beam("F1"));
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    // a 4 m beam of 100 kg on a pin at (0, 0) and a pad at (4, 0), 10 kN down at (2, 0.5) m: the pad
    // carries (10 kN + 100 kg·g0)/2 = 5.490 kN, 21.96 kN·m about the pin (statics, common practice)
    const pad = (10 + (100 * G0) / 1000) / 2;
    expect(pad.toFixed(3)).toBe("5.490");
    const m = screen.getByTestId("hand-m");
    const lines = within(m).getAllByRole("listitem").map((li) => li.textContent);
    expect(lines).toContainEqual(expect.stringMatching(/^\+ force “F1”, acting at \(2\.000, 0\.5000\) m−20\.00 kN·m$/));
    expect(lines).toContainEqual(expect.stringMatching(/right pad”, acting at \(4\.000, 0\) m21\.96 kN·m$/));
    expect(lines).toContainEqual(expect.stringMatching(/weight of “Beam”, acting at \(2\.000, 0\.2500\) m−1\.961 kN·m$/));
    const fy = within(screen.getByTestId("hand-fy")).getAllByTestId("term-value").map((v) => v.textContent);
    expect(fy).toEqual(expect.arrayContaining(["5.490 kN", "−10.00 kN", "−0.9807 kN"]));
    for (const k of ["fx", "fy", "m"]) {
      const b = screen.getByTestId(`hand-${k}`);
      // each Σ of the unrounded terms; the two sides agree, and print alike
      expect(within(b).getByTestId("forces-sum").textContent).toBe(within(b).getByTestId("momentum-sum").textContent);
      expect(within(b).getByTestId("hand-verdict").textContent).toBe("the two sides agree to 4 significant figures");
      // the difference is exactly nothing, or its floating-point noise said to be rounding
      expect(within(b).getByTestId("imbalance").textContent).toMatch(/^(0 kN(·m)?|−?\d(\.\d)?e-\d+ kN(·m)? \(rounding\))$/);
    }
    expect(screen.getByTestId("hand-check").textContent).toContain("Every number to 4 significant figures; each Σ adds the unrounded terms");
  });
});
