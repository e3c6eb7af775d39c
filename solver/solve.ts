// The solve: for each body, the reactions from the linear momentum and moment-of-momentum
// equations of its control volume, with one-sided contacts and ties, its status and warnings.
// Input is the numeric sketch (no expressions); output is the contract's result object.
import { solveBilateral, solveOneSided, type SpringSolution } from "./contact";
import { determinacyOf } from "./determinacy";
import { direction, momentOf } from "./geometry";
import { dot3, norm3, type Vec3 } from "./linalg";
import { buildBodyModel, elementName, frictionCoefficient, type BodyModel } from "./model";
import { massBalanceWarnings, portFlow, type PortFlow } from "./ports";
import { bodyStability, type BodyStability, type Requirements } from "./stability";
import type { BodyResult, EquationTerm, FreeMotion, Reaction, Sketch, SolveResult, SolveWarning, Status, Vec2 } from "./types";
import { isShared, reuseEqual, sameWarning } from "./reuse";
import { describeFreeMotion, describeSupport, fmtForce, overMu } from "./words";

export function solve(sketch: Sketch): SolveResult {
  return solveWithStability(sketch, null).result;
}

/**
 * The solve and, given the required factors, each body's factors of safety against overturning
 * and sliding as drawn (the editor says them under its status; `solveCases` gives each case's).
 */
export function solveWithStability(sketch: Sketch, required: Requirements): { result: SolveResult; stability: Record<string, BodyStability> };
export function solveWithStability(sketch: Sketch, required: null): { result: SolveResult; stability: null };
export function solveWithStability(sketch: Sketch, required: Requirements | null): { result: SolveResult; stability: Record<string, BodyStability> | null } {
  const { models, warnings } = prepare(sketch);
  const result = solveModels(models, warnings);
  if (isShared(sketch)) reuseEqual(sketch, 0, result.warnings, sameWarning);
  return { result, stability: required ? Object.fromEntries(models.map((m) => [m.body.id, bodyStability(m, result, required)])) : null };
}

/** Port flows (with the flow factor), flow warnings and one model per body. */
export function prepare(sketch: Sketch): { models: BodyModel[]; warnings: SolveWarning[] } {
  const warnings: SolveWarning[] = [];
  const f = sketch.scaling?.flowFactor ?? 1;
  const flows = new Map<string, PortFlow>();
  for (const p of sketch.ports) {
    const flow = portFlow(p, warnings);
    flows.set(p.id, f === 1 ? flow : { ...flow, massFlow: flow.massFlow * f, velocity: flow.velocity * f });
  }
  warnings.push(...massBalanceWarnings(sketch, flows, f));
  return { models: sketch.bodies.map((body) => buildBodyModel(sketch, body, flows)), warnings };
}

export function solveModels(models: BodyModel[], warnings: SolveWarning[]): SolveResult {
  const result: SolveResult = { ok: true, bodies: {}, reactions: {}, warnings, equations: {} };
  for (const model of models) solveBody(model, result);
  return result;
}

function solveBody(model: BodyModel, out: SolveResult): void {
  const { body, groups, springs, scale, supports } = model;
  const warnings = out.warnings;
  const tol = 1e-9 * scale;
  const { determinacy, freeMotions, redundant } = determinacyOf(model);

  const bilateral = solveBilateral(model);
  let status: Status;
  let used: SpringSolution;
  let freeMotion: FreeMotion | undefined;
  /** groups shown as lifted/slack */
  let released: boolean[];
  /** a body that tips: the engagement its margins come from */
  let pull: SpringSolution["pull"];

  if (norm3(bilateral.unbalanced) > tol) {
    status = "unrestrained";
    used = bilateral;
    freeMotion = describeMotion(model, bilateral.unbalanced);
    released = groups.map((g) => bilateral.r[g.normal] < -tol);
  } else {
    const one = solveOneSided(model);
    if (one.ray || one.inconsistent) {
      status = "tips";
      used = bilateral;
      if (one.ray) freeMotion = describeMotion(model, one.ray);
      released = groups.map((g) => bilateral.r[g.normal] < -tol);
      pull = one.pull;
    } else {
      used = one;
      released = one.engaged.map((e) => !e);
      status = released.some(Boolean) ? "lifts" : "holds";
    }
    frictionWarnings(model, one, warnings);
  }

  // ---- reactions
  const clean = (x: number) => (Math.abs(x) < 1e-11 * scale ? 0 : x);
  const groupOf = new Map(groups.map((g, gi) => [g.support, gi]));
  let largest = 0;
  let sumN = 0;
  let sumMuN = 0;
  let tx = 0;
  let ty = 0;
  const resid: Vec3 = [...model.Q] as Vec3;
  const reactionTerms: EquationTerm[] = [];
  const supportForces = supports.map(() => ({ fx: 0, fy: 0, m: 0, n: 0, t: 0 }));
  springs.forEach((s, i) => {
    const r = used.r[i];
    const f = supportForces[s.support];
    resid[0] += s.g[0] * r;
    resid[1] += s.g[1] * r;
    resid[2] += s.g[2] * r;
    if (s.role === "rot") f.m += r;
    else {
      f.fx += r * s.g[0];
      f.fy += r * s.g[1];
      if (s.role === "n") f.n = r;
      if (s.role === "t") f.t = r;
    }
  });

  supports.forEach((s, si) => {
    const f = supportForces[si];
    const gi = groupOf.get(si);
    const isReleased = gi !== undefined && released[gi];
    const reaction: Reaction = { body: body.id, kind: s.kind, fx: clean(f.fx), fy: clean(f.fy), m: clean(f.m), state: "active" };
    if (s.kind === "roller" || s.kind === "contact" || s.kind === "tie") reaction.n = clean(f.n);
    // the contract reports n and t for every contact: a frictionless one carries t = 0
    if (s.kind === "contact") reaction.t = clean(f.t);
    if (gi !== undefined) {
      const g = groups[gi];
      reaction.state = s.kind === "contact" ? (isReleased ? "lifted" : "bearing") : isReleased ? "slack" : "taut";
      // continuous through lift-off: n while engaged, −k·gap once released (the same formula)
      // A body that tips takes the margins of the last engagement that balanced it (the support
      // that would have to pull still does), so they go on from those of the held body.
      const sn = springs[g.normal];
      const marginQ = status === "lifts" || status === "holds" ? used.q : status === "tips" ? pull?.q : undefined;
      reaction.margin = clean(marginQ ? -sn.k * dot3(sn.g, marginQ) : f.n);
      if (isReleased) {
        warnings.push(
          status === "tips" || status === "unrestrained"
            ? {
                code: s.kind === "contact" ? "LIFTOFF" : "SLACK",
                message: `${describeSupport(s)} would have to ${s.kind === "contact" ? "pull" : "push"} ${fmtForce(Math.abs(f.n))} to hold ${body.label || body.id}`,
                ids: [s.id],
              }
            : {
                code: s.kind === "contact" ? "LIFTOFF" : "SLACK",
                message: s.kind === "contact" ? `${describeSupport(s)} lifts off` : `${describeSupport(s)} goes slack`,
                ids: [s.id],
              },
        );
      }
      if (s.kind === "contact" && s.mu !== undefined && !isReleased) {
        const n = f.n;
        const needed = n > tol ? Math.abs(f.t) / n : Math.abs(f.t) > tol ? Infinity : 0;
        reaction.friction = { needed, mu: s.mu };
        sumN += n;
        sumMuN += s.mu * n;
        const et = direction(s.angle + 90);
        tx += f.t * et[0];
        ty += f.t * et[1];
        if (overMu(needed, s.mu)) {
          warnings.push({
            code: "SLIP",
            message: `${describeSupport(s)} slips: it needs a friction coefficient of ${fmtRatio(needed)}, and has μ = ${fmtRatio(s.mu)}`,
            ids: [s.id],
          });
        }
      }
    }
    largest = Math.max(largest, Math.hypot(reaction.fx, reaction.fy));
    out.reactions[s.id] = reaction;
    const sname = elementName(s);
    reactionTerms.push({
      id: s.id,
      body: body.id,
      kind: "reaction" as const,
      label: `reaction at ${sname}`,
      name: sname,
      fx: reaction.fx,
      fy: reaction.fy,
      m: reaction.m,
      at: [s.at[0], s.at[1]],
    });
  });

  // ---- body-level friction. When every contact has |t| ≤ μ·n, then |Σ t| ≤ Σ |t| ≤ Σ μ·n, so a
  // body can only need more friction than its contacts give when one of them already warns SLIP;
  // the body's own warning says what no single contact does: the whole body slides (a reader of
  // the result file alone must not take it for one contact's local slip).
  const friction: BodyResult["friction"] = sumN > 0 ? { needed: Math.hypot(tx, ty) / sumN, available: sumMuN / sumN } : undefined;
  if (friction && status !== "tips" && status !== "unrestrained" && overMu(friction.needed, friction.available)) {
    warnings.push({
      code: "SLIP",
      message: `${body.label || body.id} slides as a whole: its friction contacts must give a friction coefficient of ${fmtRatio(friction.needed)} together, and give ${fmtRatio(friction.available)}`,
      ids: [body.id],
    });
  }

  // Whether the reactions depend on the stiffnesses is a property of the supports that carry load in
  // this solve: a contact that lifts or a tie that goes slack carries nothing, so a guyed stack whose
  // lee guy is slack stands on its pin and one guy, a determinate set (reactions by equilibrium
  // alone). The contract's `determinacy` stays that of the supports as drawn.
  const anyReleased = (status === "holds" || status === "lifts") && released.some(Boolean);
  const active = anyReleased ? determinacyOf({ ...model, springs: springs.filter((s) => s.group < 0 || !released[s.group]) }) : null;
  const activeIds = supports.filter((_, si) => !anyReleased || !released[groupOf.get(si) ?? -1]).map((s) => s.id);
  const solvedSet = active ?? { determinacy, redundant };
  if (solvedSet.determinacy.kind === "indeterminate") {
    warnings.push({
      code: "INDETERMINATE",
      message: `${body.label || body.id} is statically indeterminate (degree ${solvedSet.determinacy.degree}${active ? ` with the supports that carry load` : ""}): the reactions depend on the support stiffnesses`,
      ids: activeIds,
    });
  } else if (determinacy.kind !== "mechanism" && solvedSet.determinacy.kind === "mechanism" && solvedSet.redundant > 0) {
    // over-supported as drawn; with some released, the rest leave a motion free the loads do not drive
    warnings.push({
      code: "INDETERMINATE",
      message: `${body.label || body.id} is statically indeterminate (degree ${solvedSet.redundant}) in the directions the supports that carry load resist: the reactions depend on the support stiffnesses`,
      ids: activeIds,
    });
  } else if (determinacy.kind === "mechanism" && status !== "unrestrained") {
    warnings.push({
      code: "MECHANISM",
      message: `${body.label || body.id}: ${freeMotions.map((z) => describeFreeMotion(describeMotion(model, z), supports)).join("; ")}, but the loads do not push that way`,
      ids: [body.id],
    });
    // free one way and over-supported the others: the shares still depend on the stiffnesses
    if (solvedSet.redundant > 0)
      warnings.push({
        code: "INDETERMINATE",
        message: `${body.label || body.id} is statically indeterminate (degree ${solvedSet.redundant}) in the directions its supports resist: the reactions depend on the support stiffnesses`,
        ids: activeIds,
      });
  }

  // residual about the world origin
  const [ox, oy] = model.origin;
  const rfx = resid[0];
  const rfy = resid[1];
  const rm = resid[2] * model.L + momentOf(ox, oy, rfx, rfy);
  const cleanR = (x: number) => (Math.abs(x) < 1e-10 * scale ? 0 : x);

  out.bodies[body.id] = {
    status,
    determinacy,
    ...(active ? { activeDeterminacy: active.determinacy } : {}),
    acceleration: { ax: model.ax, ay: model.ay },
    momentum: model.momentum,
    residual: { fx: cleanR(rfx), fy: cleanR(rfy), m: cleanR(rm) },
    ...(freeMotion ? { freeMotion } : {}),
    largestReaction: largest,
    ...(friction ? { friction } : {}),
  };
  out.equations[body.id] = { forces: [...reactionTerms, ...model.forceTerms], momentum: model.momentumTerms };
}

/**
 * Bodies that only Coulomb's law settles (see slip.ts): held with contacts sliding at the limit,
 * whose reactions then depend on the order of loading; or sliding along friction contacts that
 * cannot hold them, said plainly when a preload could have jammed them.
 */
function frictionWarnings(model: BodyModel, one: SpringSolution, warnings: SolveWarning[]): void {
  const name = model.body.label || model.body.id;
  const named = (flags: boolean[]) => model.groups.filter((_, gi) => flags[gi]).map((g) => model.supports[g.support]);
  const sliding = one.sliding ? named(one.sliding) : [];
  if (sliding.length) {
    warnings.push({
      code: "INDETERMINATE",
      message:
        `${name} holds only with ${sliding.map(describeSupport).join(" and ")} sliding at the friction limit (|t| = μ·n): ` +
        `no answer has every contact gripping, so the reactions depend on the order of loading and on the stiffnesses; ` +
        `these are for all the loads applied together from zero`,
      ids: sliding.map((s) => s.id),
    });
  }
  const slides = one.slides ? named(one.slides) : [];
  if (slides.length) {
    warnings.push({
      code: "SLIP",
      message:
        `${name} slides along ${slides.map(describeSupport).join(" and ")}: ` +
        (one.couldJam
          ? `forces within friction could balance the loads, but not the ones its supports take when loaded from zero; ` +
            `a preload could jam it, so whether it holds depends on the stiffnesses and the order of loading`
          : `friction (${slides.map((s) => `μ = ${fmtRatio(frictionCoefficient(s))}`).join(", ")}) cannot balance the loads`),
      ids: slides.map((s) => s.id),
    });
  }
}

/** A generalized motion z (scaled) as a translation or a rotation about a point. */
function describeMotion(model: BodyModel, z: Vec3): FreeMotion {
  const [ux, uy, lt] = z;
  const theta = lt / model.L;
  const mag = Math.hypot(ux, uy);
  if (Math.abs(lt) <= 1e-6 * Math.max(mag, 1e-300)) {
    const angle = (Math.atan2(uy, ux) * 180) / Math.PI;
    return { kind: "translation", angle: roundAngle(angle) };
  }
  const [ox, oy] = model.origin;
  const about: Vec2 = [ox - uy / theta, oy + ux / theta];
  return { kind: "rotation", about: [roundTiny(about[0], model.L), roundTiny(about[1], model.L)] };
}

const roundAngle = (a: number) => {
  const r = Math.round(a * 1e6) / 1e6;
  return r === -180 ? 180 : r === 0 ? 0 : r;
};
const roundTiny = (x: number, L: number) => (Math.abs(x) < 1e-9 * L ? 0 : Math.round(x * 1e9) / 1e9);
const fmtRatio = (x: number) => (Number.isFinite(x) ? Number(x.toPrecision(3)).toString() : "∞");
