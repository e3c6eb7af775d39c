// A sweep's hover says a released support carries nothing, as the results table's "—" does
// (`carriesNothing`, solver/words.ts): a contact lifted off (a tie gone slack) on a body that is
// held has no margin to quote; its line runs on below zero only to show the crossing. On a body
// that tips the margin is what the support would have to pull: a force, and quoted as one.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { runSweep } from "@/canvas/studies/run";
import { releasedWords } from "@/canvas/studies/display";
import { pinPadBlock } from "../../support/pin-pad-block";

/** The block of tests/support/pin-pad-block.ts (pin at (0, 0), pad at (2, 0), P at its top, 10 kN
 *  down at its middle) with a keeper over the pad at (2, 1) (a contact pushing down). The right end
 *  needs an upward force (10 kN + P)/2: from the pad while that is positive, from the keeper
 *  (pressing down) once it is negative: below P = −10 kN the pad lifts off and carries nothing, the
 *  pin and the keeper holding the block. */
const block = pinPadBlock([{ id: "keeper", label: "keeper", body: "b", kind: "contact", at: [2, 1], angle: -90 }]);

describe("a released support in the sweep's hover", () => {
  const margin = { support: "pad", component: "margin" as const };
  const resultant = { support: "pin", component: "resultant" as const };

  it("the pad lifted off beyond P = −10 kN, its block held by the pin and the keeper: 'carries nothing', not a force", () => {
    // P from −21 to −1 kN in 2 kN steps (swept in the parameter's unit, kN); the plotted values in N
    const data = runSweep(block, { parameter: "P", from: -21, to: -1, points: 11, quantities: [margin, resultant] });
    // bearing: n = (10 kN + P)/2 → 4.5 kN at P = −1 kN
    expect(data.series[0][10]).toBeCloseTo(4500, 3);
    expect(releasedWords(data, 0, -1)).toBeNull();
    // the crossing at −10 kN is still marked on the line
    expect(data.crossings).toEqual([{ quantity: 0, between: [-11, -9] }]);
    expect(data.idle).toEqual([{ support: "pad", kind: "contact", from: -21, to: -11, points: 6, whole: false }]);
    expect(data.series[0][0]).toBeLessThan(0);
    expect(releasedWords(data, 0, -11)).toBe("carries nothing (lifted off)");
    expect(releasedWords(data, 0, -21)).toBe("carries nothing (lifted off)");
    // the pin's resultant is a force throughout: −P sideways and, with the keeper pressing down
    // (10 + P)/2 = −5.5 kN at P = −21 kN, 10 + 5.5 = 15.5 kN up: √(21² + 15.5²) kN
    expect(releasedWords(data, 1, -21)).toBeNull();
    expect(data.series[1][0]).toBeCloseTo(Math.hypot(21000, 15500), 3);
  });

  it("on a body that tips, the lifted caster's margin is what it would have to pull: still a force", () => {
    // the washing cart tips back off its front caster from about −59° (the example's notes)
    const cart = JSON.parse(readFileSync("canvas/examples/washing-cart.json", "utf8"));
    const data = runSweep(cart, { parameter: "theta", from: -58, to: 0, points: 30, quantities: [{ support: "front", component: "margin" }] });
    expect(data.statuses.every((s) => s === "tips")).toBe(true);
    expect(data.idle).toEqual([]);
    expect(releasedWords(data, 0, -58)).toBeNull();
  });
});
