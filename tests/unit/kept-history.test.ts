// The undo history kept across a reload of the page (the tab's session storage): restored only
// when it leads to the sketch the page opens, without the coalescing keys of the visits before the
// reload, and trimmed to the newest steps.
import { describe, expect, it } from "vitest";
import { createEditorStore } from "@/canvas/store";
import { setField } from "@/canvas/commands/fields";
import { HISTORY_PREFIX, KEPT_STEPS, keepHistory, restoreHistory } from "@/canvas/keptHistory";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import type { SketchFile } from "@/solver/schema";

const memory = () => {
  const m = new Map<string, string>();
  return { m, storage: { getItem: (k: string) => m.get(k) ?? null, setItem: (k: string, v: string) => void m.set(k, v), removeItem: (k: string) => void m.delete(k) } };
};
const sketch = (mass: string): SketchFile => ({ ...emptySketch("Beam"), bodies: [{ ...newBody("b1", [[0, 0], [4, 0], [4, 0.5], [0, 0.5]], "Beam"), mass }] }) as SketchFile;
const massOf = (s: SketchFile) => s.bodies[0].mass;

describe("the undo history kept for a reload", () => {
  it("comes back when it leads to the sketch opened, and Undo steps through it", () => {
    const { m, storage } = memory();
    const a = createEditorStore({ sketch: sketch("60 kg") });
    const stop = keepHistory(a, "scratch", storage, 0);
    a.getState().apply(setField({ id: "b1", field: "mass", value: "abc" }), { coalesce: "b1.mass#1" });
    a.getState().apply(setField({ id: "b1", field: "mass", value: "70 kg" }), { coalesce: "b1.mass#2" });
    stop();
    expect(m.has(`${HISTORY_PREFIX}scratch`)).toBe(true);
    const kept = JSON.parse(m.get(`${HISTORY_PREFIX}scratch`)!);
    expect(kept.past.map((e: { coalesce?: string }) => e.coalesce)).toEqual([undefined, undefined]);

    const b = createEditorStore();
    b.getState().reset(a.getState().sketch);
    expect(restoreHistory(b, "scratch", storage)).toBe(true);
    b.getState().undo();
    expect(massOf(b.getState().sketch)).toBe("abc");
    b.getState().undo();
    expect(massOf(b.getState().sketch)).toBe("60 kg");
    b.getState().redo();
    expect(massOf(b.getState().sketch)).toBe("abc");
  });

  it("is not restored over another sketch, nor under another key", () => {
    const { storage } = memory();
    const a = createEditorStore({ sketch: sketch("60 kg") });
    const stop = keepHistory(a, "sketch:one", storage, 0);
    a.getState().apply(setField({ id: "b1", field: "mass", value: "abc" }));
    stop();
    const other = createEditorStore();
    other.getState().reset(sketch("80 kg"));
    expect(restoreHistory(other, "sketch:one", storage)).toBe(false);
    expect(other.getState().past).toEqual([]);
    const same = createEditorStore();
    same.getState().reset(a.getState().sketch);
    expect(restoreHistory(same, "sketch:two", storage)).toBe(false);
  });

  it("keeps the newest steps only", () => {
    const { m, storage } = memory();
    const a = createEditorStore({ sketch: sketch("0 kg") });
    const stop = keepHistory(a, "scratch", storage, 0);
    for (let i = 1; i <= KEPT_STEPS + 5; i++) a.getState().apply(setField({ id: "b1", field: "mass", value: `${i} kg` }));
    stop();
    const kept = JSON.parse(m.get(`${HISTORY_PREFIX}scratch`)!);
    expect(kept.past).toHaveLength(KEPT_STEPS);
    // the oldest kept step starts from the sixth value typed
    expect(massOf(kept.past[0].before)).toBe("5 kg");
  });

  it("a damaged entry is dropped, not thrown", () => {
    const { m, storage } = memory();
    m.set(`${HISTORY_PREFIX}scratch`, "{not json");
    const b = createEditorStore({ sketch: sketch("60 kg") });
    expect(restoreHistory(b, "scratch", storage)).toBe(false);
    expect(m.has(`${HISTORY_PREFIX}scratch`)).toBe(false);
  });
});
