// The editor store: one way in (apply), undo and redo with the selection, typing merged into one
// step, a drag as one undo step, Escape rolling a drag back, and the live analysis beside it.
import { describe, expect, it } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { createEditorStore, HISTORY_LIMIT } from "@/canvas/store";
import { addElement, attachToBody, moveElement, replaceSketch, setField, type Command } from "@/canvas/commands";
import { emptySketch, findElement } from "@/canvas/model/elements";
import { newAttached, newBody } from "@/canvas/model/factory";
import { connectAnalysis, workerRunner } from "@/canvas/analysis/store";
import { analyseCore, expressionFields } from "@/canvas/analysis/core";


const c = <A,>(cmd: Command<A>) => cmd as unknown as Command<unknown>;

function sketch(): SketchFile {
  return {
    ...emptySketch("Beam"),
    bodies: [newBody("b1", [[0, 0], [4, 0], [4, 1], [0, 1]], "Beam"), newBody("b2", [[6, 0], [8, 0], [8, 1], [6, 1]], "Crate")],
    supports: [
      { id: "s1", body: "b1", kind: "pin", at: [0, 0] },
      { id: "s2", body: "b1", kind: "contact", at: [4, 0], angle: 90 },
    ],
  };
}

const at = (s: SketchFile, id: string) => (findElement(s, id)!.el as { at: unknown }).at;

describe("editor store", () => {
  it("applies a command, records it, and undo/redo restore the sketch and the selection", () => {
    const store = createEditorStore({ sketch: sketch() });
    const before = store.getState().sketch;
    const pin = newAttached("pin", "", { at: [2, 0], body: "b1" });
    expect(store.getState().apply(c(addElement({ kind: "pin", element: pin })))).toBe(true);
    const s = store.getState();
    expect(s.sketch.supports.map((x) => x.id)).toEqual(["s1", "s2", "s3"]);
    expect(s.selection).toEqual(["s3"]);
    expect(s.past.map((e) => e.label)).toEqual(["Add pin"]);
    s.undo();
    expect(store.getState().sketch).toBe(before);
    expect(store.getState().selection).toEqual([]);
    store.getState().redo();
    expect(store.getState().sketch.supports).toHaveLength(3);
    expect(store.getState().selection).toEqual(["s3"]);
  });

  it("records nothing for a command that changes nothing, and a new edit clears redo", () => {
    const store = createEditorStore({ sketch: sketch() });
    expect(store.getState().apply(c(moveElement({ ids: ["s1"], delta: [0, 0] })))).toBe(false);
    expect(store.getState().past).toHaveLength(0);
    store.getState().apply(c(moveElement({ ids: ["s1"], delta: [1, 0] })));
    store.getState().undo();
    expect(store.getState().future).toHaveLength(1);
    store.getState().apply(c(moveElement({ ids: ["s1"], delta: [0, 1] })));
    expect(store.getState().future).toHaveLength(0);
  });

  it("says what undo and redo did, until the next edit makes it old news; other notices stay", () => {
    const store = createEditorStore({ sketch: sketch() });
    store.getState().apply(c(moveElement({ ids: ["s1"], delta: [1, 0] })));
    store.getState().undo();
    expect(store.getState().notice).toMatch(/^Undid: /);
    store.getState().apply(c(moveElement({ ids: ["s2"], delta: [0.5, 0] })));
    expect(store.getState().notice).toBeNull();
    store.getState().notify("Saved as v4.");
    store.getState().apply(c(moveElement({ ids: ["s2"], delta: [0.5, 0] })));
    expect(store.getState().notice).toBe("Saved as v4.");
  });

  it("a finished drag makes \"Undid: …\" old news too; a press that moved nothing leaves it", () => {
    const store = createEditorStore({ sketch: sketch() });
    store.getState().apply(c(moveElement({ ids: ["s1"], delta: [1, 0] })));
    store.getState().undo();
    expect(store.getState().notice).toBe("Undid: Move s1");
    store.getState().beginGesture("Turn");
    store.getState().endGesture();
    expect(store.getState().notice).toBe("Undid: Move s1");
    store.getState().beginGesture("Move s2");
    store.getState().updateGesture([c(moveElement({ ids: ["s2"], delta: [-0.5, 0] }))]);
    store.getState().endGesture();
    expect(store.getState().past.map((e) => e.label)).toEqual(["Move s2"]);
    expect(store.getState().notice).toBeNull();
  });

  it("merges typing in one field into one undo step", () => {
    const store = createEditorStore({ sketch: sketch() });
    for (const v of ["1", "12", "12 ", "12 k", "12 kN"]) store.getState().apply(c(setField({ id: "s2", field: "mu", value: v })), { coalesce: "s2.mu#1" });
    expect(store.getState().past).toHaveLength(1);
    expect((findElement(store.getState().sketch, "s2")!.el as { mu: unknown }).mu).toBe("12 kN");
    store.getState().undo();
    expect((findElement(store.getState().sketch, "s2")!.el as { mu?: unknown }).mu).toBeUndefined();
  });

  it("keeps at most HISTORY_LIMIT steps", () => {
    const store = createEditorStore({ sketch: sketch() });
    for (let i = 0; i < HISTORY_LIMIT + 5; i++) store.getState().apply(c(moveElement({ ids: ["s1"], delta: [0.01, 0] })));
    expect(store.getState().past).toHaveLength(HISTORY_LIMIT);
  });

  it("makes a whole drag one undo step, computed from the origin each frame", () => {
    const store = createEditorStore({ sketch: sketch() });
    const origin = store.getState().sketch;
    store.getState().beginGesture();
    for (const dx of [0.1, 0.2, 0.3, 0.5]) store.getState().updateGesture(c(moveElement({ ids: ["s1"], delta: [dx, 0] })));
    // each frame starts from the origin: the last frame's delta is the whole move
    expect(at(store.getState().sketch, "s1")).toEqual([0.5, 0]);
    expect(store.getState().past).toHaveLength(0);
    store.getState().endGesture();
    expect(store.getState().past).toHaveLength(1);
    expect(store.getState().past[0].label).toBe("Move s1");
    store.getState().undo();
    expect(store.getState().sketch).toBe(origin);
  });

  it("rolls a drag back on cancel (Escape), recording nothing", () => {
    const store = createEditorStore({ sketch: sketch() });
    store.getState().select(["s2"]);
    const origin = store.getState().sketch;
    store.getState().beginGesture();
    store.getState().updateGesture(c(moveElement({ ids: ["s2"], delta: [1, 1] })));
    expect(store.getState().sketch).not.toBe(origin);
    store.getState().cancelGesture();
    expect(store.getState().sketch).toBe(origin);
    expect(store.getState().selection).toEqual(["s2"]);
    expect(store.getState().past).toHaveLength(0);
    expect(store.getState().gesture).toBeNull();
  });

  it("lets a drop attach the dragged element to the body under it, in the same undo step", () => {
    const store = createEditorStore({ sketch: sketch() });
    const origin = store.getState().sketch;
    store.getState().beginGesture();
    const move = c(moveElement({ ids: ["s2"], delta: [3, 0] }));
    store.getState().updateGesture(move);
    store.getState().updateGesture([move, c(attachToBody({ ids: ["s2"], body: "b2" }))]);
    store.getState().endGesture();
    const s2 = findElement(store.getState().sketch, "s2")!.el as { at: unknown; body: string };
    expect(s2).toMatchObject({ at: [7, 0], body: "b2" });
    expect(store.getState().past).toHaveLength(1);
    store.getState().undo();
    expect(store.getState().sketch).toBe(origin);
  });

  it("a click without movement records nothing; undo during a drag cancels it", () => {
    const store = createEditorStore({ sketch: sketch() });
    store.getState().beginGesture();
    store.getState().endGesture();
    expect(store.getState().past).toHaveLength(0);
    const origin = store.getState().sketch;
    store.getState().beginGesture();
    store.getState().updateGesture(c(moveElement({ ids: ["s1"], delta: [1, 0] })));
    store.getState().undo();
    expect(store.getState().sketch).toBe(origin);
  });

  it("selects, toggles and adds; ignores ids that do not exist", () => {
    const store = createEditorStore({ sketch: sketch() });
    store.getState().select(["s1", "zz"]);
    expect(store.getState().selection).toEqual(["s1"]);
    store.getState().select(["s2"], "add");
    store.getState().select(["s1"], "toggle");
    expect(store.getState().selection).toEqual(["s2"]);
  });

  it("reset opens a document with a fresh history", () => {
    const store = createEditorStore({ sketch: sketch() });
    store.getState().apply(c(moveElement({ ids: ["s1"], delta: [1, 0] })));
    store.getState().reset(emptySketch("Fresh"));
    expect(store.getState().past).toHaveLength(0);
    expect(store.getState().sketch.title).toBe("Fresh");
  });
});

describe("live analysis", () => {
  it("solves every change, and keeps the last good result (stale) while the input has errors", () => {
    const store = createEditorStore({ sketch: { ...sketch(), loads: [{ id: "l1", body: "b1", kind: "force", at: [2, 1], magnitude: "4 kN", angle: -90 }] } });
    const { store: analysis, stop } = connectAnalysis(store);
    const first = analysis.getState();
    expect(first.stale).toBe(false);
    // 100 kg at the centroid (2, 0.5) and 4 kN at x = 2 on a 4 m span: the contact carries half of each
    const w = 100 * 9.80665;
    expect(first.shown!.reactions.s2.n).toBeCloseTo((w + 4000) / 2, 6);
    store.getState().apply(c(setField({ id: "l1", field: "magnitude", value: "4 kN + nonsense" })));
    const bad = analysis.getState();
    expect(bad.core!.ok).toBe(false);
    expect(bad.stale).toBe(true);
    expect(bad.shown).toBe(first.shown);
    expect(bad.fieldValues.errors.get("l1.magnitude")).toMatch(/nonsense/);
    store.getState().undo();
    expect(analysis.getState().stale).toBe(false);
    expect(analysis.getState().shown!.reactions.s2.n).toBeCloseTo((w + 4000) / 2, 6);
    stop();
  });

  it("does not show another sketch's result: a file opened over this one with an input error shows none", () => {
    const store = createEditorStore({ sketch: sketch() });
    const { store: analysis, stop } = connectAnalysis(store);
    expect(analysis.getState().shown).not.toBeNull();
    const other: SketchFile = { ...sketch(), title: "Imported", bodies: [{ ...sketch().bodies[0], mass: "12 parsecs" }] };
    store.getState().apply(c(replaceSketch({ sketch: other, label: "Import" })));
    const after = analysis.getState();
    expect(after.core!.ok).toBe(false);
    expect(after.shown).toBeNull();
    expect(after.stale).toBe(false);
    // its own edits with errors keep its own last good result, as before
    store.getState().undo();
    const good = analysis.getState().shown;
    expect(good).not.toBeNull();
    store.getState().apply(c(setField({ id: "b1", field: "mass", value: "100 kg + nonsense" })));
    expect(analysis.getState().shown).toBe(good);
    expect(analysis.getState().stale).toBe(true);
    stop();
  });

  it("the worker answers only the fields the editor cannot read itself: expressions and errors", () => {
    const file = { ...sketch(), supports: [{ id: "s1", body: "b1", kind: "pin" as const, at: ["1 m + 1 m", 0] as [string, number] }] };
    const core = analyseCore(file);
    expect(Object.keys(core.fields).length).toBeGreaterThan(10);
    // the bodies' masses are "100 kg", the pin's x is an expression; its y and every corner are numbers
    expect(expressionFields(file, core.fields)).toEqual({ "bodies[0].mass": { value: 100 }, "bodies[1].mass": { value: 100 }, "supports[0].at[0]": { value: 2 } });
  });

  it("with a worker, delivers every answer in order and solves only the newest of a burst", () => {
    const posted: Array<{ seq: number; sketch: SketchFile }> = [];
    const fake = { postMessage: (m: { seq: number; text: string }) => posted.push({ seq: m.seq, sketch: JSON.parse(m.text) }), onmessage: null as null | ((e: MessageEvent) => void) };
    const run = workerRunner(fake as unknown as Worker, (fn) => fn());
    const got: number[] = [];
    const a = sketch();
    const b = { ...sketch(), title: "b" };
    const d = { ...sketch(), title: "d" };
    run(a, (core) => got.push(core.timeMs));
    run(b, () => got.push(-1));
    run(d, () => got.push(-2));
    expect(posted).toHaveLength(1);
    fake.onmessage!({ data: { seq: posted[0].seq, core: { ...analyseCore(a), timeMs: 1 } } } as MessageEvent);
    expect(got).toEqual([1]);
    // b was overtaken by d: only d is solved next
    expect(posted).toHaveLength(2);
    expect(posted[1].sketch.title).toBe("d");
  });

  function fakeWorker() {
    const posted: Array<{ seq: number; sketch: SketchFile }> = [];
    const fake = {
      terminated: false,
      postMessage: (m: { seq: number; text: string }) => posted.push({ seq: m.seq, sketch: JSON.parse(m.text) }),
      terminate() {
        this.terminated = true;
      },
      onmessage: null as null | ((e: MessageEvent) => void),
      onerror: null as null | ((e: ErrorEvent) => void),
      onmessageerror: null as null | (() => void),
    };
    return { fake, posted };
  }

  it("when the worker fails, solves on the main thread from then on and says so once", () => {
    const { fake, posted } = fakeWorker();
    const notes: string[] = [];
    const loaded = { ...sketch(), loads: [{ id: "l1", body: "b1", kind: "force" as const, at: [2, 1] as [number, number], magnitude: "4 kN", angle: -90 }] };
    const store = createEditorStore({ sketch: loaded });
    const { store: analysis, stop } = connectAnalysis(store, workerRunner(fake as unknown as Worker, (fn) => fn(), (m) => notes.push(m)));
    expect(posted).toHaveLength(1);
    expect(analysis.getState().pending).toBe(true);
    // the worker's script did not load
    fake.onerror!({ message: "404 analysis.worker.js", preventDefault() {} } as unknown as ErrorEvent);
    expect(fake.terminated).toBe(true);
    expect(notes).toHaveLength(1);
    expect(notes[0]).toMatch(/main thread.*404 analysis\.worker\.js/);
    // the sketch it held is solved here: 100 kg at the centroid (2, 0.5) and 4 kN at x = 2 on a
    // 4 m span, so the contact carries half of each (statics by hand, common practice)
    const w = 100 * 9.80665;
    expect(analysis.getState().pending).toBe(false);
    expect(analysis.getState().shown!.reactions.s2.n).toBeCloseTo((w + 4000) / 2, 6);
    // later changes follow the sketch without the worker
    store.getState().apply(c(setField({ id: "l1", field: "magnitude", value: "8 kN" })));
    expect(posted).toHaveLength(1);
    expect(analysis.getState().stale).toBe(false);
    expect(analysis.getState().shown!.reactions.s2.n).toBeCloseTo((w + 8000) / 2, 6);
    fake.onerror?.({ message: "again", preventDefault() {} } as unknown as ErrorEvent);
    expect(notes).toHaveLength(1);
    stop();
  });

  it("when the worker answers with an error, solves that sketch on the main thread", () => {
    const { fake, posted } = fakeWorker();
    const notes: string[] = [];
    const run = workerRunner(fake as unknown as Worker, (fn) => fn(), (m) => notes.push(m));
    const got: boolean[] = [];
    run(sketch(), (core) => got.push(core.ok));
    fake.onmessage!({ data: { seq: posted[0].seq, error: "out of memory" } } as MessageEvent);
    expect(got).toEqual([true]);
    expect(notes[0]).toMatch(/out of memory/);
  });
});
