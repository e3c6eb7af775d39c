// Drawing primitives shared by the Konva canvas and the SVG renderer, so a symbol is defined
// once and looks the same on screen, in an exported drawing and on the calc sheet.
// Coordinates are screen pixels (y down); world angles (degrees, counter-clockwise, y up) are
// turned into screen directions by `dir`.

export type Pt = [number, number];

export interface Style {
  stroke?: string;
  fill?: string;
  width?: number;
  dash?: number[];
  opacity?: number;
}

export type Prim =
  | ({ t: "poly"; pts: Pt[]; closed?: boolean } & Style)
  | ({ t: "circle"; c: Pt; r: number } & Style)
  | {
      t: "text";
      at: Pt;
      text: string;
      size: number;
      color: string;
      weight?: 400 | 500 | 600 | 700;
      align?: "left" | "center" | "right";
      baseline?: "top" | "middle" | "bottom";
      /** a paper-coloured outline so text stays legible over lines */
      halo?: boolean;
      italic?: boolean;
      opacity?: number;
      /** part of a symbol (not a label): label placement leaves it where it is */
      pinned?: boolean;
    };

/** Screen direction of a world angle (degrees counter-clockwise from +x, y up). */
export function dir(angleDeg: number): Pt {
  const a = (angleDeg * Math.PI) / 180;
  return [Math.cos(a), -Math.sin(a)];
}

export const add = (a: Pt, b: Pt): Pt => [a[0] + b[0], a[1] + b[1]];
export const sub = (a: Pt, b: Pt): Pt => [a[0] - b[0], a[1] - b[1]];
export const mul = (a: Pt, k: number): Pt => [a[0] * k, a[1] * k];
/** Perpendicular (90° clockwise on screen = counter-clockwise in the world). */
export const perp = (a: Pt): Pt => [a[1], -a[0]];
export const len = (a: Pt) => Math.hypot(a[0], a[1]);
export const unit = (a: Pt): Pt => {
  const l = len(a) || 1;
  return [a[0] / l, a[1] / l];
};

/** Move and turn primitives (rotation in screen degrees, clockwise positive). */
export function translate(prims: Prim[], by: Pt): Prim[] {
  return prims.map((p) => {
    if (p.t === "poly") return { ...p, pts: p.pts.map((q) => add(q, by)) };
    if (p.t === "circle") return { ...p, c: add(p.c, by) };
    return { ...p, at: add(p.at, by) };
  });
}

export function line(a: Pt, b: Pt, s: Style = {}): Prim {
  return { t: "poly", pts: [a, b], ...s };
}

/** A filled arrow head at `tip` pointing along `d`. */
export function head(tip: Pt, d: Pt, size: number, s: Style): Prim {
  const u = unit(d);
  const n = perp(u);
  const back = sub(tip, mul(u, size));
  return { t: "poly", closed: true, pts: [tip, add(back, mul(n, size * 0.42)), sub(back, mul(n, size * 0.42))], ...s };
}

/** A solid arrow (given loads): shaft and filled head. */
export function solidArrow(from: Pt, to: Pt, color: string, width = 1.8, size = 10): Prim[] {
  const d = sub(to, from);
  const u = unit(d);
  const shaftEnd = sub(to, mul(u, size * 0.8));
  return [line(from, shaftEnd, { stroke: color, width }), head(to, d, size, { fill: color, stroke: color, width: 1 })];
}

/** An open arrow (ports): shaft and a hollow head. */
export function hollowArrow(from: Pt, to: Pt, color: string, width = 1.5, size = 13): Prim[] {
  const d = sub(to, from);
  const u = unit(d);
  const shaftEnd = sub(to, mul(u, size));
  return [line(from, shaftEnd, { stroke: color, width }), head(to, d, size, { fill: "#fbfaf6", stroke: color, width })];
}

/** A double-line arrow (reactions found by the solve). */
export function doubleArrow(from: Pt, to: Pt, color: string, width = 1.5, size = 11, dash?: number[]): Prim[] {
  const d = sub(to, from);
  const u = unit(d);
  const n = perp(u);
  const gap = 2.6;
  const end = sub(to, mul(u, size * 0.95));
  const chev = sub(to, mul(u, size * 1.1));
  return [
    line(add(from, mul(n, gap)), add(end, mul(n, gap)), { stroke: color, width, dash }),
    line(sub(from, mul(n, gap)), sub(end, mul(n, gap)), { stroke: color, width, dash }),
    { t: "poly", pts: [add(chev, mul(n, size * 0.55)), to, sub(chev, mul(n, size * 0.55))], stroke: color, width: width + 0.2 },
  ];
}

/** A dashed arrow (momentum flux ṁV). */
export function dashedArrow(from: Pt, to: Pt, color: string, width = 1.4, size = 9): Prim[] {
  const d = sub(to, from);
  const u = unit(d);
  const n = perp(u);
  const back = sub(to, mul(u, size));
  return [
    line(from, sub(to, mul(u, 1.5)), { stroke: color, width, dash: [5, 3.5] }),
    { t: "poly", pts: [add(back, mul(n, size * 0.5)), to, sub(back, mul(n, size * 0.5))], stroke: color, width },
  ];
}

/** Short diagonal ticks on one side of a ground line from a to b. */
export function hatch(a: Pt, b: Pt, side: Pt, color: string, spacing = 6, length = 7): Prim[] {
  const d = sub(b, a);
  const L = len(d);
  const u = unit(d);
  const s = unit(side);
  const tick = add(mul(s, length), mul(u, -length * 0.7));
  const out: Prim[] = [];
  for (let t = spacing * 0.5; t <= L; t += spacing) {
    const p = add(a, mul(u, t));
    out.push(line(p, add(p, tick), { stroke: color, width: 0.9 }));
  }
  return out;
}

/** A zig-zag line (a rough, frictional ground). */
export function zigzag(a: Pt, b: Pt, color: string, amplitude = 2.6, step = 4.5, width = 1.3): Prim {
  const d = sub(b, a);
  const L = len(d);
  const u = unit(d);
  const n = perp(u);
  const pts: Pt[] = [a];
  let k = 0;
  for (let t = step; t < L; t += step, k++) pts.push(add(add(a, mul(u, t)), mul(n, k % 2 ? amplitude : -amplitude)));
  pts.push(b);
  return { t: "poly", pts, stroke: color, width };
}

/** Points on a circular arc (screen angles in degrees, clockwise positive). */
export function arcPoints(c: Pt, r: number, fromDeg: number, toDeg: number, steps = 24): Pt[] {
  const pts: Pt[] = [];
  for (let i = 0; i <= steps; i++) {
    const a = ((fromDeg + ((toDeg - fromDeg) * i) / steps) * Math.PI) / 180;
    pts.push([c[0] + r * Math.cos(a), c[1] + r * Math.sin(a)]);
  }
  return pts;
}

/** A curved arrow around c: counter-clockwise in the world when `ccw`. */
export function curvedArrow(c: Pt, r: number, ccw: boolean, color: string, width = 1.6, double = false): Prim[] {
  // screen angles: world counter-clockwise is screen clockwise-negative
  const start = ccw ? 60 : 120;
  const end = ccw ? -210 : 390;
  const pts = arcPoints(c, r, start, end, 30);
  const tip = pts[pts.length - 1];
  const prev = pts[pts.length - 3];
  const out: Prim[] = [];
  if (double) {
    out.push({ t: "poly", pts: arcPoints(c, r - 2.2, start, end, 30).slice(0, -2), stroke: color, width: width - 0.2 });
    out.push({ t: "poly", pts: arcPoints(c, r + 2.2, start, end, 30).slice(0, -2), stroke: color, width: width - 0.2 });
    const u = unit(sub(tip, prev));
    const n = perp(u);
    const back = sub(tip, mul(u, 9));
    out.push({ t: "poly", pts: [add(back, mul(n, 6)), tip, sub(back, mul(n, 6))], stroke: color, width });
  } else {
    out.push({ t: "poly", pts: pts.slice(0, -1), stroke: color, width });
    out.push(head(tip, sub(tip, prev), 9, { fill: color, stroke: color, width: 1 }));
  }
  return out;
}

export function text(at: Pt, s: string, color: string, size = 11, extra: Partial<Extract<Prim, { t: "text" }>> = {}): Prim {
  return { t: "text", at, text: s, size, color, halo: true, ...extra };
}

/** The box a text takes, from an average glyph width (no font metrics: this runs on the server too). */
export function textExtent(p: Extract<Prim, { t: "text" }>): { x0: number; y0: number; x1: number; y1: number } {
  const w = p.text.length * p.size * 0.56;
  const x0 = p.align === "center" ? p.at[0] - w / 2 : p.align === "right" ? p.at[0] - w : p.at[0];
  const y0 = p.baseline === "top" ? p.at[1] : p.baseline === "bottom" ? p.at[1] - p.size : p.at[1] - p.size / 2;
  return { x0, y0, x1: x0 + w, y1: y0 + p.size };
}

/** Bounding box of primitives (text approximated by its size). */
export function primsBox(prims: Prim[]): { minX: number; minY: number; maxX: number; maxY: number } {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  const addPt = (x: number, y: number) => {
    if (!Number.isFinite(x) || !Number.isFinite(y)) return;
    minX = Math.min(minX, x);
    minY = Math.min(minY, y);
    maxX = Math.max(maxX, x);
    maxY = Math.max(maxY, y);
  };
  for (const p of prims) {
    if (p.t === "poly") for (const q of p.pts) addPt(q[0], q[1]);
    else if (p.t === "circle") {
      addPt(p.c[0] - p.r, p.c[1] - p.r);
      addPt(p.c[0] + p.r, p.c[1] + p.r);
    } else {
      const b = textExtent(p);
      addPt(b.x0, b.y0);
      addPt(b.x1, b.y1);
    }
  }
  return { minX, minY, maxX, maxY };
}
