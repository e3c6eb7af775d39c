// A found limit is written by one rule wherever it is shown (the Sweep tab, its plot, the calc sheet
// and a version's page): 4 significant figures, trailing zeros kept, with the search's tolerance.
import { describe, expect, it } from "vitest";
import { sweepMarkers } from "@/lib/calcsheet/sweeps";
import { parseSketch } from "@/solver";
import { G0 } from "@/solver/constants";
import { findLimit, formatLimit, limitPrecisionWords, limitTolerance, limitWithUnit } from "@/solver/limit";
import { loadFixture, parsed } from "./helpers";

// the thrust stand: the rear pad lifts when T·h = W·d about the front pin (h = 1.5 m, d = 0.8 m,
// W = 200 kg·g0): T = 1.046 kN (statics, common practice)
const T0 = (200 * G0 * 0.8) / 1.5 / 1000;

describe("a found limit in figures", () => {
  it("has 4 significant figures, trailing zeros kept", () => {
    expect(formatLimit(45.278)).toBe("45.28");
    expect(formatLimit(44.13)).toBe("44.13");
    expect(formatLimit(1.2)).toBe("1.200");
    expect(formatLimit(0.0305)).toBe("0.03050");
    expect(formatLimit(-3.14159)).toBe("−3.142");
    expect(limitWithUnit(27.7689, "kg / s")).toBe("27.77 kg/s");
    expect(limitWithUnit(1.2, "")).toBe("1.200");
  });

  it("states the search's tolerance, rounded up to one figure so it never claims more", () => {
    expect(limitTolerance([0, 80])).toBeCloseTo(8e-8, 20);
    expect(limitTolerance([45, 20])).toBeCloseTo(2.5e-8, 20);
    expect(limitPrecisionWords(8e-8, "deg")).toBe("to 4 significant figures, found to within ±8e-8 deg");
    expect(limitPrecisionWords(2.5e-8, "m / s")).toBe("to 4 significant figures, found to within ±3e-8 m/s");
    expect(limitPrecisionWords(9.5e-9, "")).toBe("to 4 significant figures, found to within ±1e-8");
  });

  it("the search reports the tolerance it used, and the hand value lies within it at 4 figures", () => {
    const lim = findLimit(parsed(loadFixture("thrust-stand-tips.json")), "T", [0, 3], { support: "rear", component: "margin" });
    if (!lim.found) throw new Error("expected a crossing");
    expect(lim.tolerance).toBeCloseTo(3e-9, 20);
    expect(formatLimit(lim.value)).toBe("1.046");
    expect(formatLimit(lim.value)).toBe(formatLimit(T0));
  });
});

describe("the calc sheet and a version's page", () => {
  const file = () => {
    const doc = loadFixture("thrust-stand-tips.json");
    doc.cases = [
      { id: "a", name: "Full flow" },
      { id: "b", name: "Throttled", flowFactor: 0.8 },
    ];
    const p = parseSketch(doc);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    return p.file;
  };
  const sweep = { id: "s", parameter: "T", from: 0, to: 3, points: 31, quantities: [{ support: "rear", component: "margin" as const }] };

  it("a crossing is given to 4 significant figures, its search's tolerance left out where the figures do not show it", () => {
    const [marker] = sweepMarkers(file(), sweep, sweep.quantities);
    // ±3e-9 kN (1e-9 of the 3 kN range) is far finer than the 0.001 kN that 1.046 kN is written to
    expect(marker.words).toBe(`rear pad: lift-off (its normal force reaches zero) at T = ${formatLimit(T0)} kN (to 4 significant figures)`);
    expect(marker.words).toContain("at T = 1.046 kN");
    // the plot's label stays short
    expect(marker.label).toBe("rear pad: lift-off at 1.046 kN");
  });

});
