// Copy and paste of elements within a sketch and between sketches: what the clipboard text holds,
// where the copies land, which parameters come along, and that a paste is one undo step.
import { describe, expect, it } from "vitest";
import { copySelection, pasteText, type ActionContext } from "@/canvas/actions";
import { copyFragment, fragmentText, planPaste, readFragment, ELEMENTS_FORMAT } from "@/canvas/clipboard";
import { exportSketchText } from "@/canvas/files";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import { gridStep } from "@/canvas/geometry/view";
import { createEditorStore } from "@/canvas/store";
import { parseSketch } from "@/solver";
import type { SketchFile } from "@/solver/schema";

/** A skid on two feet with a discharge jet, written with parameters (one unused). */
function skid(): SketchFile {
  return {
    ...emptySketch("Skid"),
    parameters: { Q: "30 lpm", rho: "998 kg/m^3", d: "12 mm", A: "pi/4*d^2", spare: "5 kN" },
    bodies: [newBody("b1", [[0, 0], [2, 0], [2, 1], [0, 1]], "skid")],
    supports: [
      { id: "s1", body: "b1", kind: "contact", at: [0, 0], angle: 90, label: "rear foot" },
      { id: "s2", body: "b1", kind: "pin", at: [2, 0], label: "front foot" },
    ],
    loads: [{ id: "l1", body: "b1", kind: "force", at: [1, 1], magnitude: "2 kN", angle: -90 }],
    ports: [{ id: "p1", body: "b1", kind: "outlet", at: [2, 1], angle: 30, density: "rho", volumeFlow: "Q", area: "A", label: "nozzle" }],
  };
}

const ctxOf = (sketch: SketchFile) => {
  const editor = createEditorStore({ sketch });
  const ctx = { stores: { editor } as never, controller: null, ui: {} as ActionContext["ui"] } as ActionContext;
  return { editor, ctx };
};

describe("what a copy puts on the clipboard", () => {
  it("a body brings its supports, loads and ports, and the parameters their expressions read (through other parameters)", () => {
    const f = copyFragment(skid(), ["b1"])!;
    expect(f.format).toBe(ELEMENTS_FORMAT);
    expect(f.bodies.map((b) => b.id)).toEqual(["b1"]);
    expect([...f.supports, ...f.loads, ...f.ports].map((e) => e.id)).toEqual(["s1", "s2", "l1", "p1"]);
    // A reads d; "spare" is read by nothing copied
    expect(f.parameters).toEqual({ Q: "30 lpm", rho: "998 kg/m^3", d: "12 mm", A: "pi/4*d^2" });
  });

  it("one support alone: no parameters, no body", () => {
    const f = copyFragment(skid(), ["s2"])!;
    expect(f.bodies).toEqual([]);
    expect(f.supports.map((s) => s.id)).toEqual(["s2"]);
    expect(f.parameters).toEqual({});
    expect(copyFragment(skid(), [])).toBeNull();
    expect(copyFragment(skid(), ["nope"])).toBeNull();
  });

  it("reads back what it wrote; other text is not ours; ours but broken names the field", () => {
    const f = copyFragment(skid(), ["b1"])!;
    const back = readFragment(fragmentText(f));
    expect(back).toEqual({ ok: true, fragment: f });
    expect(readFragment("hello")).toBeNull();
    expect(readFragment('{"a": 1}')).toBeNull();
    expect(readFragment("{not json")).toBeNull();
    const broken = JSON.parse(fragmentText(f));
    broken.supports[0].kind = "hinge";
    const r = readFragment(JSON.stringify(broken));
    expect(r?.ok).toBe(false);
    expect(r && !r.ok && r.reason).toMatch(/supports\[0\]/);
  });
});

describe("where the copies land", () => {
  it("into the same sketch: new ids, moved two grid steps, their body the copied body", () => {
    const s = skid();
    const out = planPaste(s, copyFragment(s, ["b1"])!, { step: 0.1 });
    if (!out.ok) throw new Error(out.reason);
    const ids = out.plan.copies.map((c) => c.el.id);
    expect(ids).toEqual(["b2", "s3", "s4", "l2", "p2"]);
    const body = out.plan.copies[0].el as SketchFile["bodies"][number];
    expect(body.outline[0]).toEqual([0.2, -0.2]);
    for (const c of out.plan.copies.slice(1)) expect((c.el as { body: string }).body).toBe("b2");
    expect((out.plan.copies[1].el as { at: number[] }).at).toEqual([0.2, -0.2]);
    // the parameters are there already, the same: nothing added, nothing in conflict
    expect(out.plan.parameters).toEqual({});
    expect(out.plan.conflicts).toEqual([]);
  });

  it("into another sketch: ids and places kept, the parameters it lacks added, its own kept on a clash", () => {
    const other: SketchFile = { ...emptySketch("Other"), parameters: { Q: "45 lpm" } };
    const out = planPaste(other, copyFragment(skid(), ["b1"])!, { step: 0.1 });
    if (!out.ok) throw new Error(out.reason);
    expect(out.plan.copies.map((c) => c.el.id)).toEqual(["b1", "s1", "s2", "l1", "p1"]);
    expect((out.plan.copies[0].el as SketchFile["bodies"][number]).outline[0]).toEqual([0, 0]);
    expect(out.plan.parameters).toEqual({ rho: "998 kg/m^3", d: "12 mm", A: "pi/4*d^2" });
    expect(out.plan.conflicts).toEqual([{ name: "Q", kept: "45 lpm", copied: "30 lpm" }]);
  });

  it("supports copied without their body go on the selected body, or the only one; with none, the reason", () => {
    const frag = copyFragment(skid(), ["s1", "p1"])!;
    const one: SketchFile = { ...emptySketch(), bodies: [newBody("frame", [[5, 5], [6, 5], [6, 6], [5, 6]])] };
    const onOnly = planPaste(one, frag, { step: 0.1 });
    expect(onOnly.ok && onOnly.plan.copies.map((c) => (c.el as { body: string }).body)).toEqual(["frame", "frame"]);
    const two: SketchFile = { ...one, bodies: [...one.bodies, newBody("base", [[0, 3], [1, 3], [1, 4], [0, 4]])] };
    const unclear = planPaste(two, frag, { step: 0.1 });
    expect(unclear.ok ? "" : unclear.reason).toMatch(/Select the body/);
    const chosen = planPaste(two, frag, { step: 0.1, attachTo: "base" });
    expect(chosen.ok && chosen.plan.copies.map((c) => (c.el as { body: string }).body)).toEqual(["base", "base"]);
    const none = planPaste(emptySketch(), frag, { step: 0.1 });
    expect(none.ok ? "" : none.reason).toMatch(/Draw a body first/);
  });
});

describe("elements placed by expressions", () => {
  /** The skid with its length a parameter: the front foot and the nozzle sit at x = L. */
  function parametric(): SketchFile {
    const s = skid();
    s.parameters = { ...s.parameters, L: "2 m" };
    s.supports[1].at = ["L", 0];
    s.ports[0].at = ["L", "L/2"];
    return s;
  }

  it("pasted into the same sketch, the moved copies take the expression's value plus the offset (they do not land on the originals)", () => {
    const s = parametric();
    const out = planPaste(s, copyFragment(s, ["s2", "p1"])!, { step: 0.1 });
    if (!out.ok) throw new Error(out.reason);
    // the first copy at the original's place is taken, so both move two grid steps: L = 2 m, L/2 = 1 m
    expect((out.plan.copies[0].el as { at: unknown[] }).at).toEqual([2.2, -0.2]);
    expect((out.plan.copies[1].el as { at: unknown[] }).at).toEqual([2.2, 0.8]);
  });

  it("pasted into another sketch where the place is free, expressions stay as written and L comes along", () => {
    const s = parametric();
    const target: SketchFile = { ...emptySketch(), bodies: [newBody("frame", [[0, 0], [3, 0], [3, 1], [0, 1]])] };
    const out = planPaste(target, copyFragment(s, ["s2", "p1"])!, { step: 0.1 });
    if (!out.ok) throw new Error(out.reason);
    expect((out.plan.copies[0].el as { at: unknown[] }).at).toEqual(["L", 0]);
    expect((out.plan.copies[1].el as { at: unknown[] }).at).toEqual(["L", "L/2"]);
    expect(out.plan.parameters).toMatchObject({ L: "2 m" });
  });

  it("duplicate and the arrow keys move them too, by the analysed value", async () => {
    const { ACTIONS } = await import("@/canvas/actions");
    const { createAnalysisStore, linkAnalysis } = await import("@/canvas/analysis/store");
    const editor = createEditorStore({ sketch: parametric() });
    const analysis = createAnalysisStore();
    const stop = linkAnalysis(editor, analysis);
    const ctx = { stores: { editor, analysis } as never, controller: null, ui: {} as ActionContext["ui"] } as ActionContext;
    const run = (id: string) => ACTIONS.find((a) => a.id === id)!.run(ctx);
    const step = gridStep(editor.getState().view.scale);
    editor.getState().select(["s2"]);
    run("edit.duplicate");
    const copy = editor.getState().sketch.supports.at(-1)!;
    expect(copy.id).not.toBe("s2");
    expect(copy.at[0]).toBeCloseTo(2 + 2 * step, 9);
    expect(copy.at[1]).toBeCloseTo(-2 * step, 9);
    editor.getState().select(["p1"]);
    run("edit.nudgeRight");
    expect(editor.getState().sketch.ports[0].at[0]).toBeCloseTo(2 + step, 9);
    // y did not move: it keeps its expression
    expect(editor.getState().sketch.ports[0].at[1]).toBe("L/2");
    stop();
  });
});

describe("copy, cut and paste in the editor", () => {
  it("copy then paste twice: each paste lands further on, is one undo step, and is selected; the result solves", () => {
    const { editor, ctx } = ctxOf(skid());
    editor.getState().select(["b1"]);
    const text = copySelection(ctx, false)!;
    expect(JSON.parse(text).format).toBe(ELEMENTS_FORMAT);
    expect(pasteText(ctx, text)).toBe(true);
    const g = gridStep(editor.getState().view.scale); // two grid steps right and down, as a duplicate goes
    expect(editor.getState().sketch.bodies.map((b) => b.outline[0])).toEqual([[0, 0], [2 * g, -2 * g]]);
    expect(editor.getState().selection).toEqual(["b2", "s3", "s4", "l2", "p2"]);
    expect(editor.getState().notice).toMatch(/^Pasted 5 elements\.$/);
    expect(pasteText(ctx, text)).toBe(true);
    expect(editor.getState().sketch.bodies.map((b) => b.outline[0])).toEqual([[0, 0], [2 * g, -2 * g], [4 * g, -4 * g]]);
    editor.getState().undo();
    expect(editor.getState().sketch.bodies.length).toBe(2);
    editor.getState().undo();
    expect(editor.getState().sketch).toEqual(skid());
    editor.getState().redo();
    const p = parseSketch(editor.getState().sketch);
    expect(p.ok).toBe(true);
  });

  it("cut removes the elements and a paste into another sketch brings them there with their parameters", () => {
    const from = ctxOf(skid());
    from.editor.getState().select(["b1"]);
    const text = copySelection(from.ctx, true)!;
    expect(from.editor.getState().sketch.bodies).toEqual([]);
    const to = ctxOf({ ...emptySketch("Next skid"), parameters: {} });
    expect(pasteText(to.ctx, text)).toBe(true);
    const got = to.editor.getState().sketch;
    expect(got.ports[0]).toEqual(skid().ports[0]);
    expect(got.parameters).toEqual({ Q: "30 lpm", rho: "998 kg/m^3", d: "12 mm", A: "pi/4*d^2" });
    expect(parseSketch(got).ok).toBe(true);
  });

  it("a whole sketch file's text pastes its elements; plain text is left to the page", () => {
    const { editor, ctx } = ctxOf(emptySketch());
    expect(pasteText(ctx, exportSketchText(skid()))).toBe(true);
    expect(editor.getState().sketch.supports.map((s) => s.id)).toEqual(["s1", "s2"]);
    expect(pasteText(ctx, "2 kN")).toBe(false);
  });

  it("a read-only sketch may be copied from but not cut or pasted into", () => {
    const { editor, ctx } = ctxOf(skid());
    editor.setState({ readOnly: true });
    editor.getState().select(["s1"]);
    const text = copySelection(ctx, false);
    expect(text).not.toBeNull();
    expect(copySelection(ctx, true)).toBeNull();
    expect(pasteText(ctx, text!)).toBe(true);
    expect(editor.getState().sketch).toEqual(skid());
    expect(editor.getState().notice).toMatch(/Read only/);
  });
});
