// @vitest-environment jsdom
// The one SVG renderer (sketch + result → SVG text, no Konva, no DOM): a snapshot of a worked
// example, and structural checks that every element is drawn with its values and units.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { solveFile, type SolveResult } from "@/solver/index";
import { renderSketchSvg } from "@/canvas/render/svg";
import { drawingFamily } from "@/canvas/render/results";
import { EXAMPLES, exampleById } from "@/canvas/examples";
import { textBox } from "@/canvas/render/labels";
import { scenePrims } from "@/canvas/render/scenePrims";
import { buildScene, fieldValuesById } from "@/canvas/scene";
import { parseSketch } from "@/solver/index";
import { CAUTION, INK_SOFT } from "@/canvas/render/palette";

const overlap = (a: ReturnType<typeof textBox>, b: ReturnType<typeof textBox>) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

const parse = (svg: string) => new DOMParser().parseFromString(svg, "image/svg+xml");

function solved(id: string) {
  const sketch = exampleById(id)!.sketch;
  const result = solveFile(sketch) as SolveResult;
  expect(result.ok).toBe(true);
  return { sketch, result };
}

describe("renderSketchSvg", () => {
  it("makes a tall sketch's drawing taller, up to maxHeight, and leaves a wide one's height alone", () => {
    const block = (w: number, h: number) => ({
      format: "counterpoise.sketch",
      version: 1,
      bodies: [{ id: "b", outline: [[0, 0], [w, 0], [w, h], [0, h]], mass: 10 }],
      supports: [{ id: "s", body: "b", kind: "fixed", at: [w / 2, 0] }],
      loads: [],
      ports: [],
      massSources: [],
    });
    const heightOf = (svg: string) => Number(parse(svg).documentElement.getAttribute("height"));
    const bodyHeight = (svg: string) => {
      const ys = [...(parse(svg).querySelector('g[data-kind="body"] path')!.getAttribute("d") ?? "").matchAll(/[ML]\s*(-?[\d.]+)\s+(-?[\d.]+)/g)].map((m) => Number(m[2]));
      return Math.max(...ys) - Math.min(...ys);
    };
    const mast = block(1, 8) as unknown as Parameters<typeof renderSketchSvg>[0];
    const plain = renderSketchSvg(mast, null, { width: 700, height: 420 });
    const grown = renderSketchSvg(mast, null, { width: 700, height: 420, maxHeight: 840 });
    expect(heightOf(plain)).toBe(420);
    expect(heightOf(grown)).toBe(840);
    expect(parse(grown).documentElement.getAttribute("viewBox")).toBe("0 0 700 840");
    // the mast is drawn about twice as tall (the symbols' margins stay)
    expect(bodyHeight(grown) / bodyHeight(plain)).toBeGreaterThan(1.8);
    const slab = block(8, 1) as unknown as Parameters<typeof renderSketchSvg>[0];
    expect(heightOf(renderSketchSvg(slab, null, { width: 700, height: 420, maxHeight: 840 }))).toBe(420);
    // a shared frame keeps the size it was given
    expect(heightOf(renderSketchSvg(mast, null, { width: 700, height: 420, maxHeight: 840, frame: { scale: 40, x: 350, y: 400 } }))).toBe(420);
  });

  it("wraps the line-style key on a narrow drawing rather than cut it", () => {
    const { sketch, result } = solved("pipe-bend-anchor");
    const keyOf = (width: number) =>
      [...parse(renderSketchSvg(sketch, result, { width, height: 400 })).querySelectorAll("text")].map((t) => t.textContent ?? "").filter((t) => /arrows|double lines|dashed|units$/.test(t));
    const wide = keyOf(900);
    expect(wide).toEqual(["Solid arrows: given loads and weight · double lines: reactions found (on the body) · dashed: momentum flux ṁV · SI units"]);
    const narrow = keyOf(500);
    expect(narrow.length).toBeGreaterThan(1);
    // every part is there, and each line fits across (about 6 px a character at 11 px)
    expect(narrow.join(" · ")).toBe(wide[0]);
    for (const line of narrow) expect(line.length * 6).toBeLessThanOrEqual(500 - 32);
  });

  it("draws the pipe-bend example the same as last time", async () => {
    const { sketch, result } = solved("pipe-bend-anchor");
    const svg = renderSketchSvg(sketch, result, { width: 900, height: 600 });
    await expect(svg).toMatchFileSnapshot("./canvas-svg.pipe-bend.snap.svg");
  });

  it("is well-formed SVG with a group for every element and no unreadable numbers", () => {
    for (const ex of EXAMPLES) {
      const result = solveFile(ex.sketch) as SolveResult;
      const svg = renderSketchSvg(ex.sketch, result);
      const doc = parse(svg);
      expect(doc.getElementsByTagName("parsererror")).toHaveLength(0);
      const ids = [...doc.querySelectorAll("g[data-id]")].map((g) => g.getAttribute("data-id"));
      const expected = [ex.sketch.bodies, ex.sketch.supports, ex.sketch.loads, ex.sketch.ports, ex.sketch.massSources].flat().map((e) => e.id);
      expect(ids.sort()).toEqual(expected.sort());
      expect(svg).not.toMatch(/NaN|undefined|Infinity/);
      expect(doc.querySelector("title")?.textContent).toBe(ex.sketch.title);
    }
  });

  it("labels values with units: the reaction, the port flow, the weight", () => {
    const { sketch, result } = solved("washing-cart");
    const svg = renderSketchSvg(sketch, result);
    const doc = parse(svg);
    const text = [...doc.querySelectorAll("text")].map((t) => t.textContent);
    const rear = result.reactions.rear;
    // 4 significant figures, trailing zeros kept as in the tables (557.0 N, not 557 N), with the unit
    const R = Math.hypot(rear.fx, rear.fy);
    expect(text).toContain(`${R.toPrecision(4)} N`);
    expect(text.some((t) => /^ṁ 0\.6653 kg\/s · V \d+(\.\d+)? m\/s$/.test(t ?? ""))).toBe(true);
    expect(text).toContain("W 833.6 N");
    expect(doc.querySelector("g.results")).not.toBeNull();
    expect(text.some((t) => /double lines: reactions found/.test(t ?? ""))).toBe(true);
  });

  it("writes every force of a drawing in one unit, as its tables do, not 902.2 N beside 25.73 kN", () => {
    // one unit per quantity across a drawing, chosen from its largest figure: common practice on calc sheets
    const forceUnits = (svg: string) => new Set([...parse(svg).querySelectorAll("g.results text")].map((t) => t.textContent ?? "").flatMap((t) => [...t.matchAll(/\d (k?N)(?![·\w])/g)].map((m) => m[1])));
    const bend = solved("pipe-bend-anchor");
    const svg = renderSketchSvg(bend.sketch, bend.result);
    expect(forceUnits(svg)).toEqual(new Set(["kN"]));
    // the bend's weight, 92 kg × g0 = 902.2 N, and ṁV = 44.91 kg/s × 2.546 m/s = 114.4 N, in kN
    expect(svg).toContain(">W 0.9022 kN<");
    expect(svg).toContain(">ṁV 0.1144 kN<");
    expect(svg).toContain(">1.771 kN·m ↻<");
    expect(drawingFamily(bend.result)).toEqual({ force: "kN", moment: "kN·m" });
    // a drawing whose every force is under 1 kN stays in N
    const cart = solved("washing-cart");
    expect(forceUnits(renderSketchSvg(cart.sketch, cart.result))).toEqual(new Set(["N"]));
    // two versions compared side by side share one: the cart's N drawing joins the bend's kN
    expect(drawingFamily([cart.result, null, bend.result])).toEqual({ force: "kN", moment: "kN·m" });
    expect(drawingFamily([cart.result])).toEqual({ force: "N", moment: "N·m" });
    // a family given (a calc sheet's) still wins
    expect(renderSketchSvg(bend.sketch, bend.result, { family: { force: "N", moment: "N·m" } })).toContain(">W 902.2 N<");
  });

  it("a body whose mass the solver refuses (below zero) is not labelled with it", () => {
    const { sketch } = solved("washing-cart");
    const bad = { ...sketch, bodies: sketch.bodies.map((b) => ({ ...b, mass: "-5 kg" })) };
    const text = [...parse(renderSketchSvg(bad, null)).querySelectorAll("text")].map((t) => t.textContent);
    expect(text).toContain("Washing cart · mass not valid");
    expect(text.some((t) => /−5 kg|-5 kg/.test(t ?? ""))).toBe(false);
  });

  it("writes US customary units when asked", () => {
    const { sketch, result } = solved("pipe-bend-anchor");
    const svg = renderSketchSvg(sketch, result, { units: "US" });
    expect(svg).toMatch(/\d (lbf|kip)</);
    // port pressures are gauge pressures, written as the trade writes them (common practice)
    expect(svg).toMatch(/ psig</);
    expect(svg).not.toMatch(/ kN</);
  });

  it("shows the states by shape and word: a contact that would have to pull, and the pivot", () => {
    const sketch = structuredClone(exampleById("washing-cart")!.sketch);
    sketch.parameters = { ...sketch.parameters, theta: "-35 deg" };
    const result = solveFile(sketch) as SolveResult;
    expect(result.bodies.cart.status).toBe("tips");
    const svg = renderSketchSvg(sketch, result);
    expect(svg).toMatch(/would have to pull \d/);
    expect(svg).toMatch(/lifts</);
    expect(svg).toMatch(/pivot: tips about here/);
  });

  it("draws a sketch without a result, and fades a stale one", () => {
    const { sketch, result } = solved("pump-skid");
    const plain = renderSketchSvg(sketch);
    expect(plain).not.toMatch(/class="results"/);
    const stale = renderSketchSvg(sketch, result, { stale: true });
    expect(stale).toMatch(/class="results"><[^>]+opacity="0.38"/);
  });

  it("an exported drawing carries its title and lines above the drawing, and a caution at the bottom", () => {
    const { sketch, result } = solved("pump-skid");
    const lines = ["Holds — all supports within their limits", "SI units · drawn 2026-12-03"];
    const svg = renderSketchSvg(sketch, result, { width: 1400, height: 900, heading: { title: "Skid P-101", lines }, note: "Caution: for design checking only." });
    const doc = parse(svg);
    expect(doc.querySelector('[data-part="heading"]')?.textContent).toBe("Skid P-101");
    expect([...doc.querySelectorAll('[data-part="heading-line"]')].map((t) => t.textContent)).toEqual(lines);
    const note = doc.querySelector('[data-part="note"]')!;
    expect(note.textContent).toBe("Caution: for design checking only.");
    // nothing of the drawing reaches up into the heading (its last line's baseline is at 68 px, so
    // text drawn below 72 px is clear of it) or down onto the note
    const group = doc.querySelector("svg > g[transform]")!;
    const dy = Number(/translate\([-\d.]+ ([-\d.]+)\)/.exec(group.getAttribute("transform")!)![1]);
    const ys = [...group.querySelectorAll("text")].map((t) => Number(t.getAttribute("y")) + dy);
    expect(ys.length).toBeGreaterThan(5);
    expect(Math.min(...ys)).toBeGreaterThan(72 + 8);
    expect(Math.max(...ys)).toBeLessThan(Number(note.getAttribute("y")) - 12);
  });

  it("under an overlay, writes only the labels of the elements named, and no result labels", () => {
    const { sketch, result } = solved("pump-skid");
    const full = parse(renderSketchSvg(sketch, result));
    const quiet = parse(renderSketchSvg(sketch, result, { onlyLabelsOf: ["discharge"] }));
    expect(full.querySelectorAll(".results text").length).toBeGreaterThan(0);
    expect(quiet.querySelectorAll(".results text")).toHaveLength(0);
    // the drawing itself is the same: every element's group, every result arrow
    expect(quiet.querySelectorAll("g[data-id]").length).toBe(full.querySelectorAll("g[data-id]").length);
    expect(quiet.querySelectorAll(".results path, .results polyline, .results polygon").length).toBe(full.querySelectorAll(".results path, .results polyline, .results polygon").length);
    const textsOf = (d: Document, id: string) => [...d.querySelectorAll(`g[data-id="${id}"] text`)].map((t) => t.textContent);
    expect(textsOf(quiet, "discharge")).toEqual(textsOf(full, "discharge"));
    expect(textsOf(full, "discharge").length).toBeGreaterThan(0);
    const others = [...quiet.querySelectorAll("g[data-id]")].filter((g) => g.getAttribute("data-id") !== "discharge");
    expect(others.flatMap((g) => [...g.querySelectorAll("text")])).toHaveLength(0);
  });

  it("reads any supported file (expressions, the lead's fixtures) and says when it cannot draw", () => {
    const fixture = JSON.parse(readFileSync("tests/fixtures/sketches/pipe-bend-anchor.json", "utf8"));
    const svg = renderSketchSvg(fixture, solveFile(fixture) as SolveResult);
    expect(svg).toMatch(/data-id="anchor"/);
    expect(renderSketchSvg({ format: "nope" } as never)).toMatch(/cannot be drawn/);
  });
});

describe("a field in error", () => {
  it("draws no NaN: the element gets a dashed ring with a question mark and the field named, the earlier result stays", () => {
    const { sketch, result } = solved("washing-cart");
    const broken = structuredClone(sketch);
    const lance = broken.ports.find((p) => p.id === "lance")!;
    lance.angle = "phi + 5 deg";
    // the result of the sketch before the error, drawn faded as the editor does
    const svg = renderSketchSvg(broken, result, { stale: true });
    expect(svg).not.toMatch(/NaN|Infinity|undefined/);
    const doc = parse(svg);
    const g = doc.querySelector('g[data-id="lance"]')!;
    expect(g.querySelector("circle[stroke-dasharray]")).not.toBeNull();
    const words = [...g.querySelectorAll("text")].map((t) => t.textContent);
    expect(words).toEqual(["?", "lance tip", "angle: cannot be worked out"]);
    // the rest of the drawing and the earlier result are still there
    expect(doc.querySelector('g[data-id="rear"] path')).not.toBeNull();
    expect(doc.querySelector("g.results text")).not.toBeNull();
  });
});

describe("a port with a momentum-flux factor", () => {
  it("labels its flux βṁV with the value that includes β; ports without one keep ṁV", () => {
    const { sketch } = solved("washing-cart");
    const withBeta = structuredClone(sketch);
    const lance = withBeta.ports.find((p) => p.id === "lance")!;
    lance.beta = 1.25;
    const before = solveFile(sketch) as SolveResult;
    const after = solveFile(withBeta) as SolveResult;
    const flux = (r: SolveResult) => {
      const t = r.equations[lance.body].momentum.find((m) => m.id === "lance")!;
      return Math.hypot(t.fx, t.fy);
    };
    expect(flux(after) / flux(before)).toBeCloseTo(1.25, 12);
    const texts = (svg: string) => [...parse(svg).querySelectorAll("g.results text")].map((t) => t.textContent ?? "");
    const labelled = texts(renderSketchSvg(withBeta, after)).filter((t) => /ṁV/.test(t));
    expect(labelled.some((t) => t.startsWith("βṁV "))).toBe(true);
    expect(texts(renderSketchSvg(sketch, before)).filter((t) => /ṁV/.test(t)).every((t) => t.startsWith("ṁV "))).toBe(true);
  });
});

describe("a body's name", () => {
  it("stays off the centre of gravity: on two lines where one would cover it (the trailer drawn small)", () => {
    const { sketch } = solved("fire-monitor-trailer");
    const parsed = parseSketch(sketch);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
    const scale = 90;
    const { groups } = scenePrims(scene, scale, "SI", null);
    const body = groups.find((g) => g.id === scene.bodies[0].id)!;
    const words = body.prims.filter((p): p is Extract<typeof p, { t: "text" }> => p.t === "text");
    expect(words.map((w) => w.text)).toEqual(["Monitor trailer", "950 kg"]);
    const cg = scene.bodies[0].cg;
    const c = [cg[0] * scale, -cg[1] * scale];
    for (const w of words) {
      const b = textBox(w);
      expect(b.x1 < c[0] - 6.5 || b.x0 > c[0] + 6.5 || b.y1 < c[1] - 6.5 || b.y0 > c[1] + 6.5).toBe(true);
    }
    // drawn large, one line fits clear of it
    const big = scenePrims(scene, 160, "SI", null).groups.find((g) => g.id === scene.bodies[0].id)!;
    expect(big.prims.filter((p) => p.t === "text").map((p) => (p as { text: string }).text)).toEqual(["Monitor trailer · 950 kg"]);
  });
});

describe("gravity turned off −y", () => {
  it("draws the weight along gravity's direction, from the centre of gravity", () => {
    const { sketch } = solved("washing-cart");
    const tilted = { ...structuredClone(sketch), gravityAngle: "-90 deg + 25 deg" };
    const parsed = parseSketch(tilted);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    const result = solveFile(tilted) as SolveResult;
    const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
    const { results } = scenePrims(scene, 100, "SI", result);
    const cg = scene.bodies[0].cg;
    const at: [number, number] = [cg[0] * 100, -cg[1] * 100];
    // the shaft starts 8 px from the centre of gravity along gravity: (sin 25°, cos 25°) in screen axes
    const d = [Math.sin((25 * Math.PI) / 180), Math.cos((25 * Math.PI) / 180)];
    const shaft = results.find((p) => p.t === "poly" && p.pts.length === 2 && Math.hypot(p.pts[0][0] - at[0] - 8 * d[0], p.pts[0][1] - at[1] - 8 * d[1]) < 1e-6);
    expect(shaft).toBeDefined();
    if (shaft?.t !== "poly") return;
    const u = [shaft.pts[1][0] - shaft.pts[0][0], shaft.pts[1][1] - shaft.pts[0][1]];
    const len = Math.hypot(u[0], u[1]);
    expect(u[0] / len).toBeCloseTo(d[0], 9);
    expect(u[1] / len).toBeCloseTo(d[1], 9);
    expect(results.some((p) => p.t === "text" && /^W \d/.test(p.text))).toBe(true);
  });
});

describe("a port's pressure force p·A", () => {
  // drawn on the port's own axis (its line of action), inside the control surface, whatever the
  // scale; a suction (negative gauge pressure) pulls outward, its arrowhead toward the face
  const arrowsAt = (id: string, scale: number) => {
    const { sketch, result } = solved(id);
    const parsed = parseSketch(sketch);
    if (!parsed.ok) throw new Error("parse");
    const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
    const { results } = scenePrims(scene, scale, "SI", result);
    // the p·A shafts: thin soft-ink lines of two points
    return results.filter((p): p is Extract<typeof p, { t: "poly" }> => p.t === "poly" && p.pts.length === 2 && p.stroke === INK_SOFT && p.width === 1.4 && !p.dash);
  };

  it("on the pump skid: the suction's along y = 0.3 m inside the left face, the discharge's down the neck from its face", () => {
    for (const scale of [30, 100, 300]) {
      const shafts = arrowsAt("pump-skid", scale);
      const suction = shafts.find((p) => p.pts.every((q) => Math.abs(q[1] + 0.3 * scale) < 1e-9));
      expect(suction, `scale ${scale}`).toBeDefined();
      expect(suction!.pts.every((q) => q[0] > 0 && q[0] < 60)).toBe(true);
      const discharge = shafts.find((p) => p.pts.every((q) => Math.abs(q[0] - 1.95 * scale) < 1e-9));
      expect(discharge, `scale ${scale}`).toBeDefined();
      expect(discharge!.pts.every((q) => q[1] > -1.6 * scale && q[1] < -1.6 * scale + 60)).toBe(true);
    }
  });

  it("on the exhaust stack's flue (0.6 m across) the duct's stays inside the flue, not out past its far face", () => {
    const shafts = arrowsAt("exhaust-stack", 60);
    const duct = shafts.find((p) => p.pts.every((q) => Math.abs(q[1] + 1.6 * 60) < 1e-9));
    expect(duct).toBeDefined();
    for (const q of duct!.pts) expect(q[0] > 1.2 * 60 && q[0] < 1.8 * 60).toBe(true);
  });
});

describe("a body on one post under its centre of gravity", () => {
  it("draws the weight arriving at the centre of gravity from above, clear of the post's reaction", () => {
    const beam = {
      format: "counterpoise.sketch",
      version: 1,
      title: "Beam on one post",
      bodies: [{ id: "beam", label: "Beam", mass: 120, cg: [1.5, 0.1], outline: [[0, 0], [3, 0], [3, 0.2], [0, 0.2]] }],
      supports: [{ id: "post", label: "post", body: "beam", kind: "contact", at: [1.5, 0], angle: 90 }],
    };
    const parsed = parseSketch(beam);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    const result = solveFile(beam) as SolveResult;
    // the post carries the whole weight, m·g = 120 × 9.80665 (standard gravity, ISO 80000-3)
    expect(result.reactions.post.fy).toBeCloseTo(120 * 9.80665, 9);
    const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
    const { results } = scenePrims(scene, 100, "SI", result);
    const cg: [number, number] = [150, -10];
    // the shaft starts 52 px above the centre of gravity, on its vertical, and runs down toward it
    const shaft = results.find((p) => p.t === "poly" && p.pts.length === 2 && Math.abs(p.pts[0][0] - cg[0]) < 1e-9 && Math.abs(p.pts[0][1] - (cg[1] - 52)) < 1e-9);
    expect(shaft).toBeDefined();
    if (shaft?.t !== "poly") return;
    expect(shaft.pts[1][0]).toBeCloseTo(cg[0], 9);
    expect(shaft.pts[1][1]).toBeGreaterThan(cg[1] - 52);
    expect(shaft.pts[1][1]).toBeLessThan(cg[1] - 8);
    // nothing of the weight's arrow reaches below the centre of gravity, where the post's reaction is
    const black = results.filter((p) => p.t === "poly" && p.stroke === shaft.stroke && p.pts.every((q) => Math.abs(q[0] - cg[0]) < 8));
    expect(black.flatMap((p) => (p.t === "poly" ? p.pts : [])).every((q) => q[1] <= cg[1])).toBe(true);
    expect(results.some((p) => p.t === "text" && p.text === "W 1.177 kN")).toBe(true);
  });
});

describe("a position in error", () => {
  it("marks the element at its body's centre of gravity, named, with the field to check", () => {
    const { sketch, result } = solved("washing-cart");
    const broken = structuredClone(sketch);
    const lance = broken.ports.find((p) => p.id === "lance")!;
    lance.at = [lance.at[0], "nozzle_height"]; // no such parameter
    const parsed = parseSketch(broken);
    expect(parsed.ok).toBe(false); // the field is in error, the rest is read as the editor does
    const scene = buildScene(broken, fieldValuesById(broken, parsed.fields, parsed.ok ? [] : parsed.errors));
    const body = scene.byId.get(lance.body);
    if (body?.kind !== "body") throw new Error("the lance's body");
    const svg = renderSketchSvg(broken, result, { stale: true });
    expect(svg).not.toMatch(/NaN|Infinity|undefined/);
    const g = parse(svg).querySelector('g[data-id="lance"]')!;
    expect(g).not.toBeNull();
    const ring = g.querySelector("circle[stroke-dasharray]")!;
    expect(ring).not.toBeNull();
    expect([...g.querySelectorAll("text")].map((t) => t.textContent)).toEqual(["?", "lance tip", "position: cannot be worked out"]);
    // the ring sits on the body's centre of gravity, in the drawing's pixels (y down)
    const { groups } = scenePrims(scene, 120, "SI", null);
    const circle = groups.find((x) => x.id === "lance")!.prims.find((p) => p.t === "circle");
    expect(circle && circle.t === "circle" ? circle.c : null).toEqual([body.cg[0] * 120, -body.cg[1] * 120]);
  });
});

describe("the result's labels keep off other texts", () => {
  it("in every example, no result label overlaps an element's label or another result label", async () => {
    for (const ex of EXAMPLES) {
      const parsed = parseSketch(ex.sketch);
      if (!parsed.ok) throw new Error(ex.id);
      const result = solveFile(ex.sketch) as SolveResult;
      const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
      for (const units of ["SI", "US"] as const) {
        const { groups, results } = scenePrims(scene, 120, units, result);
        const fixed = groups.flatMap((g) => g.prims).flatMap((p) => (p.t === "text" ? [textBox(p)] : []));
        const labels = results.flatMap((p) => (p.t === "text" ? [{ text: p.text, box: textBox(p) }] : []));
        labels.forEach((l, i) => {
          expect(fixed.some((f) => overlap(l.box, f)), `${ex.id} (${units}): "${l.text}" on an element's label`).toBe(false);
          expect(labels.slice(0, i).some((m) => overlap(l.box, m.box)), `${ex.id} (${units}): "${l.text}" on another result label`).toBe(false);
        });
      }
    }
  });
});

describe("result labels keep off the given loads", () => {
  it("no result label has a load's arrow through it in the exhaust stack, whose wind load runs past the duct's pressure force", async () => {
    const { strokesOf } = await import("@/canvas/render/labels");
    const doc = exampleById("exhaust-stack")!.sketch;
    const parsed = parseSketch(doc);
    if (!parsed.ok) throw new Error("exhaust-stack");
    const result = solveFile(doc) as SolveResult;
    const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
    const crosses = (b: { x0: number; y0: number; x1: number; y1: number }, [a, c]: readonly [number[], number[]]) => {
      // a segment through the box: sample it (the strokes here are short arrows and lines)
      for (let t = 0; t <= 1; t += 0.02) {
        const x = a[0] + t * (c[0] - a[0]);
        const y = a[1] + t * (c[1] - a[1]);
        if (x > b.x0 && x < b.x1 && y > b.y0 && y < b.y1) return true;
      }
      return false;
    };
    for (const scale of [40, 60, 90]) {
      const { groups, results } = scenePrims(scene, scale, "SI", result);
      const loadStrokes = groups.filter((g) => ["force", "couple", "distributed"].includes(g.kind)).flatMap((g) => strokesOf(g.prims));
      expect(loadStrokes.length).toBeGreaterThan(10);
      for (const p of results) {
        if (p.t !== "text") continue;
        const box = textBox(p);
        expect(loadStrokes.some((s) => crosses(box, s)), `${scale} px/m: "${p.text}" has a load's stroke through it`).toBe(false);
      }
    }
  });
});

describe("element labels keep off other texts", () => {
  it("in every example and at a tipping angle of the cart, no element's label sits on another text", async () => {
    const cart = exampleById("washing-cart")!.sketch;
    const docs = [...EXAMPLES.map((ex) => ({ id: ex.id, doc: ex.sketch })), { id: "washing-cart tipping", doc: { ...cart, parameters: { ...cart.parameters, theta: "-35 deg" } } }];
    let moved = 0;
    for (const { id, doc } of docs) {
      const parsed = parseSketch(doc);
      if (!parsed.ok) throw new Error(id);
      const result = solveFile(doc) as SolveResult;
      const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
      for (const scale of [120, 320]) {
        const { groups, results } = scenePrims(scene, scale, "SI", result);
        const texts = [...groups.map((g) => ({ id: g.id, prims: g.prims })), { id: "result", prims: results }].flatMap((g) =>
          g.prims.flatMap((p) => (p.t === "text" ? [{ id: g.id, text: p.text, box: textBox(p) }] : [])),
        );
        for (const t of texts) {
          const on = texts.find((o) => o !== t && o.id !== t.id && overlap(t.box, o.box));
          expect(on, `${id} at ${scale} px/m: "${t.text}" on "${on?.text}"`).toBeUndefined();
        }
        const drawn = scenePrims(scene, scale, "SI", result, false, new Map()).groups;
        moved += groups.filter((g, i) => g.prims !== drawn[i].prims).length;
      }
    }
    // somewhere here a label had to make way (the tipping cart at 320 px/m crowds the rear wheels)
    expect(moved).toBeGreaterThan(0);
  });
});


describe("a contact that would have to pull", () => {
  it("is drawn as the normal force it would need, along its line, not with the friction it would also need", () => {
    // an 80 kg cart on two friction pads, a 20 kg/s jet out at 40 m/s level at its top: it tips
    // about the left pad, and the right pad would have to pull (demo data)
    const doc = {
      format: "counterpoise.sketch",
      version: 1,
      bodies: [{ id: "cart", outline: [[0, 0], [2, 0], [2, 1.2], [0, 1.2]], mass: 80 }],
      supports: [
        { id: "s1", body: "cart", kind: "contact", at: [0.2, 0], angle: 90, mu: 0.6 },
        { id: "s2", body: "cart", kind: "contact", at: [1.8, 0], angle: 90, mu: 0.6 },
      ],
      loads: [],
      ports: [
        { id: "jet", body: "cart", kind: "outlet", at: [2, 1], angle: 0, massFlow: 20, velocity: 40 },
        { id: "hose", body: "cart", kind: "inlet", at: [1, 1.2], angle: -90, massFlow: 20, velocity: 5 },
      ],
      massSources: [],
    };
    const parsed = parseSketch(doc);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    const result = solveFile(doc) as SolveResult;
    expect(result.bodies.cart.status).toBe("tips");
    expect(Math.abs(result.reactions.s2.t ?? 0)).toBeGreaterThan(Math.abs(result.reactions.s2.n ?? 0)); // mostly friction, as a whole
    const scene = buildScene(parsed.file, fieldValuesById(parsed.file, parsed.fields, []));
    const { results } = scenePrims(scene, 100, "SI", result);
    // the dashed double arrow: both its lines run straight up or down the page (the pad's normal)
    const dashed = results.filter((p) => p.t === "poly" && p.pts.length === 2 && p.dash && p.stroke === CAUTION);
    expect(dashed.length).toBeGreaterThanOrEqual(2);
    for (const p of dashed) if (p.t === "poly") expect(Math.abs(p.pts[1][0] - p.pts[0][0])).toBeLessThan(1e-6);
    expect(results.some((p) => p.t === "text" && /^would have to pull \d/.test(p.text))).toBe(true);
  });
});

describe("a couple's label", () => {
  it("gives its sense with the magnitude, as a fixed support's moment does (↺ counter-clockwise, ↻ clockwise)", () => {
    const doc = (value: string) => ({
      format: "counterpoise.sketch",
      version: 1,
      bodies: [{ id: "b", outline: [[0, 0], [2, 0], [2, 0.4], [0, 0.4]], mass: 0 }],
      supports: [{ id: "f", body: "b", kind: "fixed", at: [0, 0.2] }],
      loads: [{ id: "c", body: "b", kind: "couple", at: [1, 0.2], value }],
      ports: [],
      massSources: [],
    });
    const labels = (value: string) => [...parse(renderSketchSvg(doc(value) as unknown as Parameters<typeof renderSketchSvg>[0], null)).querySelectorAll(`[data-id="c"] text`)].map((t) => t.textContent);
    expect(labels("-500 N*m")).toContain("500 N·m ↻");
    expect(labels("500 N*m")).toContain("500 N·m ↺");
  });
});
