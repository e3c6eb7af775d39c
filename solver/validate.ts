// Checks beyond the schema: ids and references (once, at parse), and value ranges (again at
// every sweep point, since a swept parameter can push a value out of range).
import { STANDARD_ATMOSPHERE_PA } from "./constants";
import { polygonArea } from "./geometry";
import type { FieldError, Sketch } from "./types";

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

/** The words for a negative gravity, at parse time (resolve.ts) and at a sweep point alike. */
export const NEGATIVE_GRAVITY = "must not be negative: to have gravity act another way, give its direction (gravityAngle, −90° by default); 0 turns weights off";

/** Value ranges, the information each port needs, and loads that must be fully given. */
export function validateValues(sketch: Sketch): FieldError[] {
  const errors: FieldError[] = [];
  const err = (path: string, message: string) => errors.push({ path, message });

  // parsing refuses this already; a swept parameter can still drive gravity below zero
  if (!(sketch.gravity >= 0)) err("gravity", NEGATIVE_GRAVITY);

  sketch.bodies.forEach((b, i) => {
    if (!(b.mass >= 0)) err(`bodies[${i}].mass`, "must be zero or more (kg)");
    if (b.outline.every((p) => Number.isFinite(p[0]) && Number.isFinite(p[1])) && Math.abs(polygonArea(b.outline)) < 1e-12)
      err(`bodies[${i}].outline`, "encloses no area: its corners lie on one line");
  });

  sketch.supports.forEach((s, i) => {
    const p = `supports[${i}]`;
    if (!positive(s.stiffness)) err(`${p}.stiffness`, "must be more than zero (N/m)");
    if (s.kind === "fixed" && !positive(s.rotationalStiffness)) err(`${p}.rotationalStiffness`, "must be more than zero (N·m/rad)");
    if (s.kind === "contact" && !nonNegative(s.mu)) err(`${p}.mu`, "must be zero or more");
    if (sketch.motion?.freeX && restrainsX(s)) {
      err(p, `restrains x, but the body is free to move in x (motion.freeX): remove the support or turn it to act along y only`);
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
