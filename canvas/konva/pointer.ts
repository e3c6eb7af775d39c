// Pointer handling for the canvas, outside React: pick, place, drag (one gesture = one undo
// step), turn, reshape, rubber-band select, draw bodies, pan and zoom. Drags listen on the
// window so they continue when the pointer leaves the canvas.
import type { Vec2 } from "@/solver/types";
import { handleSign } from "../render/handles";
import { valueLookup } from "../analysis/store";
import { moveElement, moveCentreOfGravity, replacedWords } from "../commands/move";
import { rotateElement, reshapeBody } from "../commands/shape";
import type { Command } from "../commands/define";
import type { EditorStores } from "../context";
import { childrenOf, findElement, type ElementKind } from "../model/elements";
import { snapCorners, snapPoint, snapTo, type SnapResult } from "../geometry/snap";
import { gridStep, toWorld, zoomAt } from "../geometry/view";
import { angleOf, normaliseAngle } from "../geometry/polygon";
import { anchorOf, type SceneItem } from "../scene";
import { bodyCommand, bodyPlaceInView, dropAttachments, elementsInBox, OUTLINE_REACH_PX, placeCommand, placedAtOutline } from "../placement";
import { rectangleAround, rectangleOutline } from "../model/factory";
import { roundTo } from "../model/numeric";
import { markInput } from "../perf";
import { moveUnderlay } from "../commands/underlay";
import { calibrationClick } from "./underlayPointer";
import { NOTHING_LIFTED, type InteractionStore, type TrayDrop } from "./interaction";

export type HitInfo =
  | { type: "element"; id: string }
  | { type: "cg"; id: string }
  | { type: "corner"; id: string; index: number }
  | { type: "rotate"; id: string }
  | { type: "underlay" };

export interface PointerDeps {
  stores: EditorStores;
  interaction: InteractionStore;
  container: () => HTMLElement | null;
  hitTest: (screen: Vec2) => HitInfo | null;
}

type Mode =
  | { kind: "idle" }
  | { kind: "pan"; start: Vec2; view: { scale: number; x: number; y: number } }
  /** `corners`: the moving bodies' corners when the drag began (they snap to other bodies) */
  | { kind: "move"; ids: string[]; start: Vec2; anchor: Vec2; moved: boolean; exclude: Set<string>; snapAnchor: boolean; corners: Vec2[]; last?: Command<unknown> }
  /** `from`: the element's direction when the turn began; `grip`: the pointer's direction from the
   *  anchor then (the turn follows the pointer's change of direction, not where it was pressed) */
  | { kind: "rotate"; id: string; anchor: Vec2; flip: boolean; magnitude?: number; from: number; grip: number; moved: boolean }
  /** `origin`: the corner when the drag began (kept while the pointer stays near it) */
  | { kind: "corner"; id: string; index: number; start: Vec2; origin: Vec2; moved: boolean }
  | { kind: "cg"; id: string; start: Vec2; origin: Vec2; moved: boolean }
  /** `before`: the selection when the band began, which Escape gives back */
  | { kind: "band"; start: Vec2; mode: "replace" | "add"; before: string[] }
  | { kind: "rect"; start: Vec2 }
  | { kind: "pinch"; dist: number; mid: Vec2; view: { scale: number; x: number; y: number } }
  | { kind: "underlay"; start: Vec2; origin: Vec2 };

const DRAG_THRESHOLD_PX = 3;
const ANGLE_STEP = 5;
/** A turn within this many degrees of the direction it began from keeps that direction exactly
 *  (one typed as 37° is not rounded to 35° by a press that wobbles); less than a step, so every
 *  step stays reachable. */
const ANGLE_KEEP = 4;

export function createPointerController(deps: PointerDeps) {
  const { stores, interaction } = deps;
  const ed = () => stores.editor.getState();
  let mode: Mode = { kind: "idle" };
  let downScreen: Vec2 = [0, 0];
  let polygonLastClick = 0;
  /** touch points down on the canvas (two of them pinch-zoom and pan) */
  const touches = new Map<number, Vec2>();
  // back to selecting (a click placed, a polygon closed, Escape, the tray): a tool's hover mark
  // and its snap mark ("on edge") go with the tool, not at the next pointer move
  const stopToolWatch = stores.editor.subscribe((s, prev) => {
    if (s.tool !== prev.tool && s.tool.kind === "select" && mode.kind === "idle" && (interaction.getState().hover || interaction.getState().snap)) interaction.setState({ hover: null, snap: null });
  });

  const screenOf = (e: { clientX: number; clientY: number }): Vec2 => {
    const r = deps.container()?.getBoundingClientRect();
    return r ? [e.clientX - r.left, e.clientY - r.top] : [e.clientX, e.clientY];
  };
  const worldOf = (s: Vec2) => toWorld(ed().view, s);
  const tolerance = () => 9 / ed().view.scale;

  /** `keep`: where the dragged point began, kept exactly while the pointer stays near it (see `snapPoint`) */
  function snap(p: Vec2, e: { altKey: boolean }, exclude?: Set<string>, tol = tolerance(), keep?: Vec2): SnapResult {
    const s = ed();
    const scene = stores.scene.getState();
    return snapPoint(p, { bodies: scene.bodies, grid: gridStep(s.view.scale), tolerance: tol, exclude, enabled: s.snap && !e.altKey, keep });
  }
  /** Past the few pixels a click wobbles: before that, a press on a handle changes nothing. */
  const pastThreshold = (screen: Vec2) => Math.hypot(screen[0] - downScreen[0], screen[1] - downScreen[1]) >= DRAG_THRESHOLD_PX;
  const same = (a: Vec2, b: Vec2) => a[0] === b[0] && a[1] === b[1];

  /**
   * The command that places a support, load or port at a world point (a click, a tap, a tray item
   * dropped): a support or a port within `OUTLINE_REACH_PX` of a body's outline goes onto it
   * (snapped there as far out as that); one farther out is refused, with the hint in a tap's
   * words for a touch.
   */
  function place(kind: Exclude<ElementKind, "body">, world: Vec2, e: { altKey: boolean }, opts: { friction?: boolean; touch?: boolean }) {
    const s = ed();
    const reach = OUTLINE_REACH_PX / s.view.scale;
    const p = snap(world, e, undefined, placedAtOutline(kind) ? reach : tolerance()).point;
    return placeCommand(s.sketch, stores.scene.getState(), kind, p, tolerance(), { friction: opts.friction, reach, from: world, touch: opts.touch });
  }

  /** A body of the default size centred on a world point (on the grid unless snapping is off), kept in view. */
  function bodyAround(world: Vec2, e: { altKey: boolean }) {
    const s = ed();
    // the centre keeps to the grid only: another body's corner means nothing for a centre
    const grid = s.snap && !e.altKey ? gridStep(s.view.scale) : 0;
    const centre = snapPoint(world, { bodies: [], grid, tolerance: 0, enabled: grid > 0 }).point;
    return bodyPlaceInView(centre, s.view, s.viewport, grid);
  }

  /** Draw these elements (and a moved body's elements) on the interaction layer while the drag lasts. */
  function lift(ids: string[]) {
    const sketch = ed().sketch;
    const out = new Set<string>();
    for (const id of ids) {
      out.add(id);
      if (findElement(sketch, id)?.group === "bodies") for (const c of childrenOf(sketch, id)) out.add(c.el.id);
    }
    interaction.setState({ lifted: out });
  }

  const valueOf = valueLookup(stores.analysis);

  function startWindowDrag() {
    window.addEventListener("pointermove", onDragMove);
    window.addEventListener("pointerup", onDragUp);
    window.addEventListener("pointercancel", onDragCancel);
  }
  function stopWindowDrag() {
    window.removeEventListener("pointermove", onDragMove);
    window.removeEventListener("pointerup", onDragUp);
    window.removeEventListener("pointercancel", onDragCancel);
    interaction.setState({ dragging: false, panning: false, band: null, rect: null, lifted: NOTHING_LIFTED });
  }

  // A finger is forgotten when it lifts, whatever its press did: a tap that placed an element
  // starts no drag, and a finger still counted would make the next single touch a pinch.
  function onTouchEnd(e: PointerEvent) {
    if (e.pointerType !== "touch") return;
    touches.delete(e.pointerId);
    if (touches.size === 0) stopTouchWatch();
  }
  function startTouchWatch() {
    window.addEventListener("pointerup", onTouchEnd);
    window.addEventListener("pointercancel", onTouchEnd);
  }
  function stopTouchWatch() {
    window.removeEventListener("pointerup", onTouchEnd);
    window.removeEventListener("pointercancel", onTouchEnd);
  }

  function down(e: PointerEvent) {
    const s = ed();
    const screen = screenOf(e);
    if (e.pointerType === "touch") {
      touches.set(e.pointerId, screen);
      startTouchWatch();
      if (touches.size === 2) {
        // a second finger: whatever the first one started becomes a pinch
        if (mode.kind === "move" || mode.kind === "rotate" || mode.kind === "corner" || mode.kind === "cg") s.cancelGesture();
        const [a, b] = [...touches.values()];
        mode = { kind: "pinch", dist: Math.hypot(a[0] - b[0], a[1] - b[1]) || 1, mid: [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2], view: { ...s.view } };
        // a pinch pans and zooms: the labels wait for its end, as for a pan
        interaction.setState({ band: null, snap: null, panning: true });
        startWindowDrag();
        return;
      }
    }
    downScreen = screen;
    const world = worldOf(screen);
    if (e.button === 1 || (e.button === 0 && interaction.getState().spaceHeld)) {
      mode = { kind: "pan", start: screen, view: { ...s.view } };
      interaction.setState({ panning: true });
      startWindowDrag();
      e.preventDefault();
      return;
    }
    if (e.button !== 0) return;
    const tool = s.tool;

    if (tool.kind === "pick-point") {
      const p = snap(world, e).point;
      s.setMomentPoint([snapTo(p[0], 1e-4), snapTo(p[1], 1e-4)]);
      s.setTool({ kind: "select" });
      // the tool's hover mark and snap ("on edge") go with it, not at the next pointer move
      interaction.setState({ hover: null, snap: null });
      return;
    }
    if (tool.kind === "calibrate") {
      calibrationClick(s, world);
      return;
    }
    if (tool.kind === "place") {
      const out = place(tool.element, world, e, { friction: tool.friction, touch: e.pointerType === "touch" });
      if (!out.ok) s.notify(out.message);
      else {
        s.apply(out.command);
        if (!e.shiftKey) s.setTool({ kind: "select" });
      }
      return;
    }
    if (tool.kind === "body" && tool.shape === "rectangle") {
      mode = { kind: "rect", start: snap(world, e).point };
      interaction.setState({ rect: [mode.start, mode.start], dragging: true });
      startWindowDrag();
      return;
    }
    if (tool.kind === "body" && tool.shape === "polygon") {
      const p = snap(world, e).point;
      const pts = tool.points;
      const now = e.timeStamp;
      const closeToFirst = pts.length >= 3 && Math.hypot(p[0] - pts[0][0], p[1] - pts[0][1]) * s.view.scale < 10;
      const last = pts[pts.length - 1];
      const doubleClick = pts.length >= 3 && now - polygonLastClick < 400 && Math.hypot(p[0] - last[0], p[1] - last[1]) * s.view.scale < 6;
      if (closeToFirst || doubleClick) {
        finishPolygon();
        return;
      }
      polygonLastClick = now;
      s.setTool({ ...tool, points: [...pts, p] });
      return;
    }

    // select tool
    const hit = deps.hitTest(screen);
    if (hit?.type === "rotate") {
      const item = stores.scene.getState().byId.get(hit.id) as SceneItem | undefined;
      if (!item) return;
      const l = findElement(s.sketch, hit.id);
      const el = l?.el as Record<string, unknown> | undefined;
      const cartesian = item.kind === "force" && el && el.magnitude === undefined && el.angle === undefined;
      const anchor = anchorOf(item);
      const flip = handleSign(item) < 0;
      const from = "angle" in item && Number.isFinite(item.angle) ? (item.angle as number) : NaN;
      const grip = angleOf([world[0] - anchor[0], world[1] - anchor[1]]) + (flip ? 180 : 0);
      mode = { kind: "rotate", id: hit.id, anchor, flip, magnitude: cartesian && item.kind === "force" ? item.magnitude : undefined, from, grip, moved: false };
      s.beginGesture("Turn");
      lift([hit.id]);
    } else if (hit?.type === "corner") {
      const b = stores.scene.getState().byId.get(hit.id);
      const origin = b?.kind === "body" ? b.outline[hit.index] : undefined;
      if (!origin) return;
      mode = { kind: "corner", id: hit.id, index: hit.index, start: world, origin, moved: false };
      s.beginGesture("Reshape");
      lift([hit.id]);
    } else if (hit?.type === "cg") {
      const b = stores.scene.getState().byId.get(hit.id);
      if (!b || b.kind !== "body") return;
      mode = { kind: "cg", id: hit.id, start: world, origin: b.cg, moved: false };
      s.beginGesture("Move the centre of gravity");
    } else if (hit?.type === "underlay" && s.sketch.underlay) {
      mode = { kind: "underlay", start: world, origin: s.sketch.underlay.origin };
      s.beginGesture("Move the underlay");
      if (s.selection.length) s.select([]);
    } else if (hit?.type === "element") {
      const already = s.selection.includes(hit.id);
      if (e.shiftKey || e.ctrlKey || e.metaKey) {
        s.select([hit.id], "toggle");
        if (already) return;
      } else if (!already) s.select([hit.id]);
      const ids = ed().selection;
      const scene = stores.scene.getState();
      const primary = scene.byId.get(hit.id);
      if (!primary) return;
      const exclude = new Set(ids.filter((id) => scene.byId.get(id)?.kind === "body"));
      const corners = scene.bodies.filter((b) => exclude.has(b.id)).flatMap((b) => b.outline);
      mode = { kind: "move", ids, start: world, anchor: anchorOf(primary), moved: false, exclude, snapAnchor: primary.kind !== "body", corners };
      s.beginGesture("Move");
    } else {
      mode = { kind: "band", start: world, mode: e.shiftKey ? "add" : "replace", before: s.selection };
      if (!e.shiftKey) s.select([]);
    }
    interaction.setState({ dragging: true });
    startWindowDrag();
  }

  function onDragMove(e: PointerEvent) {
    const s = ed();
    const screen = screenOf(e);
    const world = worldOf(screen);
    if (e.pointerType === "touch" && touches.has(e.pointerId)) touches.set(e.pointerId, screen);
    switch (mode.kind) {
      case "pinch": {
        if (touches.size < 2) return;
        const [a, b] = [...touches.values()];
        const dist = Math.hypot(a[0] - b[0], a[1] - b[1]) || 1;
        const mid: Vec2 = [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
        const zoomed = zoomAt(mode.view, dist / mode.dist, mode.mid);
        s.setView({ ...zoomed, x: zoomed.x + mid[0] - mode.mid[0], y: zoomed.y + mid[1] - mode.mid[1] });
        return;
      }
      case "pan":
        s.setView({ ...mode.view, x: mode.view.x + screen[0] - mode.start[0], y: mode.view.y + screen[1] - mode.start[1] });
        return;
      case "move": {
        if (!mode.moved && Math.hypot(screen[0] - downScreen[0], screen[1] - downScreen[1]) < DRAG_THRESHOLD_PX) return;
        if (!mode.moved) lift(mode.ids);
        mode.moved = true;
        markInput(e.timeStamp);
        let delta: Vec2 = [world[0] - mode.start[0], world[1] - mode.start[1]];
        if (mode.snapAnchor) {
          // the element's own place (maybe typed) holds while the pointer stays near it
          const r = snap([mode.anchor[0] + delta[0], mode.anchor[1] + delta[1]], e, mode.exclude, undefined, mode.anchor);
          delta = [r.point[0] - mode.anchor[0], r.point[1] - mode.anchor[1]];
          interaction.setState({ snap: r.kind === "none" ? null : r });
        } else if (s.snap && !e.altKey) {
          // a body's corner goes onto another body's corner or edge; failing that the move keeps to
          // the grid (in whole steps, so corners typed off it stay as far off it); near where it
          // began it stays put, unless a corner or an edge is nearer still
          const g = gridStep(s.view.scale);
          const d = delta;
          const moved = mode.corners.map((c): Vec2 => [c[0] + d[0], c[1] + d[1]]);
          const r = snapCorners(moved, { bodies: stores.scene.getState().bodies, grid: g, tolerance: tolerance(), exclude: mode.exclude });
          const far = Math.hypot(d[0], d[1]);
          const caught = r && (far > tolerance() || Math.hypot(r.point[0] - r.from[0], r.point[1] - r.from[1]) < far) ? r : null;
          delta = caught ? [d[0] + caught.point[0] - caught.from[0], d[1] + caught.point[1] - caught.from[1]] : far <= tolerance() ? [0, 0] : [snapTo(d[0], g), snapTo(d[1], g)];
          interaction.setState({ snap: caught ? { point: caught.point, kind: caught.kind, body: caught.body, edge: caught.edge } : null });
        } else interaction.setState({ snap: null });
        mode.last = moveElement({ ids: mode.ids, delta, lookup: valueOf }) as Command<unknown>;
        s.updateGesture(mode.last);
        return;
      }
      case "rotate": {
        if (!mode.moved && !pastThreshold(screen)) return;
        mode.moved = true;
        const v: Vec2 = [world[0] - mode.anchor[0], world[1] - mode.anchor[1]];
        if (Math.hypot(v[0], v[1]) < 1e-9) return;
        markInput(e.timeStamp);
        const pointed = angleOf(v) + (mode.flip ? 180 : 0);
        // from the direction it had, by as much as the pointer has turned about the anchor
        let a = Number.isFinite(mode.from) ? mode.from + normaliseAngle(pointed - mode.grip) : pointed;
        if (!e.altKey && Number.isFinite(mode.from) && Math.abs(normaliseAngle(a - mode.from)) < ANGLE_KEEP) {
          // still near where it began: the direction as it was (typed, or an expression)
          s.updateGesture([]);
          return;
        }
        a = roundTo(a, e.altKey ? 0.1 : ANGLE_STEP);
        s.updateGesture(rotateElement({ id: mode.id, angle: a, magnitude: mode.magnitude }) as Command<unknown>);
        return;
      }
      case "corner": {
        if (!mode.moved && !pastThreshold(screen)) return;
        mode.moved = true;
        // the corner follows the pointer's move (not the pointer's spot on the handle)
        const p: Vec2 = [mode.origin[0] + world[0] - mode.start[0], mode.origin[1] + world[1] - mode.start[1]];
        const r = snap(p, e, new Set([mode.id]), undefined, mode.origin);
        interaction.setState({ snap: r.kind === "none" ? null : r });
        markInput(e.timeStamp);
        if (same(r.point, mode.origin)) s.updateGesture([]);
        else s.updateGesture(reshapeBody({ id: mode.id, corner: mode.index, to: r.point, keepRectangle: !e.shiftKey }) as Command<unknown>);
        return;
      }
      case "cg": {
        if (!mode.moved && !pastThreshold(screen)) return;
        mode.moved = true;
        const p: Vec2 = [mode.origin[0] + world[0] - mode.start[0], mode.origin[1] + world[1] - mode.start[1]];
        const r = snap(p, e, undefined, undefined, mode.origin);
        markInput(e.timeStamp);
        if (same(r.point, mode.origin)) s.updateGesture([]);
        else s.updateGesture(moveCentreOfGravity({ id: mode.id, to: r.point }) as Command<unknown>);
        return;
      }
      case "underlay":
        s.updateGesture(moveUnderlay({ to: [mode.origin[0] + world[0] - mode.start[0], mode.origin[1] + world[1] - mode.start[1]] }) as Command<unknown>);
        return;
      case "band":
        interaction.setState({ band: { minX: Math.min(mode.start[0], world[0]), minY: Math.min(mode.start[1], world[1]), maxX: Math.max(mode.start[0], world[0]), maxY: Math.max(mode.start[1], world[1]) } });
        return;
      case "rect":
        interaction.setState({ rect: [mode.start, snap(world, e).point] });
        return;
    }
  }

  function onDragUp(e: PointerEvent) {
    if (e.pointerType === "touch") touches.delete(e.pointerId);
    if (mode.kind === "pinch") {
      if (touches.size === 0) {
        mode = { kind: "idle" };
        stopWindowDrag();
      }
      return;
    }
    const s = ed();
    const m = mode;
    const band = interaction.getState().band;
    mode = { kind: "idle" };
    stopWindowDrag();
    interaction.setState({ snap: null });
    switch (m.kind) {
      case "move": {
        // not moved, or back where it began: nothing to attach, no undo step
        if (!m.moved || s.sketch === s.gesture?.origin) {
          s.cancelGesture();
          return;
        }
        // supports, loads and ports attach to the body they are dropped on
        const cmds = dropAttachments(s.sketch, stores.scene.getState(), m.ids, tolerance());
        // the move from the origin, then the attachments: still one undo step
        if (cmds.length && m.last) s.updateGesture([m.last, ...cmds]);
        endSayingReplaced(m.ids);
        return;
      }
      case "rotate":
      case "corner":
        endSayingReplaced([m.id]);
        return;
      case "cg":
      case "underlay":
        s.endGesture();
        return;
      case "band": {
        if (band && (band.maxX - band.minX) * s.view.scale > 2) s.select(elementsInBox(stores.scene.getState(), band), m.mode === "add" ? "add" : "replace");
        return;
      }
      case "rect": {
        const end = snap(worldOf(screenOf(e)), e).point;
        interaction.setState({ rect: null });
        if (Math.abs(end[0] - m.start[0]) * s.view.scale >= 6 && Math.abs(end[1] - m.start[1]) * s.view.scale >= 6) {
          s.apply(bodyCommand(s.sketch, rectangleOutline(m.start, end)));
          s.setTool({ kind: "select" });
          return;
        }
        // a click (a tap): a body of the default size centred there, wholly in view (a phone's
        // drawing is narrow: one with its corner at the tap would run off it)
        const { centre, size } = bodyAround(worldOf(downScreen), e);
        const added = s.apply(bodyCommand(s.sketch, rectangleAround(centre, size)));
        s.setTool({ kind: "select" });
        if (added) s.notify(`Body added, ${size[0]} m × ${size[1]} m. Drag its corners to reshape it.`);
        return;
      }
    }
  }

  function onDragCancel(e: PointerEvent) {
    if (e.pointerType === "touch") touches.delete(e.pointerId);
    cancel();
  }

  /** A drag's end: one undo step, and the status line says which expressions it wrote as numbers. */
  function endSayingReplaced(ids: readonly string[]) {
    const origin = ed().gesture?.origin;
    ed().endGesture();
    const words = origin ? replacedWords(origin, ed().sketch, ids) : "";
    if (words) ed().notify(words);
  }

  /** Escape: roll back the drag in progress, or leave the current tool. */
  function cancel(): boolean {
    const s = ed();
    touches.clear();
    stopTouchWatch();
    if (mode.kind !== "idle") {
      const wasGesture = mode.kind === "move" || mode.kind === "rotate" || mode.kind === "corner" || mode.kind === "cg" || mode.kind === "underlay";
      if (mode.kind === "pan") s.setView(mode.view);
      if (mode.kind === "band") s.select(mode.before);
      mode = { kind: "idle" };
      stopWindowDrag();
      interaction.setState({ snap: null });
      if (wasGesture) s.cancelGesture();
      return true;
    }
    if (s.tool.kind !== "select") {
      s.setTool({ kind: "select" });
      interaction.setState({ snap: null, hover: null });
      return true;
    }
    return false;
  }

  function finishPolygon() {
    const s = ed();
    const tool = s.tool;
    if (tool.kind !== "body" || tool.shape !== "polygon") return;
    // the tool first: what is said after it is about what was done, and stays
    s.setTool({ kind: "select" });
    if (tool.points.length >= 3) s.apply(bodyCommand(s.sketch, tool.points));
    else s.notify("A body needs at least three corners.");
  }

  /** Pointer moving over the canvas with no button: hover and snap preview for tools. */
  function hover(e: PointerEvent) {
    if (mode.kind !== "idle") return;
    const world = worldOf(screenOf(e));
    const tool = ed().tool;
    if (tool.kind === "select") {
      if (interaction.getState().hover) interaction.setState({ hover: null, snap: null });
      return;
    }
    // the underlay's marks are features of the image: never snapped
    if (tool.kind === "calibrate") return interaction.setState({ hover: world, snap: null });
    // a support or a port catches on an outline as far out as a click would place it there
    const r = snap(world, e, undefined, tool.kind === "place" && placedAtOutline(tool.element) ? OUTLINE_REACH_PX / ed().view.scale : tolerance());
    interaction.setState({ hover: r.point, snap: r.kind === "none" || r.kind === "grid" ? null : r });
  }

  /**
   * A tray item dropped on the canvas at a client point. A load is placed on the body there (or
   * the nearest), a support or a port as a click places it (on or near an outline, else refused);
   * a rectangle body of the default size is placed centred on the drop point (moved in to lie
   * wholly in view), selected, as one undo step. A polygon body starts the polygon tool with its
   * first corner at the drop point: a polygon is whatever shape the user has in mind, so the drop
   * is taken as the first click, and the next clicks give the other corners.
   */
  function drop(what: TrayDrop, e: { clientX: number; clientY: number; altKey: boolean }) {
    const s = ed();
    if (s.readOnly) return;
    const world = worldOf(screenOf(e));
    if (what.kind === "body" && what.polygon) {
      // the status line's hint follows the tool: it says the first corner is down
      s.setTool({ kind: "body", shape: "polygon", points: [snap(world, e).point] });
      return;
    }
    if (what.kind === "body") {
      const { centre, size } = bodyAround(world, e);
      if (!s.apply(bodyCommand(s.sketch, rectangleAround(centre, size)))) return;
      s.setTool({ kind: "select" });
      s.notify(`Body added, ${size[0]} m × ${size[1]} m. Drag its corners to reshape it.`);
      return;
    }
    const out = place(what.kind, world, e, { friction: what.friction });
    if (!out.ok) return s.notify(out.message);
    if (s.apply(out.command)) s.setTool({ kind: "select" });
  }

  function leave() {
    if (mode.kind === "idle") interaction.setState({ hover: null, snap: null });
  }

  function wheel(e: WheelEvent) {
    e.preventDefault();
    const s = ed();
    const at = screenOf(e);
    // a trackpad pinch arrives as a wheel event with ctrlKey
    const k = e.ctrlKey ? 0.01 : 0.0016;
    const factor = Math.exp(-e.deltaY * k * (e.deltaMode === 1 ? 16 : 1));
    s.setView(zoomAt(s.view, factor, at));
  }

  function dispose() {
    stopToolWatch();
    stopWindowDrag();
    stopTouchWatch();
    touches.clear();
  }

  return { down, hover, leave, wheel, drop, cancel, finishPolygon, dispose, get mode() { return mode.kind; } };
}

export type PointerController = ReturnType<typeof createPointerController>;
