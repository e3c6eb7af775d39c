// The status line after a keyboard placement, in the units on screen: with US units shown, the
// place is said in feet, as the properties panel says it; the nudge's step (the grid's, metric)
// keeps its metres with its length in feet beside it. SI is unchanged.
// Conversions: 1 ft = 0.3048 m exactly (NIST SP 811).
import { describe, expect, it } from "vitest";
import { placedWords } from "@/canvas/actions";

const RIGHT_FOOT = { at: [1.32298, 0.109612] as [number, number], place: { edge: "bottom" as const, along: 0.875 } };

describe("where a keyboard placement went, in the units on screen", () => {
  it("in US units names the place in feet and the step in metres and feet", () => {
    // 1.32298 m / 0.3048 = 4.34048 ft (a sentence drops the trailing zero); 0.109612 m = 0.35962 ft; at 289 px/m the grid is 0.1 m = 0.32808 ft
    expect(placedWords(RIGHT_FOOT, 289, "US")).toBe(
      "near the right end of its bottom edge (x = 4.34 ft, y = 0.3596 ft). Arrow keys move it 0.1 m (0.3281 ft) a press, Shift+arrow 1 m (3.281 ft).",
    );
  });

  it("in SI units is as before", () => {
    expect(placedWords(RIGHT_FOOT, 289, "SI")).toBe("near the right end of its bottom edge (x = 1.32298 m, y = 0.109612 m). Arrow keys move it 0.1 m a press, Shift+arrow 1 m.");
  });
});
