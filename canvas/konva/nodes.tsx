"use client";
// The drawing layer's nodes: one per element, each re-rendered only when its own scene object,
// selection, state, zoom or units change. Symbols come from the shared primitives.
import { memo, useMemo } from "react";
import { Group, Shape } from "react-konva";
import type Konva from "konva";
import type { SolveResult } from "@/solver/types";
import type { UnitSystem } from "@/solver/units";
import { useAnalysis, useScene, useStores } from "../context";
import type { SceneBody, SceneItem } from "../scene";
import { bodyPrims, cgPrims, groundSideOf, itemPrims, anchorWorld, portKeepOutKey, standInPoint, unplacedPrims, type Box, type DrawState } from "../render/symbols";
import { isFinitePoint } from "../geometry/polygon";
import { drawingFamily, supportStates } from "../render/results";
import type { SlideSupport } from "../render/tipSlide";
import { primsBox, type Prim } from "../render/prims";
import { shiftTexts, type TextMove } from "../render/labels";
import { ACCENT, BODY_FILL, INK } from "../render/palette";
import { drawPrims } from "./drawPrims";
import { canvasFont } from "./font";

const NO_STATES: ReadonlyMap<string, DrawState> = new Map();
const statesCache = new WeakMap<SolveResult, ReadonlyMap<string, DrawState>>();
let lastStates: ReadonlyMap<string, DrawState> = NO_STATES;
const sameStates = (a: ReadonlyMap<string, DrawState>, b: ReadonlyMap<string, DrawState>) => a.size === b.size && [...a].every(([k, v]) => b.get(k) === v);
/**
 * The drawing states of a result's supports (cached per result). A new result whose states are
 * all as before gives back the same map, so a drag that changes no state re-renders no node.
 */
type Family = { force: string; moment: string };
/**
 * The drawing's force and moment units (`drawingFamily`), one object while they stay the same, so
 * the nodes of given loads redraw only when the unit changes. Read when the result changes: every
 * edit of the scene is solved again, so the result follows the loads.
 */
export function useDrawingFamily(units: UnitSystem): Family {
  const scene = useStores().scene;
  const key = useAnalysis((s) => {
    const f = drawingFamily(s.shown, units, scene.getState().items, s.shownStability);
    return `${f.force}|${f.moment}`;
  });
  return useMemo(() => {
    const [force, moment] = key.split("|");
    return { force, moment };
  }, [key]);
}

export function statesOf(result: SolveResult | null, supports?: readonly SlideSupport[]): ReadonlyMap<string, DrawState> {
  if (!result) return NO_STATES;
  let m = statesCache.get(result);
  if (!m) {
    // the supports come with the result (the sketch it was solved from), so one map a result holds
    m = supportStates(result, supports);
    if (sameStates(m, lastStates)) m = lastStates;
    statesCache.set(result, m);
  }
  lastStates = m;
  return m;
}

function sceneFunc(prims: readonly Prim[]) {
  return (ctx: Konva.Context) => drawPrims(ctx._context, prims, canvasFont());
}

function boxHit(prims: readonly Prim[], pad = 4) {
  const shapes = prims.filter((p) => p.t !== "text");
  const b = primsBox(shapes.length ? (shapes as Prim[]) : (prims as Prim[]));
  return (ctx: Konva.Context, shape: Konva.Shape) => {
    if (!Number.isFinite(b.minX)) return;
    ctx.beginPath();
    ctx.rect(b.minX - pad, b.minY - pad, b.maxX - b.minX + 2 * pad, b.maxY - b.minY + 2 * pad);
    ctx.closePath();
    ctx.fillStrokeShape(shape);
  };
}

/** What every node takes from its parent (one subscription there instead of one per node). */
export interface NodeProps {
  id: string;
  selected: boolean;
  scale: number;
  units: UnitSystem;
}

/** A body's fill over an underlay: the drawing shows through, so the trace can be checked. */
const SEE_THROUGH_FILL = "rgba(230,223,208,0.42)";

export const BodyNode = memo(function BodyNode({ id, selected, scale, units, seeThrough, shift }: NodeProps & { seeThrough?: boolean; shift?: readonly TextMove[] }) {
  const body = useScene((s) => s.byId.get(id)) as SceneBody | undefined;
  // where this body's ports draw, which its name keeps clear of (a string: equal while they stay put)
  const keepOutKey = useScene((s) => portKeepOutKey(s.items, id, scale));
  const prims = useMemo(() => {
    const keepOut = JSON.parse(keepOutKey) as Box[];
    const out = body ? bodyPrims(body, { units, scale, color: selected ? ACCENT : INK, keepOut }) : [];
    // a name beside a narrow body may have made way for other labels
    return shiftTexts(seeThrough ? out.map((p) => ("fill" in p && p.fill === BODY_FILL ? { ...p, fill: SEE_THROUGH_FILL } : p)) : out, shift);
  }, [body, units, scale, selected, seeThrough, shift, keepOutKey]);
  if (!body || body.outline.length < 3) return null;
  const pts = body.outline.map((p) => [p[0] * scale, -p[1] * scale]);
  return (
    <Shape
      hit={{ type: "element", id }}
      sceneFunc={sceneFunc(prims)}
      hitFunc={(ctx, shape) => {
        ctx.beginPath();
        pts.forEach((p, i) => (i ? ctx.lineTo(p[0], p[1]) : ctx.moveTo(p[0], p[1])));
        ctx.closePath();
        ctx.fillStrokeShape(shape);
      }}
      perfectDrawEnabled={false}
    />
  );
});

export const CgNode = memo(function CgNode({ id, selected, scale }: NodeProps) {
  const cg = useScene((s) => (s.byId.get(id) as SceneBody | undefined)?.cg);
  const prims = useMemo(() => cgPrims(selected ? ACCENT : INK), [selected]);
  if (!cg || !Number.isFinite(cg[0]) || !Number.isFinite(cg[1])) return null;
  return (
    <Group x={cg[0] * scale} y={-cg[1] * scale} hit={{ type: "cg", id }}>
      <Shape
        sceneFunc={sceneFunc(prims)}
        hitFunc={(ctx, shape) => {
          ctx.beginPath();
          ctx.arc(0, 0, 10, 0, Math.PI * 2);
          ctx.closePath();
          ctx.fillStrokeShape(shape);
        }}
        perfectDrawEnabled={false}
      />
    </Group>
  );
});

export const ItemNode = memo(function ItemNode({ id, selected, scale, units, state, shift, family }: NodeProps & { state?: DrawState; shift?: readonly TextMove[]; family?: Family }) {
  const item = useScene((s) => s.byId.get(id)) as SceneItem | undefined;
  // an element whose position cannot be worked out is marked at its body's centre instead
  const unplaced = !!item && !isFinitePoint(anchorWorld(item));
  const needsBody = item?.kind === "pin" || item?.kind === "fixed" || unplaced;
  const body = useScene((s) => (needsBody && item ? (s.byId.get(item.body) as SceneBody | undefined) : undefined));
  const own = useMemo(() => {
    if (!item) return [];
    const o = { units, scale, color: selected ? ACCENT : INK };
    // a given force or couple in the drawing's unit, as the reactions beside it
    const fam = item.kind === "force" || item.kind === "couple" ? family : undefined;
    return unplaced ? unplacedPrims(item, o) : itemPrims(item, { ...o, groundSide: groundSideOf(item, body), state, family: fam });
  }, [item, unplaced, body, units, scale, selected, state, family]);
  const prims = useMemo(() => shiftTexts(own, shift), [own, shift]);
  // picked by the symbol, not by a leader line out to a moved label
  const hit = useMemo(() => boxHit(own), [own]);
  if (!item) return null;
  const a = unplaced ? standInPoint(body) : anchorWorld(item);
  return (
    <Group x={a[0] * scale} y={-a[1] * scale} hit={{ type: "element", id }}>
      <Shape sceneFunc={sceneFunc(prims)} hitFunc={hit} perfectDrawEnabled={false} />
    </Group>
  );
});
