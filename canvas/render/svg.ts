// The one pure renderer of a sketch and its result as SVG text: no Konva, no DOM, so it runs in
// the browser (PNG/SVG export) and on the server (comparison view, calc sheet) alike.
import { parseSketch } from "@/solver/parse";
import type { SketchFile, SketchFileInput } from "@/solver/schema";
import type { SolveResult } from "@/solver/types";
import type { UnitSystem } from "@/solver/units";
import { buildScene, fieldValuesById, pointsOf, type Scene } from "../scene";
import { boxOf } from "../geometry/polygon";
import { scenePrims } from "./scenePrims";
import { fitScenes } from "../geometry/fit";
import type { View } from "../geometry/view";
import { primsBox, type Prim } from "./prims";
import { gravityNote } from "@/solver/words";
import { FONT_STACK, INK_FAINT, PAPER, PAPER_CARD } from "./palette";

export interface SvgOptions {
  units?: UnitSystem;
  /** size of the drawing in pixels (the view is fitted inside) */
  width?: number;
  height?: number;
  /** a sketch taller than the drawing's shape may make it taller, up to this height, rather than
   *  shrink to fit `height` (a stack or a mast on a wide page); the svg's height says what it took */
  maxHeight?: number;
  /** draw the result faded, as an earlier sketch's */
  stale?: boolean;
  /** every force and moment of the result in these units (a calc sheet's one family); by default
   *  the drawing's own family (`drawingFamily`), so no drawing writes "714.8 N" beside "5.039 kN" */
  family?: { force: string; moment: string };
  /** paper background (default) or transparent */
  background?: "paper" | "none";
  /** a line of text under the drawing (e.g. the status sentence) */
  caption?: string;
  /** a title and lines under it above the drawing (an exported drawing's title and status) */
  heading?: { title: string; lines?: string[] };
  /** a small line at the very bottom (an exported drawing's caution) */
  note?: string;
  /** the legend of line styles under the drawing (default true when a result is drawn) */
  legend?: boolean;
  /**
   * draw at this scale and origin (from `sharedFrame`) instead of fitting the sketch on its own:
   * two drawings given the same frame can be laid over each other
   */
  frame?: View;
  /** write the labels of these elements only, and no result labels (the earlier drawing under an
   *  overlay, whose labels would land on the later one's) */
  onlyLabelsOf?: string[];
}

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

function sceneOf(file: SketchFile | SketchFileInput) {
  const parsed = parseSketch(file);
  const doc = ("file" in parsed && parsed.ok ? parsed.file : file) as SketchFile;
  const structural = parsed.ok || Object.keys(parsed.fields).length > 0;
  const scene = structural ? buildScene(doc, fieldValuesById(doc, parsed.fields, parsed.ok ? [] : parsed.errors)) : null;
  return { parsed, doc, scene };
}

/** The scale that fits a sketch's geometry into width × height with room for symbols and labels. */
function ownScale(scene: Scene, width: number, height: number): number {
  const world = boxOf(scene.bodies.flatMap((b) => b.outline).concat(scene.items.flatMap(pointsOf)));
  const pad = 96;
  const w = Math.max(world.maxX - world.minX, 0.2);
  const h = Math.max(world.maxY - world.minY, 0.2);
  return Number.isFinite(w) ? Math.min((width - 2 * pad) / w, (height - 2 * pad) / h) : 100;
}

/** The height a drawing `width` wide needs for the sketch at the scale its width allows (`ownScale`'s margins). */
function heightFor(scene: Scene, width: number): number {
  const world = boxOf(scene.bodies.flatMap((b) => b.outline).concat(scene.items.flatMap(pointsOf)));
  const pad = 96;
  const w = Math.max(world.maxX - world.minX, 0.2);
  const h = Math.max(world.maxY - world.minY, 0.2);
  return Number.isFinite(w) ? (h * (width - 2 * pad)) / w + 2 * pad : 0;
}

/** A scale at which the drawing's box (`box`, drawn at `scale`) fits in width × height, with a margin. */
function fitOverhang(scene: Scene, scale: number, box: ReturnType<typeof primsBox>, width: number, height: number): number {
  const world = boxOf(scene.bodies.flatMap((b) => b.outline).concat(scene.items.flatMap(pointsOf)));
  const w = world.maxX - world.minX;
  const h = world.maxY - world.minY;
  if (![w, h, box.minX, box.maxX].every(Number.isFinite)) return scale;
  const margin = 16;
  let s = scale;
  // drawn size = geometry × scale + what the symbols add, which stays
  if (box.maxX - box.minX > width - 2 * margin && w > 1e-9) s = Math.min(s, (width - 2 * margin - (box.maxX - box.minX - w * scale)) / w);
  if (box.maxY - box.minY > height - 2 * margin && h > 1e-9) s = Math.min(s, (height - 2 * margin - (box.maxY - box.minY - h * scale)) / h);
  return Math.max(s, scale / 4);
}

/** The legend's lines under a drawing `width` wide: the line styles and units, and gravity's
 *  direction when the sketch turns it, packed into as few lines as fit across (about 6 px a
 *  character at 11 px), so a narrow drawing wraps it rather than cut it. */
function legendLinesOf(parsed: ReturnType<typeof parseSketch>, width: number, units: UnitSystem): string[] {
  const key = `Solid arrows: given loads and weight · double lines: reactions found (on the body) · dashed: momentum flux ṁV · ${units === "SI" ? "SI units" : "US customary units"}`;
  const ga = parsed.ok || "fields" in parsed ? parsed.fields?.gravityAngle : undefined;
  const turned = gravityNote(ga && "value" in ga ? ga.value : undefined);
  return packLine([...key.split(" · "), ...(turned ? [turned] : [])], Math.floor((width - 32) / 6));
}
const legendHeight = (lines: readonly string[]) => (lines.length ? 22 + 15 * (lines.length - 1) : 0);

/**
 * One frame (scale and origin) that fits every sketch given, with its result, into width × height
 * — above the legend each drawing writes under itself (`legend`, as renderSketchSvg's default: when
 * it has a result), so nothing is drawn on the legend's words.
 */
export function sharedFrame(drawings: Array<{ file: SketchFile | SketchFileInput; result: SolveResult | null }>, width: number, height: number, units: UnitSystem = "SI", opts: { legend?: boolean } = {}): View | undefined {
  let room = 0;
  const drawn = drawings.flatMap((d) => {
    const { scene, parsed } = sceneOf(d.file);
    if (opts.legend ?? !!d.result) room = Math.max(room, legendHeight(legendLinesOf(parsed, width, units)));
    return scene ? [{ scene, result: d.result }] : [];
  });
  return drawn.length ? fitScenes(drawn, width, height - room, { units }) : undefined;
}


/**
 * Render a sketch file (numbers or expressions, any supported format version) and optionally
 * its solve result as a standalone SVG document.
 */
export function renderSketchSvg(file: SketchFile | SketchFileInput, result: SolveResult | null = null, opts: SvgOptions = {}): string {
  const units = opts.units ?? "SI";
  const family = opts.family;
  const width = opts.width ?? 960;
  let height = opts.height ?? 640;
  const { parsed, doc, scene } = sceneOf(file);
  const bg = opts.background === "none" ? "" : `<rect width="100%" height="100%" fill="${PAPER}"/>`;
  const headOf = (h: number) => `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${h}" viewBox="0 0 ${width} ${h}" font-family="${FONT_STACK}">`;
  const title = `<title>${esc(doc.title || "Counterpoise sketch")}</title>`;
  if (!scene) {
    const head = headOf(height);
    const msg = parsed.ok ? "" : parsed.errors.map((e) => `${e.path || "file"}: ${e.message}`).join("; ");
    return `${head}${title}${bg}<text x="24" y="40" font-size="14" fill="${INK_FAINT}">This sketch cannot be drawn: ${esc(msg)}</text></svg>`;
  }
  // the legend line, and gravity's direction when it is turned: its parts packed into as few lines
  // as fit across (about 6 px a character at 11 px), so a narrow drawing wraps it rather than cut it
  const legend = opts.legend ?? !!result;
  const legendLines = legend ? legendLinesOf(parsed, width, units) : [];
  const footer = (opts.caption ? 22 : 0) + legendHeight(legendLines) + (opts.note ? 18 : 0);
  const headLines = opts.heading?.lines ?? [];
  const top = opts.heading ? 40 + 18 * headLines.length : 0;
  if (!opts.frame && opts.maxHeight && opts.maxHeight > height) height = Math.round(Math.min(opts.maxHeight, Math.max(height, heightFor(scene, width) + footer + top)));
  const head = headOf(height);

  // fit: world box → pixels, leaving room for symbols and labels that do not scale; then centre
  // what is actually drawn (labels included) — or use the shared frame as given
  let scale = opts.frame ? opts.frame.scale : ownScale(scene, width, height - footer - top);
  let { groups, results } = scenePrims(scene, scale, units, result, opts.stale, undefined, family);
  if (!opts.frame) {
    // symbols and labels do not scale: when they reach past the edge, shrink the geometry by what
    // they overhang (once: the overhang barely changes with the scale)
    const shrunk = fitOverhang(scene, scale, primsBox([...groups.flatMap((g) => g.prims), ...results]), width, height - footer - top);
    if (shrunk < scale) {
      scale = shrunk;
      ({ groups, results } = scenePrims(scene, scale, units, result, opts.stale, undefined, family));
    }
  }
  let dx: number;
  let dy: number;
  if (opts.frame) ({ x: dx, y: dy } = opts.frame);
  else {
    const box = primsBox([...groups.flatMap((g) => g.prims), ...results]);
    dx = Number.isFinite(box.minX) ? (width - (box.maxX - box.minX)) / 2 - box.minX : width / 2;
    dy = top + (Number.isFinite(box.minY) ? (height - footer - top - (box.maxY - box.minY)) / 2 - box.minY : (height - top) / 2);
  }

  if (opts.onlyLabelsOf) {
    const keep = new Set(opts.onlyLabelsOf);
    groups = groups.map((g) => (keep.has(g.id) ? g : { ...g, prims: g.prims.filter((p) => p.t !== "text") }));
    results = results.filter((p) => p.t !== "text");
  }
  const body = groups.map((g) => `<g data-id="${esc(g.id)}" data-kind="${g.kind}">${primsToSvg(g.prims)}</g>`).join("");
  const res = results.length ? `<g class="results">${primsToSvg(results)}</g>` : "";
  let foot = "";
  let y = height - footer + 14;
  if (opts.caption) {
    foot += `<text x="16" y="${y}" font-size="13" font-weight="600" fill="#1d2329">${esc(opts.caption)}</text>`;
    y += 22;
  }
  for (const line of legendLines) {
    foot += `<text x="16" y="${y}" font-size="11" fill="${INK_FAINT}">${esc(line)}</text>`;
    y += 15;
  }
  if (opts.note) foot += `<text x="16" y="${height - 8}" font-size="11" font-style="italic" fill="${INK_FAINT}" data-part="note">${esc(opts.note)}</text>`;
  let heading = "";
  if (opts.heading) {
    heading = `<text x="16" y="28" font-size="18" font-weight="600" fill="#1d2329" data-part="heading">${esc(opts.heading.title)}</text>`;
    headLines.forEach((line, i) => (heading += `<text x="16" y="${50 + 18 * i}" font-size="13" fill="#3d4650" data-part="heading-line">${esc(line)}</text>`));
  }
  return `${head}${title}${bg}${heading}<g transform="translate(${n(dx)} ${n(dy)})">${body}${res}</g>${foot}</svg>`;
}

/** Parts joined with " · " into lines of at most `perLine` characters (a part longer than that has a line of its own). */
function packLine(parts: string[], perLine: number): string[] {
  const lines: string[] = [];
  for (const part of parts) {
    const last = lines[lines.length - 1];
    if (last !== undefined && last.length + 3 + part.length <= perLine) lines[lines.length - 1] = `${last} · ${part}`;
    else lines.push(part);
  }
  return lines;
}
