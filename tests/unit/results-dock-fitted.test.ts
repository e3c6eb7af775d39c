// The results under the drawing on a tall window take what the open tab needs, between the
// laptop's 292 px and the window's own height for them; the drawing takes the rest.
import { describe, expect, it } from "vitest";
import { fittedHeight, ownHeight } from "@/components/results/ResultsDock";

describe("the results dock's height with none chosen", () => {
  it("on a 1080 px screen a two-support sketch's reactions (about 250 px) leave the dock at 292 px, not 410", () => {
    expect(ownHeight(1080)).toBe(410);
    expect(fittedHeight(ownHeight(1080), 251)).toBe(292);
    // the drawing gains 118 px: 1080 − 48 (toolbar) − 36 (hint line) − 292
    expect(1080 - 48 - 36 - fittedHeight(ownHeight(1080), 251)).toBe(704);
  });
  it("grows with a longer table or the hand check, up to the window's own height", () => {
    expect(fittedHeight(410, 357)).toBe(357);
    expect(fittedHeight(410, 900)).toBe(410);
    expect(fittedHeight(342, 340)).toBe(340);
  });
  it("a short window keeps its own height (already at or under 292 px), and an unmeasured dock keeps the window's", () => {
    expect(fittedHeight(ownHeight(720), 120)).toBe(292);
    expect(fittedHeight(ownHeight(600), 120)).toBe(ownHeight(600));
    expect(fittedHeight(ownHeight(1000), null)).toBe(380);
  });
});
