// Autosave of the scratch sketch: a drag (move, turn, reshape, centre of gravity) is saved once
// when it ends; a drag cancelled with Escape saves nothing; typing is saved once after a pause.
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { createEditorStore } from "@/canvas/store";
import { startAutosave } from "@/canvas/autosave";
import type { SketchPersistence } from "@/canvas/persistence";
import { moveCentreOfGravity, moveElement, reshapeBody, rotateElement, setField, type Command } from "@/canvas/commands";
import { emptySketch, findElement } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";

const c = <A,>(cmd: Command<A>) => cmd as unknown as Command<unknown>;

function sketch(): SketchFile {
  return {
    ...emptySketch("Crate"),
    bodies: [newBody("b1", [[0, 0], [2, 0], [2, 1], [0, 1]], "Crate")],
    supports: [{ id: "s1", body: "b1", kind: "contact", at: [1, 0], angle: 90 }],
    ports: [{ id: "p1", body: "b1", kind: "outlet", at: [2, 0.5], angle: 0, massFlow: 1, velocity: 1 }],
  };
}

function fakePersistence() {
  const saved: SketchFile[] = [];
  const persistence: SketchPersistence = {
    kind: "scratch",
    autosave: true,
    describe: () => "test",
    load: async () => ({ ok: true, sketch: null }),
    save: async (s) => {
      saved.push(s);
      return { ok: true, savedAt: "2024-01-01T00:00:00Z" };
    },
  };
  return { saved, persistence };
}

const el = (s: SketchFile, id: string) => findElement(s, id)!.el as unknown as Record<string, unknown>;

let store: ReturnType<typeof createEditorStore>;
let saved: SketchFile[];
let autosave: ReturnType<typeof startAutosave>;

beforeEach(() => {
  vi.useFakeTimers();
  store = createEditorStore({ sketch: sketch() });
  const f = fakePersistence();
  saved = f.saved;
  autosave = startAutosave(store, f.persistence, { delayMs: 350 });
});
afterEach(() => {
  autosave.stop();
  vi.useRealTimers();
});

/** A drag as the pointer controller makes it: begin, frames from the origin, end. */
function drag(frames: Command<unknown>[], end: "end" | "cancel" = "end") {
  const s = store.getState();
  s.beginGesture("Drag");
  for (const f of frames) store.getState().updateGesture(f);
  if (end === "end") store.getState().endGesture();
  else store.getState().cancelGesture();
}

describe("autosave", () => {
  it("saves a move drag once, when it ends, with the moved position", async () => {
    drag([c(moveElement({ ids: ["s1"], delta: [0.2, 0] })), c(moveElement({ ids: ["s1"], delta: [0.6, 0] }))]);
    await vi.advanceTimersByTimeAsync(400);
    expect(saved).toHaveLength(1);
    expect(el(saved[0], "s1").at).toEqual([1.6, 0]);
  });

  it("saves turns, reshapes and centre-of-gravity drags", async () => {
    drag([c(rotateElement({ id: "p1", angle: 45 }))]);
    await vi.advanceTimersByTimeAsync(400);
    drag([c(reshapeBody({ id: "b1", corner: 2, to: [3, 2], keepRectangle: true }))]);
    await vi.advanceTimersByTimeAsync(400);
    drag([c(moveCentreOfGravity({ id: "b1", to: [0.5, 0.5] }))]);
    await vi.advanceTimersByTimeAsync(400);
    expect(saved).toHaveLength(3);
    expect(el(saved[0], "p1").angle).toBe(45);
    expect(saved[1].bodies[0].outline).toEqual([[0, 0], [3, 0], [3, 2], [0, 2]]);
    expect(saved[2].bodies[0].cg).toEqual([0.5, 0.5]);
  });

  it("saves nothing for a drag cancelled with Escape", async () => {
    drag([c(moveElement({ ids: ["s1"], delta: [0.6, 0] }))], "cancel");
    await vi.advanceTimersByTimeAsync(400);
    expect(saved).toHaveLength(0);
  });

  it("does not save a drag's frames while it lasts; a flush mid-drag keeps the sketch from before it", async () => {
    store.getState().apply(c(setField({ id: "s1", field: "angle", value: 80 })));
    store.getState().beginGesture("Move");
    store.getState().updateGesture(c(moveElement({ ids: ["s1"], delta: [0.6, 0] })));
    autosave.flush();
    expect(saved).toHaveLength(1);
    expect(el(saved[0], "s1")).toMatchObject({ at: [1, 0], angle: 80 });
    store.getState().endGesture();
    await vi.advanceTimersByTimeAsync(400);
    expect(saved).toHaveLength(2);
    expect(el(saved[1], "s1").at).toEqual([1.6, 0]);
  });

  it("merges a burst of edits into one save after the pause", async () => {
    for (const a of [10, 20, 30]) {
      store.getState().apply(c(setField({ id: "s1", field: "angle", value: a })));
      await vi.advanceTimersByTimeAsync(100);
    }
    expect(saved).toHaveLength(0);
    await vi.advanceTimersByTimeAsync(300);
    expect(saved).toHaveLength(1);
    expect(el(saved[0], "s1").angle).toBe(30);
  });
});
