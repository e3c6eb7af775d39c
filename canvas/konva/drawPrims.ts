// Draw primitives on a 2-D canvas context: the Konva side of the shared symbols.
import type { Prim } from "../render/prims";

export interface DrawFont {
  family: string;
}

const fontCache = new Map<string, string>();
function font(p: Extract<Prim, { t: "text" }>, family: string): string {
  const key = `${p.italic ? 1 : 0}${p.weight ?? 400}${p.size}${family}`;
  let f = fontCache.get(key);
  if (!f) {
    f = `${p.italic ? "italic " : ""}${p.weight ?? 400} ${p.size}px ${family}`;
    fontCache.set(key, f);
  }
  return f;
}

const HALO = "rgba(251,250,246,0.82)";
const widths = new Map<string, number>();

/** Text width, measured once per font and string. */
function textWidth(ctx: CanvasRenderingContext2D, text: string): number {
  const key = `${ctx.font}\u0000${text}`;
  let w = widths.get(key);
  if (w === undefined) {
    w = ctx.measureText(text).width;
    if (widths.size > 5000) widths.clear();
    widths.set(key, w);
  }
  return w;
}

export function drawPrims(ctx: CanvasRenderingContext2D, prims: readonly Prim[], family: string): void {
  for (const p of prims) {
    ctx.globalAlpha = p.opacity ?? 1;
    if (p.t === "text") {
      ctx.font = font(p, family);
      ctx.textAlign = p.align ?? "left";
      ctx.textBaseline = p.baseline === "top" ? "top" : p.baseline === "bottom" ? "bottom" : "middle";
      if (p.halo) {
        // a paper patch behind the words: much cheaper than stroking every glyph, and as legible
        const w = textWidth(ctx, p.text);
        const x0 = ctx.textAlign === "center" ? p.at[0] - w / 2 : ctx.textAlign === "right" ? p.at[0] - w : p.at[0];
        const y0 = ctx.textBaseline === "top" ? p.at[1] : ctx.textBaseline === "bottom" ? p.at[1] - p.size : p.at[1] - p.size / 2;
        ctx.fillStyle = HALO;
        ctx.fillRect(x0 - 1.5, y0 - 1, w + 3, p.size + 2);
      }
      ctx.fillStyle = p.color;
      ctx.fillText(p.text, p.at[0], p.at[1]);
      continue;
    }
    ctx.beginPath();
    if (p.t === "circle") ctx.arc(p.c[0], p.c[1], p.r, 0, Math.PI * 2);
    else {
      const pts = p.pts;
      if (!pts.length) continue;
      ctx.moveTo(pts[0][0], pts[0][1]);
      for (let i = 1; i < pts.length; i++) ctx.lineTo(pts[i][0], pts[i][1]);
      if (p.closed) ctx.closePath();
    }
    if (p.fill && p.fill !== "none") {
      ctx.fillStyle = p.fill;
      ctx.fill();
    }
    if (p.stroke) {
      ctx.strokeStyle = p.stroke;
      ctx.lineWidth = p.width ?? 1;
      ctx.lineJoin = "round";
      ctx.lineCap = "round";
      ctx.setLineDash(p.dash ?? []);
      ctx.stroke();
    }
  }
  ctx.globalAlpha = 1;
  ctx.setLineDash([]);
}
