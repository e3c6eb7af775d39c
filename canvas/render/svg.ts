// The one pure renderer of a sketch and its result as SVG text: no Konva, no DOM, so it runs in
// the browser (PNG/SVG export) and on the server (comparison view, calc sheet) alike.
import { parseSketch } from "@/solver/parse";
import type { SketchFile, SketchFileInput } from "@/solver/schema";
import type { SolveResult } from "@/solver/types";
import type { UnitSystem } from "@/solver/units";
import { buildScene, fieldValuesById, pointsOf, type Scene } from "../scene";
import { boxOf } from "../geometry/polygon";
import { resultPrims, supportStates } from "./results";
import { anchorWorld, bodyPrims, cgPrims, groundSideOf, itemPrims } from "./symbols";
import { primsBox, translate, type Prim } from "./prims";
import { FONT_STACK, INK_FAINT, PAPER, PAPER_CARD } from "./palette";

export interface SvgOptions {
  units?: UnitSystem;
  /** size of the drawing in pixels (the view is fitted inside) */
  width?: number;
  height?: number;
  /** draw the result faded, as an earlier sketch's */
  stale?: boolean;
  /** paper background (default) or transparent */
  background?: "paper" | "none";
  /** a line of text under the drawing (e.g. the status sentence) */
  caption?: string;
  /** the legend of line styles under the drawing (default true when a result is drawn) */
  legend?: boolean;
  /**
   * fit this world box (m) instead of the sketch's own, centred on it: two drawings given the
   * same box share scale and origin, so they can be laid over each other
   */
  world?: WorldBox;
}

export type WorldBox = { minX: number; minY: number; maxX: number; maxY: number };

const esc = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
const n = (x: number) => (Math.round(x * 100) / 100).toString();

/** One primitive as an SVG element. */
export function primToSvg(p: Prim): string {
  const op = p.opacity !== undefined && p.opacity < 1 ? ` opacity="${n(p.opacity)}"` : "";
  if (p.t === "text") {
    const anchor = p.align === "center" ? "middle" : p.align === "right" ? "end" : "start";
    const base = p.baseline === "top" ? "hanging" : p.baseline === "bottom" ? "text-after-edge" : "central";
    const halo = p.halo ? ` stroke="${PAPER_CARD}" stroke-width="3" paint-order="stroke" stroke-linejoin="round"` : "";
    const style = `${p.weight ? ` font-weight="${p.weight}"` : ""}${p.italic ? ` font-style="italic"` : ""}`;
    return `<text x="${n(p.at[0])}" y="${n(p.at[1])}" font-size="${n(p.size)}" fill="${p.color}" text-anchor="${anchor}" dominant-baseline="${base}"${style}${halo}${op}>${esc(p.text)}</text>`;
  }
  const stroke = p.stroke ? ` stroke="${p.stroke}" stroke-width="${n(p.width ?? 1)}"` : "";
  const fill = ` fill="${p.fill ?? "none"}"`;
  const dash = p.dash ? ` stroke-dasharray="${p.dash.join(" ")}"` : "";
  if (p.t === "circle") return `<circle cx="${n(p.c[0])}" cy="${n(p.c[1])}" r="${n(p.r)}"${fill}${stroke}${dash}${op}/>`;
  const d = p.pts.map((q, i) => `${i ? "L" : "M"}${n(q[0])} ${n(q[1])}`).join("") + (p.closed ? "Z" : "");
  return `<path d="${d}"${fill}${stroke}${dash} stroke-linejoin="round" stroke-linecap="round"${op}/>`;
}

export function primsToSvg(prims: Prim[]): string {
  return prims.map(primToSvg).join("");
}

// An element's primitives depend only on its scene object (which the editor replaces when it
// changes), the zoom, the units and its drawn state: kept per object, so redrawing the result on
// every move of a drag does not rebuild every support's and port's symbol.
const primsCache = new WeakMap<object, { key: string; prims: Prim[]; texts: Prim[] }>();
function cachedPrims(owner: object, key: string, make: () => Prim[]): { prims: Prim[]; texts: Prim[] } {
  const hit = primsCache.get(owner);
  if (hit && hit.key === key) return hit;
  const prims = make();
  const entry = { key, prims, texts: prims.filter((p) => p.t === "text") };
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
    const { prims, texts } = cachedPrims(b, `${scale}|${units}`, () => {
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
    const body = scene.byId.get(item.body);
    const groundSide = groundSideOf(item, body?.kind === "body" ? body : undefined);
    const state = states?.get(item.id);
    const { prims, texts } = cachedPrims(item, `${scale}|${units}|${groundSide}|${state ?? ""}`, () =>
      translate(itemPrims(item, { units, scale, groundSide, state }), [a[0] * scale, -a[1] * scale]),
    );
    groups.push({ id: item.id, kind: item.kind, prims });
    for (const t of texts) obstacles.push(t);
  }
  const drawing = result ? resultPrims(scene, result, { units, scale, stale, obstacles }) : null;
  return { groups, results: drawing?.prims ?? [] };
}

function sceneOf(file: SketchFile | SketchFileInput) {
  const parsed = parseSketch(file);
  const doc = ("file" in parsed && parsed.ok ? parsed.file : file) as SketchFile;
  const structural = parsed.ok || Object.keys(parsed.fields).length > 0;
  const scene = structural ? buildScene(doc, fieldValuesById(doc, parsed.fields, parsed.ok ? [] : parsed.errors)) : null;
  return { parsed, doc, scene };
}

const worldOf = (scene: Scene): WorldBox => boxOf(scene.bodies.flatMap((b) => b.outline).concat(scene.items.flatMap(pointsOf)));

/** The box (m) around every body and element of the given sketches: a shared frame for an overlay. */
export function sketchWorldBox(...files: Array<SketchFile | SketchFileInput>): WorldBox | undefined {
  const boxes = files.map((f) => sceneOf(f).scene).filter((s): s is Scene => s !== null).map(worldOf).filter((b) => Number.isFinite(b.minX));
  if (!boxes.length) return undefined;
  return {
    minX: Math.min(...boxes.map((b) => b.minX)),
    minY: Math.min(...boxes.map((b) => b.minY)),
    maxX: Math.max(...boxes.map((b) => b.maxX)),
    maxY: Math.max(...boxes.map((b) => b.maxY)),
  };
}

/**
 * Render a sketch file (numbers or expressions, any supported format version) and optionally
 * its solve result as a standalone SVG document.
 */
export function renderSketchSvg(file: SketchFile | SketchFileInput, result: SolveResult | null = null, opts: SvgOptions = {}): string {
  const units = opts.units ?? "SI";
  const width = opts.width ?? 960;
  const height = opts.height ?? 640;
  const { parsed, doc, scene } = sceneOf(file);
  const bg = opts.background === "none" ? "" : `<rect width="100%" height="100%" fill="${PAPER}"/>`;
  const head = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" font-family="${FONT_STACK}">`;
  const title = `<title>${esc(doc.title || "Counterpoise sketch")}</title>`;
  if (!scene) {
    const msg = parsed.ok ? "" : parsed.errors.map((e) => `${e.path || "file"}: ${e.message}`).join("; ");
    return `${head}${title}${bg}<text x="24" y="40" font-size="14" fill="${INK_FAINT}">This sketch cannot be drawn: ${esc(msg)}</text></svg>`;
  }
  const footer = (opts.caption ? 22 : 0) + ((opts.legend ?? !!result) ? 22 : 0);

  // fit: world box → pixels, leaving room for symbols and labels that do not scale
  const world = opts.world ?? worldOf(scene);
  const pad = 96;
  const w = Math.max(world.maxX - world.minX, 0.2);
  const h = Math.max(world.maxY - world.minY, 0.2);
  const scale = Number.isFinite(w) ? Math.min((width - 2 * pad) / w, (height - footer - 2 * pad) / h) : 100;
  const { groups, results } = scenePrims(scene, scale, units, result, opts.stale);
  // centre what is actually drawn (labels included), or the shared world box
  let dx: number;
  let dy: number;
  if (opts.world && Number.isFinite(w)) {
    dx = width / 2 - ((world.minX + world.maxX) / 2) * scale;
    dy = (height - footer) / 2 + ((world.minY + world.maxY) / 2) * scale;
  } else {
    const box = primsBox([...groups.flatMap((g) => g.prims), ...results]);
    dx = Number.isFinite(box.minX) ? (width - (box.maxX - box.minX)) / 2 - box.minX : width / 2;
    dy = Number.isFinite(box.minY) ? (height - footer - (box.maxY - box.minY)) / 2 - box.minY : height / 2;
  }

  const body = groups.map((g) => `<g data-id="${esc(g.id)}" data-kind="${g.kind}">${primsToSvg(g.prims)}</g>`).join("");
  const res = results.length ? `<g class="results">${primsToSvg(results)}</g>` : "";
  let foot = "";
  let y = height - footer + 14;
  if (opts.caption) {
    foot += `<text x="16" y="${y}" font-size="13" font-weight="600" fill="#1d2329">${esc(opts.caption)}</text>`;
    y += 22;
  }
  if (opts.legend ?? !!result) {
    foot += `<text x="16" y="${y}" font-size="11" fill="${INK_FAINT}">Solid arrows: given loads and weight · double lines: reactions found (on the body) · dashed: momentum flux ṁV · ${units === "SI" ? "SI units" : "US customary units"}</text>`;
  }
  return `${head}${title}${bg}<g transform="translate(${n(dx)} ${n(dy)})">${body}${res}</g>${foot}</svg>`;
}
