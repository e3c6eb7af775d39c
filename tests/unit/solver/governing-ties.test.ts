// Cases that give a support's governing value alike are all named (the envelope keeps the first as
// its governing case; `ties` lists them all). Two crews aim the washing cart's lance alike: their
// cases tie wherever one of them governs.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parseSketch, solveCases } from "@/solver";
import { G0 } from "@/solver/constants";

function study(cases: unknown[]) {
  const file = { ...JSON.parse(readFileSync("canvas/examples/washing-cart.json", "utf8")), cases };
  const p = parseSketch(file);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return solveCases(p.file);
}

describe("governing cases that tie", () => {
  it("lists every case that gives the governing value, the governing one first", () => {
    const s = study([
      { id: "a", name: "Aimed down, day crew", parameters: { theta: "-75 deg" } },
      { id: "b", name: "Aimed down, night crew", parameters: { theta: "-75 deg" } },
      { id: "off", name: "Pump off", flowFactor: 0 },
    ]);
    const rear = s.envelope.rear;
    // with the jet aimed down the rear wheels carry more than the parked cart's share of its weight
    expect(rear.governing.fy).toBe("a");
    expect(rear.ties?.fy).toEqual(["a", "b"]);
    expect(rear.ties?.resultant).toEqual(["a", "b"]);
    expect(rear.design.case).toBe("a");
    // parked, the front caster carries the most (the jet lifts its share): the pump-off case alone
    // governs it, W·(0.28 − 0.06) / (0.58 − 0.06) from moments about the rear wheels (statics, common practice)
    expect(s.envelope.front.governing.fy).toBe("off");
    expect(s.envelope.front.components.fy!.max.value).toBeCloseTo((85 * G0 * 0.22) / 0.52, 6);
    expect(s.envelope.front.ties?.fy).toBeUndefined();
    // the caster's Fx is zero in every case: nothing governs it, nothing ties
    expect(s.envelope.front.ties?.fx).toBeUndefined();
    // the least margin of the caster is where the jet lifts it most: both crews alike
    expect(s.envelope.front.ties?.margin).toEqual(["a", "b"]);
  });

  it("no ties where the cases differ", () => {
    const s = study([
      { id: "a", name: "Aimed down", parameters: { theta: "-75 deg" } },
      { id: "r", name: "Raised", parameters: { theta: "-60 deg" } },
    ]);
    for (const env of Object.values(s.envelope)) expect(env.ties).toBeUndefined();
  });
});
