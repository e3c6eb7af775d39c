// Expressions with units (mathjs), compiled once when a sketch is parsed.
//
// mathjs resolves an unknown name that happens to be a unit as that unit ("rho*A*V" with no A in
// scope is kg·A·V/m³), and a parameter called `m` turns "2 m" into 2 × m. Two rules close both
// traps: only the units this trade uses are units here (A, V, L, h, t, d stay free for parameters),
// every other name must be a parameter (checked in the parse tree, so nothing is silently a unit),
// and a parameter may not take the name of one of our units.
import {
  absDependencies,
  acosDependencies,
  addDependencies,
  asinDependencies,
  atan2Dependencies,
  atanDependencies,
  cbrtDependencies,
  compileDependencies,
  cosDependencies,
  create,
  createUnitDependencies,
  divideDependencies,
  eDependencies,
  expDependencies,
  hypotDependencies,
  log10Dependencies,
  logDependencies,
  maxDependencies,
  minDependencies,
  multiplyDependencies,
  parseDependencies,
  piDependencies,
  powDependencies,
  roundDependencies,
  sinDependencies,
  sqrtDependencies,
  subtractDependencies,
  tanDependencies,
  toDependencies,
  unaryMinusDependencies,
  unaryPlusDependencies,
  unitDependencies,
  type MathNode,
  type Unit,
} from "mathjs";
import { GALLON_US_M3, INCH_M, INCH_WATER_PA, LBF_N, PSF_PA } from "./constants";
import { explainEvaluation, isRealValue, PlainMathError } from "./expressionErrors";
import { CONSTANT_NAMES, FUNCTION_NAMES, shapeProblem, UNIT_NAMES } from "./expressionVocabulary";

export { CONSTANT_NAMES, FUNCTION_NAMES, reservedNameReason, UNIT_NAMES } from "./expressionVocabulary";

const math = create({
  absDependencies,
  acosDependencies,
  addDependencies,
  asinDependencies,
  atan2Dependencies,
  atanDependencies,
  cbrtDependencies,
  compileDependencies,
  cosDependencies,
  createUnitDependencies,
  divideDependencies,
  eDependencies,
  expDependencies,
  hypotDependencies,
  log10Dependencies,
  logDependencies,
  maxDependencies,
  minDependencies,
  multiplyDependencies,
  parseDependencies,
  piDependencies,
  powDependencies,
  roundDependencies,
  sinDependencies,
  sqrtDependencies,
  subtractDependencies,
  tanDependencies,
  toDependencies,
  unaryMinusDependencies,
  unaryPlusDependencies,
  unitDependencies,
});

// Exact definitions (NIST SP 811): psi as lbf/in², US gallon 3.785411784 L.
math.createUnit("psi", { definition: `${LBF_N / (INCH_M * INCH_M)} Pa` }, { override: true });
math.createUnit("ksi", { definition: `${(1000 * LBF_N) / (INCH_M * INCH_M)} Pa` });
// duct and fan pressures: the conventional inch of water column, and pound-force per square foot
math.createUnit("inH2O", { definition: `${INCH_WATER_PA} Pa` }, { override: true });
// mathjs's own kip is 4448.2216 N, short of 1000 lbf: the exact one, as the display converts with
math.createUnit("kip", { definition: `${1000 * LBF_N} N` }, { override: true });
math.createUnit("psf", { definition: `${PSF_PA} Pa` });
math.createUnit("gpm", { definition: `${GALLON_US_M3 / 60} m^3/s` });
math.createUnit("lpm", { definition: `${0.001 / 60} m^3/s` });
math.createUnit("lps", { definition: "0.001 m^3/s" });

// Inverse trigonometry returns an angle with its unit, so `atan(0.5)` in an angle field is 26.57°, not 0.4636°.
const asAngle = (x: number) => math.unit(x, "rad");
const plain = (v: unknown): number => {
  if (typeof v === "number") return v;
  if (isUnit(v) && v.equalBase(math.unit(1, "m") as Unit)) return v.toNumber("m");
  if (isUnit(v)) return unitlessValue(v);
  throw new PlainMathError("needs a number");
};
/** hypot of plain numbers, or of quantities of one kind (the length of a vector given in metres). */
const hypot = (...xs: unknown[]) => {
  if (xs.every((x) => typeof x === "number")) return Math.hypot(...(xs as number[]));
  if (!xs.every(isUnit)) throw new PlainMathError("mixes quantities with units and plain numbers: give every argument a unit of the same kind");
  const [first, ...rest] = xs as Unit[];
  if (rest.some((u) => !u.equalBase(first))) throw new PlainMathError("needs every argument in units of the same kind");
  // a Unit stores its SI value: the result keeps the first argument's unit
  const out = first.clone();
  (out as unknown as { value: number }).value = Math.hypot(...xs.map((u) => (u as unknown as { value: number }).value));
  return out;
};
math.import(
  {
    asin: (x: unknown) => asAngle(Math.asin(plain(x))),
    acos: (x: unknown) => asAngle(Math.acos(plain(x))),
    atan: (x: unknown) => asAngle(Math.atan(plain(x))),
    atan2: (y: unknown, x: unknown) => {
      if (isUnit(y) && isUnit(x)) {
        if (!y.equalBase(x)) throw new PlainMathError("needs both arguments in units of the same kind");
        return asAngle(Math.atan2(y.toSI().toNumeric() as number, x.toSI().toNumeric() as number));
      }
      return asAngle(Math.atan2(plain(y), plain(x)));
    },
    hypot,
  },
  { override: true },
);

const TRIG = new Set(["sin", "cos", "tan"]);

/** What a numeric field holds, and its SI unit (angles in degrees). */
export const FIELD_UNITS = {
  length: "m",
  angle: "deg",
  mass: "kg",
  force: "N",
  moment: "N m",
  lineLoad: "N/m",
  massFlow: "kg/s",
  velocity: "m/s",
  pressure: "Pa",
  area: "m^2",
  density: "kg/m^3",
  volumeFlow: "m^3/s",
  stiffness: "N/m",
  rotationalStiffness: "N m/rad",
  acceleration: "m/s^2",
  ratio: "",
} as const;
export type FieldKind = keyof typeof FIELD_UNITS;

/** How each field kind's SI unit is written for people (angles in degrees). */
export const FIELD_UNIT_LABELS: Record<FieldKind, string> = {
  length: "m",
  angle: "°",
  mass: "kg",
  force: "N",
  moment: "N·m",
  lineLoad: "N/m",
  massFlow: "kg/s",
  velocity: "m/s",
  pressure: "Pa",
  area: "m²",
  density: "kg/m³",
  volumeFlow: "m³/s",
  stiffness: "N/m",
  rotationalStiffness: "N·m/rad",
  acceleration: "m/s²",
  ratio: "",
};

const KIND_WORDS: Record<FieldKind, string> = {
  length: "a length (m)",
  angle: "an angle (deg)",
  mass: "a mass (kg)",
  force: "a force (N)",
  moment: "a moment (N·m)",
  lineLoad: "a load per length (N/m)",
  massFlow: "a mass flow (kg/s)",
  velocity: "a velocity (m/s)",
  pressure: "a pressure (Pa)",
  area: "an area (m²)",
  density: "a density (kg/m³)",
  volumeFlow: "a volume flow (m³/s)",
  stiffness: "a stiffness (N/m)",
  rotationalStiffness: "a rotational stiffness (N·m/rad)",
  acceleration: "an acceleration (m/s²)",
  ratio: "a plain number",
};

const targetUnits = new Map<FieldKind, Unit>();
for (const [k, u] of Object.entries(FIELD_UNITS) as [FieldKind, string][]) {
  if (u) targetUnits.set(k, math.unit(1, u) as Unit);
}
// A moment given as "N m" where a rotational stiffness is wanted is read per radian.
const momentUnit = math.unit(1, "N m") as Unit;

export type MathValue = number | Unit;

export function isUnit(v: unknown): v is Unit {
  return typeof v === "object" && v !== null && (v as { type?: string }).type === "Unit";
}

function unitlessValue(u: Unit): number {
  // A dimensionless unit (m/m) still carries a value.
  const dims = (u as unknown as { dimensions: number[] }).dimensions;
  if (dims.every((d) => d === 0)) return u.toSI().toNumeric() as number;
  throw new PlainMathError(`has units (${u.formatUnits()}) where a plain number is needed`);
}

/** Our unit names, longest first, as one alternation for the patterns below. */
const UNIT_PATTERN = [...UNIT_NAMES].sort((a, b) => b.length - a.length).join("|");
/** Not inside a longer name: "xm3" and "a2m3" are names, "2m3" is 2 m³. */
const NAME_START = "(?<![A-Za-z_]\\w*)";
/** m2, mm2, m3, cm3, ft3, in2: a length unit with the power written as a plain digit. */
const DIGIT_POWER = new RegExp(`${NAME_START}(?:(mm|cm|km|m|ft|in|yd)([23])|(s)(2))\\b(?!\\s*[(^])`, "g");
/** a unit (or its square or cube) per h: km/h, kg/h, m^3/h, L/h */
const PER_H = new RegExp(`${NAME_START}(${UNIT_PATTERN}|L|l)(\\^[23])?(\\s*\\/\\s*)h\\b(?!\\s*[(^])`, "g");
/** L/min and L/s (or l): not `L / min(a, b)`, not `L/s^2`, not the end of a longer name */
const LITRES_PER_MINUTE = new RegExp(`${NAME_START}([Ll])\\s*\\/\\s*min\\b(?!\\s*\\()`, "g");
const LITRES_PER_SECOND = new RegExp(`${NAME_START}([Ll])\\s*\\/\\s*s\\b(?!\\s*[(^])`, "g");
const LITRES_PER = new RegExp(`${NAME_START}([Ll])\\s*\\/\\s*(min|s|h)\\b`, "g");
/** feet and inches together, "5 ft 3 in" (mathjs multiplies them into an area) */
const FEET_INCHES = /(?<![\w.])(\d+(?:\.\d+)?)\s*(ft|foot|feet)\s+(\d+(?:\.\d+)?)\s*(in|inch)\b(?!\s*[\w(^])/g;
/** a force and a length joined by a hyphen or a point, as torques are written (kN-m, kN.m, lbf-ft, ft-lb) */
const HYPHEN_MOMENT = /(?<![A-Za-z_]\w*)(?:(N|kN|MN|lbf|kip|kgf)[-.](m|mm|cm|ft|in)|(ft|in)[-.](lbf|lb|kip))\b(?!\s*[(^])/g;
/** feet and inches as marks after a number: 5' 3", 5′ 3″ */
const FOOT_MARK = /(\d)\s*['′]/g;
const INCH_MARK = /(\d)\s*["″]/g;
/** gauge pressures as the trade writes them: every pressure here is gauge, so psig is psi */
const GAUGE = /(?<![A-Za-z_]\w*)(psi|bar|kPa|MPa)g\b/g;
/** digits grouped by spaces, as SI writes them: 12 500, 1 000 000 (also thin spaces) */
const SPACE_GROUPS = /(?<![\w.])(\d{1,3})((?:[ \u2009\u202f]\d{3})+)(?!\d)/g;

/** The text before a position ends in a number: "600 " or "2" before "L/min", "m3". */
const AFTER_NUMBER = /(?<![\w.])\d+(?:\.\d+)?(?:[eE][+-]?\d+)?\s*$/;
/** …or in a unit and a slash or a product sign written tight against it: "kg/" before "m3". */
const AFTER_UNIT_TIGHT = new RegExp(`${NAME_START}(?:${UNIT_PATTERN}|lpm|lps)(?:\\^[23])?[/*]$`);
/**
 * Part of a quantity as written: right after a number ("2 m3", "600 L/min", "50 psig"), or inside
 * a compound unit, after a unit and a slash or product sign with no space ("1000 kg/m3"). There a
 * name is the unit whatever the parameters are called; anywhere else a parameter of the same name
 * wins (see DEVELOPERS.md, "Units beside parameters of the same name").
 */
const inQuantity = (source: string, offset: number): boolean => {
  const before = source.slice(0, offset);
  return AFTER_NUMBER.test(before) || AFTER_UNIT_TIGHT.test(before);
};

/** m3 → m^3 (s2 → s^2) in a quantity, or unless a parameter has that name. */
const digitPower =
  (parameterNames: ReadonlySet<string>) =>
  (all: string, unit: string | undefined, power: string | undefined, second: string | undefined, secondPower: string | undefined, offset: number, source: string): string => {
    const [u, p] = unit ? [unit, power!] : [second!, secondPower!];
    return parameterNames.has(`${u}${p}`) && !inQuantity(source, offset) ? all : `${u}^${p}`;
  };

/** "/h" tight against a unit ("km/h", "m^3/h": no space either side of the slash) is per hour. */
const tightSlash = (slash: string) => slash === "/";

/** Text users type that mathjs does not read: 30°, N·m, m², m3, m/s2, kN-m, kN.m, L/min, L/s,
 *  km/h, 5 ft 3 in, 5' 3", psig, 12 500, the minus sign. Beside a parameter of the same name:
 *  - "/h" tight against a unit (km/h, m³/h, kg/h, L/h) is per hour, parameter h or not; with
 *    spaces ("6 kN*m / h") or after anything but a unit ("W/h", "2/h") h is the parameter (with
 *    no parameter h a spaced "km / h" is still per hour: nothing else it could be). Never in
 *    `h(…)` or `h^2`.
 *  - "L/min", "L/s", "L/h" (and l) right after a number ("600 L/min") are litres per minute,
 *    second, hour; elsewhere a parameter called L is L ("L/min" then divides it by a minute).
 *    Never `L / min(a, b)`.
 *  - "m3", "mm2", "s2", "psig", "barg" right after a number or tight after a unit ("2 m3",
 *    "1000 kg/m3", "50 psig") are units; elsewhere a parameter of that name wins. */
export function normaliseExpressionText(text: string, parameterNames: ReadonlySet<string> = new Set()): string {
  return text
    .replace(/°/g, " deg")
    .replace(/[·×]/g, "*")
    .replace(/²/g, "^2")
    .replace(/³/g, "^3")
    .replace(/−/g, "-")
    .replace(SPACE_GROUPS, (_all, head: string, rest: string) => head + rest.replace(/[ \u2009\u202f]/g, ""))
    .replace(DIGIT_POWER, digitPower(parameterNames))
    .replace(FOOT_MARK, "$1 ft ")
    .replace(INCH_MARK, "$1 in ")
    .replace(GAUGE, (all, unit: string, offset: number, source: string) => (parameterNames.has(all) && !inQuantity(source, offset) ? all : unit))
    .replace(HYPHEN_MOMENT, (_all, force?: string, length?: string, lengthFirst?: string, forceAfter?: string) =>
      force ? `${force}*${length}` : `${lengthFirst}*${forceAfter === "lb" ? "lbf" : forceAfter}`,
    )
    .replace(FEET_INCHES, (_all, feet: string, ft: string, inches: string, inch: string) => `(${feet} ${ft} + ${inches} ${inch})`)
    .replace(PER_H, (all, unit: string, power: string | undefined, slash: string, offset: number, source: string) => {
      const litre = unit === "L" || unit === "l";
      // the parameter L is not a unit, so neither is an h after it
      if (litre && parameterNames.has(unit) && !inQuantity(source, offset)) return all;
      if (parameterNames.has("h") && !tightSlash(slash)) return all;
      return `${litre ? "litre" : unit}${power ?? ""}${slash}hr`;
    })
    .replace(LITRES_PER_MINUTE, (all, letter: string, offset: number, source: string) => (parameterNames.has(letter) && !inQuantity(source, offset) ? all : "lpm"))
    .replace(LITRES_PER_SECOND, (all, letter: string, offset: number, source: string) => (parameterNames.has(letter) && !inQuantity(source, offset) ? all : "lps"))
    .trim();
}

/** A text that a parameter of the same name lets read two ways: the reading taken, and the other. */
export interface TwoReadings {
  /** which reading was taken and how to write the other, in words */
  note: string;
  /** the other reading, as an expression text */
  other: string;
  /** the reading taken and the other, in a few words each, with how to write the one taken unmistakably */
  taken: string;
  otherWords: string;
  takenText: string;
}

/**
 * The first place in a text where a parameter of the same name could have given another reading
 * (the readings are `normaliseExpressionText`'s): "km/h" tight beside a parameter h (per hour, or
 * divided by h), "km / h" spaced (divided by h, or per hour), "600 L/min" beside a parameter L
 * (litres per minute, or 600 × L per minute). Null when there is none.
 */
export function twoReadings(text: string, parameterNames: ReadonlySet<string>): TwoReadings | null {
  const source = text.replace(/³/g, "^3").replace(/²/g, "^2").replace(/−/g, "-").replace(DIGIT_POWER, digitPower(parameterNames));
  const swap = (m: RegExpExecArray, by: string) => source.slice(0, m.index) + by + source.slice(m.index + m[0].length);
  if (parameterNames.has("h")) {
    for (const m of source.matchAll(PER_H)) {
      const [, unit, power, slash] = m;
      if ((unit === "L" || unit === "l") && parameterNames.has(unit) && !inQuantity(source, m.index)) continue;
      const u = `${unit}${power ?? ""}`;
      const w = u.replace("^2", "²").replace("^3", "³");
      return tightSlash(slash)
        ? {
            note: `"${u}/h" is per hour here (h written tight against a unit is the hour); to divide by the parameter h, write ${u} / h with spaces`,
            other: swap(m, `${u} / h`),
            taken: `${w} per hour`,
            otherWords: `${w} divided by the parameter h (${u} / h)`,
            takenText: `${source.slice(0, m.index)}${u}/hr`,
          }
        : {
            note: `"${u} / h" divides by the parameter h here (with spaces); for per hour write ${u}/h with no spaces`,
            other: swap(m, `${u}/hr`),
            taken: `${w} divided by the parameter h`,
            otherWords: `${w} per hour (${u}/h)`,
            takenText: `(${source.slice(0, m.index)}${u}) / h`,
          };
    }
  }
  for (const m of source.matchAll(LITRES_PER)) {
    if (!parameterNames.has(m[1]) || !inQuantity(source, m.index)) continue;
    const number = AFTER_NUMBER.exec(source.slice(0, m.index))![0].trim();
    const per = m[2] === "min" ? "minute" : m[2] === "s" ? "second" : "hour";
    const before = source.slice(0, m.index).replace(/\s*$/, "");
    return {
      note: `"${number} ${m[1]}/${m[2]}" is litres per ${per} here (a unit right after a number); to multiply by the parameter ${m[1]}, write ${number}*${m[1]}/${m[2]}`,
      // "min" is a function to the parser, not a unit: a minute is written as 60 s
      other: `${before}*${m[1]}/${m[2] === "min" ? "(60 s)" : m[2] === "s" ? "s" : "hr"}${source.slice(m.index + m[0].length)}`,
      taken: `litres per ${per}`,
      otherWords: `${number} times the parameter ${m[1]} per ${per} (${number}*${m[1]}/${m[2]})`,
      takenText: `${number} ${m[2] === "min" ? "lpm" : m[2] === "s" ? "lps" : "litre/hr"}`,
    };
  }
  return null;
}

/**
 * When a field fails (or comes out a plain number) and its text has a reading that a parameter
 * of the same name would have given otherwise, the words that say which reading was taken and
 * how to write the other; null when there is no such place.
 */
export function readingNote(text: string, parameterNames: ReadonlySet<string>): string | null {
  return twoReadings(text, parameterNames)?.note ?? null;
}

export interface CompiledExpression {
  text: string;
  /** parameter names the expression reads directly */
  deps: string[];
  evaluate: (scope: Map<string, MathValue>) => MathValue;
  /** `sin(30)`-style calls whose argument may be a unitless number, checked after evaluation */
  trigArgs: Array<{ call: string; evaluate: (scope: Map<string, MathValue>) => MathValue }>;
}

export class ExpressionError extends Error {}

/**
 * Parse and check an expression once. Unknown names are errors found in the parse tree;
 * `parameterNames` are the names that may be read.
 */
/** Compiled expressions by text and the parameter names they may read: a live editor parses the
 *  same sketch on every change, and most of its expressions have not changed. */
const compiled = new Map<string, CompiledExpression | ExpressionError>();
const CACHE_LIMIT = 5000;

export function compileExpression(text: string, parameterNames: ReadonlySet<string>): CompiledExpression {
  const key = `${text}\u0000${[...parameterNames].sort().join(",")}`;
  const hit = compiled.get(key);
  if (hit instanceof ExpressionError) throw hit;
  if (hit) return hit;
  try {
    const out = compileUncached(text, parameterNames);
    remember(key, out);
    return out;
  } catch (err) {
    if (err instanceof ExpressionError) remember(key, err);
    throw err;
  }
}

/**
 * A value typed in a box outside the sketch (a limit's target, a sweep's end, a moment point): a
 * plain number, or a quantity with its unit; no parameters. Errors are in words.
 */
export function evaluateTyped(text: string): number | Unit {
  if (!text.trim()) throw new ExpressionError("needs a value");
  const v = compileExpression(text.trim(), new Set()).evaluate(new Map());
  if (typeof v === "number") {
    if (!Number.isFinite(v)) throw new ExpressionError("does not give a finite number");
    return v;
  }
  if (!isUnit(v)) throw new ExpressionError("does not give a single number");
  return v;
}

function remember(key: string, value: CompiledExpression | ExpressionError) {
  if (compiled.size >= CACHE_LIMIT) compiled.delete(compiled.keys().next().value!);
  compiled.set(key, value);
}

function compileUncached(text: string, parameterNames: ReadonlySet<string>): CompiledExpression {
  let node: MathNode;
  const source = normaliseExpressionText(text, parameterNames);
  try {
    node = math.parse(source);
  } catch (err) {
    // a decimal comma (1,5 or 0,55 kg/s): say what to type instead of the parser's words
    const comma = text.includes("(") ? null : /(^|[^\w.])(\d+),(\d+)/.exec(text);
    // three digits after it may be a thousands separator (the app's own tables write 1,151): say both
    if (comma && /^\d{3}(?![\d,])/.test(text.slice(comma.index + comma[0].length - comma[3].length)))
      throw new ExpressionError(`cannot read "${text}": write ${comma[2]}${comma[3]} if the comma groups thousands, or ${comma[2]}.${comma[3]} if it is a decimal comma (no separators here)`);
    if (comma) throw new ExpressionError(`cannot read "${text}": write decimals with a point (${comma[2]}.${comma[3]}, not ${comma[2]},${comma[3]})`);
    throw new ExpressionError(`cannot read "${text}": ${(err as Error).message}`);
  }
  const deps = new Set<string>();
  const problems: string[] = [];
  const trigArgs: CompiledExpression["trigArgs"] = [];
  node.traverse((n, _path, parent) => {
    const shape = shapeProblem(n);
    if (shape) {
      problems.push(shape);
      return;
    }
    if (n.type === "FunctionNode") {
      const fn = (n as unknown as { fn: { name?: string }; args: MathNode[] }).fn;
      const name = fn?.name ?? "";
      if (!FUNCTION_NAMES.has(name)) problems.push(`unknown function "${name}"`);
      else if (TRIG.has(name)) {
        const arg = (n as unknown as { args: MathNode[] }).args[0];
        if (arg) {
          const code = arg.compile();
          trigArgs.push({ call: `${name}(${arg.toString()})`, evaluate: (scope) => code.evaluate(scope) });
        }
      }
      return;
    }
    if (n.type !== "SymbolNode") return;
    // The function name of a call is a SymbolNode too; it was checked above.
    if (parent && parent.type === "FunctionNode" && (parent as unknown as { fn: MathNode }).fn === n) return;
    const name = (n as unknown as { name: string }).name;
    if (parameterNames.has(name)) deps.add(name);
    else if (UNIT_NAMES.has(name) || CONSTANT_NAMES.has(name)) return;
    else if (FUNCTION_NAMES.has(name)) problems.push(functionAsNameMessage(name, source, parameterNames));
    else problems.push(unknownNameMessage(name));
  });
  if (problems.length) throw new ExpressionError([...new Set(problems)].join("; "));
  const code = node.compile();
  const root = node;
  return {
    text,
    deps: [...deps],
    evaluate: (scope) => {
      let value: unknown;
      try {
        value = code.evaluate(scope);
      } catch {
        throw new ExpressionError(explainEvaluation(root, scope));
      }
      if (!isRealValue(value)) throw new ExpressionError(explainEvaluation(root, scope));
      return value as MathValue;
    },
    trigArgs,
  };
}

function functionAsNameMessage(name: string, source: string, parameterNames: ReadonlySet<string>): string {
  const letter = /\b([Ll])\s*\/\s*min\b/.exec(source)?.[1];
  if (name === "min" && letter && parameterNames.has(letter))
    return `"${letter}/min" reads the parameter ${letter} divided by min here, not litres per minute: litres per minute are ${letter}/min right after a number (600 ${letter}/min), or lpm`;
  return `"${name}" is a function: call it with its arguments, as in ${name}(…)`;
}

/** What an engineer probably meant by a name we do not read (the pressures here are gauge). */
const UNKNOWN_HINTS: Readonly<Record<string, string>> = {
  psia: "every pressure here is gauge: write psi (gauge), the absolute value less the atmosphere (1 atm = 14.696 psi)",
  bara: "every pressure here is gauge: write bar (gauge), the absolute value less the atmosphere (1 atm = 1.01325 bar)",
  lbs: "write lb for a mass or lbf for a force",
  tons: "write tonne (1000 kg), or lb (1 short ton = 2000 lb)",
  kips: "write kip (1000 lbf)",
};

function unknownNameMessage(name: string): string {
  // "x/h" with no parameter h: an hour after a name that is no unit is not guessed
  if (name === "h")
    return `unknown name "h": it is not a parameter, and Counterpoise does not read "h" as a unit on its own (write hours as hr: 5 hr, x/hr; after a unit, /h is per hour: 3.6 km/h, 50 m³/h)`;
  const hint = UNKNOWN_HINTS[name];
  if (hint) return `unknown name "${name}": it is not a parameter or a unit here: ${hint}`;
  const known = math.Unit.isValuelessUnit(name);
  return known
    ? `unknown name "${name}": it is not a parameter, and Counterpoise does not read "${name}" as a unit (define a parameter ${name}, or write the unit out)`
    : `unknown name "${name}": define it as a parameter or use a unit such as m, kN, psi, deg`;
}

/** Convert an evaluated value to the SI number of a field kind, or explain why not. */
export function toFieldNumber(value: MathValue, kind: FieldKind): number {
  let out: number;
  if (typeof value === "number") out = value;
  else if (isUnit(value)) {
    if (kind === "ratio") out = unitlessValue(value);
    else if (kind === "rotationalStiffness" && value.equalBase(momentUnit)) out = value.toNumber("N m");
    else {
      const target = targetUnits.get(kind)!;
      if (!value.equalBase(target)) {
        throw new ExpressionError(`${value.format({ precision: 6 })} is ${describeDimension(value)}, but this field needs ${KIND_WORDS[kind]}`);
      }
      // every field unit is multiplicative (no offset): the stored SI values divide, which
      // spares parsing the unit's name again at each sweep point
      const si = (value as unknown as { value: number | null }).value;
      out = si === null ? value.toNumber(FIELD_UNITS[kind]) : si / (target as unknown as { value: number }).value;
    }
  } else if (typeof value === "boolean") {
    throw new ExpressionError("gives true/false, not a number");
  } else {
    throw new ExpressionError("does not give a single number");
  }
  if (!Number.isFinite(out)) throw new ExpressionError("does not give a finite number");
  return out;
}

/** The field kind whose unit a value's unit shares its dimension with ("bar" → pressure), or null
 *  (a plain number, an angle-free ratio, or units no field takes). N/m reads as a line load. */
export function kindOfUnit(unit: string): FieldKind | null {
  if (!unit) return null;
  let u: Unit;
  try {
    u = math.unit(1, unit) as Unit;
  } catch {
    return null;
  }
  return kindOf(u);
}

/** The first field kind (in FIELD_UNITS' order: N/m reads as a line load) whose unit shares a
 *  quantity's dimension, or null. */
function kindOf(u: Unit): FieldKind | null {
  for (const [k, t] of targetUnits) if (u.equalBase(t)) return k;
  return null;
}

function describeDimension(u: Unit): string {
  const k = kindOf(u);
  return k ? KIND_WORDS[k] : "in other units";
}

/** The value of a parameter as written by the user: its number in its own units. A result in
 *  tangled units (√(p/ρ) gives bar^0.5 m^1.5/kg^0.5) is shown in the SI unit of its kind (m/s). */
export function describeValue(value: MathValue): { value: number; unit: string; si: number } {
  if (typeof value === "number") return { value, unit: "", si: value };
  let unit = value.formatUnits();
  const si = value.toSI();
  if (/\^[0-9.]*\.|\^0\./.test(unit) || unit.split(/[ */]/).filter(Boolean).length > 3) {
    const kind = kindOf(value);
    if (kind) unit = FIELD_UNITS[kind];
  }
  return { value: value.toNumeric(unit) as number, unit, si: si.toNumeric() as number };
}

/** Does a trigonometric call receive a unitless non-zero number (probably meant as degrees)? */
export function unitlessTrigWarning(expr: CompiledExpression, scope: Map<string, MathValue>): string | null {
  for (const t of expr.trigArgs) {
    let v: MathValue;
    try {
      v = t.evaluate(scope);
    } catch {
      continue;
    }
    if (typeof v === "number" && v !== 0) {
      return `${t.call} reads ${v} as radians: did you mean ${v} deg?`;
    }
  }
  return null;
}

/** Build a value in a given unit (for sweeps that set a parameter). */
const unitOnes = new Map<string, Unit>();
export function makeValue(value: number, unit: string): MathValue {
  if (!unit) return value;
  // Parse the unit once; our units are all multiplicative, so the stored (SI) value scales.
  let one = unitOnes.get(unit);
  if (!one) {
    one = math.unit(1, unit) as Unit;
    unitOnes.set(unit, one);
  }
  const u = one.clone();
  (u as unknown as { value: number }).value = (one as unknown as { value: number }).value * value;
  return u;
}

/** Evaluate a standalone expression to an SI number of a field kind (no parameters). */
export function evaluateToNumber(text: string, kind: FieldKind, scope = new Map<string, MathValue>()): number {
  const expr = compileExpression(text, new Set(scope.keys()));
  return toFieldNumber(expr.evaluate(scope), kind);
}

export { math as mathForTests };
