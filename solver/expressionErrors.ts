// Why an expression failed, in words an engineer reads. mathjs reports the failing typed-function
// ("Unexpected type of argument in function addScalar …"), which names neither the part of the
// expression at fault nor the fix. On an error (only then), the expression tree is evaluated part
// by part to find the innermost operation that fails or gives no real value, and that operation
// is described: what it combines, and what to change.
import type { MathNode, Unit } from "mathjs";

type Scope = Map<string, unknown>;

/** An error whose message is already plain words (thrown by our own functions). */
export class PlainMathError extends Error {}

interface Failure {
  node: MathNode;
  args: MathNode[];
  values: unknown[];
  /** the error thrown, or undefined when the operation gave a value that is not a real number */
  error?: unknown;
  result?: unknown;
}

const isUnit = (v: unknown): v is Unit => typeof v === "object" && v !== null && (v as { type?: string }).type === "Unit";

/** A real, finite number or quantity (a valueless unit such as the `deg` of `to deg` counts). */
export function isRealValue(v: unknown): boolean {
  if (typeof v === "number") return Number.isFinite(v);
  if (isUnit(v)) {
    const value = (v as unknown as { value: number | null }).value;
    return value === null || Number.isFinite(value);
  }
  return false;
}

/** Does a quantity carry a dimension (m/m does not; an angle does)? */
function hasDimension(v: unknown): v is Unit {
  if (!isUnit(v)) return false;
  const dims = (v as unknown as { dimensions: number[] }).dimensions;
  return dims.some((d) => d !== 0);
}

/** index of the angle in mathjs's base dimensions */
const ANGLE = 7;
const isAngle = (v: unknown): boolean => isUnit(v) && (v as unknown as { dimensions: number[] }).dimensions.every((d, i) => (i === ANGLE ? d === 1 : d === 0));

function childrenOf(node: MathNode): MathNode[] {
  const n = node as unknown as { type: string; args?: MathNode[]; content?: MathNode };
  if (n.type === "OperatorNode" || n.type === "FunctionNode") return n.args ?? [];
  if (n.type === "ParenthesisNode" && n.content) return [n.content];
  return [];
}

function evaluateNode(node: MathNode, scope: Scope): { value?: unknown; error?: unknown } {
  try {
    // a copy, so that nothing the diagnosis evaluates can touch the caller's scope
    return { value: node.compile().evaluate(new Map(scope)) };
  } catch (error) {
    return { error };
  }
}

/** The innermost part of the tree that throws or gives a value that is not a real number. */
function findFailure(node: MathNode, scope: Scope): Failure | null {
  const args = childrenOf(node);
  for (const a of args) {
    const f = findFailure(a, scope);
    if (f) return f;
  }
  const own = evaluateNode(node, scope);
  if (own.error === undefined && isRealValue(own.value)) return null;
  const values = args.map((a) => evaluateNode(a, scope).value);
  return { node, args, values, error: own.error, result: own.value };
}

const fmt = (x: number) => String(Number(x.toPrecision(6))).replace(/^-/, "−");
const unitsOf = (u: Unit) => u.formatUnits();
const text = (n: MathNode) => n.toString();
const fnName = (node: MathNode): string => {
  const n = node as unknown as { type: string; fn: string | { name?: string } };
  return n.type === "OperatorNode" ? (n.fn as string) : ((n.fn as { name?: string }).name ?? "");
};

/** A plain operand named for the fix: "give theta a unit (20 deg)" or "give 3 a unit (3 kg)". */
function giveUnitHint(plainNode: MathNode, plainValue: unknown, unitValue: Unit): string {
  let inner = plainNode;
  while ((inner as unknown as { type: string }).type === "ParenthesisNode") inner = (inner as unknown as { content: MathNode }).content;
  const isSymbol = (inner as unknown as { type: string }).type === "SymbolNode";
  const name = isSymbol ? (inner as unknown as { name: string }).name : text(plainNode);
  const value = typeof plainValue === "number" ? fmt(plainValue) : name;
  return `give ${name} a unit (${value} ${unitsOf(unitValue)}) or drop the unit here`;
}

function explainSum(f: Failure, fn: "add" | "subtract"): string | null {
  const [a, b] = f.values;
  const t = `"${text(f.node)}"`;
  if (isUnit(a) && isUnit(b)) {
    const verb = fn === "add" ? "added" : "subtracted";
    return `${t}: ${unitsOf(a)} and ${unitsOf(b)} cannot be ${verb}: units do not match`;
  }
  const aPlain = typeof a === "number";
  const bPlain = typeof b === "number";
  if (aPlain === bPlain) return null;
  const [plainIdx, unitIdx] = aPlain ? [0, 1] : [1, 0];
  const what =
    fn === "add"
      ? "adds a plain number to a quantity with units"
      : aPlain
        ? "subtracts a quantity with units from a plain number"
        : "subtracts a plain number from a quantity with units";
  return `${t} ${what} — ${giveUnitHint(f.args[plainIdx], f.values[plainIdx], f.values[unitIdx] as Unit)}`;
}

const NO_REAL_VALUE: Record<string, string> = {
  asin: "its argument must be between −1 and 1",
  acos: "its argument must be between −1 and 1",
  sqrt: "its argument must not be negative",
  log: "its argument must be more than zero",
  log10: "its argument must be more than zero",
  pow: "a negative number to a fractional power has none",
};
const NEEDS_PLAIN = new Set(["exp", "log", "log10", "round"]);
const TRIG = new Set(["sin", "cos", "tan"]);

function explainFailure(f: Failure): string {
  const t = `"${text(f.node)}"`;
  const fn = fnName(f.node);
  const type = (f.node as unknown as { type: string }).type;
  if (f.error === undefined) {
    // a value, but not a real finite one
    if (fn === "divide" && f.values[1] !== undefined && (f.values[1] === 0 || (isUnit(f.values[1]) && f.values[1].toSI().toNumeric() === 0)))
      return `${t} divides by zero`;
    if (NO_REAL_VALUE[fn]) return `${t} has no real value: ${NO_REAL_VALUE[fn]}`;
    if (type === "ConstantNode") return `${t} is not a finite number`;
    return `${t} does not give a real, finite number`;
  }
  if (f.error instanceof PlainMathError) return `${t}: ${f.error.message}`;
  if (fn === "add" || fn === "subtract") {
    const m = explainSum(f, fn);
    if (m) return m;
  }
  const dimensioned = f.values.filter(hasDimension);
  if ((fn === "min" || fn === "max") && f.values.length > 1) {
    if (dimensioned.length && dimensioned.length < f.values.length)
      return `${t} compares quantities with units and plain numbers — give every argument a unit of the same kind`;
    return `${t} compares quantities whose units do not match (${dimensioned.map(unitsOf).join(", ")})`;
  }
  if (TRIG.has(fn) && f.values.length === 1 && isUnit(f.values[0]) && !isAngle(f.values[0]))
    return `${t}: ${fn} needs an angle (deg or rad) or a plain number, not ${unitsOf(f.values[0])}`;
  if (NEEDS_PLAIN.has(fn) && dimensioned.length)
    return `${t}: ${fn} needs a plain number, not a quantity with units (${dimensioned.map(unitsOf).join(", ")})`;
  if (fn === "pow" && hasDimension(f.values[1])) return `${t}: a power must be a plain number, not ${unitsOf(f.values[1])}`;
  if (fn === "to" && isUnit(f.values[0]) && isUnit(f.values[1]))
    return `${t}: ${unitsOf(f.values[0])} cannot be converted to ${unitsOf(f.values[1])}: units do not match`;
  if (fn === "to") return `${t}: "to" converts a quantity with units to another unit of the same kind`;
  const message = f.error instanceof Error ? f.error.message : "";
  const tooMany = /Too many arguments in function \w+ \(expected: (\d+)/.exec(message);
  if (tooMany) return `${t}: ${fn} takes ${tooMany[1]} argument${tooMany[1] === "1" ? "" : "s"}`;
  if (/Too few arguments/.test(message)) return `${t}: ${fn} needs more arguments`;
  if (/Units do not match|different base/.test(message)) return `${t}: units do not match (${dimensioned.map(unitsOf).join(", ")})`;
  return `${t} cannot be evaluated: check the units and the arguments of ${fn ? `${fn}` : "this part"}`;
}

/**
 * The reason an expression failed (it threw, or gave a value that is not a real, finite
 * number), naming the innermost part at fault.
 */
export function explainEvaluation(root: MathNode, scope: Scope): string {
  const f = findFailure(root, scope);
  if (!f) return `"${text(root)}" does not give a real, finite number`;
  return explainFailure(f);
}

/**
 * The units a field of each kind is typed in, SI first, then US customary: the units an unknown
 * name's error suggests for that field. Each is written as an expression reads it ("tonne", not
 * "t", which stays free for parameters).
 */
export const UNITS_TO_SUGGEST: Readonly<Record<string, readonly string[]>> = {
  length: ["m", "mm", "ft", "in"],
  smallLength: ["mm", "in"],
  angle: ["deg", "rad"],
  mass: ["kg", "tonne", "lb"],
  force: ["N", "kN", "lbf", "kip"],
  moment: ["N m", "kN m", "lbf ft"],
  lineLoad: ["kN/m", "lbf/ft"],
  massFlow: ["kg/s", "lb/s"],
  velocity: ["m/s", "ft/s"],
  pressure: ["kPa", "bar", "psi"],
  area: ["m^2", "mm^2", "in^2"],
  density: ["kg/m^3", "lb/ft^3"],
  volumeFlow: ["lpm", "m^3/s", "m^3/h", "gpm"],
  stiffness: ["kN/m", "lbf/in"],
  rotationalStiffness: ["kN m/rad", "lbf ft/rad"],
  acceleration: ["m/s^2", "ft/s^2"],
};

/** The suggestion an unknown name's error carries when nothing says what the field holds. */
export const ANY_UNIT_SUGGESTION = "use a unit such as m, kN, psi, deg";

/**
 * An error's words for a field of this kind: the units suggested for an unknown name are the
 * field's own ("kg, tonne, lb" in a mass field, "kPa, bar, psi" in a pressure field), and a field
 * that takes a plain number says so. Other messages, and a kind not known, are left as they are.
 */
export function suggestUnitsFor(message: string, kind: string | null | undefined): string {
  if (!kind || !message.includes(ANY_UNIT_SUGGESTION)) return message;
  if (kind === "ratio") return message.replaceAll(ANY_UNIT_SUGGESTION, "type a plain number (this field takes no unit)");
  const units = UNITS_TO_SUGGEST[kind];
  return units ? message.replaceAll(ANY_UNIT_SUGGESTION, `use a unit such as ${units.join(", ")}`) : message;
}
