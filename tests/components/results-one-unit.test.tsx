// The results panel writes every force of a result in one unit, chosen from the largest of the
// whole result (all in kN once any force is 1 kN: common practice on a calculation by hand), and
// every figure by one rule (4 significant figures, zeros kept): the reactions table, the hand
// check's terms and the status sentence read alike, in SI and in US customary units.
import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { act } from "react";
import { describe, expect, it } from "vitest";
import { mountResultsDock } from "./editor-helpers";
import { sharedWeight, twoReactions } from "../fixtures/one-unit";

const cell = (support: string, col: string) => within(screen.getByTestId("reactions")).getByText((_, el) => el?.getAttribute("data-col") === col && el.parentElement?.getAttribute("data-support") === support).textContent;
const header = (label: string) => within(screen.getByTestId("reactions")).getByRole("columnheader", { name: new RegExp(`^${label}`) }).textContent;
const fyTerms = () => within(screen.getByTestId("hand-fy")).getAllByTestId("term-value").map((v) => v.textContent);

describe("one unit per quantity in the results panel", () => {
  // a 2 m beam without mass on a pin and a pad, 5 kN down over the pin and 50 N over the pad: each
  // support carries the load over it (statics, common practice)
  it("a 50 N and a 5 kN reaction: 5.000 and 0.05000 kN in the table and in the hand check, in SI and in US", async () => {
    const user = userEvent.setup();
    const editor = mountResultsDock(twoReactions);
    expect(header("Fy")).toBe("Fy(kN)");
    expect(cell("pin", "fy")).toBe("5.000");
    expect(cell("pad", "fy")).toBe("0.05000");
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    expect(fyTerms()).toEqual(["5.000 kN", "0.05000 kN", "−5.000 kN", "−0.05000 kN"]);
    // US: 5 kN = 1,124 lbf and 50 N = 11.24 lbf (1 lbf = 4.448222 N, NIST SP 811)
    act(() => editor.getState().setUnits("US"));
    expect(fyTerms()).toEqual(["1,124 lbf", "11.24 lbf", "−1,124 lbf", "−11.24 lbf"]);
    await user.click(screen.getByRole("tab", { name: "Reactions" }));
    expect(header("Fy")).toBe("Fy(lbf)");
    expect(cell("pin", "fy")).toBe("1,124");
    expect(cell("pad", "fy")).toBe("11.24");
  });

  // 1.2 kN at mid-span: 600 N on each support (statics, common practice); the reactions are below
  // 1 kN but the load they carry is not, and the hand check lists both
  it("reactions below 1 kN carrying 1.2 kN: the table, the hand check and the sentence all in kN", async () => {
    const user = userEvent.setup();
    mountResultsDock(sharedWeight);
    expect(header("Fy")).toBe("Fy(kN)");
    expect(cell("pin", "fy")).toBe("0.6000");
    expect(cell("pad", "fy")).toBe("0.6000");
    expect(screen.getAllByTestId("status-sentence")[0].textContent).toContain("the largest reaction is 0.6 kN");
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    expect(fyTerms()).toEqual(["0.6000 kN", "0.6000 kN", "−1.200 kN"]);
  });
});
