"use client";
// The interaction layer: handles of the selection (turn, reshape), the snap target, the rubber
// band, a body being drawn and a preview of what a click will place. Results get their own layer.
import { memo, useEffect, useMemo, useRef } from "react";
import type Konva from "konva";
import { Circle, Group, Line, Rect, Shape, Text } from "react-konva";
import { useStore } from "zustand";
import type { Vec2 } from "@/solver/types";
import { useEditor, useScene, useStores } from "../context";
import { DIRECTED, GROUP_OF } from "../model/elements";
import { roundTo } from "../model/numeric";
import { elementGroups, resultLayer } from "../render/scenePrims";
import { drawingFamily, supportStates } from "../render/results";
import { itemPrims } from "../render/symbols";
import type { Prim } from "../render/prims";
import { handleAlong, handleWords, placeHandle } from "../render/handles";
import { ACCENT, CAUTION, INK_FAINT, PAPER_CARD } from "../render/palette";
import { angleOnEdge, bodyAt, OUTLINE_REACH_PX, outlineSpot, placedAtOutline } from "../placement";
import { anchorOf, type Scene, type SceneBody, type SceneItem } from "../scene";
import { drawingFrame } from "../geometry/fit";
import { drawPrims } from "./drawPrims";
import { canvasFont } from "./font";
import type { InteractionStore } from "./interaction";
import { shiftBox } from "../render/labels";
import { momentPointPrims } from "../render/momentPoint";
import { NOTE_GAP, noteWidth, pointerNotePlace } from "../render/pointerNote";
import { toScreen } from "../geometry/view";

const px = (p: Vec2, s: number): [number, number] => [p[0] * s, -p[1] * s];
export { ROTATE_HANDLE_PX, handlePlace } from "../render/handles";

const DRAWN_WITH_RESULTS = new Set(["pin", "roller", "contact", "fixed", "tie", "inlet", "outlet"]);
/** What the result's labels keep off but is not drawn with it: a drag of one waits for its result. */
const KEPT_OFF = new Set(["force", "couple", "distributed", "massSource"]);

/**
 * The results layer's one shape. It follows the stores itself rather than through React props: a
 * new result (from the worker, between frames) is drawn at once in that task, so the frames that
 * answer the pointer only draw what the pointer moved.
 */
export function ResultsShape({ interaction }: { interaction: InteractionStore }) {
  const stores = useStores();
  const shapeRef = useRef<Konva.Shape>(null);
  const primsRef = useRef<Prim[]>([]);
  useEffect(() => {
    let last: unknown[] = [];
    let lastKept: unknown[] = [];
    const same = (a: unknown[], b: unknown[]) => a.length === b.length && a.every((k, i) => k === b[i]);
    const redraw = (now: boolean) => {
      const a = stores.analysis.getState();
      const e = stores.editor.getState();
      const sc = stores.scene.getState();
      // what the results are drawn at: dragging a load changes none of these until its result arrives
      const parts = [...sc.bodies, ...sc.items.filter((i) => DRAWN_WITH_RESULTS.has(i.kind))];
      // the loads the labels keep off: followed at rest, caught up with by the next result in a drag
      const kept = sc.items.filter((i) => KEPT_OFF.has(i.kind));
      // held while a pan lasts: the labels keep inside the drawing area where it ends
      if (interaction.getState().panning) return;
      const key: unknown[] = [a.shown, a.stale, e.view.scale, e.units, e.view.x, e.view.y, e.viewport, e.momentPoint, sc.legendRows, ...parts];
      if (same(key, last) && (same(kept, lastKept) || interaction.getState().dragging)) return;
      last = key;
      lastKept = kept;
      const all = [...parts, ...kept];
      const scene: Scene = {
        bodies: parts.filter((p): p is SceneBody => p.kind === "body"),
        items: all.filter((p): p is SceneItem => p.kind !== "body"),
        byId: new Map(all.map((p) => [p.id, p])),
      };
      // the supports' and ports' own labels are drawn (and moved off these) by their nodes; only the
      // result's layer is drawn here, over their symbols
      const states = a.shown ? supportStates(a.shown, a.shownSketch?.supports) : null;
      const family = drawingFamily(a.shown, e.units, scene.items, a.shownStability);
      const groups = a.shown || e.momentPoint ? elementGroups(scene, e.view.scale, e.units, states, family) : [];
      const found = a.shown && states ? resultLayer(groups, scene, e.view.scale, e.units, a.shown, states, a.stale, drawingFrame(e.view, e.viewport, sc.legendRows), family) : [];
      // the hand check's P, its words clear of the result's and the elements' own
      primsRef.current = e.momentPoint ? [...found, ...momentPointPrims(px(e.momentPoint, e.view.scale), [...found, ...groups.flatMap((g) => g.prims)])] : found;
      const layer = shapeRef.current?.getLayer();
      if (!layer) return;
      if (now) layer.draw();
      else layer.batchDraw();
    };
    const stops = [
      stores.analysis.subscribe(() => redraw(true)),
      stores.scene.subscribe(() => redraw(false)),
      stores.editor.subscribe((s, p) => {
        if (s.view !== p.view || s.units !== p.units || s.viewport !== p.viewport || s.momentPoint !== p.momentPoint) redraw(false);
      }),
      interaction.subscribe((s, p) => {
        if ((!s.dragging && p.dragging) || (!s.panning && p.panning)) redraw(false);
      }),
    ];
    redraw(false);
    return () => stops.forEach((stop) => stop());
  }, [stores, interaction]);
  return <Shape ref={shapeRef} sceneFunc={(ctx) => drawPrims(ctx._context, primsRef.current, canvasFont())} listening={false} perfectDrawEnabled={false} />;
}

export const SelectionHandles = memo(function SelectionHandles() {
  const only = useEditor((s) => (s.selection.length === 1 ? s.selection[0] : null));
  const el = useScene((s) => (only ? s.byId.get(only) : undefined));
  const scale = useEditor((s) => s.view.scale);
  const units = useEditor((s) => s.units);
  const tool = useEditor((s) => s.tool.kind);
  const view = useEditor((s) => s.view);
  const viewport = useEditor((s) => s.viewport);
  const legendRows = useScene((s) => s.legendRows);
  const directed = el && el.kind !== "body" && DIRECTED.has(el.kind) && "angle" in el ? (el as SceneItem & { angle: number }) : null;
  // the element's words are measured once per change of the element, the scale or the units (not
  // per pan frame); the handle's place among them follows the view
  const words = useMemo(() => (directed ? handleWords(directed, scale, units) : null), [directed, scale, units]);
  const place = useMemo(() => {
    if (!directed || !words) return null;
    const along = handleAlong(directed);
    const frame = drawingFrame(view, viewport, legendRows);
    return { along, ...placeHandle(words, along, frame && shiftBox(frame, px(anchorOf(directed), view.scale))) };
  }, [directed, words, view, viewport, legendRows]);
  if (!el || tool !== "select") return null;
  if (el.kind === "body") {
    return (
      <Group>
        {el.outline.map((p, i) => {
          const [x, y] = px(p, scale);
          return (
            <Rect
              key={i}
              x={x - 4.5}
              y={y - 4.5}
              width={9}
              height={9}
              fill={PAPER_CARD}
              stroke={ACCENT}
              strokeWidth={1.5}
              hit={{ type: "corner", id: el.id, index: i }}
              hitStrokeWidth={8}
            />
          );
        })}
      </Group>
    );
  }
  if (!place) return null;
  const item = el as SceneItem & { angle: number };
  const a = px(anchorOf(item), scale);
  // no handle to turn by while the angle (or the anchor) is an expression in error: nothing to draw it from
  if (![item.angle, a[0], a[1]].every(Number.isFinite)) return null;
  const { along } = place;
  const t = place.distance;
  const h: [number, number] = [a[0] + along[0] * t, a[1] + along[1] * t];
  return (
    <Group>
      <Line points={[a[0], a[1], h[0], h[1]]} stroke={ACCENT} strokeWidth={1} dash={[3, 3]} listening={false} />
      <Circle x={h[0]} y={h[1]} radius={6.5} fill={PAPER_CARD} stroke={ACCENT} strokeWidth={1.8} hit={{ type: "rotate", id: item.id }} hitStrokeWidth={10} />
      <Text x={h[0] + place.readout[0]} y={h[1] + place.readout[1]} text={`${roundTo(item.angle, 0.1)}°`} fontSize={10.5} fill={ACCENT} fontFamily={canvasFont()} listening={false} />
    </Group>
  );
});

/**
 * A note beside the pointer at world point `at`, drawn in a group already placed there: right of
 * and below the pointer, or flipped to its other side where the canvas's edge would cut it off.
 */
function PointerNote({ at, text, fontSize, fill, gap = NOTE_GAP }: { at: Vec2; text: string; fontSize: number; fill: string; gap?: Vec2 }) {
  const view = useEditor((s) => s.view);
  const viewport = useEditor((s) => s.viewport);
  const size = { width: noteWidth(text, fontSize), height: fontSize * 1.25 };
  const [dx, dy] = pointerNotePlace(toScreen(view, at), size, viewport, gap);
  // on a light ground, so it reads over the drawing's own words
  return (
    <Group x={dx} y={dy}>
      <Rect x={-2} y={-2} width={size.width + 4} height={size.height + 2} fill={PAPER_CARD} opacity={0.85} cornerRadius={2} />
      <Text text={text} fontSize={fontSize} fill={fill} fontFamily={canvasFont()} name="pointer-note" />
    </Group>
  );
}

export const PointerOverlay = memo(function PointerOverlay({ interaction }: { interaction: InteractionStore }) {
  const snap = useStore(interaction, (s) => s.snap);
  const band = useStore(interaction, (s) => s.band);
  const rect = useStore(interaction, (s) => s.rect);
  const hover = useStore(interaction, (s) => s.hover);
  const scale = useEditor((s) => s.view.scale);
  const tool = useEditor((s) => s.tool);
  const units = useEditor((s) => s.units);
  const { scene } = useStores();
  // what a click would place, where it would go: a support or a port onto the outline it is near,
  // or nowhere (`at` null) when it is near none
  const ghost = useMemo(() => {
    if (tool.kind !== "place" || !hover) return null;
    const bodies = scene.getState().bodies;
    const tol = 9 / scale;
    let body = bodyAt(bodies, hover, tol);
    let at: Vec2 = hover;
    if (placedAtOutline(tool.element)) {
      const spot = outlineSpot(bodies, hover, OUTLINE_REACH_PX / scale, tol, hover, GROUP_OF[tool.element] === "ports");
      if (!spot) return { at: null, prims: [] };
      body = spot.body;
      at = spot.at;
    }
    const angle = angleOnEdge(tool.element, body, at, tol) ?? 0;
    const fake = { id: "", body: body?.id ?? "", kind: tool.element, at, angle, magnitude: 1000, value: 500, from: [at[0] - 0.5, at[1]], to: [at[0] + 0.5, at[1]], w1: 2000, w2: 2000, massFlow: 10, velocity: 5, pressure: 0, ...(tool.friction ? { mu: 0.3 } : {}) } as unknown as SceneItem;
    return { at, prims: itemPrims(fake, { units, scale, color: ACCENT, showName: false }).map((p) => ({ ...p, opacity: 0.55 })) };
  }, [tool, hover, scale, units, scene]);

  return (
    <Group listening={false}>
      {snap && snap.kind !== "none" && snap.kind !== "grid" && (
        <Group x={snap.point[0] * scale} y={-snap.point[1] * scale}>
          <Rect x={-5} y={-5} width={10} height={10} rotation={snap.kind === "corner" ? 45 : 0} offsetX={0} stroke={ACCENT} strokeWidth={1.4} />
          <PointerNote at={snap.point} text={snap.kind === "corner" ? "corner" : "on edge"} fontSize={10} fill={ACCENT} gap={[8, 6]} />
        </Group>
      )}
      {band && (
        <Rect
          x={band.minX * scale}
          y={-band.maxY * scale}
          width={(band.maxX - band.minX) * scale}
          height={(band.maxY - band.minY) * scale}
          stroke={ACCENT}
          dash={[4, 3]}
          strokeWidth={1}
          fill="rgba(180,70,43,0.05)"
        />
      )}
      {rect && (
        <Rect
          x={Math.min(rect[0][0], rect[1][0]) * scale}
          y={-Math.max(rect[0][1], rect[1][1]) * scale}
          width={Math.abs(rect[1][0] - rect[0][0]) * scale}
          height={Math.abs(rect[1][1] - rect[0][1]) * scale}
          stroke={ACCENT}
          strokeWidth={1.5}
          dash={[6, 4]}
          fill="rgba(230,223,208,0.6)"
        />
      )}
      {tool.kind === "body" && tool.shape === "polygon" && tool.points.length > 0 && (
        <Group>
          <Line points={[...tool.points, ...(hover ? [hover] : [])].flatMap((p) => px(p, scale))} stroke={ACCENT} strokeWidth={1.5} dash={[6, 4]} />
          {tool.points.map((p, i) => (
            <Circle key={i} x={p[0] * scale} y={-p[1] * scale} radius={i === 0 ? 6 : 3.5} stroke={ACCENT} strokeWidth={1.4} fill={PAPER_CARD} />
          ))}
        </Group>
      )}
      {ghost?.at && (
        <Group x={ghost.at[0] * scale} y={-ghost.at[1] * scale}>
          <Shape sceneFunc={(ctx) => drawPrims(ctx._context, ghost.prims, canvasFont())} />
        </Group>
      )}
      {ghost && !ghost.at && hover && (
        <Group x={hover[0] * scale} y={-hover[1] * scale}>
          <PointerNote at={hover} text="not on a body: move onto or near its outline" fontSize={10.5} fill={CAUTION} />
        </Group>
      )}
      {tool.kind === "pick-point" && hover && (
        <Group x={hover[0] * scale} y={-hover[1] * scale}>
          <Circle radius={7} stroke={CAUTION} strokeWidth={1.5} />
          <PointerNote at={hover} text="click: take moments about this point" fontSize={10.5} fill={INK_FAINT} />
        </Group>
      )}
    </Group>
  );
});
