// Every element's primitives in content pixels (world × scale, y down), and the result's drawing
// with its labels kept off the elements' texts: what the SVG renderer, the canvas's results layer
// and the fit to view all measure and draw.
import type { SolveResult } from "@/solver/types";
import type { UnitSystem } from "@/solver/units";
import type { Scene } from "../scene";
import { translate, type Prim } from "./prims";
import { resultPrims, supportStates } from "./results";
import { anchorWorld, bodyPrims, cgPrims, groundSideOf, itemPrims } from "./symbols";

// An element's primitives depend only on its scene object (which the editor replaces when it
// changes), its body's (a pin or fixed support faces away from the body's edge), the zoom, the
// units and its drawn state: kept per object, so redrawing the result on every move of a drag does
// not rebuild every support's and port's symbol.
type Entry = { deps: readonly unknown[]; prims: Prim[]; texts: Prim[] };
const primsCache = new WeakMap<object, Entry>();
function cachedPrims(owner: object, deps: readonly unknown[], make: () => Prim[]): Entry {
  const hit = primsCache.get(owner);
  if (hit && hit.deps.length === deps.length && hit.deps.every((d, i) => d === deps[i])) return hit;
  const prims = make();
  const entry = { deps, prims, texts: prims.filter((p) => p.t === "text") };
  primsCache.set(owner, entry);
  return entry;
}

/** Every element's primitives in content pixels, keyed for the SVG's groups. */
export function scenePrims(scene: Scene, scale: number, units: UnitSystem, result: SolveResult | null, stale = false) {
  const states = result ? supportStates(result) : null;
  const groups: Array<{ id: string; kind: string; prims: Prim[] }> = [];
  // the elements' texts, which the result's labels keep off
  const obstacles: Prim[] = [];
  for (const b of scene.bodies) {
    const { prims, texts } = cachedPrims(b, [scale, units], () => {
      const out = bodyPrims(b, { units, scale });
      if (Number.isFinite(b.cg[0])) out.push(...translate(cgPrims(), [b.cg[0] * scale, -b.cg[1] * scale]));
      return out;
    });
    groups.push({ id: b.id, kind: "body", prims });
    for (const t of texts) obstacles.push(t);
  }
  for (const item of scene.items) {
    const a = anchorWorld(item);
    if (!Number.isFinite(a[0]) || !Number.isFinite(a[1])) continue;
    const found = scene.byId.get(item.body);
    const body = found?.kind === "body" ? found : undefined;
    const state = states?.get(item.id);
    const { prims, texts } = cachedPrims(item, [scale, units, state, body], () =>
      translate(itemPrims(item, { units, scale, groundSide: groundSideOf(item, body), state }), [a[0] * scale, -a[1] * scale]),
    );
    groups.push({ id: item.id, kind: item.kind, prims });
    for (const t of texts) obstacles.push(t);
  }
  const drawing = result && states ? resultPrims(scene, result, { units, scale, stale, obstacles, states }) : null;
  return { groups, results: drawing?.prims ?? [] };
}
