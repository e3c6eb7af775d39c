// The hand check writes every number by one rule (4 significant figures, trailing zeros kept), takes
// each Σ of the unrounded terms, prints two sums that differ by floating-point rounding alike, and
// says such a difference is rounding rather than printing a bare 0 beside two different figures.
import { describe, expect, it } from "vitest";
import { handCheckText, type HandCheckBlock } from "@/components/results/handCheck";
import { tableCells } from "@/lib/calcsheet/table-layout";
import { parseSketch, solve } from "@/solver";
import { formatFigures } from "@/solver/quantity";
import { cellNumberText, handCheckDifferenceText, handCheckNumber, handCheckSides, handCheckTable } from "@/solver/report";
import { G0 } from "@/solver/constants";
import { formatNumber } from "@/solver/units";
import { loadFixture, parsed } from "./solver/helpers";

/** A block of the check made by hand: force terms and momentum terms in N, the sums of the unrounded terms. */
function block(forces: number[], momentum: number[]): HandCheckBlock {
  const f = forces.reduce((a, b) => a + b, 0);
  const m = momentum.reduce((a, b) => a + b, 0);
  return {
    key: "fx",
    title: "ΣFx",
    forces: forces.map((value, i) => ({ id: `f${i}`, label: `force ${i}`, value })),
    forcesSum: f,
    momentum: momentum.map((value, i) => ({ id: `m${i}`, label: `flux ${i}`, value })),
    momentumSum: m,
    imbalance: f - m,
  };
}
const inKN = (n: number) => n / 1000;

describe("a number of the hand check", () => {
  it("has 4 significant figures with trailing zeros kept, small values too", () => {
    expect(handCheckNumber(12.5)).toBe("12.50");
    expect(handCheckNumber(3.1)).toBe("3.100");
    expect(handCheckNumber(0.05)).toBe("0.05000");
    expect(handCheckNumber(-0.0981749)).toBe("−0.09817");
    expect(handCheckNumber(1234.56)).toBe("1,235");
    // rounding up past a power of ten gains no fifth figure
    expect(handCheckNumber(9.99996)).toBe("10.00");
    expect(handCheckNumber(999.96)).toBe("1,000");
    expect(handCheckNumber(0)).toBe("0");
    expect(handCheckNumber(1.23456e-7)).toBe("1.235e-7");
  });

  it("writes a value and the same value with floating-point noise on it alike", () => {
    expect(formatFigures(0.09817500000001)).toBe(formatFigures(0.0981749999999));
    expect(formatFigures(98.17500000001)).toBe(formatFigures(98.1749999999));
  });

  it("is what the calc sheet prints in a table that asks for it (the usual rule drops the zeros of 0.05)", () => {
    expect(cellNumberText({ figures: 4 }, 0.05)).toBe("0.05000");
    expect(cellNumberText({ figures: 4 }, 12.5)).toBe("12.50");
    expect(cellNumberText({}, 12.5)).toBe("12.50");
  });
});

describe("the two sides of an equation of the hand check", () => {
  it("two sums equal but for floating-point rounding print alike, and their difference is said to be rounding", () => {
    // a reaction of 98.175 N, a weight's noise along x, and a momentum flux equal to the reaction but
    // for its last bits: printed each on its own, the sums would read 0.09818 beside 0.09817
    const b = block([98.17500000001, 6e-15], [98.1749999999]);
    expect(formatNumber(inKN(b.forcesSum), 4, { keepZeros: true })).not.toBe(formatNumber(inKN(b.momentumSum), 4, { keepZeros: true }));
    const text = handCheckText(b, { force: 98.175, moment: 0 }, inKN, "kN");
    expect(text.forcesSum).toBe(text.momentumSum);
    expect(text.forcesSum).toMatch(/^0\.0981[78] kN$/);
    // the weight's 6e-15 N along x is no figure of the check
    expect(text.forces[1]).toBe("0 kN");
    expect(text.difference).toMatch(/^\d(\.\d)?e-1\d kN \(rounding\)$/);
    expect(text.difference).not.toBe("0 kN");
    expect(text.verdict).toBe("the two sides agree to 4 significant figures");
  });

  it("a difference that is a figure is printed as one, and said to differ", () => {
    // 12.5 N of force against 3.1 N of momentum flux: 9.4 N is not held
    const text = handCheckText(block([12.5], [3.1]), { force: 12.5, moment: 0 }, (n) => n, "N");
    expect([text.forces[0], text.forcesSum, text.momentum[0], text.momentumSum, text.difference]).toEqual(["12.50 N", "12.50 N", "3.100 N", "3.100 N", "9.400 N"]);
    expect(text.verdict).toBe("the two sides differ: the body is not in equilibrium on its supports as drawn");
  });

  it("an exact zero difference is 0, and rounding of either sign is written in e-notation", () => {
    expect(handCheckDifferenceText(0, false, "kN")).toBe("0 kN");
    expect(handCheckDifferenceText(-1.23e-12, true, "kN·m")).toBe("−1.2e-12 kN·m (rounding)");
    const sides = handCheckSides(1, 1 + 1e-12, -1e-12, { force: 1, moment: 0 });
    expect(sides.rounding).toBe(true);
    expect(sides.forces).toBe(sides.momentum);
  });
});

describe("the calc sheet's hand-check table", () => {
  it("prints every number of the check to 4 significant figures, the points of action too", () => {
    // the beam of the results panel: 10 kN down at mid-span (2, 0.5) m, 100 kg, a pin at (0, 0) and a
    // pad at (4, 0); the pad carries (10 kN + 100 kg·g0)/2 = 5.490 kN, 21.96 kN·m about the pin (statics)
    const p = parseSketch({
      format: "counterpoise.sketch",
      version: 1,
      title: "Beam",
      bodies: [{ id: "b1", label: "Beam", mass: 100, outline: [[0, 0], [4, 0], [4, 0.5], [0, 0.5]] }],
      supports: [
        { id: "s1", label: "left pin", body: "b1", kind: "pin", at: [0, 0] },
        { id: "s2", label: "right pad", body: "b1", kind: "contact", at: [4, 0], angle: 90 },
      ],
      loads: [{ id: "l1", body: "b1", kind: "force", at: [2, 0.5], magnitude: "10 kN", angle: -90 }],
      ports: [],
      massSources: [],
    });
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    const t = handCheckTable(solve(p.sketch), "b1", [0, 0], "SI");
    const cells = tableCells(t);
    const row = (start: string) => cells[t.rows.findIndex((r) => String(r[1]).startsWith(start))];
    const pad = (10_000 + 100 * G0) / 2;
    expect(row("reaction at “right pad”").slice(2)).toEqual([handCheckNumber(0), handCheckNumber(pad / 1000), "(4.000, 0)", handCheckNumber((4 * pad) / 1000)]);
    expect(row("reaction at “right pad”")[3]).toBe("5.490");
    expect(row("reaction at “right pad”")[5]).toBe("21.96");
    // the load: −10.00 kN at (2.000, 0.5000), −20.00 kN·m about the pin; the weight −0.9807 kN
    expect(cells.some((r) => r[3] === "−10.00" && r[4] === "(2.000, 0.5000)" && r[5] === "−20.00")).toBe(true);
    expect(cells.some((r) => r[3] === "−0.9807")).toBe(true);
    // every printed number has 4 significant figures (or is 0, or a rounding noted as such)
    for (const r of cells) {
      for (const c of [r[2], r[3], r[5]]) {
        if (c === "0" || /\(rounding\)$/.test(c)) continue;
        expect(c.replace(/[−,.]/g, "").replace(/^0+/, ""), c).toHaveLength(4);
      }
    }
  });

  it("says the sums agree, and how far: a pump skid about (2, 1) m", () => {
    const r = solve(parsed(loadFixture("pump-skid-discharge.json")));
    const t = handCheckTable(r, "skid", [2, 1], "SI");
    expect(t.notes).toContain("Every number to 4 significant figures. Each Σ adds the unrounded terms, so it may differ in its last figure from the printed terms added up.");
    expect(t.notes!.some((n) => n.startsWith("The two sides agree to 4 significant figures in ΣFx, ΣFy and ΣM"))).toBe(true);
    // no bare 0 in the imbalance row beside sums that print differently
    const cells = tableCells(t);
    const [forces, momentum, imbalance] = cells.slice(-3);
    for (const k of [2, 3, 5]) {
      expect(forces[k]).toBe(momentum[k]);
      expect(imbalance[k]).toMatch(/^(0|−?\d(\.\d)?e-\d+ \(rounding\))$/);
    }
  });
});
