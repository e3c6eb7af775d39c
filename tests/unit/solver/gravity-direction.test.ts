// Gravity turned off the page's −y: a body on a slope or a tilt table.
// The checks are the rigid-block rules of the trade (common practice; the tilt-table form of the
// first is the static stability factor of vehicle tilt tests, tan θ = T/(2H), from memory):
//   - a block resting on a tilted base tips over its downhill edge when tan θ = (b/2)/h_cg
//     (the weight's line of action passes the edge), provided it has not slid first;
//   - it slides when tan θ > μ (the friction angle), the sliding factor being μ / tan θ.
import { describe, expect, it } from "vitest";
import { findLimit, parseSketch, solve, solveCases } from "@/solver";
import { G0 } from "@/solver/constants";
import { box, expectRel, parsed, sketch, solved } from "./helpers";
import { renderSketchSvg } from "@/canvas/render/svg";
import { inputsTable } from "@/solver/report";
import { gravityNote } from "@/solver/words";

const b = 1.2; // base, m
const hcg = 1.0; // height of the centre of gravity, m
const mass = 500; // kg

/** A block on two contacts at its bottom corners, the base tilted by `tilt` (gravity leans toward +x). */
const block = (tilt: string, mu = 1.0) =>
  sketch({
    parameters: { tilt },
    gravityAngle: "-90 deg + tilt",
    bodies: [{ id: "blk", outline: box(b, 2 * hcg), mass, cg: [b / 2, hcg] }],
    supports: [
      { id: "uphill", body: "blk", kind: "contact", at: [0, 0], angle: 90, mu },
      { id: "downhill", body: "blk", kind: "contact", at: [b, 0], angle: 90, mu },
    ],
  });

describe("the weight follows gravity's direction", () => {
  it("W·sin θ along the base and W·cos θ across it, at the centre of gravity", () => {
    const theta = 12;
    const r = solved(block(`${theta} deg`));
    const W = mass * G0;
    const t = (theta * Math.PI) / 180;
    // the supports carry the weight: Σ reactions = −W·(sin θ, −cos θ)
    const fx = r.reactions.uphill.fx + r.reactions.downhill.fx;
    const fy = r.reactions.uphill.fy + r.reactions.downhill.fy;
    expectRel(fx, -W * Math.sin(t), 1e-9);
    expectRel(fy, W * Math.cos(t), 1e-9);
    // moment about the uphill corner: the downhill normal is W·(cos θ·b/2 + sin θ·h)/b
    expectRel(r.reactions.downhill.n!, (W * (Math.cos(t) * (b / 2) + Math.sin(t) * hcg)) / b, 1e-9);
  });

  it("absent, it is −90°: the same result as writing −90° out", () => {
    const plain = sketch({
      bodies: [{ id: "blk", outline: box(b, 2 * hcg), mass, cg: [b / 2, hcg] }],
      supports: [
        { id: "uphill", body: "blk", kind: "contact", at: [0, 0], angle: 90 },
        { id: "downhill", body: "blk", kind: "contact", at: [b, 0], angle: 90 },
      ],
    });
    expect(JSON.stringify(solved(plain))).toBe(JSON.stringify(solved({ ...plain, gravityAngle: -90 })));
    expect(JSON.stringify(solved(plain))).toBe(JSON.stringify(solved({ ...plain, gravityAngle: "270 deg" })));
  });
});

describe("tilt-table angle: tan θ = (b/2)/h (common practice)", () => {
  it("the limit finder finds the tilt at which the uphill contact unloads", () => {
    const p = parseSketch(block("10 deg"));
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    const lim = findLimit(p.sketch, "tilt", [0, 60], { support: "uphill", component: "n" }, 0);
    expect(lim.found).toBe(true);
    if (lim.found) {
      expect(lim.unit).toBe("deg");
      expectRel(lim.value, (Math.atan(b / 2 / hcg) * 180) / Math.PI, 1e-6);
    }
  });

  it("just past it, the block tips about the downhill edge", () => {
    const critical = (Math.atan(b / 2 / hcg) * 180) / Math.PI;
    expect(solve(parsed(block(`${critical - 0.5} deg`))).bodies.blk.status).not.toBe("tips");
    const past = solve(parsed(block(`${critical + 0.5} deg`)));
    expect(past.bodies.blk.status).toBe("tips");
  });

  it("the overturning factor is (b/2)/(h·tan θ): restoring W·cos θ·b/2 over overturning W·sin θ·h", () => {
    const theta = 20;
    const t = (theta * Math.PI) / 180;
    const run = solveCases(parseOk(block(`${theta} deg`))).runs[0];
    if (!run.ok) throw new Error("run");
    const ot = run.stability.blk.overturning;
    if ("notApplicable" in ot) throw new Error(ot.notApplicable);
    expect(ot.about).toBe("downhill");
    expectRel(ot.factor, b / 2 / (hcg * Math.tan(t)), 1e-9);
  });
});

describe("sliding on a slope: μ / tan θ (common practice)", () => {
  it("the sliding factor is μ over tan θ, and passes 1 at the friction angle", () => {
    const mu = 0.35;
    for (const theta of [5, 15, 19]) {
      const run = solveCases(parseOk(block(`${theta} deg`, mu))).runs[0];
      if (!run.ok) throw new Error("run");
      const sl = run.stability.blk.sliding;
      if ("notApplicable" in sl) throw new Error(sl.notApplicable);
      expectRel(sl.factor, mu / Math.tan((theta * Math.PI) / 180), 1e-9);
      expect(sl.factor > 1).toBe(theta < (Math.atan(mu) * 180) / Math.PI);
    }
  });
});

describe("a turned gravity is said wherever the drawing or the inputs are printed", () => {
  it("in words: the angle from +x and how far it is off −y", () => {
    expect(gravityNote(undefined)).toBeNull();
    expect(gravityNote(-90)).toBeNull();
    expect(gravityNote(270)).toBeNull();
    expect(gravityNote(-65)).toBe("gravity at −65°, 25° off −y");
    expect(gravityNote(-100)).toBe("gravity at −100°, 10° off −y");
    expect(gravityNote(90)).toBe("gravity at 90°, 180° off −y");
  });

  it("under the drawing and in the inputs table", () => {
    const doc = block("25 deg");
    const svg = renderSketchSvg(doc, solve(parsed(doc)));
    expect(svg).toContain("gravity at −65°, 25° off −y");
    // a narrow drawing (the comparison's) wraps the key and the note into lines inside the width
    const narrow = renderSketchSvg(doc, solve(parsed(doc)), { width: 640, height: 400 });
    const lines = [...narrow.matchAll(/<text x="16" y="([\d.]+)" font-size="11"[^>]*>([^<]*)<\/text>/g)];
    expect(lines.length).toBeGreaterThan(1);
    expect(lines.map((m) => m[2]).join(" · ")).toMatch(/^Solid arrows: .* · SI units · gravity at −65°, 25° off −y$/);
    for (const m of lines) expect(m[2].length * 6).toBeLessThanOrEqual(640 - 32);
    expect(Number(lines[1][1]) - Number(lines[0][1])).toBe(15);
    expect(Number(lines[lines.length - 1][1])).toBeLessThan(400);
    const p = parseSketch(doc);
    if (!p.ok) throw new Error();
    const row = inputsTable(p).rows.find((r) => r[0] === "gravity")!;
    expect(String(row[4])).toBe("9.80665 m/s² (acts at −65° from +x, 25° off −y (-90 deg + tilt))");
    expect(renderSketchSvg({ ...doc, gravityAngle: undefined }, solve(parsed({ ...doc, gravityAngle: undefined })))).not.toContain("off −y");
  });
});

describe("bad input names the field", () => {
  it("a gravity direction with the wrong units", () => {
    const p = parseSketch({ ...block("5 deg"), gravityAngle: "9.81 m/s^2" });
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.errors.find((e) => e.path === "gravityAngle")?.message).toMatch(/angle|deg/);
  });
});

function parseOk(doc: unknown) {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return p.file;
}
