// The hour is written h (SI Brochure, 9th ed., table 8: non-SI units accepted for use with the SI),
// so a flow typed "180 m3/hr" reads "180 m³/h" wherever the app shows it: the editor's parameters,
// the studies (sweep axis, ranges, limits), the results' error words and the calc sheet. One
// function writes units (`prettyUnit`); what it writes reads back as the same value.
import { describe, expect, it } from "vitest";
import { parseSketch } from "@/solver";
import { evaluateToNumber } from "@/solver/expressions";
import { limitWithUnit } from "@/solver/limit";
import { parametersTable } from "@/solver/report";
import { prettyUnit } from "@/solver/units";
import { sweepRangeWords } from "@/canvas/studies/display";
import { readableValue } from "@/components/editor/ParametersTable";
import { unitAsWritten } from "@/components/results/errorPlace";
import { buildCalcSheet } from "@/lib/calcsheet/pdf";
import { loadFixture } from "./solver/helpers";
import { pdfText } from "../support/pdf-text";

describe("prettyUnit writes the hour as h, and units with symbols by their symbols", () => {
  it("m³/h, kg/h, L/min and L/s (SI Brochure, table 8: h for hour, L for litre)", () => {
    expect(prettyUnit("m^3 / hr")).toBe("m³/h");
    expect(prettyUnit("m^3 / hour")).toBe("m³/h");
    expect(prettyUnit("kg / hr")).toBe("kg/h");
    expect(prettyUnit("km / hr")).toBe("km/h");
    expect(prettyUnit("lpm")).toBe("L/min");
    expect(prettyUnit("lps")).toBe("L/s");
    // a symbol with its own solidus is bracketed after another one
    expect(prettyUnit("kg / lpm")).toBe("kg/(L/min)");
    // names that merely contain the letters are left alone
    expect(prettyUnit("thr")).toBe("thr");
    // as before: products, powers, and a number's space kept
    expect(prettyUnit("kg^3 / (m^4 s^4)")).toBe("kg³/(m⁴·s⁴)");
    expect(prettyUnit("N m")).toBe("N·m");
    expect(prettyUnit("998 kg/m^3")).toBe("998 kg/m³");
  });

  it("what it writes reads back as the same value, with or without a parameter called h (1 h = 3600 s, NIST SP 811)", () => {
    for (const [typed, kind, si] of [
      ["180 m3/hr", "volumeFlow", 0.05],
      ["3600 kg/hr", "massFlow", 1],
      ["90 km/hr", "velocity", 25],
      ["600 L/min", "volumeFlow", 0.01],
    ] as const) {
      const base = loadFixture("pipe-bend-anchor.json");
      const parsed = parseSketch({ ...base, parameters: { ...base.parameters, q: typed } });
      if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
      const v = parsed.parameterValues.q;
      if (!("value" in v)) throw new Error(v.error);
      const shown = `${v.value} ${prettyUnit(v.unit)}`;
      expect(shown).not.toMatch(/hr|lpm/);
      expect(evaluateToNumber(shown, kind)).toBeCloseTo(si, 12);
      // "/h" tight after a unit is per hour even in a sketch with a parameter h (a height)
      expect(evaluateToNumber(shown, kind, new Map([["h", 2]]))).toBeCloseTo(si, 12);
    }
  });
});

describe("every place shows the same m³/h", () => {
  const base = loadFixture("pipe-bend-anchor.json");
  const file = { ...base, parameters: { ...base.parameters, Q: "180 m3/hr" } };
  const parsed = parseSketch(file);
  if (!parsed.ok) throw new Error("does not parse");

  it("the editor's parameters, the studies' words and the results' error words", () => {
    const v = parsed.parameterValues.Q;
    if (!("value" in v)) throw new Error(v.error);
    expect(v.unit).toBe("m^3 / hr");
    // the parameters table beside the canvas: as typed, then in the units on screen
    expect(readableValue(v.value, v.unit, "SI")).toBe("180 m³/h (50 L/s)");
    // a sweep's range and a limit found in it
    expect(sweepRangeWords("Q", 0, 360, v.unit)).toBe("Q from 0 to 360 m³/h");
    expect(limitWithUnit(123.4567, v.unit)).toMatch(/^123\.5 m³\/h$/);
    // an error that names the unit
    expect(unitAsWritten("m^3 / hr")).toBe("m³/h");
    // the calc sheet's parameters table
    const row = parametersTable(parsed).rows.find((r) => r[0] === "Q")!;
    expect(row[2]).toBe("180 m³/h");
  });

  it("the calc sheet prints the value in m³/h, never m³/hr (the expression column keeps the text as typed)", { timeout: 30_000 }, async () => {
    const buf = await buildCalcSheet({ workspace: "W", sketchTitle: "Bend", version: 1, savedAt: new Date(0), generatedAt: new Date(0), signoff: [], file });
    const { text } = await pdfText(buf);
    expect(text).toContain("Q 180 m3/hr 180 m³/h");
    expect(text).not.toContain("m³/hr");
  });
});
