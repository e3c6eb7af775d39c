// The hand check's moment block names where every term acts, the momentum flux lines too, and a
// fixed support's own couple beside its r × F: each line is one a checker can redo by hand.
import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { exampleById } from "@/canvas/examples";
import { mountResultsDock } from "./editor-helpers";

describe("hand check: where each moment term acts", () => {
  it("the pipe-bend example about the origin: the anchor's r × F plus its couple, the flux lines at their ports", async () => {
    const user = userEvent.setup();
    mountResultsDock(exampleById("pipe-bend-anchor")!.sketch);
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    for (const k of ["x", "y"]) {
      await user.clear(screen.getByTestId(`moment-${k}`));
      await user.type(screen.getByTestId(`moment-${k}`), "0");
    }
    await user.keyboard("{Enter}");
    const lines = within(screen.getByTestId("hand-m"))
      .getAllByRole("listitem")
      .map((li) => li.textContent);
    // Control-volume momentum equation (any fluid mechanics text) with the example's numbers:
    // Q = 2700 L/min = 0.045 m³/s, A = π/4 × 0.15² = 0.017671 m², V = 2.546 m/s, ṁV = 998 × 0.045 ×
    // 2.546 = 114.4 N. The anchor at (0.09, 0) carries Fy = 114.4 + 902.2 + 17 579 = 18 596 N and a
    // couple m = −1.771 kN·m; about the origin r × F = 0.09 × 18 596 = 1 674 N·m, and with the couple
    // −1 771 + 1 674 = −97.44 N·m, which balances the weight's 0.108 × 902.2 = 97.44 N·m.
    expect(lines).toContainEqual(expect.stringMatching(/^ *reaction at “anchor”, acting at \(0\.09000, 0\) m, with its couple −1\.771 kN·m−0\.09744 kN·m$/));
    // the outlet's flux up the riser at (0, 0.45) has no arm about the origin; nor has the inlet's
    expect(lines).toContainEqual(expect.stringMatching(/^momentum out at “up the riser”, acting at \(0, 0\.4500\) m0 kN·m$/));
    expect(lines).toContainEqual(expect.stringMatching(/^momentum in at “from pump”, as −ṁV, acting at \(−0\.4500, 0\) m0 kN·m$/));
    // the forces without a couple say only where they act
    expect(lines).toContainEqual(expect.stringMatching(/^\+ weight of “DN150 bend”, acting at \(−0\.1080, 0\.1080\) m0\.09744 kN·m$/));
  });

  it("about the anchor the outlet's flux has its arm: r × ṁV = −0.09 m × 114.4 N = −10.29 N·m", async () => {
    const user = userEvent.setup();
    mountResultsDock(exampleById("pipe-bend-anchor")!.sketch);
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    const lines = within(screen.getByTestId("hand-m"))
      .getAllByRole("listitem")
      .map((li) => li.textContent);
    expect(lines).toContainEqual(expect.stringMatching(/^momentum out at “up the riser”, acting at \(0, 0\.4500\) m−0\.01029 kN·m$/));
    // at its own point the anchor's line is its couple alone
    expect(lines).toContainEqual(expect.stringMatching(/^ *reaction at “anchor”, acting at \(0\.09000, 0\) m, with its couple −1\.771 kN·m−1\.771 kN·m$/));
  });
});
