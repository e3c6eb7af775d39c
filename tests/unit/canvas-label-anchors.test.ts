// Labels stay beside what they label: on a stack standing on two feet close together, each
// reaction's value and each support's name sit nearer their own support than the other one, at
// the canvas's sizes (a laptop, a laptop with the Cases tab open, a phone) and in an export; and
// no two labels sit on each other. The layout is checked as the canvas places it: fitted to the
// drawing area, kept inside it, the result's labels first.
import { describe, expect, it } from "vitest";
import { exampleById } from "@/canvas/examples";
import { parseSketch, solveFile, type SolveResult } from "@/solver/index";
import { formatQuantity } from "@/solver/units";
import type { SketchFile } from "@/solver/schema";
import { buildScene, fieldValuesById, type Scene } from "@/canvas/scene";
import { drawingFrame, fitScene } from "@/canvas/geometry/fit";
import { elementGroups, resultLayer, scenePrims } from "@/canvas/render/scenePrims";
import { supportStates } from "@/canvas/render/results";
import { astray, boxesOverlap, labelBlocks, NO_SHIFTS, placeElementLabels, placeResultLabels, shiftTexts, textBox, type Box } from "@/canvas/render/labels";
import { text, type Prim, type Pt } from "@/canvas/render/prims";

type Text = Extract<Prim, { t: "text" }>;
type Label = { owner: string; words: string; box: Box };

/** The exhaust stack as the demo saves it at the site's design wind: a 3 m skid on two feet 2.8 m apart under an 8 m stack. */
function stack(v: string, ballast: string): SketchFile {
  const file = structuredClone(exampleById("exhaust-stack")!.sketch) as SketchFile;
  file.parameters = { ...file.parameters, v, ballast };
  return file;
}

function solved(file: SketchFile) {
  const parsed = parseSketch(file);
  if (!parsed.ok) throw new Error("the sketch parses");
  const result = solveFile(file) as SolveResult;
  expect(result.ok).toBe(true);
  return { scene: buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, [])), result };
}

function blocksOf(owner: string, prims: readonly Prim[]): Label[] {
  return labelBlocks(prims).map((idx) => {
    const boxes = idx.map((i) => textBox(prims[i] as Text));
    return {
      owner,
      words: idx.map((i) => (prims[i] as Text).text).join(" / "),
      box: boxes.reduce((a, b) => ({ x0: Math.min(a.x0, b.x0), y0: Math.min(a.y0, b.y0), x1: Math.max(a.x1, b.x1), y1: Math.max(a.y1, b.y1) })),
    };
  });
}

/** Every label as the canvas draws it in a drawing area of width × height, and the scale it is drawn at. */
function canvasLabels(scene: Scene, result: SolveResult, width: number, height: number) {
  const view = fitScene(scene, width, height, { result, units: "SI" });
  const frame = drawingFrame(view, { width, height });
  const states = supportStates(result);
  const groups = elementGroups(scene, view.scale, "SI", states);
  const results = resultLayer(groups, scene, view.scale, "SI", result, states, false, frame);
  const shifts = placeElementLabels(groups, results, NO_SHIFTS, frame);
  const labels = [...groups.flatMap((g) => blocksOf(g.id, shiftTexts(g.prims, shifts.get(g.id)))), ...blocksOf("result", results)];
  return { labels, scale: view.scale };
}

/** Every label as an export draws it at this scale (no drawing area to keep inside). */
function exportLabels(scene: Scene, result: SolveResult, scale: number) {
  const { groups, results } = scenePrims(scene, scale, "SI", result);
  return [...groups.flatMap((g) => blocksOf(g.id, g.prims)), ...blocksOf("result", results)];
}

const centre = (b: Box): Pt => [(b.x0 + b.x1) / 2, (b.y0 + b.y1) / 2];

/** For each support: its label's distance to its own support and to the nearest other one (px). */
function distances(scene: Scene, result: SolveResult, labels: readonly Label[], scale: number) {
  const supports = scene.items.filter((i) => ["pin", "roller", "contact", "fixed", "tie"].includes(i.kind)) as Array<Scene["items"][number] & { at: [number, number]; label?: string }>;
  const at = (s: (typeof supports)[number]): Pt => [s.at[0] * scale, -s.at[1] * scale];
  const out: Array<{ what: string; own: number; other: number }> = [];
  for (const s of supports) {
    const r = result.reactions[s.id];
    // the reaction's value as the drawing writes it, and the support's name
    const value = formatQuantity(Math.hypot(r.fx, r.fy), "force", "SI", { keepZeros: true });
    for (const [what, label] of [
      [`${s.id}'s reaction ${value}`, labels.find((l) => l.owner === "result" && l.words === value)],
      [`${s.id}'s name`, labels.find((l) => l.owner === s.id && l.words === (s.label || s.id))],
    ] as const) {
      expect(label, what).toBeDefined();
      const c = centre(label!.box);
      const d = (p: Pt) => Math.hypot(c[0] - p[0], c[1] - p[1]);
      out.push({ what, own: d(at(s)), other: Math.min(...supports.filter((o) => o !== s).map((o) => d(at(o)))) });
    }
  }
  return out;
}

function expectNoOverlaps(labels: readonly Label[], where: string) {
  for (const [i, a] of labels.entries())
    for (const b of labels.slice(i + 1)) {
      // one element's name over its values is one block; two blocks of one element may touch
      if (a.owner === b.owner && a.owner !== "result") continue;
      expect(boxesOverlap(a.box, b.box), `${where}: "${a.words}" on "${b.words}"`).toBe(false);
    }
}

// the drawing area of the editor's canvas: a laptop (1280 × 800, and with the Cases tab open), a
// smaller laptop (1024 × 768), a phone (390 × 844), a wide screen
const AREAS: Array<[number, number]> = [
  [712, 412],
  [712, 316],
  [792, 392],
  [366, 380],
  [1100, 520],
];

describe("labels beside their own supports", () => {
  for (const [v, ballast] of [
    ["40 m/s", "900 kg"],
    ["30 m/s", "0 kg"],
  ])
    it(`on the exhaust stack at ${v} with ${ballast} of ballast, each reaction's value and each support's name sit nearer their own support than the other, on every canvas size`, () => {
      const { scene, result } = solved(stack(v, ballast));
      for (const [w, h] of AREAS) {
        const { labels, scale } = canvasLabels(scene, result, w, h);
        for (const d of distances(scene, result, labels, scale)) expect(d.own, `${w} × ${h} (${scale.toFixed(1)} px/m): ${d.what} is nearer the other support`).toBeLessThan(d.other);
        expectNoOverlaps(labels, `${w} × ${h}`);
      }
    });

  it("in an exported drawing too, at a close zoom and a far one", () => {
    const { scene, result } = solved(stack("40 m/s", "900 kg"));
    for (const scale of [10, 16, 24, 40]) {
      const labels = exportLabels(scene, result, scale);
      for (const d of distances(scene, result, labels, scale)) expect(d.own, `${scale} px/m: ${d.what} is nearer the other support`).toBeLessThan(d.other);
      expectNoOverlaps(labels, `${scale} px/m`);
    }
  });

  it("moves a value whose own place is nearer another support to the side of its own", () => {
    // two supports 40 px apart; the first one's value is written at (60, 80), nearer the second
    const own: Pt = [0, 0];
    const other: Pt = [40, 0];
    const value = text([60, 80], "3.817 kN", "#000", 11.5, { align: "center", baseline: "middle", weight: 600 });
    expect(astray(textBox(value as Text), own, [other])).toBeGreaterThan(0);
    const anchors = new Map([[0, { at: own, family: "support" }]]);
    const rivals = [
      { at: own, family: "support" },
      { at: other, family: "support" },
    ];
    const [placed] = placeResultLabels([value], [], undefined, { anchors, rivals });
    const c = centre(textBox(placed as Text));
    expect(Math.hypot(c[0] - own[0], c[1] - own[1])).toBeLessThan(Math.hypot(c[0] - other[0], c[1] - other[1]));
    // without the points it belongs to, it stays where it was written
    expect(placeResultLabels([value])[0]).toBe(value);
    // a support of another family (a port) is no rival
    expect(placeResultLabels([value], [], undefined, { anchors, rivals: [rivals[0], { at: other, family: "port" }] })[0]).toBe(value);
  });

  it("keeps an element's name nearer its own support than the next one's, and leaves a name already there", () => {
    // two contacts 45 px apart, each named to its lower right as the symbol writes it: the left one's
    // name reaches past the right one (clear of its foot, drawn above the names)
    const name = (x: number, words: string): Prim[] => [
      { t: "poly", pts: [[x - 9, -5], [x + 9, -5]], stroke: "#000" },
      text([x + 20, 10], words, "#555", 10, { italic: true, align: "left", baseline: "middle" }),
    ];
    const groups = [
      { id: "upwind", kind: "contact", prims: name(0, "upwind edge"), anchor: [0, 0] as Pt },
      { id: "downwind", kind: "contact", prims: name(45, "downwind edge"), anchor: [45, 0] as Pt },
    ];
    const shifts = placeElementLabels(groups, []);
    const moved = groups.map((g) => textBox(shiftTexts(g.prims, shifts.get(g.id))[1] as Text));
    const [up, down] = moved.map(centre);
    expect(Math.hypot(up[0], up[1])).toBeLessThan(Math.hypot(up[0] - 45, up[1]));
    expect(Math.hypot(down[0] - 45, down[1])).toBeLessThan(Math.hypot(down[0], down[1]));
    expect(boxesOverlap(moved[0], moved[1])).toBe(false);
    // the right one's name was already nearest its own support: it stays
    expect(shifts.has("downwind")).toBe(false);
    // without their points the names stay where the symbols wrote them
    expect(placeElementLabels(groups.map(({ anchor: _, ...g }) => g), []).has("upwind")).toBe(false);
  });
});

describe("labels on the pipe bend", () => {
  it("write the anchor's moment outside the bend, off its outline, and on no other label, at a laptop's sizes", () => {
    const { scene, result } = solved(exampleById("pipe-bend-anchor")!.sketch as SketchFile);
    const body = scene.bodies[0];
    for (const [w, h] of [
      [712, 412],
      [792, 392],
      [712, 316],
    ] as const) {
      const { labels, scale } = canvasLabels(scene, result, w, h);
      expectNoOverlaps(labels, `${w} × ${h}`);
      // the moment's value (↺ or ↻) lies right of the bend's right face, where the anchor is
      const moment = labels.find((l) => l.owner === "result" && /[↺↻]$/.test(l.words))!;
      const right = Math.max(...body.outline.map((p) => p[0] * scale));
      expect(moment.box.x0, `${w} × ${h}`).toBeGreaterThan(right);
    }
  });
});
