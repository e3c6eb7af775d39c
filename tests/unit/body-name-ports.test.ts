// A body's name keeps clear of its ports' bars and pressure arrows: where no corner inside the body
// leaves them clear, it goes beside the body instead of under a port's drawing.
import { describe, expect, it } from "vitest";
import { EXAMPLES } from "@/canvas/examples";
import { buildScene, type SceneBody } from "@/canvas/scene";
import { bodyPrims, portKeepOut, type Box } from "@/canvas/render/symbols";
import type { Prim } from "@/canvas/render/prims";

/** The demo bend (an L of pipe with an inlet on its left face and an outlet on top), with its mass as a number. */
function bend() {
  const ex = EXAMPLES.find((e) => e.id === "pipe-bend-anchor")!;
  const sketch = { ...ex.sketch, bodies: ex.sketch.bodies.map((b) => ({ ...b, mass: 92 })) };
  const scene = buildScene(sketch);
  return { scene, body: scene.bodies[0] as SceneBody };
}

/** The boxes of the name's text (11 px type, about 6.4 px a character, as the placement takes it). */
function nameBoxes(prims: Prim[]): Box[] {
  return prims.flatMap((p) => {
    if (p.t !== "text") return [];
    const w = p.text.length * 6.4;
    const x0 = p.align === "right" ? p.at[0] - w : p.align === "center" ? p.at[0] - w / 2 : p.at[0];
    return [{ x0, y0: p.at[1] - 6, x1: x0 + w, y1: p.at[1] + 6 }];
  });
}
const overlaps = (a: Box, b: Box) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

describe("a body's name and its ports", () => {
  it("marks each port's bar and inward arrow: the inlet on the left face reaches 60 px into the body", () => {
    const { scene, body } = bend();
    const [inlet] = portKeepOut(scene.items, body.id, 350);
    expect(inlet.x1 - inlet.x0).toBeCloseTo(60 + 28, 6);
    expect(inlet.y1 - inlet.y0).toBeCloseTo(28, 6);
  });

  it("at every zoom, the name is clear of both ports (and at 350 px/m it would not be without them)", () => {
    const { scene, body } = bend();
    for (const scale of [120, 200, 250, 300, 350, 450]) {
      const keepOut = portKeepOut(scene.items, body.id, scale);
      const names = nameBoxes(bodyPrims(body, { units: "SI", scale, keepOut }));
      expect(names.length).toBeGreaterThan(0);
      for (const n of names) for (const k of keepOut) expect(overlaps(n, k), `scale ${scale}`).toBe(false);
    }
    const keepOut = portKeepOut(scene.items, body.id, 350);
    const before = nameBoxes(bodyPrims(body, { units: "SI", scale: 350 }));
    expect(before.some((n) => keepOut.some((k) => overlaps(n, k)))).toBe(true);
  });

  it("a body without ports places its name as before", () => {
    const { body } = bend();
    expect(bodyPrims(body, { units: "SI", scale: 350, keepOut: [] })).toEqual(bodyPrims(body, { units: "SI", scale: 350 }));
  });
});
