// A 500 kg block, base b = 2 m, on two contacts at its bottom corners x = 0 and x = 2 m (μ each),
// its centre of gravity over the middle; a jet leaves its left side at h = 1 m pointing −x, so it
// pushes the block +x with its momentum flux P = ṁ·V, and a mass source feeds the flow back in
// (no momentum of its own). Invented test data; each test states its own hand calculation.
import { parseSketch, type SketchFileInput } from "@/solver";

/** How the jet is given: ṁ and V (10 kg/s at 50 m/s, P = 500 N at flow factor 1), or water at Q through 0.01 m² (P = ρQ²/A). */
export type JetGiven = "mass flow" | "volume flow";

const JETS: Record<JetGiven, { parameters: Record<string, string>; port: Record<string, unknown>; feed: string }> = {
  "mass flow": { parameters: { h: "1 m" }, port: { at: [0, "h"], massFlow: "10 kg/s", velocity: "50 m/s" }, feed: "10 kg/s" },
  "volume flow": { parameters: { Q: "0.02 m^3/s" }, port: { at: [0, 1], density: "1000 kg/m^3", volumeFlow: "Q", area: "0.01 m^2" }, feed: "1000 kg/m^3 * Q" },
};

export function jetPushedBlock(mu: number, extra: Partial<SketchFileInput> = {}, jet: JetGiven = "mass flow"): SketchFileInput {
  const { parameters, port, feed } = JETS[jet];
  return {
    format: "counterpoise.sketch",
    version: 6,
    parameters,
    bodies: [{ id: "blk", label: "Block", mass: 500, cg: [1, 0.5], outline: [[0, 0], [2, 0], [2, 2], [0, 2]] }],
    supports: [
      { id: "rear", label: "rear pad", body: "blk", kind: "contact", at: [0, 0], angle: 90, mu },
      { id: "front", label: "front pad", body: "blk", kind: "contact", at: [2, 0], angle: 90, mu },
    ],
    loads: [],
    ports: [{ id: "jet", label: "jet", body: "blk", kind: "outlet", angle: 180, ...port }],
    massSources: [{ id: "feed", label: "feed", body: "blk", massFlow: feed, at: [1, 1] }],
    ...extra,
  } as SketchFileInput;
}

/** The parsed sketch file, or the test stops with the parser's errors. */
export function fileOf(doc: SketchFileInput) {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return p.file;
}
