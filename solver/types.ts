// The sketch with every expression evaluated to a plain number in SI units (angles in degrees),
// and the solve result of the contract. `solve` reads only these types: it never sees an expression.

export type Vec2 = [number, number];

export interface Body {
  id: string;
  label?: string;
  /** load group of its weight (default "dead") */
  group?: string;
  outline: Vec2[];
  /** kg, everything inside the control volume (fluid included) */
  mass: number;
  /** given centre of gravity; the outline's area centroid when absent */
  cg?: Vec2;
}

interface ElementBase {
  id: string;
  label?: string;
  body: string;
  /** load group (defaults: loads "loads", ports and mass sources "flow") */
  group?: string;
}

export interface PinSupport extends ElementBase { kind: "pin"; at: Vec2; stiffness?: number }
export interface RollerSupport extends ElementBase { kind: "roller"; at: Vec2; angle: number; stiffness?: number }
export interface ContactSupport extends ElementBase { kind: "contact"; at: Vec2; angle: number; mu?: number; stiffness?: number }
export interface FixedSupport extends ElementBase { kind: "fixed"; at: Vec2; stiffness?: number; rotationalStiffness?: number }
export interface TieSupport extends ElementBase { kind: "tie"; at: Vec2; angle: number; stiffness?: number }
export type Support = PinSupport | RollerSupport | ContactSupport | FixedSupport | TieSupport;

export interface ForceLoad extends ElementBase {
  kind: "force";
  at: Vec2;
  magnitude?: number;
  /** degrees */
  angle?: number;
  fx?: number;
  fy?: number;
}
export interface CoupleLoad extends ElementBase { kind: "couple"; value: number; at?: Vec2 }
export interface DistributedLoad extends ElementBase {
  kind: "distributed";
  from: Vec2;
  to: Vec2;
  /** N/m of the line's true length */
  w1: number;
  w2: number;
  /** degrees; default -90 */
  angle?: number;
}
export type Load = ForceLoad | CoupleLoad | DistributedLoad;

export interface Port extends ElementBase {
  kind: "inlet" | "outlet";
  at: Vec2;
  /** direction of the fluid velocity, degrees */
  angle: number;
  massFlow?: number;
  velocity?: number;
  pressure?: number;
  area?: number;
  density?: number;
  volumeFlow?: number;
  /** momentum-flux correction factor β (1 for uniform flow across the port) */
  beta?: number;
}

export interface MassSource extends ElementBase { massFlow: number; at?: Vec2 }

export interface Motion {
  ax?: number;
  ay?: number;
  freeX?: boolean;
}

export interface Sketch {
  format: "counterpoise.sketch";
  version: number;
  title?: string;
  description?: string;
  /** m/s², acts in -y */
  gravity: number;
  /** direction gravity acts in, degrees from +x; absent: −90 (−y) */
  gravityAngle?: number;
  /** parameter values in SI (as plain numbers), for display */
  parameters: Record<string, number>;
  bodies: Body[];
  supports: Support[];
  loads: Load[];
  ports: Port[];
  massSources: MassSource[];
  motion?: Motion;
  /** applied by operating cases: factors per load group, and the flow factor */
  scaling?: Scaling;
}

export interface Scaling {
  factors?: Record<string, number>;
  /** every port's ṁ and V × f at fixed areas (momentum flux × f²); mass sources × f */
  flowFactor?: number;
}

export const DEFAULT_GROUPS = { weight: "dead", load: "loads", flow: "flow" } as const;

// ---------------------------------------------------------------- result

export type Status = "holds" | "lifts" | "tips" | "unrestrained";
export type SupportState = "bearing" | "lifted" | "taut" | "slack" | "active";
export type WarningCode =
  | "LIFTOFF"
  | "SLACK"
  | "SLIP"
  | "MASS_IMBALANCE"
  | "PORT_INCONSISTENT"
  | "INDETERMINATE"
  | "MECHANISM"
  | "TRIG_UNITLESS";

export interface SolveWarning {
  code: WarningCode;
  message: string;
  ids: string[];
}

export type FreeMotion = { kind: "translation"; angle: number } | { kind: "rotation"; about: Vec2 };

export interface Determinacy {
  kind: "determinate" | "indeterminate" | "mechanism";
  degree: number;
}

export interface ForceMoment {
  fx: number;
  fy: number;
  m: number;
}

export interface BodyResult {
  status: Status;
  determinacy: Determinacy;
  /** with a contact lifted or a tie slack in a body that holds (`lifts`): the determinacy of the
   *  supports that carry load in this solve, the released ones left out. `determinacy` is that of
   *  the supports as drawn (the contract's); whether the reactions depend on the stiffnesses is
   *  this one's to say (a guyed stack whose lee guy is slack stands on a pin and one guy). */
  activeDeterminacy?: Determinacy;
  acceleration: { ax: number; ay: number };
  /** Σ_out ṁV − Σ_in ṁV, and its moment about the origin */
  momentum: ForceMoment;
  /** equilibrium residual of the reported reactions */
  residual: ForceMoment;
  freeMotion?: FreeMotion;
  /** the largest reaction resultant on this body (N), for listings */
  largestReaction: number;
  /** friction the body needs overall (|Σ t| / Σ n over its friction contacts) and what it has */
  friction?: { needed: number; available: number };
}

export interface Reaction {
  body: string;
  kind: Support["kind"];
  fx: number;
  fy: number;
  m: number;
  /** along `angle` (contact normal, roller, tie tension) */
  n?: number;
  /** contact tangential, along angle + 90 */
  t?: number;
  state: SupportState;
  /** contacts and ties: n while bearing/taut, −stiffness·gap once lifted/slack */
  margin?: number;
  /** friction contacts: |t| / n needed, and μ */
  friction?: { needed: number; mu: number };
}

export interface EquationTerm {
  /** element id (support, load, port, body) */
  id: string;
  body: string;
  kind: "reaction" | "weight" | "force" | "couple" | "distributed" | "pressure" | "inertia" | "momentum";
  /**
   * The term in words, its element named by `elementName` (a label in quotes, an id bare): e.g.
   * "weight of “Skid”", "momentum out at p2", "momentum in at “from pump”, as −ṁV",
   * "pressure at p1", "reaction at “anchor”"; a case's factor on its group ends it: " × 1.35".
   */
  label: string;
  /**
   * The element as the label names it ("“from pump”", "p1"), for words built around it elsewhere
   * (this and the three below are additive: optional, absent from results saved before them).
   */
  name?: string;
  /** Momentum terms only: "out" at an outlet (+β·ṁV), "in" at an inlet (−β·ṁV): the port's kind. */
  flow?: "in" | "out";
  /** Momentum terms only: the port's momentum-flux factor β, when it is not 1. */
  beta?: number;
  /** The case's factor on the term's load group, when it is not 1 (the values include it already). */
  factor?: number;
  fx: number;
  fy: number;
  /** a couple (N·m); forces carry their moment through `at` */
  m: number;
  /** point of action of the force */
  at?: Vec2;
}

export interface BodyEquations {
  /** forces on the control volume (left side): reactions, loads, weight, pressure, inertia */
  forces: EquationTerm[];
  /** momentum flux terms (right side): +ṁV out, −ṁV in */
  momentum: EquationTerm[];
}

export interface SolveResult {
  ok: true;
  bodies: Record<string, BodyResult>;
  reactions: Record<string, Reaction>;
  warnings: SolveWarning[];
  equations: Record<string, BodyEquations>;
}

export interface FieldError {
  path: string;
  message: string;
}

export interface SolveFailure {
  ok: false;
  errors: FieldError[];
}
