// The vocabulary of an expression: the units, functions and constants it may name, the names a
// parameter may not take, and the shapes of parse tree it may hold (plain arithmetic only).
import type { MathNode } from "mathjs";

/** The only unit names an expression may use; everything else is a parameter or an error. */
export const UNIT_NAMES: ReadonlySet<string> = new Set([
  // length
  "m", "mm", "cm", "km", "in", "inch", "ft", "foot", "feet", "yd",
  // mass
  "kg", "g", "tonne", "lbm", "lb",
  // time
  "s", "ms", "hr", "hour",
  // force
  "N", "kN", "MN", "lbf", "kip", "kgf",
  // pressure
  "Pa", "kPa", "MPa", "GPa", "bar", "mbar", "psi", "ksi", "psf", "atm", "inH2O", "mmH2O",
  // angle
  "deg", "degree", "degrees", "rad",
  // volume and flow
  "litre", "liter", "gal", "gpm", "lpm", "lps",
]);

/** Functions and constants an expression may call. */
export const FUNCTION_NAMES: ReadonlySet<string> = new Set([
  "sqrt", "cbrt", "abs", "min", "max", "hypot", "exp", "log", "log10", "round",
  "sin", "cos", "tan", "asin", "acos", "atan", "atan2", "to",
]);
export const CONSTANT_NAMES: ReadonlySet<string> = new Set(["pi", "e"]);

/** Words the expression parser always reads as themselves, whatever the parameters say. */
const KEYWORDS: Readonly<Record<string, string>> = {
  true: "true", false: "false", null: "nothing", undefined: "nothing", NaN: "not-a-number", Infinity: "infinity",
};
/** Words the parser reads as operators ("2 ft to m", "a mod b", "not a"). */
const OPERATOR_WORDS: ReadonlySet<string> = new Set(["mod", "to", "in", "and", "or", "not", "xor"]);
const OPERATOR_EXAMPLES: Readonly<Record<string, string>> = { to: "2 ft to m", in: "2 ft in m", not: "not a" };
/** Mathematical constants whose names a reader takes for the constant. E, i, phi and tau stay free:
 *  a parameter always takes precedence over them (mathjs reads the scope first), and engineers use
 *  them for Young's modulus, an index, the friction angle and a shear stress. */
const CONSTANT_LOOKALIKES: ReadonlySet<string> = new Set(["PI", "LN2", "LN10", "LOG2E", "LOG10E", "SQRT1_2", "SQRT2"]);

/** Why a name cannot be a parameter, or null when it can. */
export function reservedNameReason(name: string): string | null {
  if (UNIT_NAMES.has(name))
    return `"${name}" is a unit here, so "2 ${name}" would be ambiguous; name the parameter something else (e.g. ${name}_1)`;
  if (Object.hasOwn(KEYWORDS, name))
    return `"${name}" is a fixed word in expressions (it always means ${KEYWORDS[name]}), so the parameter could never be read; name it something else`;
  if (OPERATOR_WORDS.has(name))
    return `"${name}" is an operator word in expressions (as in "${OPERATOR_EXAMPLES[name] ?? `a ${name} b`}"), so it cannot name a parameter; name it something else`;
  if (FUNCTION_NAMES.has(name)) return `"${name}" is a built-in function; name the parameter something else`;
  if (CONSTANT_NAMES.has(name) || CONSTANT_LOOKALIKES.has(name))
    return `"${name}" is a mathematical constant in expressions; name the parameter something else`;
  return null;
}

/** The arithmetic an expression may hold: numbers, units, parameters, + − * / ^, "to" and calls. */
const OPERATORS = new Set(["add", "subtract", "multiply", "divide", "pow", "unaryMinus", "unaryPlus", "to"]);
const NODE_TYPES = new Set(["ConstantNode", "SymbolNode", "OperatorNode", "FunctionNode", "ParenthesisNode"]);

/** Why a part of the parse tree is not plain arithmetic (an assignment would even change a
 *  parameter for every later field), or null. */
export function shapeProblem(n: MathNode): string | null {
  if (!NODE_TYPES.has(n.type)) {
    if (n.type === "AssignmentNode" || n.type === "FunctionAssignmentNode") return `"${n.toString()}" assigns a value: a field holds a value or an expression, not "="`;
    return `"${n.toString()}" is not arithmetic: use numbers, units, parameters, + − * / ^ and functions`;
  }
  if (n.type === "OperatorNode") {
    const op = n as unknown as { fn: string; op: string };
    if (!OPERATORS.has(op.fn)) return `the operator "${op.op}" is not available here: use + − * / ^ and functions`;
  }
  if (n.type === "ConstantNode") {
    const value = (n as unknown as { value: unknown }).value;
    if (typeof value === "string") return `the text ${n.toString()} is not a number`;
    if (typeof value !== "number") return `"${n.toString()}" is not a number`;
    if (!Number.isFinite(value)) return `"${n.toString()}" is not a finite number${n.toString().endsWith("Infinity") ? " (a number beyond ±1.8e308, such as 1e400, reads as Infinity)" : ""}`;
  }
  return null;
}
