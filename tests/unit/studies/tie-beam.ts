// A beam held by a pin, a pad and an anchor bolt, lifted by an uplift P: the bolt is slack until
// the pad lifts. Shared by the limit finder's no-crossing tests and the limits table's.
import type { SketchFileInput } from "@/solver";
import { box, sketch } from "../solver/helpers";

/** A 200 kg, 2 m beam: a pin at x = 0, a pad (contact facing up) at x = 2 m and an anchor bolt (a
 *  tie pulling down) at x = 1 m, its weight W at x = 1 m, an uplift P at x = 1.5 m. With the bolt
 *  slack, moments about the pin: 2·n − W + 1.5·P = 0, so the pad bears n = (W − 1.5·P)/2 and lifts
 *  at P = W/1.5 = 1307.6 N, where the bolt takes over: T = 1.5·P − W (common practice). */
export const tieBeam = (): SketchFileInput =>
  sketch({
    parameters: { P: "100 N" },
    bodies: [{ id: "s", outline: box(2, 0.5), mass: 200, cg: [1, 0.25] }],
    supports: [
      { id: "pin", body: "s", kind: "pin", at: [0, 0] },
      { id: "pad", body: "s", kind: "contact", at: [2, 0], angle: 90 },
      { id: "bolt", body: "s", kind: "tie", at: [1, 0], angle: -90 },
    ],
    loads: [{ id: "up", body: "s", kind: "force", at: [1.5, 0.5], fx: 0, fy: "P" }],
  });
