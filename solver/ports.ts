// Mass flow and speed at each port, in the contract's order of preference, and the checks
// that over-specified values agree (PORT_INCONSISTENT) and that mass balances per body.
import type { Port, Sketch, SolveWarning } from "./types";

/** Relative disagreement above which over-specified values warn. */
const AGREEMENT = 0.005;

export interface PortFlow {
  /** kg/s */
  massFlow: number;
  /** m/s */
  velocity: number;
}

function differs(a: number, b: number): boolean {
  const scale = Math.max(Math.abs(a), Math.abs(b));
  return scale > 0 && Math.abs(a - b) > AGREEMENT * scale;
}

/** ṁ and V of one port; pushes a warning when given values disagree by more than 0.5 %. */
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
    }
  }
  return { massFlow: mdot, velocity: vel };
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
