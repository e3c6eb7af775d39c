// No words under a centre of gravity's mark: a body's name and mass inside it slide past the mark
// when no corner is clear of it (the monitor trailer at 60 px/m read "9⊕ kg"), and the label
// layout keeps every other label (values, names, reactions) off the mark as off another label.
import { describe, expect, it } from "vitest";
import { EXAMPLES } from "@/canvas/examples";
import { parseSketch, solve } from "@/solver/index";
import { buildScene, fieldValuesById, type SceneBody } from "@/canvas/scene";
import { bodyPrims, cgMarkBox, portKeepOut, type Box } from "@/canvas/render/symbols";
import { boxesOverlap, placeElementLabels, shiftTexts, textBox } from "@/canvas/render/labels";
import { scenePrims } from "@/canvas/render/scenePrims";
import { text, type Prim } from "@/canvas/render/prims";

/** The demo fire-monitor trailer, its expressions evaluated as the editor's analysis does. */
function trailer() {
  const ex = EXAMPLES.find((e) => e.id === "fire-monitor-trailer")!;
  const parsed = parseSketch(ex.sketch);
  if (!parsed.ok) throw new Error("the demo parses");
  const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
  return { scene, body: scene.bodies.find((b) => b.id === "trailer") as SceneBody, result: solve(parsed.sketch) };
}

/** The quartered circle itself (radius 6.5 px) around the centre of gravity at this zoom. */
const markAt = (b: SceneBody, scale: number): Box => {
  const [x, y] = [b.cg[0] * scale, -b.cg[1] * scale];
  return { x0: x - 6.5, y0: y - 6.5, x1: x + 6.5, y1: y + 6.5 };
};
const texts = (prims: readonly Prim[]) => prims.filter((p): p is Extract<Prim, { t: "text" }> => p.t === "text");

describe("a body's name and its centre of gravity", () => {
  it("the trailer's name is never written over its centre of gravity, at any zoom from 40 to 300 px/m", () => {
    const { scene, body } = trailer();
    expect(body.mass).toBe(950);
    for (let scale = 40; scale <= 300; scale += 2) {
      const names = texts(bodyPrims(body, { units: "SI", scale, keepOut: portKeepOut(scene.items, body.id, scale) }));
      expect(names.length).toBeGreaterThan(0);
      for (const n of names) expect(boxesOverlap(textBox(n), markAt(body, scale)), `${scale} px/m: "${n.text}"`).toBe(false);
    }
  });

  it("at 60 px/m no corner is clear of the mark: the name slides past it on two lines, or goes beside the body when the supply's droplet is there too", () => {
    const { scene, body } = trailer();
    // without the mass source: inside, just right of the mark (its box reaches 8.5 px past the centre of gravity at 105 px)
    const alone = texts(bodyPrims(body, { units: "SI", scale: 60, keepOut: [] }));
    expect(alone.map((n) => n.text)).toEqual(["Monitor trailer", "950 kg"]);
    expect(alone[0].at).toEqual([116.5, -50]);
    expect(alone[0].halo).toBe(false);
    // the supply hose's droplet at 2.9 m (174 px) is in the way of that too: beside the body's top right corner, on a halo
    const keepOut = portKeepOut(scene.items, body.id, 60);
    const beside = texts(bodyPrims(body, { units: "SI", scale: 60, keepOut }));
    expect(beside.map((n) => [n.text, n.at, n.halo])).toEqual([["Monitor trailer · 950 kg", [234, -55], true]]);
    for (const k of keepOut) expect(boxesOverlap(textBox(beside[0]), k)).toBe(false);
  });

  it("with the result drawn, no text of the sketch or of the result sits on the mark, on a phone's zoom or a laptop's", () => {
    const { scene, body, result } = trailer();
    for (const scale of [55, 60, 70, 90, 120, 160]) {
      const { groups, results } = scenePrims(scene, scale, "SI", result);
      const all = [...groups.flatMap((g) => texts(g.prims)), ...texts(results)];
      for (const t of all) expect(boxesOverlap(textBox(t), markAt(body, scale)), `${scale} px/m: "${t.text}"`).toBe(false);
    }
  });
});

describe("the label layout and a centre of gravity's mark", () => {
  it("moves a label whose own place is on a body's mark off it, as off another label", () => {
    const cg: [number, number] = [100, -50];
    const body = { id: "b1", kind: "body", prims: [{ t: "poly", closed: true, pts: [[0, 0], [200, 0], [200, -100], [0, -100]] } as Prim], marks: [cgMarkBox(cg)] };
    // a force's value written where the mark is
    const force = { id: "l1", kind: "force", prims: [text([100, -50], "12 kN", "#000", 11.5, { align: "center", baseline: "middle" })], anchor: [150, -50] as [number, number] };
    const shifts = placeElementLabels([body, force]);
    expect(shifts.has("l1")).toBe(true);
    const [moved] = texts(shiftTexts(force.prims, shifts.get("l1")));
    expect(boxesOverlap(textBox(moved), cgMarkBox(cg))).toBe(false);
    // without the mark the label keeps its own place
    expect(placeElementLabels([{ ...body, marks: undefined }, force]).has("l1")).toBe(false);
  });
});
