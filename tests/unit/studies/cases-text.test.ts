// The short text forms of the Cases panel.
import { describe, expect, it } from "vitest";
import { formatFactors, formatOverrides, formatTerms, idFromName, parseFactors, parseOverrides, parseTerms } from "@/components/studies/casesText";

describe("case text forms", () => {
  it("parameter changes", () => {
    expect(parseOverrides("theta = 30 deg; Q = 1500 gpm", ["theta", "Q"])).toEqual({ ok: true, value: { theta: "30 deg", Q: "1500 gpm" } });
    expect(parseOverrides("", ["theta"])).toEqual({ ok: true, value: undefined });
    expect(parseOverrides("phi = 3", ["theta"])).toEqual({ ok: false, error: 'the sketch has no parameter "phi" (it has theta)' });
    expect(parseOverrides("theta 30", ["theta"])).toEqual({ ok: false, error: '"theta 30" should read name = value (e.g. theta = 30 deg)' });
    expect(formatOverrides({ theta: "30 deg", Q: 2 })).toBe("theta = 30 deg; Q = 2");
    // a comma that starts the next "name =" parts changes too; one inside a function call does not
    expect(parseOverrides("Q = 0 litre/s, pd = 650 kPa", ["Q", "pd"])).toEqual({ ok: true, value: { Q: "0 litre/s", pd: "650 kPa" } });
    expect(parseOverrides("Q = max(1, 2) * 1 lps; pd = 1 bar", ["Q", "pd"])).toEqual({ ok: true, value: { Q: "max(1, 2) * 1 lps", pd: "1 bar" } });
  });
  it("group factors", () => {
    expect(parseFactors("dead 1.2, flow × 1.5, test pressure 1.1")).toEqual({ ok: true, value: { dead: 1.2, flow: 1.5, "test pressure": 1.1 } });
    expect(parseFactors("dead").ok).toBe(false);
    // with the sketch's groups, a name that is none of them is refused
    expect(parseFactors("dead 1.2, wnd 2", ["dead", "wind"])).toEqual({ ok: false, error: 'no load is in group "wnd"; the sketch\'s groups are dead, wind' });
    expect(parseFactors("dead 1.2, wind 2", ["dead", "wind"])).toEqual({ ok: true, value: { dead: 1.2, wind: 2 } });
    expect(formatFactors({ dead: 1.2, flow: 1.5 })).toBe("dead 1.2, flow 1.5");
  });
  it("combination terms", () => {
    expect(parseTerms("1.2 normal + 1.5 test", ["normal", "test"])).toEqual({ ok: true, value: [{ case: "normal", factor: 1.2 }, { case: "test", factor: 1.5 }] });
    expect(parseTerms("normal", ["normal"])).toEqual({ ok: true, value: [{ case: "normal", factor: 1 }] });
    expect(parseTerms("1.2 nope", ["normal"])).toEqual({ ok: false, error: 'there is no case "nope" (cases: normal)' });
    expect(formatTerms([{ case: "normal", factor: 1.2 }])).toBe("1.2 normal");
  });
  it("combination terms name a case by its id or its name, in any capitals, spaces and all", () => {
    const cases = [
      { id: "case-5", name: "Dead" },
      { id: "case-6", name: "Rated flow" },
    ];
    expect(parseTerms("1.2 dead + 1.5 Rated  flow", cases)).toEqual({ ok: true, value: [{ case: "case-5", factor: 1.2 }, { case: "case-6", factor: 1.5 }] });
    expect(parseTerms("1.2*case-5 + 0.9 x rated flow", cases)).toEqual({ ok: true, value: [{ case: "case-5", factor: 1.2 }, { case: "case-6", factor: 0.9 }] });
    expect(parseTerms("1.5 wind", cases)).toEqual({ ok: false, error: 'there is no case "wind" (cases: Dead (case-5), Rated flow (case-6))' });
    // the middle dot the sheet itself writes products with (μ·n) reads as a product too
    expect(parseTerms("0.9·Dead + 1.5 · rated flow", cases)).toEqual({ ok: true, value: [{ case: "case-5", factor: 0.9 }, { case: "case-6", factor: 1.5 }] });
    // a decimal comma is said as such, not as a case named "1,5 Rated flow"
    expect(parseTerms("0.9 Dead + 1,5 Rated flow", cases)).toEqual({ ok: false, error: '"1,5" has a decimal comma: write the factor with a point (1.5)' });
    expect(parseTerms("1,5×Dead", cases)).toEqual({ ok: false, error: '"1,5" has a decimal comma: write the factor with a point (1.5)' });
    // written back by name, as typed, and read back to the same cases
    const text = formatTerms([{ case: "case-5", factor: 1.2 }, { case: "case-6", factor: 1.5 }], cases);
    expect(text).toBe("1.2 Dead + 1.5 Rated flow");
    expect(parseTerms(text, cases)).toEqual({ ok: true, value: [{ case: "case-5", factor: 1.2 }, { case: "case-6", factor: 1.5 }] });
    // a name another case's id would take (or one with a +) stays an id
    expect(formatTerms([{ case: "a", factor: 1 }], [{ id: "a", name: "b" }, { id: "b", name: "B case" }])).toBe("1 a");
    expect(formatTerms([{ case: "a", factor: 1 }], [{ id: "a", name: "wind + snow" }])).toBe("1 a");
  });
  it("ids from names", () => {
    expect(idFromName("Test pressure", [])).toBe("test-pressure");
    expect(idFromName("Test pressure", ["test-pressure"])).toBe("test-pressure-2");
  });
});
