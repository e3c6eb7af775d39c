// Label placement shared by the SVG renderer and the canvas: in a crowded drawing no two labels
// sit on each other, the layout is the same every time, and a label moved clear of its own place
// gets a leader line. The sketch is invented to crowd: a hold-down strap beside a contact, a pin
// and a roller 0.3 m apart, a port at a corner next to a force.
import { describe, expect, it } from "vitest";
import { parseSketch, solve, solveFile, type SolveResult } from "@/solver/index";
import { buildScene, fieldValuesById } from "@/canvas/scene";
import { elementGroups, scenePrims } from "@/canvas/render/scenePrims";
import { supportStates } from "@/canvas/render/results";
import { boxesOverlap, labelBlocks, placeElementLabels, placeResultLabels, shiftTexts, textBox } from "@/canvas/render/labels";
import { text, type Prim } from "@/canvas/render/prims";
import { renderSketchSvg } from "@/canvas/render/svg";
import type { SketchFileInput } from "@/solver/schema";

const crowded = {
  format: "counterpoise.sketch",
  version: 3,
  title: "Crowded frame",
  parameters: {},
  bodies: [{ id: "frame", label: "frame", mass: "120 kg", outline: [[0, 0], [2, 0], [2, 0.8], [0, 0.8]] }],
  supports: [
    { id: "pinA", label: "left pin", body: "frame", kind: "pin", at: [0.1, 0] },
    { id: "rollB", label: "left roller", body: "frame", kind: "roller", at: [0.4, 0], angle: 90 },
    { id: "strap", label: "hold-down strap", body: "frame", kind: "tie", at: [1.85, 0], angle: -90 },
    { id: "cR", label: "right foot", body: "frame", kind: "contact", at: [2, 0], angle: 90 },
  ],
  loads: [
    { id: "P", label: "push", body: "frame", kind: "force", at: [1.9, 0.8], angle: -60, magnitude: "3 kN" },
    { id: "Q", label: "side load", body: "frame", kind: "force", at: [0.05, 0.75], angle: 0, magnitude: "800 N" },
  ],
  ports: [{ id: "jet", label: "nozzle", body: "frame", kind: "outlet", at: [2, 0.7], angle: 20, massFlow: "4 kg/s", velocity: "30 m/s", pressure: "50 kPa", area: "0.001 m^2" }],
} as unknown as SketchFileInput; // an older format version: read through the migrations

function drawn(scale: number) {
  const parsed = parseSketch(crowded);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  const result = solveFile(crowded) as SolveResult;
  expect(result.ok).toBe(true);
  const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
  return { scene, result, ...scenePrims(scene, scale, "SI", result) };
}

const textsOf = (prims: readonly Prim[]) => prims.flatMap((p) => (p.t === "text" ? [p] : []));

describe("label placement", () => {
  it("in a crowded sketch, no label sits on another, at a close zoom and a far one", () => {
    for (const scale of [120, 200, 320]) {
      const { groups, results } = drawn(scale);
      const labels = [...groups.flatMap((g) => textsOf(g.prims).map((t) => ({ id: g.id, t }))), ...textsOf(results).map((t) => ({ id: "result", t }))];
      // lines of one block sit a line apart: compare labels of different owners, and the result's among themselves
      for (const [i, a] of labels.entries()) {
        for (const b of labels.slice(i + 1)) {
          if (a.id === b.id && a.id !== "result") continue;
          expect(boxesOverlap(textBox(a.t), textBox(b.t)), `${scale} px/m: "${a.t.text}" on "${b.t.text}"`).toBe(false);
        }
      }
    }
  });

  it("would have put labels on each other without it (so the check above can fail)", () => {
    const { scene, result, groups: placed } = drawn(120);
    const unplaced = scenePrims(scene, 120, "SI", result, false, new Map()).groups;
    const moved = placed.filter((g, i) => g.prims !== unplaced[i].prims).map((g) => g.id);
    expect(moved.length).toBeGreaterThan(0);
    const texts = unplaced.flatMap((g) => textsOf(g.prims).map((t) => ({ id: g.id, box: textBox(t) })));
    const clash = texts.some((a, i) => texts.slice(i + 1).some((b) => a.id !== b.id && boxesOverlap(a.box, b.box)));
    expect(clash).toBe(true);
  });

  it("places the same way every time: the same SVG twice, and the same shifts object when nothing changed", () => {
    const a = renderSketchSvg(crowded, solveFile(crowded) as SolveResult);
    const b = renderSketchSvg(crowded, solveFile(crowded) as SolveResult);
    expect(a).toBe(b);
    const { scene, result, results, shifts } = drawn(200);
    expect(shifts.size).toBeGreaterThan(0);
    const groups = elementGroups(scene, 200, "SI", supportStates(result));
    const again = placeElementLabels(groups, results);
    expect(again).not.toBe(shifts);
    expect([...again]).toEqual([...shifts]);
    // given the last layout back, an unchanged layout is the same object: no canvas node redraws
    expect(placeElementLabels(groups, results, shifts)).toBe(shifts);
  });

  it("keeps a block of lines together and moves the later of two clashing labels by one line", () => {
    const a = text([0, 0], "5.531 kN", "#000", 11, { align: "left", baseline: "middle" });
    const b = text([4, 2], "pA 314.2 N", "#000", 11, { align: "left", baseline: "middle" });
    const far = text([300, 0], "ṁV 12 N", "#000", 11, { align: "left", baseline: "middle" });
    const out = placeResultLabels([a, b, far]);
    expect(out[0]).toBe(a);
    expect(out[2]).toBe(far);
    // the box of an 11 px line is 11 + 2 × 1.5 px high: one line down is 14 px
    expect(out[1].t === "text" && out[1].at).toEqual([4, 16]);
    // a port's name over its flow and pressure: one block; a text elsewhere is another
    const port = [text([50, 0], "nozzle", "#000", 10, { italic: true }), text([50, 14], "ṁ 4 kg/s", "#000", 11), text([50, 28], "p 50 kPa", "#000", 11)];
    expect(labelBlocks([...port, far])).toEqual([[0, 1, 2], [3]]);
  });

  it("puts values before names, and draws a leader to a label moved clear of its own place", () => {
    // an element's value sits where another element's name wants to be: the value stays, the name moves
    const value: Prim[] = [{ t: "poly", pts: [[0, 0], [0, 40]], stroke: "#000" }, text([0, 0], "800 N", "#000", 11, { align: "left", baseline: "middle" })];
    const name: Prim[] = [{ t: "poly", pts: [[10, 60], [10, 80]], stroke: "#000" }, text([2, 1], "side load", "#000", 10, { italic: true, align: "left", baseline: "middle" })];
    const blockers = [text([2, 14], "W 1 kN", "#000", 11, { align: "left", baseline: "middle" }), text([2, -15], "R 2 kN", "#000", 11, { align: "left", baseline: "middle" })];
    const shifts = placeElementLabels([{ id: "Q", prims: name }, { id: "F", prims: value }], blockers);
    expect(shifts.has("F")).toBe(false);
    const moves = shifts.get("Q")!;
    expect(moves).toHaveLength(1);
    const moved = shiftTexts(name, moves);
    const placed = moved[1];
    expect(placed.t === "text" && [placed.at[0] - 2, placed.at[1] - 1]).toEqual([moves[0][1], moves[0][2]]);
    const box = placed.t === "text" ? textBox(placed) : null;
    for (const other of [value[1], ...blockers]) if (other.t === "text") expect(boxesOverlap(box!, textBox(other))).toBe(false);
    // moved clear of its place: a leader from its own symbol (the line at x = 10) to the label
    const leader = moved[moved.length - 1];
    expect(moved).toHaveLength(name.length + 1);
    expect(leader.t === "poly" && leader.pts[0][0]).toBe(10);
  });

  it("moves a label the edge of the drawing area would cut back inside it, and leaves one wholly off it", () => {
    // a port at x = 0 pointing left: its values end at the port, right-aligned, so most of the
    // line lies left of a drawing area that starts at x = −30
    const port: Prim[] = [{ t: "poly", pts: [[0, 0], [-40, 0]], stroke: "#000" }, text([-6, -10], "ṁ 59.88 kg/s · V 7.639 m/s", "#000", 11, { align: "right", baseline: "middle" })];
    const far: Prim[] = [{ t: "poly", pts: [[-900, 0], [-940, 0]], stroke: "#000" }, text([-906, -10], "ṁ 1 kg/s", "#000", 11, { align: "right", baseline: "middle" })];
    const frame = { x0: -30, y0: -200, x1: 300, y1: 200 };
    const before = textBox(port[1] as Extract<Prim, { t: "text" }>);
    expect(before.x0).toBeLessThan(frame.x0);
    const shifts = placeElementLabels([{ id: "suction", prims: port }, { id: "far", prims: far }], [], undefined, frame);
    const moved = shiftTexts(port, shifts.get("suction"));
    const after = textBox(moved[1] as Extract<Prim, { t: "text" }>);
    expect(after.x0).toBeGreaterThanOrEqual(frame.x0);
    expect(after.x1).toBeLessThanOrEqual(frame.x1);
    // moved in just as far as it reached past the edge, on its own line, still over its own
    // place (so no leader)
    expect(after.x0 - before.x0).toBeCloseTo(frame.x0 - before.x0, 6);
    expect(after.y0).toBe(before.y0);
    expect(moved).toHaveLength(port.length);
    // an element panned out of sight keeps its label with it
    expect(shifts.has("far")).toBe(false);
    // without a frame (an export, the calc sheet) nothing moves
    expect(placeElementLabels([{ id: "suction", prims: port }], []).size).toBe(0);
    // a reaction's value past the right edge comes in too
    const reaction = text([296, 40], "2.953 kN", "#000", 11, { align: "left", baseline: "middle" });
    const [inside] = placeResultLabels([reaction], [], frame);
    expect(textBox(inside as Extract<Prim, { t: "text" }>).x1).toBeLessThanOrEqual(frame.x1);
    expect(placeResultLabels([reaction])[0]).toBe(reaction);
  });

  it("puts a body's name beside it when the body is too narrow for it anywhere inside", async () => {
    const { bodyPrims } = await import("@/canvas/render/symbols");
    const body = (outline: [number, number][]) => ({ id: "stack", label: "Stack on skid", mass: 900, outline, cg: [0.3, 4] as [number, number] }) as unknown as Parameters<typeof bodyPrims>[0];
    const nameOf = (prims: Prim[]) => textsOf(prims).find((t) => t.text.startsWith("Stack on skid"))!;
    // 0.6 m wide at 30 px/m: 18 px, far less than the name
    const narrow = nameOf(bodyPrims(body([[0, 0], [0.6, 0], [0.6, 8], [0, 8]]), { units: "SI", scale: 30 }));
    const box = textBox(narrow);
    expect(box.x0).toBeGreaterThanOrEqual(0.6 * 30);
    expect(narrow.halo).not.toBe(false); // on the paper, not the body's fill: kept readable over lines
    // a wide body keeps it inside, at its top left corner
    const wide = nameOf(bodyPrims(body([[0, 0], [8, 0], [8, 2], [0, 2]]), { units: "SI", scale: 30 }));
    expect(wide.at[0]).toBeGreaterThan(0);
    expect(wide.at[0]).toBeLessThan(8 * 30);
    expect(wide.at[1]).toBeGreaterThan(-2 * 30);
    expect(wide.halo).toBe(false);
  });

  it("names a distributed load beside the middle of its arrows' tails, on the side away from the body", async () => {
    const { itemPrims } = await import("@/canvas/render/symbols");
    const load = (from: [number, number], to: [number, number], angle: number, w1: number, w2: number) =>
      ({ kind: "distributed", id: "w", label: "wind", body: "b", from, to, angle, w1, w2 }) as unknown as Parameters<typeof itemPrims>[0];
    const nameOf = (prims: Prim[]) => textsOf(prims).find((t) => t.text === "wind")!;
    // a load down on a 2 m deck at 50 px/m: the line is 100 px long; arrows' tails 32 px above it (w1 = w2)
    const down = nameOf(itemPrims(load([0, 0], [2, 0], -90, 500, 500), { units: "SI", scale: 50 }));
    expect(down.align).toBe("center");
    expect(down.at[0]).toBeCloseTo(50, 6);
    expect(textBox(down).y1).toBeLessThanOrEqual(-32);
    // wind pushing +x on a 6 m stack: tails to the left of it, the name right-aligned there, half-way up
    const wind = nameOf(itemPrims(load([0, 0], [0, 6], 0, 400, 400), { units: "SI", scale: 20 }));
    expect(wind.align).toBe("right");
    expect(wind.at[0]).toBeCloseTo(-32 - 6, 6);
    expect(wind.at[1]).toBeCloseTo(-60, 0);
    // the arrows pointing the other way (a suction): the tails and the name are on the other side
    const suction = nameOf(itemPrims(load([0, 0], [0, 6], 0, -400, -400), { units: "SI", scale: 20 }));
    expect(suction.align).toBe("left");
    expect(suction.at[0]).toBeCloseTo(32 + 6, 6);
  });

  it("moves a name beside a narrow body off another element's arrow; a name inside a body stays", async () => {
    const { bodyPrims } = await import("@/canvas/render/symbols");
    const body = (outline: [number, number][]) => ({ id: "stack", label: "Stack on skid", mass: 900, outline, cg: [0.3, 4] as [number, number] }) as unknown as Parameters<typeof bodyPrims>[0];
    const stackPrims = bodyPrims(body([[0, 0], [0.6, 0], [0.6, 8], [0, 8]]), { units: "SI", scale: 30 });
    const name = textBox(textsOf(stackPrims)[0]);
    // a duct's arrow drawn straight through the name, from its right end into the body
    const midY = (name.y0 + name.y1) / 2;
    const duct: Prim[] = [{ t: "poly", pts: [[name.x1 + 30, midY], [18, midY]], stroke: "#000" }];
    const shifts = placeElementLabels([{ id: "stack", kind: "body", prims: stackPrims }, { id: "duct", kind: "inlet", prims: duct }]);
    const moves = shifts.get("stack")!;
    expect(moves).toHaveLength(1);
    const moved = shiftTexts(stackPrims, moves);
    const at = textBox(textsOf(moved)[0]);
    // clear of the arrow and of the body's outline (x = 0 … 18 px)
    expect(at.y0 > midY || at.y1 < midY).toBe(true);
    expect(at.x0).toBeGreaterThanOrEqual(18);
    // a wide body's name inside it stays where it is, arrow or not
    const widePrims = bodyPrims(body([[0, 0], [8, 0], [8, 2], [0, 2]]), { units: "SI", scale: 30 });
    const inner = textBox(textsOf(widePrims)[0]);
    const across: Prim[] = [{ t: "poly", pts: [[inner.x0 - 5, (inner.y0 + inner.y1) / 2], [inner.x1 + 5, (inner.y0 + inner.y1) / 2]], stroke: "#000" }];
    expect(placeElementLabels([{ id: "stack", kind: "body", prims: widePrims }, { id: "duct", kind: "inlet", prims: across }]).has("stack")).toBe(false);
  });
});

describe("leader lines", () => {
  // a leader that starts on empty paper (the label's old place) points at nothing: it must start on
  // a line end or corner of what the label belongs to
  const isLeader = (p: Prim) => p.t === "poly" && p.width === 0.75 && p.opacity === 0.8 && p.pts.length === 2;
  it("start on a point of the element's own drawing, in every fixture, in SI and US units", async () => {
    const { readdirSync, readFileSync } = await import("node:fs");
    let leaders = 0;
    for (const name of readdirSync("tests/fixtures/sketches")) {
      const file = JSON.parse(readFileSync(`tests/fixtures/sketches/${name}`, "utf8"));
      const parsed = parseSketch(file);
      if (!parsed.ok) continue;
      const result = solveFile(file) as SolveResult;
      const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
      for (const units of ["SI", "US"] as const)
        for (const scale of [60, 120, 240]) {
          const { groups } = scenePrims(scene, scale, units, result.ok ? result : null);
          for (const g of groups) {
            const own = g.prims.filter((p) => !isLeader(p)).flatMap((p) => (p.t === "poly" ? p.pts : p.t === "circle" ? [p.c] : []));
            for (const l of g.prims.filter(isLeader)) {
              leaders++;
              const start = (l as Extract<Prim, { t: "poly" }>).pts[0];
              const d = Math.min(...own.map((q) => Math.hypot(q[0] - start[0], q[1] - start[1])));
              expect(d, `${name} ${units} ${scale} px/m, ${g.id}`).toBeLessThan(0.5);
            }
          }
        }
    }
    expect(leaders).toBeGreaterThan(0);
  });
});

describe("label placement on a very long body", () => {
  it("places the labels of an outline a thousand kilometres long at a close zoom without filling a square per 48 px of it", () => {
    // 1e6 m at 120 px/m: an outline stroke 1.2e8 px long (2.5 million squares of the stroke index)
    const file = {
      format: "counterpoise.sketch",
      version: 6,
      title: "Long body",
      parameters: {},
      bodies: [{ id: "b1", label: "Body 1", outline: [[0, 0], [1e6, 0], [1e6, 1], [0, 1]], mass: "100 kg" }],
      supports: [{ id: "s1", body: "b1", kind: "fixed", at: [0.5, 0] }],
      loads: [],
      ports: [{ id: "p1", body: "b1", kind: "inlet", at: [0, 0.5], angle: 0, massFlow: 39.27, velocity: 5, pressure: "200 kPa", area: 0.007854 }],
      massSources: [],
    } as unknown as SketchFileInput;
    const parsed = parseSketch(file);
    if (!parsed.ok) throw new Error("the sketch parses");
    const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
    const result = solve(parsed.sketch);
    const { groups, results } = scenePrims(scene, 120, "SI", result);
    expect(groups.length).toBeGreaterThan(0);
    // the port's label still keeps off the body's outline (the long strokes are asked about too)
    const again = placeElementLabels(groups, results, undefined, { x0: -200, y0: -300, x1: 800, y1: 300 });
    expect(again).toBeInstanceOf(Map);
  });
});
