// A 1000 kg block on two feet 1 m apart (its weight midway, 0.6 m up), pushed sideways 1 m up by
// P. Tipping about the far foot (rigid-block statics, common practice): restoring W·b/2 =
// 1000 × 9.80665 × 0.5 = 4903.3 N·m over overturning P·h — 1.226 at P = 4 kN, 2.452 at 2 kN. Only
// the far foot has friction (μ 0.9): sliding 0.9 × (W/2 + P·h/b) / P = 2.003 at 4 kN, 3.106 at 2 kN.
import type { SketchFile } from "@/solver/schema";

export function pushedBlock(P: string, extra: Partial<Pick<SketchFile, "cases" | "combinations">> = {}): SketchFile {
  return {
    format: "counterpoise.sketch",
    version: 5,
    title: "Pushed block",
    parameters: { P },
    bodies: [{ id: "b", label: "block", mass: "1000 kg", outline: [[0, 0], [1, 0], [1, 1.2], [0, 1.2]], cg: [0.5, 0.6] }],
    supports: [
      { id: "near", label: "near foot", body: "b", kind: "contact", at: [0, 0], angle: 90 },
      { id: "far", label: "far foot", body: "b", kind: "contact", at: [1, 0], angle: 90, mu: 0.9 },
    ],
    loads: [{ id: "push", body: "b", kind: "force", at: [0, 1], angle: 0, magnitude: "P" }],
    ports: [],
    massSources: [],
    ...extra,
  } as unknown as SketchFile;
}
