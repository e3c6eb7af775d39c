// Every element's primitives in content pixels (world × scale, y down), and the result's drawing
// with its labels kept off the elements' texts: what the SVG renderer, the canvas's results layer
// and the fit to view all measure and draw.
import type { SolveResult } from "@/solver/types";
import type { UnitSystem } from "@/solver/units";
import type { Scene } from "../scene";
import { NO_SHIFTS, placeElementNames, shiftTexts, type LabelShifts } from "./declutter";
import { translate, type Prim } from "./prims";
import { resultPrims, supportStates } from "./results";
import { anchorWorld, bodyPrims, cgPrims, groundSideOf, itemPrims, type DrawState } from "./symbols";

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

type Group = { id: string; kind: string; prims: Prim[] };

/** Every element's primitives in content pixels as its symbol draws them (names not yet moved). */
export function elementGroups(scene: Scene, scale: number, units: UnitSystem, states: ReadonlyMap<string, DrawState> | null): Group[] {
  const groups: Group[] = [];
  for (const b of scene.bodies) {
    const { prims } = cachedPrims(b, [scale, units], () => {
      const out = bodyPrims(b, { units, scale });
      if (Number.isFinite(b.cg[0])) out.push(...translate(cgPrims(), [b.cg[0] * scale, -b.cg[1] * scale]));
      return out;
    });
    groups.push({ id: b.id, kind: "body", prims });
  }
  for (const item of scene.items) {
    const a = anchorWorld(item);
    if (!Number.isFinite(a[0]) || !Number.isFinite(a[1])) continue;
    const found = scene.byId.get(item.body);
    const body = found?.kind === "body" ? found : undefined;
    const state = states?.get(item.id);
    const { prims } = cachedPrims(item, [scale, units, state, body], () =>
      translate(itemPrims(item, { units, scale, groundSide: groundSideOf(item, body), state }), [a[0] * scale, -a[1] * scale]),
    );
    groups.push({ id: item.id, kind: item.kind, prims });
  }
  return groups;
}

/**
 * Every element's primitives in content pixels, keyed for the SVG's groups, with crowded names
 * moved (`shifts` as the canvas placed them for the whole sketch, or placed here), and the
 * result's drawing with its labels kept off the elements' texts.
 */
export function scenePrims(scene: Scene, scale: number, units: UnitSystem, result: SolveResult | null, stale = false, shifts?: LabelShifts) {
  const states = result ? supportStates(result) : null;
  const drawn = elementGroups(scene, scale, units, states);
  const moves = shifts ?? placeElementNames(drawn, NO_SHIFTS);
  const groups = drawn.map((g) => (moves.has(g.id) ? { ...g, prims: shiftTexts(g.prims, moves.get(g.id)) } : g));
  // the elements' texts, which the result's labels keep off
  const obstacles: Prim[] = [];
  for (const g of groups) for (const p of g.prims) if (p.t === "text") obstacles.push(p);
  const drawing = result && states ? resultPrims(scene, result, { units, scale, stale, obstacles, states }) : null;
  return { groups, results: drawing?.prims ?? [] };
}
