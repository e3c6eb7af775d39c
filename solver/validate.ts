// Checks beyond the schema: ids and references (once, at parse), and value ranges (again at
// every sweep point, since a swept parameter can push a value out of range).
import { STANDARD_ATMOSPHERE_PA } from "./constants";
import { polygonArea, selfCrossing } from "./geometry";
import { portFlow } from "./ports";
import type { FieldError, Sketch, Vec2 } from "./types";

type Group = "bodies" | "supports" | "loads" | "ports" | "massSources";
const GROUPS: Group[] = ["bodies", "supports", "loads", "ports", "massSources"];

/** Unique ids, and every element's `body` names a body. */
export function validateReferences(sketch: Sketch): FieldError[] {
  const errors: FieldError[] = [];
  const seen = new Map<string, string>();
  for (const g of GROUPS) {
    sketch[g].forEach((el, i) => {
      const path = `${g}[${i}].id`;
      const prev = seen.get(el.id);
      if (prev) errors.push({ path, message: `id "${el.id}" is already used by ${prev}` });
      else seen.set(el.id, `${g}[${i}]`);
    });
  }
  const bodyIds = new Set(sketch.bodies.map((b) => b.id));
  for (const g of GROUPS) {
    if (g === "bodies") continue;
    sketch[g].forEach((el, i) => {
      const body = (el as { body: string }).body;
      if (!bodyIds.has(body)) {
        errors.push({
          path: `${g}[${i}].body`,
          message: bodyIds.size ? `names body "${body}", which does not exist (bodies: ${[...bodyIds].join(", ")})` : `names body "${body}", but the sketch has no body yet`,
        });
      }
    });
  }
  return errors;
}

const nonNegative = (v: number | undefined) => v === undefined || v >= 0;
const positive = (v: number | undefined) => v === undefined || v > 0;
/** The softest support spring the solve takes (N/m, or N·m/rad): softer, its stiffness matrix underflows. */
const MIN_STIFFNESS = 1e-6;

/** The words for a negative gravity, at parse time (resolve.ts) and at a sweep point alike. */
export const NEGATIVE_GRAVITY = "must not be negative: to have gravity act another way, give its direction (gravityAngle, −90° by default); 0 turns weights off";

/**
 * The largest size of any number in a sketch (SI units): a million times the largest load that
 * makes sense (about 1e12 N), and so far inside the floating-point range (1.8e308) that the
 * products and squares of a solve stay finite. Past it, a result would hold Infinity or NaN.
 */
export const MAX_MAGNITUDE = 1e18;
export const TOO_LARGE = "is too large to solve: the solver takes numbers up to ±1e18 in SI units (check the unit and the exponent)";

const PORT_SIZES = ["massFlow", "velocity", "volumeFlow", "area", "density", "pressure"] as const;

/**
 * Numbers past MAX_MAGNITUDE, each named by its path. Once, at parse: a sweep checks the values
 * it puts in (sweep.ts), and a port speed found by division is checked in validateValues.
 */
export function validateSizes(sketch: Sketch): FieldError[] {
  const errors: FieldError[] = [];
  const big = (path: string, v: number | undefined) => {
    if (v !== undefined && Math.abs(v) > MAX_MAGNITUDE) errors.push({ path, message: TOO_LARGE });
  };
  const bigPoint = (path: string, p: Vec2 | undefined) => {
    if (p === undefined) return;
    big(`${path}[0]`, p[0]);
    big(`${path}[1]`, p[1]);
  };
  big("gravity", sketch.gravity);
  big("motion.ax", sketch.motion?.ax);
  big("motion.ay", sketch.motion?.ay);
  sketch.bodies.forEach((b, i) => {
    big(`bodies[${i}].mass`, b.mass);
    bigPoint(`bodies[${i}].cg`, b.cg);
    b.outline.forEach((p, j) => bigPoint(`bodies[${i}].outline[${j}]`, p));
  });
  sketch.supports.forEach((s, i) => {
    bigPoint(`supports[${i}].at`, s.at);
    big(`supports[${i}].stiffness`, s.stiffness);
    if (s.kind === "fixed") big(`supports[${i}].rotationalStiffness`, s.rotationalStiffness);
    if (s.kind === "contact") big(`supports[${i}].mu`, s.mu);
  });
  sketch.loads.forEach((l, i) => {
    const p = `loads[${i}]`;
    if (l.kind === "force") {
      bigPoint(`${p}.at`, l.at);
      for (const k of ["magnitude", "fx", "fy"] as const) big(`${p}.${k}`, l[k]);
    } else if (l.kind === "couple") {
      bigPoint(`${p}.at`, l.at);
      big(`${p}.value`, l.value);
    } else {
      bigPoint(`${p}.from`, l.from);
      bigPoint(`${p}.to`, l.to);
      big(`${p}.w1`, l.w1);
      big(`${p}.w2`, l.w2);
    }
  });
  sketch.ports.forEach((port, i) => {
    bigPoint(`ports[${i}].at`, port.at);
    for (const k of PORT_SIZES) big(`ports[${i}].${k}`, port[k]);
  });
  sketch.massSources.forEach((m, i) => big(`massSources[${i}].massFlow`, m.massFlow));
  return errors;
}

/** Value ranges, the information each port needs, and loads that must be fully given. */
export function validateValues(sketch: Sketch): FieldError[] {
  const errors: FieldError[] = [];
  const err = (path: string, message: string) => errors.push({ path, message });

  // parsing refuses this already; a swept parameter can still drive gravity below zero
  if (!(sketch.gravity >= 0)) err("gravity", NEGATIVE_GRAVITY);

  sketch.bodies.forEach((b, i) => {
    if (!(b.mass >= 0)) err(`bodies[${i}].mass`, "must be zero or more (kg)");
    // (products of corners past MAX_MAGNITUDE overflow: validateSizes names those)
    if (!b.outline.every((p) => Math.abs(p[0]) <= MAX_MAGNITUDE && Math.abs(p[1]) <= MAX_MAGNITUDE)) return;
    // a self-crossing outline has no inside: its "area" and centroid mean nothing
    const crossing = selfCrossing(b.outline);
    if (crossing) {
      const [e1, e2] = crossing.edges.map((e) => `corner ${e + 1} to ${((e + 1) % b.outline.length) + 1}`);
      const at = crossing.at.map((x) => Number(x.toPrecision(4))).join(", ");
      err(`bodies[${i}].outline`, `crosses itself: its edge from ${e1} crosses its edge from ${e2} at (${at}); list the corners in order around the body`);
    } else if (Math.abs(polygonArea(b.outline)) < 1e-12) err(`bodies[${i}].outline`, "encloses no area: its corners lie on one line");
  });

  sketch.supports.forEach((s, i) => {
    const p = `supports[${i}]`;
    if (!positive(s.stiffness)) err(`${p}.stiffness`, "must be more than zero (N/m)");
    // so small a spring gives a body no grip the solve can measure (it would read as unrestrained)
    else if (s.stiffness !== undefined && s.stiffness < MIN_STIFFNESS) err(`${p}.stiffness`, `is too small to solve with: at least ${MIN_STIFFNESS} N/m (a support that carries nothing is better removed)`);
    if (s.kind === "fixed" && !positive(s.rotationalStiffness)) err(`${p}.rotationalStiffness`, "must be more than zero (N·m/rad)");
    else if (s.kind === "fixed" && s.rotationalStiffness !== undefined && s.rotationalStiffness < MIN_STIFFNESS)
      err(`${p}.rotationalStiffness`, `is too small to solve with: at least ${MIN_STIFFNESS} N·m/rad`);
    if (s.kind === "contact" && !nonNegative(s.mu)) err(`${p}.mu`, "must be zero or more");
    if (sketch.motion?.freeX && restrainsX(s)) {
      err(p, `restrains x, but the body is set free to move in x (“Free to move in x”, motion.freeX in the file): untick that, remove the support, or turn it to act along y only`);
    }
  });

  sketch.loads.forEach((l, i) => {
    const p = `loads[${i}]`;
    if (l.kind === "force") {
      const polar = l.magnitude !== undefined || l.angle !== undefined;
      const cartesian = l.fx !== undefined || l.fy !== undefined;
      if (polar && cartesian) err(p, "give either magnitude and angle, or fx and fy, not both");
      else if (polar && (l.magnitude === undefined || l.angle === undefined))
        err(l.magnitude === undefined ? `${p}.magnitude` : `${p}.angle`, "is required with " + (l.magnitude === undefined ? "angle" : "magnitude"));
      else if (!polar && !cartesian) err(p, "needs magnitude and angle, or fx and fy");
    }
    if (l.kind === "distributed" && l.from[0] === l.to[0] && l.from[1] === l.to[1]) err(`${p}.to`, "must differ from `from`: the load line has no length");
  });

  sketch.ports.forEach((port, i) => {
    const p = `ports[${i}]`;
    for (const k of ["massFlow", "velocity", "volumeFlow"] as const) if (!nonNegative(port[k])) err(`${p}.${k}`, "must be zero or more (the direction is given by angle)");
    for (const k of ["area", "density"] as const) if (!positive(port[k])) err(`${p}.${k}`, "must be more than zero");
    const hasMassFlow =
      port.massFlow !== undefined ||
      (port.density !== undefined && port.volumeFlow !== undefined) ||
      (port.density !== undefined && port.area !== undefined && port.velocity !== undefined);
    if (!hasMassFlow) err(p, `port "${port.id}" needs a mass flow: give massFlow, or density and volumeFlow, or density, area and velocity`);
    const hasVelocity =
      port.velocity !== undefined ||
      (port.density !== undefined && port.area !== undefined && hasMassFlow) ||
      (port.volumeFlow !== undefined && port.area !== undefined) ||
      port.massFlow === 0;
    if (hasMassFlow && !hasVelocity) err(p, `port "${port.id}" needs a velocity: give velocity, or density and area, or volumeFlow and area`);
    // a speed found by dividing by the area can still come out too large with every value in range
    // (a zero area or density is already refused above: one error for it, not two)
    else if (hasMassFlow && port.velocity === undefined && positive(port.area) && positive(port.density) && PORT_SIZES.every((k) => !(Math.abs(port[k] ?? 0) > MAX_MAGNITUDE)) && !(Math.abs(portFlow(port, null).velocity) <= MAX_MAGNITUDE))
      err(`${p}.area`, `is too small for the flow through it: the speed it gives, ${port.density !== undefined ? "massFlow / (density × area)" : "volumeFlow / area"}, is beyond 1e18 m/s`);
    if (port.beta !== undefined && !(port.beta >= 1 && port.beta <= 2))
      err(`${p}.beta`, "must be from 1 to 2: the momentum-flux factor is 1 for flow uniform across the port, about 1.02 for turbulent pipe flow and 4/3 for laminar (it is never below 1)");
    // gauge pressure is above the atmosphere around the port: a full vacuum is −1 atm at the most
    // (at sea level; less at altitude), so anything below it is a slip of sign or of absolute for gauge
    if (port.pressure !== undefined && port.pressure < -STANDARD_ATMOSPHERE_PA)
      err(`${p}.pressure`, "is below a full vacuum: a gauge pressure cannot be less than −101.325 kPa (one standard atmosphere below the air around it); check the sign, or whether the value is absolute");
    if (port.pressure !== undefined && port.pressure !== 0 && port.area === undefined)
      err(`${p}.area`, `is required: port "${port.id}" has a gauge pressure, and its force is pressure × area`);
  });

  sketch.massSources.forEach((m, i) => {
    if (!(m.massFlow >= 0)) err(`massSources[${i}].massFlow`, "must be zero or more (kg/s)");
  });
  return errors;
}

/** Does a support resist motion in x (forbidden with motion.freeX)? */
export function restrainsX(s: Sketch["supports"][number]): boolean {
  if (s.kind === "pin" || s.kind === "fixed") return true;
  if (s.kind === "contact" && s.mu !== undefined) return true;
  const a = (s.angle * Math.PI) / 180;
  return Math.abs(Math.cos(a)) > 1e-9;
}
