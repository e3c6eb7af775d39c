// The editor's store (zustand + immer): the sketch exactly in the file format, the selection,
// the undo history and the view. Components read it through narrow selectors and change the
// sketch only through `apply` (one command) or a gesture (a drag: many frames, one undo step).
import equal from "fast-deep-equal";
import { createStore, type StoreApi } from "zustand/vanilla";
import { immer } from "zustand/middleware/immer";
import type { SketchFile } from "@/solver/schema";
import type { UnitSystem } from "@/solver/units";
import type { Vec2 } from "@/solver/types";
import type { AnyCommand, Command } from "./commands/define";
import { findElement, emptySketch, type ElementKind } from "./model/elements";
import { DEFAULT_VIEW, type View } from "./geometry/view";

export interface HistoryEntry {
  label: string;
  before: SketchFile;
  after: SketchFile;
  selectionBefore: string[];
  selectionAfter: string[];
  /** consecutive applies with the same key (typing in one field) merge into this entry; an entry
   *  they bring back to where it began is dropped (a visit that changed nothing is no undo step) */
  coalesce?: string;
  /** the whole sketch was replaced: undo and redo ask for a fit to view too */
  replacesSketch?: boolean;
  /** the hand check's point P moved with the edit (a mirror): undo and redo put it back */
  momentPoint?: { before: Vec2 | null; after: Vec2 | null };
}

/** What a pointer press on the canvas does. */
export type Tool =
  | { kind: "select" }
  | { kind: "place"; element: Exclude<ElementKind, "body">; friction?: boolean }
  | { kind: "body"; shape: "rectangle" | "polygon"; points: Vec2[] }
  | { kind: "pick-point" }
  /** setting the underlay's scale: the marks clicked so far, in image pixels */
  | { kind: "calibrate"; points: Vec2[] };

interface Gesture {
  origin: SketchFile;
  selection: string[];
  label: string;
}

export interface EditorState {
  sketch: SketchFile;
  selection: string[];
  past: HistoryEntry[];
  future: HistoryEntry[];
  gesture: Gesture | null;
  tool: Tool;
  view: View;
  units: UnitSystem;
  /** grid and edge snapping (a held Alt turns it off for one drag) */
  snap: boolean;
  /** the point the hand check takes moments about (world, m); null: the first support */
  momentPoint: Vec2 | null;
  /** a short message for the status line ("Draw a body first") */
  notice: string | null;
  /** bumps on every change of the sketch (autosave watches it) */
  revision: number;
  /**
   * bumps when the view should be fitted to the sketch: a whole other sketch came in (an example,
   * an import, a new sketch) or went out again with undo/redo. The canvas does the fit, as it
   * needs the drawn scene and the canvas's size.
   */
  fitRequest: number;
  /** size of the canvas on screen, px (fit to view needs it) */
  viewport: { width: number; height: number };
  /** the caller's role may not change this sketch: commands and gestures are refused */
  readOnly: boolean;

  /** Any command, whatever its arguments' type. */
  /**
   * `momentPoint`: where the hand check's P goes with this edit (undo puts it back). `refit`: the
   * edit moves the drawing about as a new sketch would (a whole-sketch mirror): the view is fitted
   * again, on undo and redo too.
   */
  apply: (cmd: AnyCommand, opts?: { coalesce?: string; momentPoint?: Vec2 | null; refit?: boolean }) => boolean;
  undo: () => void;
  redo: () => void;
  beginGesture: (label?: string) => void;
  /** Replace the gesture's frame: the commands run on the sketch as it was when the gesture began. */
  updateGesture: (cmds: AnyCommand | readonly AnyCommand[]) => void;
  endGesture: () => void;
  cancelGesture: () => void;
  select: (ids: string[], mode?: "replace" | "toggle" | "add") => void;
  setTool: (tool: Tool) => void;
  setView: (view: View) => void;
  setUnits: (units: UnitSystem) => void;
  setSnap: (on: boolean) => void;
  setMomentPoint: (p: Vec2 | null) => void;
  notify: (text: string | null) => void;
  setViewport: (size: { width: number; height: number }) => void;
  setReadOnly: (on: boolean) => void;
  /** Open a document (not undoable): history starts afresh. */
  reset: (sketch: SketchFile) => void;
}

export const HISTORY_LIMIT = 300;

export const READ_ONLY_NOTICE = "Read only — your role may not edit this sketch. Select, measure and read results freely.";

export type EditorStore = StoreApi<EditorState>;

const run = (sketch: SketchFile, cmd: Command<unknown>) => cmd.def.run(sketch, cmd.args);
/** "Undid: …" speaks of the step before the newest: a new edit (a command or a finished drag) makes it old news. */
const isHistoryNotice = (notice: string | null | undefined) => !!notice && (notice.startsWith("Undid: ") || notice.startsWith("Redid: "));

export function createEditorStore(initial: Partial<Pick<EditorState, "sketch" | "view" | "units" | "snap">> = {}): EditorStore {
  return createStore<EditorState>()(
    immer((set, get) => ({
      sketch: initial.sketch ?? emptySketch(),
      selection: [],
      past: [],
      future: [],
      gesture: null,
      tool: { kind: "select" },
      view: initial.view ?? DEFAULT_VIEW,
      units: initial.units ?? "SI",
      snap: initial.snap ?? true,
      momentPoint: null,
      notice: null,
      revision: 0,
      fitRequest: 0,
      viewport: { width: 800, height: 600 },
      readOnly: false,

      apply: (cmd, opts) => {
        const s = get();
        if (s.readOnly) {
          s.notify(READ_ONLY_NOTICE);
          return false;
        }
        if (s.gesture) s.cancelGesture();
        const c = cmd as unknown as Command<unknown>;
        const before = get().sketch;
        const after = run(before, c);
        if (after === before) return false;
        const selectionBefore = get().selection;
        const selectionAfter = c.def.select?.(before, after, c.args, selectionBefore) ?? selectionBefore.filter((id) => findElement(after, id));
        const label = c.def.label(c.args, before);
        // the edit under way ends where it began (typed, then taken back): it leaves no undo step
        const last = get().past[get().past.length - 1];
        const backToStart = !!opts?.coalesce && last?.coalesce === opts.coalesce && get().future.length === 0 && equal(last.before, after);
        const movesPoint = opts?.momentPoint !== undefined && !equal(opts.momentPoint, s.momentPoint);
        set((d) => {
          d.sketch = after;
          d.selection = selectionAfter;
          d.revision += 1;
          if (movesPoint) d.momentPoint = opts!.momentPoint!;
          const refit = c.def.replacesSketch || !!opts?.refit;
          if (refit) d.fitRequest += 1;
          if (!c.def.undoable) return;
          if (isHistoryNotice(d.notice)) d.notice = null;
          const top = d.past[d.past.length - 1];
          if (opts?.coalesce && top && top.coalesce === opts.coalesce && d.future.length === 0) {
            if (backToStart) {
              d.past.pop();
              return;
            }
            top.after = after;
            top.selectionAfter = selectionAfter;
            return;
          }
          d.past.push({
            label,
            before,
            after,
            selectionBefore,
            selectionAfter,
            coalesce: opts?.coalesce,
            ...(refit ? { replacesSketch: true } : {}),
            ...(movesPoint ? { momentPoint: { before: s.momentPoint, after: opts!.momentPoint! } } : {}),
          });
          if (d.past.length > HISTORY_LIMIT) d.past.splice(0, d.past.length - HISTORY_LIMIT);
          d.future = [];
        });
        return true;
      },

      undo: () => {
        const s = get();
        if (s.gesture) return s.cancelGesture();
        const entry = s.past[s.past.length - 1];
        if (!entry) return;
        set((d) => {
          d.past.pop();
          d.future.push(entry);
          d.sketch = entry.before;
          d.selection = entry.selectionBefore.filter((id) => findElement(entry.before, id));
          if (entry.momentPoint) d.momentPoint = entry.momentPoint.before;
          d.revision += 1;
          if (entry.replacesSketch) d.fitRequest += 1;
          d.notice = `Undid: ${entry.label}`;
        });
      },

      redo: () => {
        const s = get();
        if (s.gesture) return;
        const entry = s.future[s.future.length - 1];
        if (!entry) return;
        set((d) => {
          d.future.pop();
          d.past.push(entry);
          d.sketch = entry.after;
          d.selection = entry.selectionAfter.filter((id) => findElement(entry.after, id));
          if (entry.momentPoint) d.momentPoint = entry.momentPoint.after;
          d.revision += 1;
          if (entry.replacesSketch) d.fitRequest += 1;
          d.notice = `Redid: ${entry.label}`;
        });
      },

      beginGesture: (label = "Drag") => {
        const s = get();
        if (s.readOnly) return;
        if (s.gesture) s.cancelGesture();
        set((d) => {
          d.gesture = { origin: s.sketch, selection: s.selection, label };
        });
      },

      updateGesture: (cmds) => {
        const g = get().gesture;
        if (!g) return;
        const list = (Array.isArray(cmds) ? cmds : [cmds]) as Command<unknown>[];
        let next = g.origin;
        for (const c of list) next = run(next, c);
        const label = list.length ? list[list.length - 1].def.label(list[list.length - 1].args, g.origin) : g.label;
        if (next === get().sketch) return;
        set((d) => {
          d.sketch = next;
          d.revision += 1;
          if (d.gesture) d.gesture.label = label;
        });
      },

      endGesture: () => {
        const s = get();
        const g = s.gesture;
        if (!g) return;
        set((d) => {
          d.gesture = null;
          if (s.sketch === g.origin) return;
          if (isHistoryNotice(d.notice)) d.notice = null;
          d.past.push({ label: g.label, before: g.origin, after: s.sketch, selectionBefore: g.selection, selectionAfter: s.selection });
          if (d.past.length > HISTORY_LIMIT) d.past.splice(0, d.past.length - HISTORY_LIMIT);
          d.future = [];
        });
      },

      cancelGesture: () => {
        const g = get().gesture;
        if (!g) return;
        set((d) => {
          const changed = d.sketch !== g.origin;
          d.sketch = g.origin;
          d.selection = g.selection;
          d.gesture = null;
          if (changed) d.revision += 1;
        });
      },

      select: (ids, mode = "replace") => {
        const s = get();
        const valid = ids.filter((id) => findElement(s.sketch, id));
        let next: string[];
        if (mode === "replace") next = valid;
        else if (mode === "add") next = [...new Set([...s.selection, ...valid])];
        else {
          const cur = new Set(s.selection);
          for (const id of valid) {
            if (cur.has(id)) cur.delete(id);
            else cur.add(id);
          }
          next = [...cur];
        }
        if (next.length === s.selection.length && next.every((id, i) => id === s.selection[i])) return;
        set((d) => {
          d.selection = next;
        });
      },

      setTool: (tool) => {
        if (get().readOnly && tool.kind !== "select" && tool.kind !== "pick-point") {
          get().notify(READ_ONLY_NOTICE);
          return;
        }
        set((d) => {
          d.tool = tool as never;
        });
      },
      setView: (view) =>
        set((d) => {
          d.view = view;
        }),
      setUnits: (units) =>
        set((d) => {
          d.units = units;
        }),
      setSnap: (on) =>
        set((d) => {
          d.snap = on;
        }),
      setMomentPoint: (p) =>
        set((d) => {
          d.momentPoint = p;
        }),
      notify: (text) =>
        set((d) => {
          d.notice = text;
        }),
      setViewport: (size) =>
        set((d) => {
          d.viewport = size;
        }),
      setReadOnly: (on) =>
        set((d) => {
          d.readOnly = on;
          if (on) d.tool = { kind: "select" };
        }),
      reset: (sketch) =>
        set((d) => {
          d.sketch = sketch;
          d.selection = [];
          d.past = [];
          d.future = [];
          d.gesture = null;
          d.tool = { kind: "select" };
          d.momentPoint = null;
          d.revision += 1;
          d.fitRequest += 1;
        }),
    })),
  );
}
