// Display in SI or US customary units (factors from NIST SP 811).
import { describe, expect, it } from "vitest";
import { convert, formatNumber, formatQuantity, prettyUnit } from "@/solver/units";

describe("formatQuantity", () => {
  it.each([
    [2400, "force", "SI", "2.4 kN"],
    [2400, "force", "US", "539.5 lbf"],
    [120e3, "force", "US", "26.98 kip"],
    [-2400, "force", "SI", "−2.4 kN"],
    [5120.4, "force", "SI", "5.12 kN"],
    [1356, "moment", "US", "1,000 lbf·ft"],
    [689475.7293168361, "pressure", "US", "100 psi"],
    [689475.7293168361, "pressure", "SI", "689.5 kPa"],
    [14.2, "massFlow", "US", "31.31 lb/s"],
    [31, "velocity", "US", "101.7 ft/s"],
    [0.0252362, "volumeFlow", "US", "400 gpm"],
    [0.01, "volumeFlow", "SI", "10 L/s"],
    [1356, "moment", "SI", "1.356 kN·m"],
    [35, "angle", "SI", "35°"],
    [0, "force", "SI", "0 N"],
    [0.00045, "area", "US", "0.6975 in²"],
    // below a psi, inches of water (conventional: 249.0889 Pa, NIST SP 811 Appendix B.8, from memory)
    [-250, "pressure", "US", "−1.004 inH2O"],
    [6000, "pressure", "US", "24.09 inH2O"],
    [6894.757293168361, "pressure", "US", "1 psi"],
    [0, "pressure", "US", "0 psi"],
    [-250, "pressure", "SI", "−250 Pa"],
    // lengths: 1 ft = 0.3048 m and 1 in = 0.0254 m exactly (NIST SP 811, Appendix B)
    [2.5, "length", "SI", "2.5 m"],
    [1.6002, "length", "US", "5.25 ft"],
    [0.1, "smallLength", "SI", "100 mm"],
    [0.1016, "smallLength", "US", "4 in"],
  ] as const)("%s %s in %s → %s", (v, q, sys, out) => {
    expect(formatQuantity(v, q, sys)).toBe(out);
  });

  it("keeps a requested unit", () => {
    expect(formatQuantity(2400, "force", "SI", { unit: "N" })).toBe("2,400 N");
    expect(convert(4.4482216152605, "force", "US", "lbf").value).toBe(1);
  });

  it("3–4 significant figures, grouped thousands, a true minus sign", () => {
    expect(formatNumber(0.0012346)).toBe("0.001235");
    expect(formatNumber(1234.56)).toBe("1,235");
    expect(formatNumber(12345.6)).toBe("12,346");
    expect(formatNumber(-1.5)).toBe("−1.5");
    expect(formatNumber(Infinity)).toBe("∞");
  });

  it("keeps trailing zeros for table columns, so every figure shown is significant", () => {
    // Significant figures: a trailing zero after the point is significant (common practice).
    expect(formatNumber(11.5, 4, { keepZeros: true })).toBe("11.50");
    expect(formatNumber(2.4, 4, { keepZeros: true })).toBe("2.400");
    expect(formatNumber(-0.31, 4, { keepZeros: true })).toBe("−0.3100");
    expect(formatNumber(1039.2, 4, { keepZeros: true })).toBe("1,039");
    expect(formatNumber(1500, 5, { keepZeros: true })).toBe("1,500.0");
    expect(formatNumber(0, 4, { keepZeros: true })).toBe("0");
    expect(formatNumber(0.0310, 4, { keepZeros: true })).toBe("0.031");
    expect(formatNumber(-0.00004, 4, { keepZeros: true })).toBe("−0.00004");
    expect(formatNumber(11.5)).toBe("11.5");
  });

  it("a table's value that rounds up past a power of ten gains no fifth figure, and from 1,000 keeps its separator", () => {
    // 4 significant figures of 999.96 are 1,000 (common practice), as the hand check writes it
    expect(formatNumber(999.96, 4, { keepZeros: true })).toBe("1,000");
    expect(formatNumber(-999.96, 4, { keepZeros: true })).toBe("−1,000");
    expect(formatNumber(9.99996, 4, { keepZeros: true })).toBe("10.00");
    expect(formatNumber(99.996, 4, { keepZeros: true })).toBe("100.0");
    expect(formatNumber(0.99996, 4, { keepZeros: true })).toBe("1.000");
    expect(formatNumber(0.099996, 4, { keepZeros: true })).toBe("0.1000");
    expect(formatNumber(9999.6, 4, { keepZeros: true })).toBe("10,000");
    // past the figures asked for, whole numbers keep every digit
    expect(formatNumber(12345.6)).toBe("12,346");
  });
});

describe("areas", () => {
  it("a duct's area in m² from 0.1 m² up, a pipe bore's in mm² (1 m² = 10⁶ mm², SI Brochure 9th ed.)", () => {
    expect(formatQuantity(0.5, "area")).toBe("0.5 m²");
    expect(formatQuantity(0.8, "area")).toBe("0.8 m²");
    expect(formatQuantity(Math.PI / 4 * 0.2 ** 2, "area")).toBe("31,416 mm²");
    expect(formatQuantity(0.002, "area")).toBe("2,000 mm²");
  });
});

describe("prettyUnit", () => {
  it("writes mathjs's unit text as people write units (SI Brochure, 9th ed., §5.4.6: the solidus, and a half-high dot for a product)", () => {
    expect(prettyUnit("m / s")).toBe("m/s");
    expect(prettyUnit("m / s^2")).toBe("m/s²");
    expect(prettyUnit("kg / m^3")).toBe("kg/m³");
    expect(prettyUnit("N * m")).toBe("N·m");
    expect(prettyUnit("deg")).toBe("deg");
  });
});
