// A given point force or couple is written in the drawing's one force and moment unit, the one its
// reactions are written in (`drawingFamily`): one drawing never writes "500 N" beside "5.039 kN",
// nor "2,000 lbf" beside "12.00 kip". One unit per quantity across a drawing is common practice on
// calc sheets.
import { describe, expect, it } from "vitest";
import { exampleById } from "@/canvas/examples";
import { buildScene, fieldValuesById, type SceneItem } from "@/canvas/scene";
import { drawingFamily } from "@/canvas/render/results";
import { itemPrims } from "@/canvas/render/symbols";
import { renderSketchSvg } from "@/canvas/render/svg";
import { parseSketch, solve } from "@/solver";
import type { SketchFile } from "@/solver/schema";
import type { UnitSystem } from "@/solver/units";

/** The pump-skid example with given loads added on its skid. */
function skidWith(loads: SketchFile["loads"]) {
  const file = structuredClone(exampleById("pump-skid")!.sketch);
  file.loads = loads;
  const p = parseSketch(file);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  const scene = buildScene(p.file, fieldValuesById(p.file, p.fields, []));
  return { scene, result: solve(p.sketch) };
}

const words = (item: SceneItem, units: UnitSystem, family?: { force: string; moment: string }) =>
  itemPrims(item, { units, scale: 100, family, showName: false }).flatMap((p) => (p.t === "text" ? [p.text] : []));

describe("given loads in the drawing's unit", () => {
  it("SI: a 500 N force and a 300 N·m couple on the skid whose bearers carry about 5 kN are written in kN", () => {
    const { scene, result } = skidWith([
      { id: "f", body: "skid", kind: "force", at: [1, 1], magnitude: "500 N", angle: -90 },
      { id: "c", body: "skid", kind: "couple", value: "300 N*m" },
    ]);
    const family = drawingFamily(result, "SI", scene.items);
    expect(family).toEqual({ force: "kN", moment: "kN·m" });
    const byId = (id: string) => scene.items.find((i) => i.id === id)!;
    expect(words(byId("f"), "SI", family)).toEqual(["0.5 kN"]);
    expect(words(byId("c"), "SI", family)).toEqual(["0.3 kN·m ↺"]);
    // each in its own unit when no family is given (a toolbar icon, a load being placed)
    expect(words(byId("f"), "SI")).toEqual(["500 N"]);
  });

  it("US: a 2 kip force beside a 12 kip one (the reactions then in kip) is written in kip, not lbf", () => {
    // 1 kip = 1000 lbf = 4448.2216 N (NIST SP 811)
    const { scene, result } = skidWith([
      { id: "big", body: "skid", kind: "force", at: [1, 1], magnitude: "12 kip", angle: -90 },
      { id: "small", body: "skid", kind: "force", at: [2, 1], magnitude: "2 kip", angle: -90 },
    ]);
    const family = drawingFamily(result, "US", scene.items);
    expect(family).toEqual({ force: "kip", moment: "kip·ft" });
    const small = scene.items.find((i) => i.id === "small")!;
    expect(words(small, "US", family)).toEqual(["2 kip"]);
    expect(words(small, "US")).not.toEqual(["2 kip"]);
  });

  it("with no result yet, the given loads alone choose the unit: 800 N beside 5 kN is 0.8 kN", () => {
    const { scene } = skidWith([
      { id: "a", body: "skid", kind: "force", at: [1, 1], magnitude: "800 N", angle: -90 },
      { id: "b", body: "skid", kind: "force", at: [2, 1], magnitude: "5 kN", angle: -90 },
    ]);
    const family = drawingFamily(null, "SI", scene.items);
    expect(family).toEqual({ force: "kN", moment: "kN·m" });
    expect(words(scene.items.find((i) => i.id === "a")!, "SI", family)).toEqual(["0.8 kN"]);
    // and small loads alone stay in N
    expect(drawingFamily(null, "SI", scene.items.filter((i) => i.id === "a"))).toEqual({ force: "N", moment: "N·m" });
  });

  it("the SVG drawing: the given force's label and the reactions share kN", () => {
    const file = structuredClone(exampleById("pump-skid")!.sketch);
    file.loads = [{ id: "f", body: "skid", kind: "force", at: [1, 1], magnitude: "500 N", angle: -90 }];
    const p = parseSketch(file);
    if (!p.ok) throw new Error(JSON.stringify(p.errors));
    const svg = renderSketchSvg(file, solve(p.sketch));
    expect(svg).toContain(">0.5 kN<");
    expect(svg).not.toContain(">500 N<");
  });
});
