// Mass flow and speed at each port, in the contract's order of preference, and the checks
// that over-specified values agree (PORT_INCONSISTENT, also a mass flow at zero speed) and that
// mass balances per body.
import type { Port, Sketch, SolveWarning } from "./types";
import { direction, nearestOnOutline, pointInPolygon, polygonDiameter } from "./geometry";
import { kindAndName } from "./words";

/** Relative disagreement above which over-specified values warn. */
const AGREEMENT = 0.005;

export interface PortFlow {
  /** kg/s */
  massFlow: number;
  /** m/s */
  velocity: number;
  /** false when nothing gives the mass flow (no ṁ, nor ρ with Q, nor ρ with A and V): `massFlow` is then 0 by default */
  massFlowGiven: boolean;
}

function differs(a: number, b: number): boolean {
  const scale = Math.max(Math.abs(a), Math.abs(b));
  return scale > 0 && Math.abs(a - b) > AGREEMENT * scale;
}

/** "Inlet p1", "Outlet nozzle" (a label that starts with the kind is not given it twice). */
function portName(p: Pick<Port, "kind" | "id" | "label">): string {
  return kindAndName(p.kind === "inlet" ? "Inlet" : "Outlet", p.label || p.id);
}

/**
 * ṁ and V of one port; pushes a warning when given values disagree by more than 0.5 %, or when a
 * mass flow goes through the port at zero speed (ṁ = ρ·A·V would need an infinite area).
 */
export function portFlow(p: Port, warnings: SolveWarning[] | null): PortFlow {
  const { massFlow, density: rho, volumeFlow: q, area: a, velocity: v } = p;
  const mdotWays: number[] = [];
  if (massFlow !== undefined) mdotWays.push(massFlow);
  if (rho !== undefined && q !== undefined) mdotWays.push(rho * q);
  if (rho !== undefined && a !== undefined && v !== undefined) mdotWays.push(rho * a * v);
  const mdot = mdotWays.length ? mdotWays[0] : 0;

  const vWays: number[] = [];
  if (v !== undefined) vWays.push(v);
  if (rho !== undefined && a !== undefined && mdotWays.length) vWays.push(mdot / (rho * a));
  if (q !== undefined && a !== undefined) vWays.push(q / a);
  const vel = vWays.length ? vWays[0] : 0;

  if (warnings) {
    const bad = mdotWays.some((w) => differs(w, mdot)) || vWays.some((w) => differs(w, vel));
    if (bad) {
      warnings.push({
        code: "PORT_INCONSISTENT",
        message: `Port ${p.label || p.id}: the values given disagree by more than 0.5 % (mass flow ${fmt(mdotWays)} kg/s, velocity ${fmt(vWays)} m/s); using ṁ = ${round(mdot)} kg/s and V = ${round(vel)} m/s`,
        ids: [p.id],
      });
    } else if (vel === 0 && mdot > 0) {
      // nothing else to compare them with (ṁ and V given, no area or density), yet they cannot
      // agree: a flow needs a speed. Warning codes are a fixed set, so it is this one
      warnings.push({
        code: "PORT_INCONSISTENT",
        message: `${portName(p)}: a mass flow of ${round(mdot)} kg/s at zero velocity would need an infinite area (ṁ = ρ·A·V); check V or the area`,
        ids: [p.id],
      });
    }
  }
  return { massFlow: mdot, velocity: vel, massFlowGiven: mdotWays.length > 0 };
}

const round = (x: number) => Number(x.toPrecision(4));
const fmt = (xs: number[]) => xs.map(round).join(" vs ");

/** Σ ṁ(inlets) + Σ mass sources = Σ ṁ(outlets) per body, within 0.5 % of the larger side. */
export function massBalanceWarnings(sketch: Sketch, flows: Map<string, PortFlow>, flowFactor = 1): SolveWarning[] {
  const warnings: SolveWarning[] = [];
  for (const b of sketch.bodies) {
    let inflow = 0;
    let outflow = 0;
    const ids: string[] = [];
    for (const p of sketch.ports) {
      if (p.body !== b.id) continue;
      ids.push(p.id);
      const f = flows.get(p.id)!;
      if (p.kind === "inlet") inflow += f.massFlow;
      else outflow += f.massFlow;
    }
    for (const s of sketch.massSources) {
      if (s.body !== b.id) continue;
      ids.push(s.id);
      inflow += s.massFlow * flowFactor;
    }
    const larger = Math.max(inflow, outflow);
    if (larger > 0 && Math.abs(inflow - outflow) > AGREEMENT * larger) {
      warnings.push({
        code: "MASS_IMBALANCE",
        message: `${b.label || b.id}: mass in (${round(inflow)} kg/s, inlets and sources) differs from mass out (${round(outflow)} kg/s) by ${round((100 * Math.abs(inflow - outflow)) / larger)} %; steady flow needs them equal`,
        ids,
      });
    }
  }
  return warnings;
}

/**
 * Ports drawn against their kind: an inlet whose flow leaves the body through its face, or an
 * outlet whose flow enters it (the format has the velocity into the body at an inlet and out of it
 * at an outlet). Almost always a sign slip, and it changes the reactions without an error, so the
 * words under the status say it. A port on the outline whose flow runs along it (a port turned a
 * quarter turn too far) crosses nothing and is said to; a port off
 * the outline (inside the body or outside it) is said to be off it: the control surface is the
 * outline, so fluid crosses the boundary only there.
 */
export function portDirectionNotes(sketch: Sketch): Array<{ id: string; body: string; message: string }> {
  const out: Array<{ id: string; body: string; message: string }> = [];
  for (const p of sketch.ports) {
    const body = sketch.bodies.find((b) => b.id === p.body);
    if (!body || body.outline.length < 3 || !Number.isFinite(p.at[0]) || !Number.isFinite(p.at[1]) || !Number.isFinite(p.angle)) continue;
    const eps = 1e-3 * Math.max(polygonDiameter(body.outline), 1e-6);
    const d = direction(p.angle);
    const ahead = pointInPolygon([p.at[0] + eps * d[0], p.at[1] + eps * d[1]], body.outline);
    const behind = pointInPolygon([p.at[0] - eps * d[0], p.at[1] - eps * d[1]], body.outline);
    const name = portName(p);
    if (ahead === behind) {
      if (nearestOnOutline(p.at, body.outline).distance > eps) {
        const where = pointInPolygon(p.at, body.outline) ? "inside" : "outside";
        out.push({ id: p.id, body: p.body, message: `${name} is ${where} its body, not on its outline: the control surface is the outline, and fluid crosses it only there. Move the port onto the edge where the flow crosses.` });
      } else {
        const across = p.kind === "inlet" ? "into" : "out of";
        out.push({ id: p.id, body: p.body, message: `${name} flows along the outline, not across it: fluid that crosses the control surface must go through it, and the port's area is taken square to its flow. Turn it to point ${across} the body.` });
      }
      continue;
    }
    const turned = `${Number((((p.angle + 180) % 360 + 540) % 360 - 180).toFixed(1))}°`;
    if (p.kind === "inlet" && !ahead)
      out.push({ id: p.id, body: p.body, message: `${name} points out of the body: an inlet's flow enters the control volume. If the fluid comes in here, turn it to ${turned}; if it leaves, make it an outlet.` });
    if (p.kind === "outlet" && ahead)
      out.push({ id: p.id, body: p.body, message: `${name} points into the body: an outlet's flow leaves the control volume. If the fluid leaves here, turn it to ${turned}; if it comes in, make it an inlet.` });
  }
  return out;
}
