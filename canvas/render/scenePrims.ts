// Every element's primitives in content pixels (world × scale, y down), and the result's drawing
// with its labels kept off the elements' texts: what the SVG renderer, the canvas's results layer
// and the fit to view all measure and draw.
import type { SolveResult } from "@/solver/types";
import type { UnitSystem } from "@/solver/units";
import type { Scene } from "../scene";
import { isFinitePoint } from "../geometry/polygon";
import { placeElementLabels, shiftTexts, type Box, type LabelShifts } from "./labels";
import { translate, type Prim, type Pt } from "./prims";
import { drawingFamily, resultPrims, supportStates, type ResultOptions } from "./results";
import { anchorWorld, bodyPrims, cgMarkBox, cgPrims, groundSideOf, itemPrims, portKeepOutKey, standInPoint, unplacedPrims, type DrawState } from "./symbols";

// An element's primitives depend only on its scene object (which the editor replaces when it
// changes), its body's (a pin or fixed support faces away from the body's edge), the zoom, the
// units and its drawn state: kept per object, so redrawing the result on every move of a drag does
// not rebuild every support's and port's symbol.
type Entry = { deps: readonly unknown[]; prims: Prim[] };
const primsCache = new WeakMap<object, Entry>();
function cachedPrims(owner: object, deps: readonly unknown[], make: () => Prim[]): Entry {
  const hit = primsCache.get(owner);
  if (hit && hit.deps.length === deps.length && hit.deps.every((d, i) => d === deps[i])) return hit;
  const prims = make();
  const entry = { deps, prims };
  primsCache.set(owner, entry);
  return entry;
}

/** An element's primitives; `anchor`: its point in content pixels, which its labels stay beside;
 *  `marks`: what no label may cover (a body's centre of gravity). */
type Group = { id: string; kind: string; prims: Prim[]; anchor?: Pt; marks?: readonly Box[] };

/** Every element's primitives in content pixels as its symbol draws them (names not yet moved). */
export function elementGroups(scene: Scene, scale: number, units: UnitSystem, states: ReadonlyMap<string, DrawState> | null, family?: ResultOptions["family"]): Group[] {
  const groups: Group[] = [];
  for (const b of scene.bodies) {
    // the name keeps clear of the body's ports; the key changes only when a port of this body moves
    const keepOutKey = portKeepOutKey(scene.items, b.id, scale);
    const { prims } = cachedPrims(b, [scale, units, keepOutKey], () => {
      const out = bodyPrims(b, { units, scale, keepOut: JSON.parse(keepOutKey) as Box[] });
      if (Number.isFinite(b.cg[0])) out.push(...translate(cgPrims(), [b.cg[0] * scale, -b.cg[1] * scale]));
      return out;
    });
    const cg: Pt = [b.cg[0] * scale, -b.cg[1] * scale];
    groups.push({ id: b.id, kind: "body", prims, marks: Number.isFinite(cg[0]) && Number.isFinite(cg[1]) ? [cgMarkBox(cg)] : undefined });
  }
  for (const item of scene.items) {
    const found = scene.byId.get(item.body);
    const body = found?.kind === "body" ? found : undefined;
    const a = anchorWorld(item);
    if (!isFinitePoint(a)) {
      const at = standInPoint(body);
      const { prims } = cachedPrims(item, [scale, units, body], () => translate(unplacedPrims(item, { units, scale }), [at[0] * scale, -at[1] * scale]));
      groups.push({ id: item.id, kind: item.kind, prims });
      continue;
    }
    const state = states?.get(item.id);
    // a given force or couple is written in the drawing's unit, as the reactions beside it are
    const fam = item.kind === "force" || item.kind === "couple" ? family : undefined;
    const { prims } = cachedPrims(item, [scale, units, state, body, fam?.force, fam?.moment], () =>
      translate(itemPrims(item, { units, scale, groundSide: groundSideOf(item, body), state, family: fam }), [a[0] * scale, -a[1] * scale]),
    );
    groups.push({ id: item.id, kind: item.kind, prims, anchor: [a[0] * scale, -a[1] * scale] });
  }
  return groups;
}

// What the result's labels keep off: the strokes of the bodies, supports, ports and given loads
// (a reaction's value written across a wind load's arrows reads as neither). The canvas places them
// again with the loads where they are when a result arrives, and once a drag has ended.
const UNDER_RESULTS = new Set(["body", "pin", "roller", "contact", "fixed", "tie", "inlet", "outlet", "force", "couple", "distributed", "massSource"]);

/**
 * The result's drawing, its labels placed (they come first: the elements' labels make way); its
 * figures in one unit (`family`, by default the drawing's own: `drawingFamily`).
 */
export function resultLayer(groups: readonly Group[], scene: Scene, scale: number, units: UnitSystem, result: SolveResult, states: Map<string, DrawState>, stale = false, frame?: Box, family?: ResultOptions["family"]) {
  // the bodies' names (and texts that are part of a symbol) stay; the supports' and ports' labels make way
  const under = groups.filter((g) => UNDER_RESULTS.has(g.kind)).flatMap((g) => (g.kind === "body" ? g.prims : g.prims.filter((p) => p.t !== "text" || p.pinned)));
  return resultPrims(scene, result, { units, scale, stale, under, states, frame, family: family ?? drawingFamily(result, units, scene.items) }).prims;
}

/**
 * Every element's primitives in content pixels, keyed for the SVG's groups, with crowded labels
 * moved (`shifts` as the canvas placed them for the whole sketch, or placed here), and the
 * result's drawing; the shifts used come back too.
 */
export function scenePrims(scene: Scene, scale: number, units: UnitSystem, result: SolveResult | null, stale = false, shifts?: LabelShifts, family?: ResultOptions["family"]) {
  const states = result ? supportStates(result, scene.items) : null;
  const fam = family ?? drawingFamily(result, units, scene.items);
  const drawn = elementGroups(scene, scale, units, states, fam);
  const results = result && states ? resultLayer(drawn, scene, scale, units, result, states, stale, undefined, fam) : [];
  const moves = shifts ?? placeElementLabels(drawn, results);
  const groups = drawn.map((g) => (moves.has(g.id) ? { ...g, prims: shiftTexts(g.prims, moves.get(g.id)) } : g));
  return { groups, results, shifts: moves };
}
