// What a field suggests and remembers: an unknown name's error suggests the field's own units,
// placeholders are written in the unit system on screen, a visit to a field that ends where it
// began leaves no undo step, and a field's last good value is found in the undo history.
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { parseSketch } from "@/solver/parse";
import { evaluateToNumber, type FieldKind } from "@/solver/expressions";
import { ANY_UNIT_SUGGESTION, suggestUnitsFor, UNITS_TO_SUGGEST } from "@/solver/expressionErrors";
import { errorInWords, fieldKindAt } from "@/components/results/errorPlace";
import { exampleIn, FORCE_COMPONENTS, FORCE_POLAR, FORM, type NumberFieldDef } from "@/components/editor/fieldDefs";
import { createEditorStore } from "@/canvas/store";
import type { Command } from "@/canvas/commands";
import { elementField, lastGoodValue, setField, setParameter, sketchField } from "@/canvas/commands/fields";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";

const c = <A,>(cmd: Command<A>) => cmd as unknown as Command<unknown>;

/** A 4 m × 1 m body on a pin and a contact (demo data), its mass as given. */
function sketch(mass: string | number = "60 kg"): SketchFile {
  return {
    ...emptySketch("Crate"),
    bodies: [{ ...newBody("b1", [[0, 0], [4, 0], [4, 1], [0, 1]], "Crate"), mass }],
    supports: [
      { id: "s1", body: "b1", kind: "pin", at: [0, 0] },
      { id: "s2", body: "b1", kind: "contact", at: [4, 0], angle: 90 },
    ],
  };
}

describe("an unknown name suggests the field's own units", () => {
  it("a mass field's abc suggests kg, tonne, lb; a pressure field's kPa, bar, psi; never m, kN, psi, deg", () => {
    const parsed = parseSketch(sketch("abc"));
    expect(parsed.ok).toBe(false);
    const error = !parsed.ok ? parsed.errors.find((e) => e.path === "bodies[0].mass")! : null;
    // the solver fits its words to the field already (so the API and the calc sheet say it too)
    expect(error!.message).toBe('unknown name "abc": define it as a parameter or use a unit such as kg, tonne, lb');
    const generic = `unknown name "abc": define it as a parameter or ${ANY_UNIT_SUGGESTION}`;
    expect(suggestUnitsFor(generic, "mass")).toBe('unknown name "abc": define it as a parameter or use a unit such as kg, tonne, lb');
    expect(suggestUnitsFor(generic, "pressure")).toBe('unknown name "abc": define it as a parameter or use a unit such as kPa, bar, psi');
    expect(suggestUnitsFor(generic, "ratio")).toBe('unknown name "abc": define it as a parameter or type a plain number (this field takes no unit)');
    // each unknown name of one message, and nothing else
    expect(suggestUnitsFor(`unknown name "a": define it as a parameter or ${ANY_UNIT_SUGGESTION}; unknown name "b": define it as a parameter or ${ANY_UNIT_SUGGESTION}`, "velocity")).toBe(
      'unknown name "a": define it as a parameter or use a unit such as m/s, ft/s; unknown name "b": define it as a parameter or use a unit such as m/s, ft/s',
    );
    expect(suggestUnitsFor('"2 m" is a length (m), but this field needs a mass (kg)', "mass")).toBe('"2 m" is a length (m), but this field needs a mass (kg)');
    expect(suggestUnitsFor(generic, null)).toBe(generic);
  });

  it("every unit suggested can be typed in a field of its kind", () => {
    for (const [kind, units] of Object.entries(UNITS_TO_SUGGEST)) {
      const fieldKind = (kind === "smallLength" ? "length" : kind) as FieldKind;
      for (const u of units) expect(Number.isFinite(evaluateToNumber(`2 ${u}`, fieldKind)), `${u} for ${kind}`).toBe(true);
    }
    // 1 tonne = 1000 kg; 1 bar = 100 kPa (SI brochure)
    expect(evaluateToNumber("1 tonne", "mass")).toBe(1000);
    expect(evaluateToNumber("1 bar", "pressure")).toBeCloseTo(100_000, 6);
  });

  it("the banner's words suggest the units of the field at the error's path", () => {
    const s = sketch("abc");
    const message = `unknown name "abc": define it as a parameter or ${ANY_UNIT_SUGGESTION}`;
    expect(errorInWords(s, { path: "bodies[0].mass", message })).toBe('Body Crate — mass: unknown name "abc": define it as a parameter or use a unit such as kg, tonne, lb');
    expect(errorInWords(s, { path: "supports[1].angle", message })).toBe('Contact s2 — pushes toward: unknown name "abc": define it as a parameter or use a unit such as deg, rad');
    expect(errorInWords(s, { path: "supports[0].at[1]", message })).toBe('Pin s1 — position y: unknown name "abc": define it as a parameter or use a unit such as m, mm, ft, in');
    // a parameter may hold any quantity: the suggestion stays general
    expect(errorInWords(s, { path: "parameters.p", message })).toBe(`Parameter p: ${message}`);
  });

  it("knows the kind of the field at each path", () => {
    expect(fieldKindAt("bodies[0].mass")).toBe("mass");
    expect(fieldKindAt("ports[2].pressure")).toBe("pressure");
    expect(fieldKindAt("ports[2].beta")).toBe("ratio");
    expect(fieldKindAt("loads[0].value")).toBe("moment");
    expect(fieldKindAt("bodies[0].outline[2][1]")).toBe("length");
    expect(fieldKindAt("gravity")).toBe("acceleration");
    expect(fieldKindAt("motion.ax")).toBe("acceleration");
    expect(fieldKindAt("parameters.rho")).toBeNull();
    expect(fieldKindAt("bodies[0]")).toBeNull();
  });
});

describe("placeholders in the unit system on screen", () => {
  const US_UNITS = new Set(["ft", "in", "inch", "yd", "lb", "lbm", "lbf", "kip", "psi", "ksi", "gpm", "gal"]);
  const SI_UNITS = new Set(["m", "mm", "cm", "km", "kg", "g", "tonne", "N", "kN", "MN", "Pa", "kPa", "MPa", "bar", "lpm", "lps", "litre"]);
  const words = (text: string) => text.match(/[A-Za-z]+/g) ?? [];
  const defs = [...Object.values(FORM).flat(), ...FORCE_POLAR, ...FORCE_COMPONENTS].filter((d): d is NumberFieldDef => "display" in d && d.example !== undefined);

  it("SI examples use SI units, US examples US units, and each is a value of its field", () => {
    expect(defs.length).toBeGreaterThan(20);
    for (const d of defs) {
      const kind = d.display as FieldKind;
      for (const units of ["SI", "US"] as const) {
        const text = exampleIn(d.example!, units);
        const foreign = words(text).filter((w) => (units === "SI" ? US_UNITS : SI_UNITS).has(w));
        expect(foreign, `${d.key} in ${units}: ${text}`).toEqual([]);
        expect(Number.isFinite(evaluateToNumber(text, kind)), `${d.key} in ${units}: ${text}`).toBe(true);
      }
    }
  });

  it("a port's velocity is 31 m/s in SI and 100 ft/s in US; its pressure 350 kPa and 50 psi; a body's mass 850 kg and 1900 lb", () => {
    const port = (key: string) => FORM.inlet.find((d) => d.key === key) as NumberFieldDef;
    expect(exampleIn(port("velocity").example!, "SI")).toBe("31 m/s");
    expect(exampleIn(port("velocity").example!, "US")).toBe("100 ft/s");
    expect(exampleIn(port("pressure").example!, "SI")).toBe("350 kPa");
    expect(exampleIn(port("pressure").example!, "US")).toBe("50 psi");
    const mass = FORM.body.find((d) => d.key === "mass") as NumberFieldDef;
    expect(exampleIn(mass.example!, "SI")).toBe("850 kg");
    expect(exampleIn(mass.example!, "US")).toBe("1900 lb");
  });
});

describe("a visit to a field that ends where it began", () => {
  it("leaves no undo step, and typing on starts a new one from there", () => {
    const store = createEditorStore({ sketch: sketch() });
    const start = store.getState().sketch;
    for (const v of ["a", "ab", "abc", "60 kg"]) store.getState().apply(c(setField({ id: "b1", field: "mass", value: v })), { coalesce: "b1.mass#1" });
    expect(store.getState().past).toHaveLength(0);
    expect(store.getState().sketch).toEqual(start);
    store.getState().apply(c(setField({ id: "b1", field: "mass", value: "70 kg" })), { coalesce: "b1.mass#1" });
    expect(store.getState().past).toHaveLength(1);
    store.getState().undo();
    expect(store.getState().sketch.bodies[0].mass).toBe("60 kg");
  });

  it("other visits keep their steps", () => {
    const store = createEditorStore({ sketch: sketch() });
    store.getState().apply(c(setField({ id: "b1", field: "mass", value: "abc" })), { coalesce: "b1.mass#1" });
    store.getState().apply(c(setField({ id: "b1", field: "mass", value: "60 kg" })), { coalesce: "b1.mass#2" });
    expect(store.getState().past.map((e) => [e.before.bodies[0].mass, e.after.bodies[0].mass])).toEqual([
      ["60 kg", "abc"],
      ["abc", "60 kg"],
    ]);
  });
});

describe("a field's last good value", () => {
  const type = (store: ReturnType<typeof createEditorStore>, value: string, visit: string) => store.getState().apply(c(setField({ id: "b1", field: "mass", value })), { coalesce: visit });

  it("walks back through the history past the bad entries", () => {
    const store = createEditorStore({ sketch: sketch() });
    type(store, "abc", "v1");
    type(store, "2 m", "v2");
    const mass = elementField("b1", "mass");
    expect(lastGoodValue(store.getState(), mass)).toEqual({ value: "60 kg" });
    // the current value, when good, is the last good one
    type(store, "75 kg", "v3");
    expect(lastGoodValue(store.getState(), mass)).toEqual({ value: "75 kg" });
    // but not the one the visit under way stored: that is what is being taken back
    expect(lastGoodValue(store.getState(), mass, "v3")).toEqual({ value: "60 kg" });
  });

  it("is good in the sketch as it is now: a value that reads a deleted parameter is skipped", () => {
    const store = createEditorStore({ sketch: sketch() });
    store.getState().apply(c(setParameter({ name: "m0", expression: "70 kg" })));
    type(store, "m0", "v1");
    type(store, "abc", "v2");
    expect(lastGoodValue(store.getState(), elementField("b1", "mass"))).toEqual({ value: "m0" });
    store.getState().apply(c(setField({ id: "b1", field: "mass", value: "abc" })));
    const s = store.getState();
    const withoutM0 = { sketch: { ...s.sketch, parameters: {} }, past: s.past };
    expect(lastGoodValue(withoutM0, elementField("b1", "mass"))).toEqual({ value: "60 kg" });
  });

  it("null when nothing in the history was good", () => {
    const store = createEditorStore({ sketch: sketch("abc") });
    type(store, "xyz", "v1");
    expect(lastGoodValue(store.getState(), elementField("b1", "mass"))).toBeNull();
  });

  it("a point's coordinate and the sketch's own fields", () => {
    const store = createEditorStore({ sketch: sketch() });
    store.getState().apply(c(setField({ id: "s1", field: ["at", 0], value: "1 kg" })), { coalesce: "x" });
    expect(lastGoodValue(store.getState(), elementField("s1", ["at", 0]))).toEqual({ value: 0 });
    expect(lastGoodValue(store.getState(), sketchField("gravity"))).toEqual({ value: undefined });
  });
});
