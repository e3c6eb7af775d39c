// One body as the solver sees it: the known generalized load Q (every force on the control
// volume except the reactions, with the momentum flux moved to the force side) and the supports
// as stiff springs. Generalized coordinates are scaled by the body size L so that forces and
// moments compare: Q = (Fx, Fy, M/L) about a reference point O near the body, q = (ux, uy, L·θ).
import { boundingBox, direction, momentOf, polygonCentroid, polygonDiameter } from "./geometry";
import type { PortFlow } from "./ports";
import { isShared, reuseEqual, sameTerm } from "./reuse";
import { DEFAULT_GROUPS, type Body, type EquationTerm, type Sketch, type Support, type Vec2 } from "./types";

/** The names of labels already worked out (`elementName`). */
const NAMES = new Map<string, string>();

/**
 * An element as the equations' labels name it: its label in quotes, or its id bare. A label is
 * free text (a noun, "nozzle", or a phrase, "from pump"), so it is set off as a name and every
 * kind of term reads as a sentence around it: pressure at “from pump”, momentum out at p2. Runs
 * of white space (a pasted line break) become one space; quotes the user put around the whole
 * label are not doubled.
 */
export function elementName(e: { id: string; label?: string }): string {
  if (!e.label) return e.id;
  // every solve names every element (a live drag solves on each pointer move): a label's name is
  // worked out once
  let name = NAMES.get(e.label);
  if (name === undefined) {
    const text = e.label.replace(/\s+/gu, " ").trim();
    const wrapped = /^(?:"([^"]+)"|“([^“”]+)”|‘([^‘’]+)’|'([^']+)')$/u.exec(text);
    const inner = (wrapped ? wrapped.slice(1).find((g) => g !== undefined)!.trim() : "") || text;
    name = inner ? `“${inner}”` : "";
    if (NAMES.size >= 4096) NAMES.clear();
    NAMES.set(e.label, name);
  }
  return name || e.id;
}

/** Stiffness shared by supports when none is given (N/m). Only ratios matter. */
export const DEFAULT_STIFFNESS = 1e9;

export interface Spring {
  /** index into model.supports */
  support: number;
  role: "x" | "y" | "n" | "t" | "rot";
  /** generalized direction (scaled) */
  g: number[];
  /** N/m, or N·m/rad for the rotational spring */
  k: number;
  /** contact or tie group this spring belongs to, or -1 when always engaged */
  group: number;
}

export interface Group {
  support: number;
  normal: number;
  tangent: number;
  kind: "contact" | "tie";
}

export interface BodyModel {
  body: Body;
  cg: Vec2;
  /** reference point for moments */
  origin: Vec2;
  /** length scale (m) */
  L: number;
  supports: Support[];
  springs: Spring[];
  groups: Group[];
  /** known generalized load, scaled */
  Q: [number, number, number];
  /** force scale for tolerances (N) */
  scale: number;
  /** with motion.freeX: the solved ax (m/s²) */
  ax: number;
  ay: number;
  freeX: boolean;
  forceTerms: EquationTerm[];
  momentumTerms: EquationTerm[];
  /** Σ_out ṁV − Σ_in ṁV, moment about the world origin */
  momentum: { fx: number; fy: number; m: number };
}

/** A support's friction coefficient: a contact's μ, 0 for a frictionless contact or any other support. */
export const frictionCoefficient = (s: Support): number => (s.kind === "contact" ? (s.mu ?? 0) : 0);

function supportStiffnesses(supports: Support[]): number[] {
  const given = supports.map((s) => s.stiffness).filter((k): k is number => k !== undefined);
  const mean = given.length ? given.reduce((a, b) => a + b, 0) / given.length : DEFAULT_STIFFNESS;
  return supports.map((s) => s.stiffness ?? mean);
}

export function buildBodyModel(sketch: Sketch, body: Body, flows: Map<string, PortFlow>): BodyModel {
  const bb = boundingBox(body.outline);
  /** the contract's length for a fixed support's default rotational stiffness k·L² */
  const bboxDiagonal = Math.hypot(bb.maxX - bb.minX, bb.maxY - bb.minY) || 1;
  // The scale of the generalized coordinates: the outline's diameter, which (unlike the box)
  // does not change when the sketch is turned, so least-squares answers turn with it.
  const L = polygonDiameter(body.outline) || 1;
  const cg: Vec2 = body.cg ? copy(body.cg) : polygonCentroid(body.outline);
  const supports = sketch.supports.filter((s) => s.body === body.id);
  // Moments are taken about the centroid of the support points (the outline's centroid without
  // supports): geometry alone, so the rank test sees the supports as drawn whatever the mass and
  // the cg (a cg far outside the outline made a pin and roller look parallel, and the stiffness
  // solve ill-conditioned), and the least-squares reactions of an unrestrained body do not move
  // with its cg. An unbalanced load is reported through this point: supports that all meet at one
  // point (a pin) carry the whole force, and only the moment about it is left over.
  const origin: Vec2 = supports.length ? supportCentroid(supports) : polygonCentroid(body.outline);
  const [ox, oy] = origin;
  const springs: Spring[] = [];
  const groups: Group[] = [];
  const ks = supportStiffnesses(supports);

  const forceSpring = (si: number, role: Spring["role"], e: Vec2, at: Vec2, k: number, group: number) => {
    const g = [e[0], e[1], momentOf(at[0] - ox, at[1] - oy, e[0], e[1]) / L];
    springs.push({ support: si, role, g, k, group });
    return springs.length - 1;
  };

  supports.forEach((s, si) => {
    const k = ks[si];
    switch (s.kind) {
      case "pin":
        forceSpring(si, "x", [1, 0], s.at, k, -1);
        forceSpring(si, "y", [0, 1], s.at, k, -1);
        break;
      case "fixed": {
        forceSpring(si, "x", [1, 0], s.at, k, -1);
        forceSpring(si, "y", [0, 1], s.at, k, -1);
        const kr = s.rotationalStiffness ?? k * bboxDiagonal * bboxDiagonal;
        springs.push({ support: si, role: "rot", g: [0, 0, 1 / L], k: kr, group: -1 });
        break;
      }
      case "roller":
        forceSpring(si, "n", direction(s.angle), s.at, k, -1);
        break;
      case "contact":
      case "tie": {
        const gi = groups.length;
        const normal = forceSpring(si, "n", direction(s.angle), s.at, k, gi);
        const tangent = s.kind === "contact" && s.mu !== undefined ? forceSpring(si, "t", direction(s.angle + 90), s.at, k, gi) : -1;
        groups.push({ support: si, normal, tangent, kind: s.kind });
        break;
      }
    }
  });

  // ---- known loads, as equation terms with their points of action
  const forceTerms: EquationTerm[] = [];
  const momentumTerms: EquationTerm[] = [];
  const name = elementName(body);
  const g = sketch.gravity;
  const m = body.mass;
  const motion = sketch.motion ?? {};
  const freeX = motion.freeX === true;

  // Operating cases scale load groups; a factor shows in the term's label for the hand check.
  const factors = sketch.scaling?.factors;
  const factorOf = (group: string | undefined, fallback: string) => factors?.[group ?? fallback] ?? 1;
  const tag = (label: string, f: number) => (f === 1 ? label : `${label} × ${Number(f.toPrecision(6))}`);
  // the factor as data too, so nothing has to read it back out of the label
  const factored = (f: number) => (f === 1 ? {} : { factor: f });
  // A term is built by a plain object literal when it has no factor, β or optional point, which is
  // nearly always: a literal with a spread in it is built key by key, several times slower, and a
  // live drag or a sweep builds every term on every solve. The spread form stays for the rest, so
  // the keys of every term come in the same order either way.

  const fw = factorOf(body.group, DEFAULT_GROUPS.weight);
  if (m * g * fw !== 0) {
    // down the page unless the sketch turns gravity (a body on a slope, a tilt-table check)
    const [gx, gy] = direction(sketch.gravityAngle ?? -90);
    const label = tag(`weight of ${name}`, fw);
    const fx = m * g * fw * gx;
    const fy = m * g * fw * gy;
    forceTerms.push(
      fw === 1
        ? { id: body.id, body: body.id, kind: "weight", label, name, fx, fy, m: 0, at: cg }
        : { id: body.id, body: body.id, kind: "weight", label, name, ...factored(fw), fx, fy, m: 0, at: cg },
    );
  }

  for (const l of sketch.loads) {
    if (l.body !== body.id) continue;
    const lname = elementName(l);
    const fl = factorOf(l.group, DEFAULT_GROUPS.load);
    if (fl === 0) continue;
    const first = forceTerms.length;
    if (l.kind === "force") {
      let fx: number;
      let fy: number;
      if (l.magnitude !== undefined) {
        const e = direction(l.angle ?? 0);
        fx = l.magnitude * e[0];
        fy = l.magnitude * e[1];
      } else {
        fx = l.fx ?? 0;
        fy = l.fy ?? 0;
      }
      forceTerms.push({ id: l.id, body: body.id, kind: "force", label: `force ${lname}`, name: lname, fx, fy, m: 0, at: copy(l.at) });
    } else if (l.kind === "couple") {
      const label = `couple ${lname}`;
      forceTerms.push(
        l.at
          ? { id: l.id, body: body.id, kind: "couple", label, name: lname, fx: 0, fy: 0, m: l.value, at: copy(l.at) }
          : { id: l.id, body: body.id, kind: "couple", label, name: lname, fx: 0, fy: 0, m: l.value },
      );
    } else {
      // A linear load = two triangles: w1·ℓ/2 at ℓ/3 from `from`, w2·ℓ/2 at ℓ/3 from `to`.
      const len = Math.hypot(l.to[0] - l.from[0], l.to[1] - l.from[1]);
      const e = direction(l.angle ?? -90);
      const p1: Vec2 = [l.from[0] + (l.to[0] - l.from[0]) / 3, l.from[1] + (l.to[1] - l.from[1]) / 3];
      const p2: Vec2 = [l.from[0] + (2 * (l.to[0] - l.from[0])) / 3, l.from[1] + (2 * (l.to[1] - l.from[1])) / 3];
      const total = ((l.w1 + l.w2) * len) / 2;
      if (Math.abs(l.w1 + l.w2) > 1e-12 * (Math.abs(l.w1) + Math.abs(l.w2))) {
        // one resultant at the trapezoid's centroid
        const s = (l.w1 + 2 * l.w2) / (3 * (l.w1 + l.w2));
        const at: Vec2 = [l.from[0] + s * (l.to[0] - l.from[0]), l.from[1] + s * (l.to[1] - l.from[1])];
        forceTerms.push({ id: l.id, body: body.id, kind: "distributed", label: `distributed load ${lname} (resultant)`, name: lname, fx: total * e[0], fy: total * e[1], m: 0, at });
      } else {
        const a = (l.w1 * len) / 2;
        const b = (l.w2 * len) / 2;
        forceTerms.push({ id: l.id, body: body.id, kind: "distributed", label: `distributed load ${lname} (part at ⅓)`, name: lname, fx: a * e[0], fy: a * e[1], m: 0, at: p1 });
        forceTerms.push({ id: l.id, body: body.id, kind: "distributed", label: `distributed load ${lname} (part at ⅔)`, name: lname, fx: b * e[0], fy: b * e[1], m: 0, at: p2 });
      }
    }
    if (fl !== 1) {
      for (let i = first; i < forceTerms.length; i++) {
        const t = forceTerms[i];
        forceTerms[i] = { ...t, label: tag(t.label, fl), ...factored(fl), fx: t.fx * fl, fy: t.fy * fl, m: t.m * fl };
      }
    }
  }

  let mfx = 0;
  let mfy = 0;
  let mm = 0;
  for (const p of sketch.ports) {
    if (p.body !== body.id) continue;
    const pname = elementName(p);
    const e = direction(p.angle);
    const pressure = p.pressure ?? 0;
    const fp = factorOf(p.group, DEFAULT_GROUPS.flow);
    if (pressure * fp !== 0) {
      // pushes inward at both: along the flow at an inlet, against it at an outlet
      const f = pressure * (p.area ?? 0) * (p.kind === "inlet" ? 1 : -1) * fp;
      const label = tag(`pressure at ${pname}`, fp);
      forceTerms.push(
        fp === 1
          ? { id: p.id, body: body.id, kind: "pressure", label, name: pname, fx: f * e[0], fy: f * e[1], m: 0, at: copy(p.at) }
          : { id: p.id, body: body.id, kind: "pressure", label, name: pname, ...factored(fp), fx: f * e[0], fy: f * e[1], m: 0, at: copy(p.at) },
      );
    }
    const flow = flows.get(p.id)!;
    // β: the momentum-flux correction factor of a velocity profile that is not uniform across the port
    const beta = p.beta ?? 1;
    const mv = beta * flow.massFlow * flow.velocity * (p.kind === "outlet" ? 1 : -1) * fp;
    if (mv !== 0) {
      const fx = mv * e[0];
      const fy = mv * e[1];
      // an inlet's term is its momentum flux with a minus sign (Σ out − Σ in): said in the label,
      // so a negative value beside it does not read as a double negative
      const label = tag(`${p.kind === "outlet" ? "momentum out" : "momentum in"} at ${pname}${beta === 1 ? "" : ` (β = ${Number(beta.toPrecision(4))})`}${p.kind === "outlet" ? "" : `, as −${beta === 1 ? "" : "β"}ṁV`}`, fp);
      const flowWay = p.kind === "outlet" ? "out" : "in";
      momentumTerms.push(
        beta === 1 && fp === 1
          ? { id: p.id, body: body.id, kind: "momentum", label, name: pname, flow: flowWay, fx, fy, m: 0, at: copy(p.at) }
          : { id: p.id, body: body.id, kind: "momentum", label, name: pname, flow: flowWay, ...(beta === 1 ? {} : { beta }), ...factored(fp), fx, fy, m: 0, at: copy(p.at) },
      );
      mfx += fx;
      mfy += fy;
      mm += momentOf(p.at[0], p.at[1], fx, fy);
    }
  }

  // in a sweep, most terms come out as the last point's solve made them (see reuse.ts)
  if (isShared(sketch)) {
    reuseEqual(body, 0, forceTerms, sameTerm);
    reuseEqual(body, 1, momentumTerms, sameTerm);
  }

  // ---- the scaled generalized load Q = Σ forces − Σ momentum flux, about `origin`
  const { Q, scale } = generalizedLoad(forceTerms, momentumTerms, origin, L);

  // ---- motion: prescribed acceleration, or ax found from the x equation (supports cannot push in x)
  let ax = motion.ax ?? 0;
  const ay = motion.ay ?? 0;
  if (freeX) ax = m > 0 ? Q[0] / m : 0;
  if (m !== 0 && (ax !== 0 || ay !== 0)) {
    const t: EquationTerm = { id: body.id, body: body.id, kind: "inertia", label: `inertia of ${name} (−m·a)`, name, fx: -m * ax, fy: -m * ay, m: 0, at: cg };
    forceTerms.push(t);
    Q[0] += t.fx;
    Q[1] += t.fy;
    Q[2] += momentOf(cg[0] - ox, cg[1] - oy, t.fx, t.fy) / L;
    if (freeX) Q[0] = 0; // exactly balanced by construction
  }

  return {
    body,
    cg,
    origin,
    L,
    supports,
    springs,
    groups,
    Q,
    scale,
    ax,
    ay,
    freeX,
    forceTerms,
    momentumTerms,
    momentum: { fx: mfx, fy: mfy, m: mm },
  };
}

/**
 * The scaled generalized load Q = Σ forces − Σ momentum flux about `origin` (the momentum flux
 * moves to the force side with its sign changed), and a force scale for tolerances.
 */
export function generalizedLoad(forceTerms: EquationTerm[], momentumTerms: EquationTerm[], origin: Vec2, L: number) {
  const Q: [number, number, number] = [0, 0, 0];
  let scale = 0;
  const add = (t: EquationTerm, sign: number) => {
    Q[0] += sign * t.fx;
    Q[1] += sign * t.fy;
    const arm = t.at ? momentOf(t.at[0] - origin[0], t.at[1] - origin[1], t.fx, t.fy) : 0;
    Q[2] += (sign * (arm + t.m)) / L;
    scale += Math.abs(t.fx) + Math.abs(t.fy) + Math.abs(t.m) / L;
  };
  forceTerms.forEach((t) => add(t, 1));
  momentumTerms.forEach((t) => add(t, -1));
  return { Q, scale: scale || 1 };
}

/** Mean of the support points, each support counted once. */
function supportCentroid(supports: Support[]): Vec2 {
  let x = 0;
  let y = 0;
  for (const s of supports) {
    x += s.at[0];
    y += s.at[1];
  }
  return [x / supports.length, y / supports.length];
}

/** Results never share arrays with the sketch (a sweep changes the sketch in place). */
const copy = (p: Vec2): Vec2 => [p[0], p[1]];
