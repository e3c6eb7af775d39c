// Registered actions: one entry per thing a user can do (id, label, shortcut, run). The tray,
// the menus, the keyboard and the element outline read this list, so a new tool is one entry.
import type { Vec2 } from "@/solver/types";
import { formatQuantity, type UnitSystem } from "@/solver/units";
import type { EditorStores } from "./context";
import type { EditorStore, Tool } from "./store";
import type { PointerController } from "./konva/pointer";
import type { Command } from "./commands/define";
import { deleteElements, deletionEffects, duplicateElements, pasteElements } from "./commands/elements";
import type { SketchFile } from "@/solver/schema";
import { copyFragment, fragmentText, pasteNotice, planPaste, readFragment } from "./clipboard";
import { moveElement, replacedWords } from "./commands/move";
import { rotateElement } from "./commands/shape";
import { mirrorElements, mirrorKeeps, mirrorLeavesAlone, mirrorLine, mirrorMixedKinds, mirroredIds, mirroredMomentPoint, mixedKindsWords, type MirrorAxis } from "./commands/mirror";
import { describeElement, DIRECTED, findElement, GROUPS, KIND_LABEL, withAttached, type ElementKind } from "./model/elements";
import { plural } from "./commands/define";
import { sweepRangeWords, sweptUnitIn } from "./studies/display";
import { anchorOf } from "./scene";
import { polygonAround, rectangleAround } from "./model/factory";
import { valueLookup } from "./analysis/store";
import { fitScene, isFitted } from "./geometry/fit";
import { fitUnderlayView } from "./geometry/underlay";
import { snapTo } from "./geometry/snap";
import { roundTo } from "./model/numeric";
import { gridStep, toWorld, zoomAt } from "./geometry/view";
import { bodyCommand, bodyPlaceInView, NEEDS_BODY, placedAtOutline, placeWithoutPointer, spotWords, type SpotPlace } from "./placement";

/** What the page around the editor provides to actions (dialogs, downloads, saving). */
export interface EditorUi {
  openImport(): void;
  exportJson(): void;
  exportSvg(): void;
  exportPng(): void;
  newSketch(): void;
  save(): void;
  showKeys(): void;
}

export interface ActionContext {
  stores: EditorStores;
  controller: PointerController | null;
  ui: EditorUi;
}

export type ActionGroup = "add" | "edit" | "view" | "file" | "results";

export interface Action {
  id: string;
  label: string;
  group: ActionGroup;
  /** e.g. ["Mod+Z"]; Mod is Ctrl, or ⌘ on a Mac */
  shortcuts?: string[];
  /** longer words for a tooltip */
  hint?: string;
  /** listed in the toolbar's menu of its group (the File menu) */
  menu?: boolean;
  /** for the tray: the element kind it places */
  kind?: ElementKind;
  friction?: boolean;
  /** copy, cut and paste: their keys are left to the browser, whose clipboard events run them */
  clipboard?: boolean;
  enabled?: (ctx: ActionContext) => boolean;
  /** what the status line says when the action is asked for but not enabled */
  disabledNotice?: string;
  run: (ctx: ActionContext) => void;
  /** for the tray: add the element at once, with no pointer (Enter or Space on a tray item) */
  placeNow?: (ctx: ActionContext) => void;
}

const ed = (ctx: ActionContext) => ctx.stores.editor.getState();
const hasSelection = (ctx: ActionContext) => ed(ctx).selection.length > 0;
const hasBody = (ctx: ActionContext) => ed(ctx).sketch.bodies.length > 0;

/** The world point in the middle of the canvas. */
function viewCentre(ctx: ActionContext): Vec2 {
  const s = ed(ctx);
  return toWorld(s.view, [s.viewport.width / 2, s.viewport.height / 2]);
}

function placeAction(id: string, label: string, kind: Exclude<ElementKind, "body">, shortcut: string, hint: string, friction = false): Action {
  return {
    id,
    label,
    group: "add",
    kind,
    friction,
    shortcuts: [shortcut],
    hint,
    enabled: hasBody,
    disabledNotice: NEEDS_BODY,
    // what to do next is the status line's hint, read from the tool (`toolHint`)
    run: (ctx) => ed(ctx).setTool({ kind: "place", element: kind, friction }),
    placeNow: (ctx) => {
      const s = ed(ctx);
      const scene = ctx.stores.scene.getState();
      const out = placeWithoutPointer(s.sketch, scene, kind, { selection: s.selection, viewCentre: viewCentre(ctx), tol: 9 / s.view.scale, friction });
      if (!out.ok) return s.notify(out.message);
      if (!s.apply(out.command)) return;
      s.setTool({ kind: "select" });
      const body = scene.bodies.find((b) => b.id === out.body);
      s.notify(`${label} added to ${body?.label ?? out.body} ${placedWords(out, s.view.scale, s.units)}`);
    },
  };
}

const metres = (x: number) => `${Number(x.toPrecision(6)) || 0} m`;

/**
 * Where a keyboard placement went and how to move it, for the status line (two lines at most):
 * "near the left end of its bottom edge (x = 0.25 m, y = 0 m). Arrow keys move it 0.2 m a press,
 * Shift+arrow 2 m." In US units the place is in feet, as the panel beside it says it, and the
 * grid's metric step gets its length in feet or inches beside it.
 */
export function placedWords(out: { at?: Vec2; place?: SpotPlace }, scale: number, units: UnitSystem = "SI"): string {
  const g = gridStep(scale);
  const length = units === "US" ? (x: number) => formatQuantity(x, "length", "US") : metres;
  const step = (x: number) => (units === "US" ? `${metres(x)} (${length(x)})` : metres(x));
  const where = [out.place ? spotWords(out.place) : "", out.at ? `(x = ${length(out.at[0])}, y = ${length(out.at[1])})` : ""].filter(Boolean).join(" ");
  return `${where}. Arrow keys move it ${step(g)} a press, Shift+arrow ${step(10 * g)}.`;
}

/** A body of the default size in the middle of the view (on the grid, and no larger than the view takes), selected: the tray's keyboard route. */
function addBodyNow(ctx: ActionContext, shape: "rectangle" | "polygon") {
  const s = ed(ctx);
  const g = gridStep(s.view.scale);
  const c = viewCentre(ctx);
  const { centre, size } = bodyPlaceInView([snapTo(c[0], g), snapTo(c[1], g)], s.view, s.viewport, g);
  const outline = shape === "rectangle" ? rectangleAround(centre, size) : polygonAround(centre, size);
  if (!s.apply(bodyCommand(s.sketch, outline))) return;
  s.setTool({ kind: "select" });
  s.notify(
    shape === "rectangle"
      ? `Body added in the middle of the view, ${size[0]} m × ${size[1]} m. Arrow keys move it; its corners are in the properties on the right.`
      : "Polygon body added in the middle of the view. Set, add or remove its corners in the properties on the right.",
  );
}

/** After a nudge or a turn: say which expressions it wrote as numbers, and what no longer follows them. */
function sayReplaced(ctx: ActionContext, before: SketchFile, ids: readonly string[]) {
  const words = replacedWords(before, ed(ctx).sketch, ids);
  if (words) ed(ctx).notify(words);
}

function nudge(id: string, label: string, key: string, d: Vec2, far: boolean): Action {
  return {
    id,
    label,
    group: "edit",
    shortcuts: [far ? `Shift+${key}` : key],
    enabled: hasSelection,
    run: (ctx) => {
      const s = ed(ctx);
      const step = gridStep(s.view.scale) * (far ? 10 : 1);
      if (s.apply(moveElement({ ids: s.selection, delta: [d[0] * step, d[1] * step], lookup: valueLookup(ctx.stores.analysis) }) as Command<unknown>)) sayReplaced(ctx, s.sketch, s.selection);
    },
  };
}

function turn(id: string, label: string, key: string, by: number): Action {
  return {
    id,
    label,
    group: "edit",
    shortcuts: [key],
    enabled: (ctx) => {
      const s = ed(ctx);
      return s.selection.length === 1 && DIRECTED.has(findElement(s.sketch, s.selection[0])?.kind ?? "body");
    },
    run: (ctx) => {
      const s = ed(ctx);
      const id0 = s.selection[0];
      const item = ctx.stores.scene.getState().byId.get(id0);
      if (!item || !("angle" in item)) return;
      // by exactly the step (a direction typed as 37° turns to 52°, as a nudge keeps a typed offset)
      const angle = (item.angle as number) + by;
      if (s.apply(rotateElement({ id: id0, angle, magnitude: item.kind === "force" ? item.magnitude : undefined }) as Command<unknown>)) sayReplaced(ctx, s.sketch, [id0]);
    },
  };
}

/**
 * Mirror the selection about the centre line of its bounding box (a body brings what sits on it);
 * with nothing selected, the whole sketch. One undo step; the status line says what was mirrored,
 * about which line, what stays as it was and any expression written as a number.
 */
function mirror(id: string, label: string, key: string, axis: MirrorAxis): Action {
  const how = axis === "leftRight" ? "left–right" : "up–down";
  return {
    id,
    label,
    group: "edit",
    shortcuts: [key],
    hint: `Mirrors the selection ${how} about the middle of its extent (a body with everything on it); with nothing selected, the whole sketch.`,
    enabled: hasBody,
    disabledNotice: "Nothing to mirror yet: draw a body first.",
    run: (ctx) => {
      const s = ed(ctx);
      const before = s.sketch;
      const ids = [...s.selection];
      const lookup = valueLookup(ctx.stores.analysis);
      const about = mirrorLine(before, ids, axis, lookup);
      if (about === undefined) return s.notify("Nothing to mirror: the selection has no position that can be worked out.");
      const mixed = mirrorMixedKinds(before, ids, axis, about);
      if (mixed.length) return s.notify(mixedKindsWords(mixed));
      const stuck = mirrorLeavesAlone(before, ids, axis, about, lookup);
      // the hand check's P goes with the drawing (the whole sketch) or with the part it was picked on
      const momentPoint = mirroredMomentPoint(before, ids, axis, about, s.momentPoint, lookup);
      // the whole sketch mirrored in a fitted view: fitted again (the words drawn around it change sides)
      const refit = !ids.length && isFitted(s.view);
      if (!s.apply(mirrorElements({ ids, axis, lookup, about }) as Command<unknown>, { momentPoint, refit })) {
        if (!s.readOnly) s.notify("The selection is its own mirror image: nothing changed. Select the body to mirror it with what sits on it.");
        return;
      }
      const n = mirroredIds(before, ids).size;
      const what = ids.length ? `Mirrored ${plural(n, "element")}` : "Nothing was selected: mirrored the whole sketch";
      const line = `${axis === "leftRight" ? "x" : "y"} = ${metres(about)}`;
      const replaced = replacedWords(before, ed(ctx).sketch, ids.length ? ids : [...mirroredIds(before, ids)]);
      const one = stuck.length === 1;
      const alone = stuck.length ? ` ${stuck.join(", ")} ${one ? "is" : "are"} not mirrored: ${one ? "its expression has an error" : "their expressions have errors"}. Undo, fix ${one ? "it" : "them"} and mirror again.` : "";
      const moved = momentPoint && s.momentPoint && (momentPoint[0] !== s.momentPoint[0] || momentPoint[1] !== s.momentPoint[1]);
      const pWords = moved ? ` The hand check's point P went with it, to (${metres(momentPoint[0])}, ${metres(momentPoint[1])}).` : "";
      ed(ctx).notify(`${what} ${how} about ${line}.${pWords}${mirrorKeeps(before, ids, axis)}${replaced ? ` ${replaced}` : ""}${alone}`);
    },
  };
}

export const ACTIONS: readonly Action[] = [
  // ---- add (the tray)
  {
    id: "add.body",
    label: "Body (rectangle)",
    group: "add",
    kind: "body",
    shortcuts: ["B"],
    hint: "Drag on the canvas to draw a rectangle; a click makes one of the default size (2 m × 1 m at ordinary zoom), centred there.",
    run: (ctx) => ed(ctx).setTool({ kind: "body", shape: "rectangle", points: [] }),
    placeNow: (ctx) => addBodyNow(ctx, "rectangle"),
  },
  {
    id: "add.polygon",
    label: "Body (polygon)",
    group: "add",
    kind: "body",
    shortcuts: ["Shift+B"],
    hint: "Click each corner; click the first corner, double-click or press Enter to close.",
    run: (ctx) => ed(ctx).setTool({ kind: "body", shape: "polygon", points: [] }),
    placeNow: (ctx) => addBodyNow(ctx, "polygon"),
  },
  placeAction("add.pin", "Pin", "pin", "P", "Holds x and y; free to turn."),
  placeAction("add.roller", "Roller", "roller", "R", "Holds along its direction, either way."),
  placeAction("add.contact", "Contact", "contact", "C", "Pushes only: lifts off rather than pull."),
  placeAction("add.contact-friction", "Contact with friction", "contact", "Shift+C", "Pushes only, and holds sideways up to μ times the normal force.", true),
  placeAction("add.fixed", "Fixed support", "fixed", "X", "Holds x, y and turning."),
  placeAction("add.tie", "Tie", "tie", "T", "Pulls only: goes slack rather than push."),
  placeAction("add.force", "Point force", "force", "L", "A given force at a point."),
  placeAction("add.couple", "Couple", "couple", "M", "A given moment, counter-clockwise positive."),
  placeAction("add.distributed", "Distributed load", "distributed", "W", "A load per length along a line, w₁ to w₂."),
  placeAction("add.inlet", "Inlet", "inlet", "I", "Fluid entering the control volume."),
  placeAction("add.outlet", "Outlet", "outlet", "O", "Fluid leaving the control volume."),
  placeAction("add.massSource", "Mass source", "massSource", "S", "Mass added inside with no momentum of its own."),

  // ---- edit
  { id: "edit.undo", label: "Undo", group: "edit", shortcuts: ["Mod+Z"], enabled: (c) => ed(c).past.length > 0 || !!ed(c).gesture, run: (c) => ed(c).undo() },
  { id: "edit.redo", label: "Redo", group: "edit", shortcuts: ["Shift+Mod+Z", "Mod+Y"], enabled: (c) => ed(c).future.length > 0, run: (c) => ed(c).redo() },
  {
    id: "edit.delete",
    label: "Delete",
    group: "edit",
    shortcuts: ["Delete", "Backspace"],
    enabled: hasSelection,
    run: (c) => {
      const s = ed(c);
      const also = deletionWords(s.sketch, s.selection);
      if (s.apply(deleteElements({ ids: s.selection }) as Command<unknown>) && also) s.notify(`Deleted ${plural(withAttached(s.sketch, s.selection).size, "element")}.${also}`);
    },
  },
  {
    id: "edit.duplicate",
    label: "Duplicate",
    group: "edit",
    shortcuts: ["Mod+D"],
    enabled: hasSelection,
    run: (c) => {
      const s = ed(c);
      const g = gridStep(s.view.scale);
      s.apply(duplicateElements({ ids: s.selection, offset: [2 * g, -2 * g], lookup: valueLookup(c.stores.analysis) }) as Command<unknown>);
    },
  },
  {
    id: "edit.copy",
    label: "Copy",
    group: "edit",
    shortcuts: ["Mod+C"],
    clipboard: true,
    enabled: hasSelection,
    run: (c) => writeClipboard(c, copySelection(c, false)),
  },
  {
    id: "edit.cut",
    label: "Cut",
    group: "edit",
    shortcuts: ["Mod+X"],
    clipboard: true,
    enabled: hasSelection,
    run: (c) => writeClipboard(c, copySelection(c, true)),
  },
  {
    id: "edit.paste",
    label: "Paste",
    group: "edit",
    shortcuts: ["Mod+V"],
    clipboard: true,
    run: (c) => {
      const clip = typeof navigator !== "undefined" ? navigator.clipboard : undefined;
      if (!clip?.readText) return ed(c).notify(PASTE_BY_KEYS);
      clip.readText().then(
        (text) => pasteText(c, text) || ed(c).notify("The clipboard holds no Counterpoise elements."),
        () => ed(c).notify(PASTE_BY_KEYS),
      );
    },
  },
  {
    id: "edit.selectAll",
    label: "Select all",
    group: "edit",
    shortcuts: ["Mod+A"],
    run: (c) => {
      const scene = c.stores.scene.getState();
      ed(c).select([...scene.byId.keys()]);
    },
  },
  nudge("edit.nudgeLeft", "Nudge left", "ArrowLeft", [-1, 0], false),
  nudge("edit.nudgeRight", "Nudge right", "ArrowRight", [1, 0], false),
  nudge("edit.nudgeUp", "Nudge up", "ArrowUp", [0, 1], false),
  nudge("edit.nudgeDown", "Nudge down", "ArrowDown", [0, -1], false),
  nudge("edit.nudgeLeftFar", "Nudge left ×10", "ArrowLeft", [-1, 0], true),
  nudge("edit.nudgeRightFar", "Nudge right ×10", "ArrowRight", [1, 0], true),
  nudge("edit.nudgeUpFar", "Nudge up ×10", "ArrowUp", [0, 1], true),
  nudge("edit.nudgeDownFar", "Nudge down ×10", "ArrowDown", [0, -1], true),
  turn("edit.turnLeft", "Turn 15° counter-clockwise", "]", 15),
  turn("edit.turnRight", "Turn 15° clockwise", "[", -15),
  mirror("edit.mirrorLeftRight", "Mirror left–right", "Shift+H", "leftRight"),
  mirror("edit.mirrorUpDown", "Mirror up–down", "Shift+V", "upDown"),

  // ---- view
  {
    id: "view.fit",
    label: "Fit to view",
    group: "view",
    shortcuts: ["F"],
    run: (c) => {
      const s = ed(c);
      const scene = c.stores.scene.getState();
      // nothing drawn yet: the drawing to trace over is what there is to see
      const u = s.sketch.underlay;
      if (!scene.bodies.length && !scene.items.length && u && !u.hidden) s.setView(fitUnderlayView(u, s.viewport.width, s.viewport.height));
      else s.setView(fitScene(scene, s.viewport.width, s.viewport.height, { result: c.stores.analysis.getState().shown, units: s.units }));
    },
  },
  { id: "view.zoomIn", label: "Zoom in", group: "view", shortcuts: ["+", "="], run: (c) => zoomBy(c, 1.25) },
  { id: "view.zoomOut", label: "Zoom out", group: "view", shortcuts: ["-"], run: (c) => zoomBy(c, 0.8) },
  { id: "view.units", label: "Switch SI / US units", group: "view", shortcuts: ["U"], run: (c) => ed(c).setUnits(ed(c).units === "SI" ? "US" : "SI") },
  { id: "view.snap", label: "Snap to grid and edges", group: "view", run: (c) => ed(c).setSnap(!ed(c).snap) },
  { id: "view.keys", label: "Keys and gestures", group: "view", shortcuts: ["?"], run: (c) => c.ui.showKeys() },

  // ---- file
  { id: "file.new", label: "New sketch", group: "file", menu: true, run: (c) => c.ui.newSketch() },
  { id: "file.import", label: "Import JSON…", group: "file", menu: true, shortcuts: ["Mod+O"], run: (c) => c.ui.openImport() },
  { id: "file.exportJson", label: "Export JSON", group: "file", menu: true, shortcuts: ["Mod+E"], run: (c) => c.ui.exportJson() },
  { id: "file.exportSvg", label: "Export drawing as SVG", group: "file", menu: true, run: (c) => c.ui.exportSvg() },
  { id: "file.exportPng", label: "Export drawing as PNG", group: "file", menu: true, run: (c) => c.ui.exportPng() },
  // not in the menu: the scratch sketch keeps itself, and a saved sketch has its own Save button
  { id: "file.save", label: "Save", group: "file", shortcuts: ["Mod+S"], run: (c) => c.ui.save() },

  // ---- results
  {
    id: "results.pickPoint",
    label: "Pick the point for moments",
    group: "results",
    shortcuts: ["K"],
    hint: "Click on the canvas to take the hand check's moments about that point; Enter takes the selected element's point.",
    run: (c) => ed(c).setTool({ kind: "pick-point" }),
  },
];

/**
 * The point for moments without a pointer: while "Pick the point for moments" is on, Enter takes
 * the selected element's own point (a support's, a load's or a port's; a body's centre of
 * gravity), the usual choice of a hand check. False when the tool is not on; with nothing
 * selected it says what to do instead.
 */
export function pickSelectedPoint(ctx: ActionContext): boolean {
  const s = ed(ctx);
  if (s.tool.kind !== "pick-point") return false;
  const l = s.selection.length === 1 ? findElement(s.sketch, s.selection[0]) : undefined;
  const item = l ? ctx.stores.scene.getState().byId.get(l.el.id) : undefined;
  if (!l || !item) {
    s.notify("Select one element first (in the Elements list), then K and Enter; or type Px and Py in the Hand check tab.");
    return true;
  }
  const p = anchorOf(item);
  // the element's point as it is (typed to the micron or not), free of floating-point noise
  s.setMomentPoint([roundTo(p[0], 1e-9), roundTo(p[1], 1e-9)]);
  s.setTool({ kind: "select" });
  s.notify(`The hand check takes moments about ${describeElement(l)}${l.kind === "body" ? "'s centre of gravity" : ""} (x = ${metres(p[0])}, y = ${metres(p[1])}).`);
  return true;
}

function zoomBy(c: ActionContext, f: number) {
  const s = ed(c);
  s.setView(zoomAt(s.view, f, [s.viewport.width / 2, s.viewport.height / 2]));
}

export function actionById(id: string): Action {
  const a = ACTIONS.find((x) => x.id === id);
  if (!a) throw new Error(`no action ${id}`);
  return a;
}

/** The actions a toolbar menu lists, in registration order. */
export function menuActions(group: ActionGroup): Action[] {
  return ACTIONS.filter((a) => a.group === group && a.menu);
}

/** A button's tooltip from its action: "Zoom out (-)"; `label` replaces the action's words. */
export function actionTitle(id: string, label?: string): string {
  const a = actionById(id);
  const key = a.shortcuts?.[0];
  return key ? `${label ?? a.label} (${shortcutLabel(key)})` : (label ?? a.label);
}

/**
 * What a delete does to the kept sweeps, for the status line (empty when it touches none): " The
 * kept sweep of p from 0 to 10 bar no longer plots front; … Undo brings them back."
 */
export function deletionWords(sketch: SketchFile, ids: readonly string[]): string {
  const { sweepsChanged, sweepsRemoved } = deletionEffects(sketch, ids);
  if (!sweepsChanged.length && !sweepsRemoved.length) return "";
  const gone = withAttached(sketch, [...ids]);
  const nameOf = (id: string) => findElement(sketch, id)?.el.label || id;
  const parts = (sketch.sweeps ?? []).flatMap((w) => {
    const what = `the kept sweep of ${sweepRangeWords(w.parameter, w.from, w.to, sweptUnitIn(sketch, w.parameter))}`;
    const names = [...new Set((w.quantities ?? []).filter((q) => gone.has(q.support)).map((q) => nameOf(q.support)))].join(" and ");
    if (sweepsRemoved.includes(w.id)) return [`${what} plotted only ${names} and is gone`];
    return sweepsChanged.includes(w.id) ? [`${what} no longer plots ${names}`] : [];
  });
  const text = parts.join("; ");
  return ` ${text[0].toUpperCase()}${text.slice(1)}. Undo brings them back.`;
}

// ---------------------------------------------------------------- clipboard

const PASTE_BY_KEYS = "The browser did not let the page read the clipboard: press Ctrl+V (⌘V) to paste.";

/** The selection as clipboard text (null when nothing is selected); a cut then deletes it. */
export function copySelection(ctx: ActionContext, cut: boolean): string | null {
  const s = ed(ctx);
  const fragment = copyFragment(s.sketch, s.selection);
  if (!fragment) return null;
  const n = GROUPS.reduce((t, g) => t + fragment[g].length, 0);
  const also = cut ? deletionWords(s.sketch, s.selection) : "";
  if (cut && !s.apply(deleteElements({ ids: s.selection }) as Command<unknown>)) return null;
  s.notify(`${cut ? "Cut" : "Copied"} ${n} element${n === 1 ? "" : "s"}: paste them here or in another sketch.${also}`);
  return fragmentText(fragment);
}

function writeClipboard(ctx: ActionContext, text: string | null) {
  if (text === null) return;
  navigator.clipboard?.writeText(text).catch(() => ed(ctx).notify("The browser did not let the page write to the clipboard: press Ctrl+C (⌘C) instead."));
}

/**
 * Clipboard text pasted into the sketch: copied elements or a whole sketch file's text. False when
 * the text is not ours (the page keeps its own paste); true once it has been handled, or refused
 * with the reason in the status line.
 */
export function pasteText(ctx: ActionContext, text: string): boolean {
  const read = readFragment(text);
  if (!read) return false;
  const s = ed(ctx);
  if (!read.ok) {
    s.notify(read.reason);
    return true;
  }
  // loose supports, loads and ports go on the selected body (or the body of a selected element)
  const picked = s.selection.map((id) => findElement(s.sketch, id)).find(Boolean);
  const attachTo = picked ? (picked.group === "bodies" ? picked.el.id : (picked.el as { body: string }).body) : undefined;
  const out = planPaste(s.sketch, read.fragment, { attachTo, step: gridStep(s.view.scale) });
  if (!out.ok) s.notify(out.reason);
  else if (s.apply(pasteElements(out.plan) as Command<unknown>)) s.notify(pasteNotice(out.plan));
  return true;
}

// ---------------------------------------------------------------- shortcuts

interface KeyLike {
  key: string;
  ctrlKey: boolean;
  metaKey: boolean;
  shiftKey: boolean;
  altKey: boolean;
}

export function matchesShortcut(e: KeyLike, spec: string): boolean {
  const parts = spec.split("+");
  // "+" itself is a key: "Shift++" is not used; a lone "+" splits into ["", ""]
  const key = spec === "+" ? "+" : parts[parts.length - 1];
  const mods = new Set(spec === "+" ? [] : parts.slice(0, -1));
  const mod = e.ctrlKey || e.metaKey;
  if (mods.has("Mod") !== mod) return false;
  if (mods.has("Alt") !== e.altKey) return false;
  const symbol = key.length === 1 && !/[a-z0-9]/i.test(key);
  if (!symbol && mods.has("Shift") !== e.shiftKey) return false;
  return e.key.toLowerCase() === key.toLowerCase();
}

/** The action a key press runs, if any (the most specific match wins). */
export function actionForKey(e: KeyLike, actions: readonly Action[] = ACTIONS): Action | undefined {
  return actions.find((a) => a.shortcuts?.some((s) => matchesShortcut(e, s)));
}

export function shortcutLabel(spec: string, mac = typeof navigator !== "undefined" && /Mac|iPhone|iPad/.test(navigator.platform)): string {
  return spec
    .split(/\+(?!$)/)
    .map((p) => (p === "Mod" ? (mac ? "⌘" : "Ctrl") : p === "Shift" ? (mac ? "⇧" : "Shift") : p.replace("Arrow", "")))
    .join(mac ? "" : "+");
}

// ------------------------------------------------------------ the tool's words

/** One key for a tool: its kind and what it places (a polygon's corners so far do not change it). */
export function toolKey(tool: Tool): string {
  if (tool.kind === "place") return `place:${tool.element}${tool.friction ? ":f" : ""}`;
  if (tool.kind === "body") return `body:${tool.shape}`;
  return tool.kind;
}

const corners = (n: number) => `${n} corner${n === 1 ? "" : "s"} placed`;

/**
 * What the status line says while a tool is on: read from the tool itself, so it is there exactly
 * as long as the tool is (gone once a single placement hands back to selecting). `touch`: the words
 * for a phone or a tablet, taps and the status line's Done button instead of keys. Null while
 * selecting.
 */
export function toolHint(tool: Tool, touch = false): string | null {
  const act = touch ? "tap" : "click";
  const stop = touch ? " Done stops." : " Esc to stop.";
  switch (tool.kind) {
    case "select":
      return null;
    case "place": {
      const label = ACTIONS.find((a) => a.kind === tool.element && !!a.friction === !!tool.friction)?.label ?? KIND_LABEL[tool.element];
      const where = placedAtOutline(tool.element) ? "on or near a body's outline" : "on a body";
      return `${label}: ${act} ${where} to place it${touch ? "." : " (Shift+click to place several)."}${stop}`;
    }
    case "body": {
      if (tool.shape === "rectangle") return `Body: drag a rectangle on the drawing, or ${act} for one of the default size centred there.${stop}`;
      const n = tool.points.length;
      const close = touch ? (n >= 3 ? "tap the first corner or Done to close it." : "tap the first corner to close it.") : "click the first corner or press Enter to close it; Backspace removes the last corner.";
      return `Polygon body: ${n ? `${corners(n)}. ${touch ? "Tap" : "Click"} each next corner` : `${act} each corner`}, then ${close}${n >= 3 && touch ? "" : stop}`;
    }
    case "pick-point":
      return `${touch ? "Tap" : "Click"} on the drawing: the hand check takes moments about that point.${touch ? "" : " Enter takes the selected element's point."}${stop}`;
    case "calibrate":
      return tool.points.length === 0
        ? `Setting the scale: ${act} the first of two marks a known distance apart on the drawing (the farther apart they are, and the closer you zoom in on each, the more exact the scale).${stop}`
        : tool.points.length === 1
          ? `Setting the scale: now ${act} the second mark.${stop}`
          : "Type the real distance between the two marks in the Underlay section, then Set the scale.";
  }
}

/**
 * Keeps the status line's notice with the tool it was said under: a change of tool (choosing one,
 * or going back to selecting after a placement, Esc or Done) clears the notice, so neither the
 * last tool's words nor a refusal it gave linger. Words said after the change (what was added)
 * stay. So does it with the selection: "Pin added… Arrow keys move it" goes once another element
 * is selected, which the arrows would move instead (words said with the change, "Undid: …", stay).
 * Returns the function that stops.
 */
export function noticesFollowTool(editor: EditorStore): () => void {
  return editor.subscribe((s, prev) => {
    if (s.notice === null) return;
    const otherSelection = s.selection !== prev.selection && s.notice === prev.notice && s.selection.join("\u0000") !== prev.selection.join("\u0000");
    if (toolKey(s.tool) !== toolKey(prev.tool) || otherSelection) s.notify(null);
  });
}
