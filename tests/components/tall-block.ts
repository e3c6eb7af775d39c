// The tall block both tips-and-slides tests push: one drawing, solved with its stability factors.
import { DEFAULT_REQUIREMENTS, parseSketch, solveWithStability } from "@/solver/index";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";

/**
 * A 1 m wide, 2 m tall, 100 kg block on two pads (μ as given) pushed sideways at its top left
 * corner by P. Rigid-block statics (common practice): it tips about the right pad when
 * P·2 m > W·0.5 m, P > W/4 = 245.2 N; it slides when P > μ·W (294.2 N at μ = 0.3).
 */
export function tallBlock(push: string, mu: number | [number, number] = 0.3) {
  const [m1, m2] = Array.isArray(mu) ? mu : [mu, mu];
  return {
    ...emptySketch("Tall block"),
    bodies: [{ ...newBody("b1", [[0, 0], [1, 0], [1, 2], [0, 2]], "Block"), mass: "100 kg" }],
    supports: [
      { id: "s1", body: "b1", kind: "contact" as const, at: [0, 0] as [number, number], angle: 90, mu: m1, label: "left pad" },
      { id: "s2", body: "b1", kind: "contact" as const, at: [1, 0] as [number, number], angle: 90, mu: m2, label: "right pad" },
    ],
    loads: [{ id: "f1", body: "b1", kind: "force" as const, at: [0, 2] as [number, number], fx: push, fy: 0, label: "push" }],
  };
}

export function solved(doc: unknown) {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  const { result, stability } = solveWithStability(p.sketch, DEFAULT_REQUIREMENTS);
  return { sketch: p.sketch, result, stability };
}
