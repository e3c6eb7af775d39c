// Draw primitives on a 2-D canvas context: the Konva side of the shared symbols.
import type { Prim } from "../render/prims";
import { PAPER_CARD } from "../render/palette";

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

export function drawPrims(ctx: CanvasRenderingContext2D, prims: readonly Prim[], family: string): void {
  for (const p of prims) {
    ctx.globalAlpha = p.opacity ?? 1;
    if (p.t === "text") {
      ctx.font = font(p, family);
      ctx.textAlign = p.align ?? "left";
      ctx.textBaseline = p.baseline === "top" ? "top" : p.baseline === "bottom" ? "bottom" : "middle";
      if (p.halo) {
        ctx.lineWidth = 3;
        ctx.lineJoin = "round";
        ctx.strokeStyle = PAPER_CARD;
        ctx.setLineDash([]);
        ctx.strokeText(p.text, p.at[0], p.at[1]);
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
