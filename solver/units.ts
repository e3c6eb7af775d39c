// Display of SI values in SI or US customary units, with 3–4 significant figures.
// Conversion factors are the exact ones of NIST SP 811 (solver/constants.ts).
import { FOOT_M, GALLON_US_M3, INCH_M, INCH_WATER_PA, LBF_N, LBM_KG, PSI_PA } from "./constants";

export type UnitSystem = "SI" | "US";
export type Quantity =
  | "force"
  | "moment"
  | "length"
  | "smallLength"
  | "mass"
  | "massFlow"
  | "pressure"
  | "velocity"
  | "volumeFlow"
  | "area"
  | "density"
  | "lineLoad"
  | "stiffness"
  | "acceleration"
  | "angle"
  | "ratio";

interface Scale {
  unit: string;
  /** SI value per one of this unit */
  factor: number;
  /** smallest value (in this unit) shown in it; default 1 */
  min?: number;
  /** the unit a zero is written in, where the system has none of factor 1 (0 psi, not 0 inH2O) */
  zero?: true;
}

/** Units per quantity and system, largest first; the first whose value is ≥ 1 is chosen. */
const UNITS: Record<Quantity, Record<UnitSystem, Scale[]>> = {
  force: {
    SI: [{ unit: "MN", factor: 1e6 }, { unit: "kN", factor: 1e3 }, { unit: "N", factor: 1 }],
    US: [{ unit: "kip", factor: 1000 * LBF_N, min: 10 }, { unit: "lbf", factor: LBF_N }],
  },
  moment: {
    SI: [{ unit: "MN·m", factor: 1e6 }, { unit: "kN·m", factor: 1e3 }, { unit: "N·m", factor: 1 }],
    US: [{ unit: "kip·ft", factor: 1000 * LBF_N * FOOT_M, min: 10 }, { unit: "lbf·ft", factor: LBF_N * FOOT_M }],
  },
  length: { SI: [{ unit: "m", factor: 1 }], US: [{ unit: "ft", factor: FOOT_M }] },
  smallLength: { SI: [{ unit: "mm", factor: 1e-3 }], US: [{ unit: "in", factor: INCH_M }] },
  mass: {
    SI: [{ unit: "t", factor: 1000 }, { unit: "kg", factor: 1 }],
    US: [{ unit: "lb", factor: LBM_KG }],
  },
  massFlow: { SI: [{ unit: "kg/s", factor: 1 }], US: [{ unit: "lb/s", factor: LBM_KG }] },
  pressure: {
    SI: [{ unit: "MPa", factor: 1e6 }, { unit: "kPa", factor: 1e3 }, { unit: "Pa", factor: 1 }],
    // below a psi (a fan's or a duct's pressure), inches of water, as the trade reads them
    US: [{ unit: "ksi", factor: 1000 * PSI_PA, min: 10 }, { unit: "psi", factor: PSI_PA, zero: true }, { unit: "inH2O", factor: INCH_WATER_PA }],
  },
  velocity: { SI: [{ unit: "m/s", factor: 1 }], US: [{ unit: "ft/s", factor: FOOT_M }] },
  volumeFlow: {
    SI: [{ unit: "m³/s", factor: 1 }, { unit: "L/s", factor: 1e-3 }],
    US: [{ unit: "gpm", factor: GALLON_US_M3 / 60 }],
  },
  // a duct of half a square metre reads 0.5 m², not 500,000 mm²; a pipe bore stays in mm²
  area: { SI: [{ unit: "m²", factor: 1, min: 0.1 }, { unit: "mm²", factor: 1e-6 }], US: [{ unit: "ft²", factor: FOOT_M ** 2 }, { unit: "in²", factor: INCH_M ** 2 }] },
  density: { SI: [{ unit: "kg/m³", factor: 1 }], US: [{ unit: "lb/ft³", factor: LBM_KG / FOOT_M ** 3 }] },
  lineLoad: {
    SI: [{ unit: "kN/m", factor: 1e3 }, { unit: "N/m", factor: 1 }],
    US: [{ unit: "kip/ft", factor: (1000 * LBF_N) / FOOT_M }, { unit: "lbf/ft", factor: LBF_N / FOOT_M }],
  },
  stiffness: {
    SI: [{ unit: "MN/m", factor: 1e6 }, { unit: "kN/m", factor: 1e3 }, { unit: "N/m", factor: 1 }],
    US: [{ unit: "kip/in", factor: (1000 * LBF_N) / INCH_M }, { unit: "lbf/in", factor: LBF_N / INCH_M }],
  },
  acceleration: { SI: [{ unit: "m/s²", factor: 1 }], US: [{ unit: "ft/s²", factor: FOOT_M }] },
  angle: { SI: [{ unit: "°", factor: 1 }], US: [{ unit: "°", factor: 1 }] },
  ratio: { SI: [{ unit: "", factor: 1 }], US: [{ unit: "", factor: 1 }] },
};

/** The value in the chosen unit, without formatting. */
export function convert(valueSI: number, q: Quantity, system: UnitSystem, unit?: string): { value: number; unit: string } {
  const list = UNITS[q][system];
  let scale = unit ? list.find((s) => s.unit === unit) : undefined;
  if (!scale) {
    const abs = Math.abs(valueSI);
    scale = list.find((s) => abs >= s.factor * (s.min ?? 1) * 0.99995) ?? list[list.length - 1];
    if (abs === 0) scale = list.find((s) => s.factor === 1) ?? list.find((s) => s.zero) ?? list[list.length - 1];
  }
  return { value: valueSI / scale.factor, unit: scale.unit };
}

/** A number with 3–4 significant figures: 4 below 10 000 units, grouped thousands above.
 *  Prose drops trailing zeros ("2.4 kN"); a table column keeps them (`keepZeros`: "2.400", "11.50"),
 *  so every figure shown is significant (small values below 10^−sig keep their short form). */
export function formatNumber(x: number, sig = 4, opts: { keepZeros?: boolean } = {}): string {
  if (!Number.isFinite(x)) return x > 0 ? "∞" : x < 0 ? "−∞" : "—";
  if (x === 0 || Math.abs(x) < 1e-12) return "0";
  // a figure is rounded to `sig` figures first, so a value that rounds up past a power of ten is
  // written in the next one's digits: 999.96 is "1,000", 9.99996 "10.00" in a table (not "1000.0",
  // "10.000": a fifth figure), and a sentence says "1,000" as a table does
  if (Math.abs(x) < 10 ** sig) x = Number(x.toPrecision(sig));
  const abs = Math.abs(x);
  let s: string;
  if (abs >= 1000) {
    const digits = Math.max(0, sig - 1 - Math.floor(Math.log10(abs)));
    s = x.toLocaleString("en-US", { maximumFractionDigits: digits, minimumFractionDigits: opts.keepZeros ? digits : 0 });
  } else {
    const digits = Math.max(0, sig - 1 - Math.floor(Math.log10(abs)));
    s = x.toFixed(Math.min(digits, 12));
    // a table keeps its trailing zeros on values from 0.1 up; below 0.1 it drops them ("0.031",
    // "−0.00004", not "0.03100", "−0.00004000": padding would only widen the column). A table that
    // must show every figure (the hand check's) asks for `figures` instead (formatFigures)
    if (s.includes(".") && !(opts.keepZeros && digits <= sig)) s = s.replace(/0+$/, "").replace(/\.$/, "");
  }
  return s.replace(/^-/, "−");
}

/** "2.40 kN", "1,151 lbf", "35.0°" */
export function formatQuantity(valueSI: number, q: Quantity, system: UnitSystem = "SI", opts: { sig?: number; unit?: string; keepZeros?: boolean } = {}): string {
  const { value, unit } = convert(valueSI, q, system, opts.unit);
  const num = formatNumber(value, opts.sig ?? 4, { keepZeros: opts.keepZeros });
  if (!unit) return num;
  return unit === "°" ? `${num}°` : `${num} ${unit}`;
}

export function unitsFor(q: Quantity, system: UnitSystem): string[] {
  return UNITS[q][system].map((s) => s.unit);
}

const SUPERSCRIPT: Readonly<Record<string, string>> = { "-": "⁻", "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹" };
/** mathjs's names of units that have a symbol of their own (SI Brochure, 9th ed., table 8: the hour
 *  is h, the litre L); each reads back as typed ("50 m³/h", "600 L/min" after a number). */
const SYMBOL: Readonly<Record<string, string>> = { hr: "h", hour: "h", hours: "h", lpm: "L/min", lps: "L/s", litre: "L", liter: "L" };

/**
 * A unit as the expression parser writes it, as engineers write it (SI Brochure, 9th ed., §5.4.6:
 * the solidus, superscript powers, a half-high dot for a product): "kg / m^3" → "kg/m³",
 * "m^3 / hr" → "m³/h", "kg^3 / (m^4 s^4)" → "kg³/(m⁴·s⁴)", "N m" → "N·m". The one display of a
 * unit the app has: the editor, the results, the studies and the calc sheet all write it so.
 */
export function prettyUnit(u: string): string {
  return u
    .trim()
    // a symbol with a solidus of its own is bracketed after another ("kg/(L/min)")
    .replace(/(\/\s*)?\b(hr|hours?|lp[ms]|lit(?:re|er))\b/g, (_, over: string | undefined, name: string) => (over ?? "") + (over && SYMBOL[name].includes("/") ? `(${SYMBOL[name]})` : SYMBOL[name]))
    .replace(/\s*\/\s*/g, "/")
    .replace(/\s*\*\s*/g, "·")
    .replace(/\^(?:\((-?\d+)\)|(-?\d+))(?![\d.])/g, (_, a: string | undefined, b: string | undefined) => [...(a ?? b ?? "")].map((c) => SUPERSCRIPT[c]).join(""))
    // a product written with a space ("N m", "m² s"); not after a bare number ("998 kg" stays)
    .replace(/(?<=[\p{L}¹²³⁰⁴-⁹⁻)])\s+(?=[(\p{L}])/gu, "·");
}
