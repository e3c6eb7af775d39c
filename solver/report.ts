// Result tables as plain data: the results panel, the CSV export and the calc sheet all read
// the same rows, so a number cannot differ between them. Cells are numbers in the column's unit
// (or text); formatting is left to whoever shows them.
import type { CaseRun, StudyResult } from "./cases";
import { handCheckSums, termMomentAbout } from "./equations";
import { FIELD_UNIT_LABELS } from "./expressions";
import { FIELD_KIND_BY_NAME } from "./resolve";
import type { ParseResult } from "./parse";
import type { BodyStability } from "./stability";
import type { SolveResult, Vec2 } from "./types";
import { convert, formatNumber, unitsFor, type Quantity, type UnitSystem } from "./units";

export type Cell = string | number | null;

export interface Table {
  id: string;
  title: string;
  columns: Array<{ key: string; label: string; unit?: string; align?: "left" | "right" }>;
  rows: Cell[][];
  /** notes printed under the table */
  notes?: string[];
}

/** The fixed display unit of a column: kN / kN·m in SI, lbf / lbf·ft in US. */
export function columnUnit(q: Quantity, system: UnitSystem): string {
  const preferred: Partial<Record<Quantity, Record<UnitSystem, string>>> = {
    force: { SI: "kN", US: "lbf" },
    moment: { SI: "kN·m", US: "lbf·ft" },
  };
  return preferred[q]?.[system] ?? unitsFor(q, system)[0];
}

const inUnit = (v: number | undefined, q: Quantity, system: UnitSystem): number | null =>
  v === undefined || !Number.isFinite(v) ? null : convert(v, q, system, columnUnit(q, system)).value;

/** Reactions of one run, one row per support (force on the body, or load on the support). */
export function reactionTable(result: SolveResult, system: UnitSystem, opts: { onSupport?: boolean; id?: string; title?: string } = {}): Table {
  const f = columnUnit("force", system);
  const m = columnUnit("moment", system);
  const sign = opts.onSupport ? -1 : 1;
  return {
    id: opts.id ?? "reactions",
    title: opts.title ?? (opts.onSupport ? "Loads on the supports" : "Reactions (forces on the body)"),
    columns: [
      { key: "support", label: "Support", align: "left" },
      { key: "kind", label: "Kind", align: "left" },
      { key: "fx", label: "Fx", unit: f },
      { key: "fy", label: "Fy", unit: f },
      { key: "resultant", label: "Resultant", unit: f },
      { key: "angle", label: "Direction", unit: "°" },
      { key: "m", label: "M", unit: m },
      { key: "n", label: "Normal n", unit: f },
      { key: "t", label: "Tangential t", unit: f },
      { key: "state", label: "State", align: "left" },
      { key: "margin", label: "Margin", unit: f },
    ],
    rows: Object.entries(result.reactions).map(([id, r]) => {
      const fx = sign * r.fx;
      const fy = sign * r.fy;
      const res = Math.hypot(fx, fy);
      return [
        id,
        r.kind,
        inUnit(fx, "force", system),
        inUnit(fy, "force", system),
        inUnit(res, "force", system),
        res > 0 ? Number(((Math.atan2(fy, fx) * 180) / Math.PI).toFixed(2)) : null,
        inUnit(sign * r.m, "moment", system),
        inUnit(r.n === undefined ? undefined : sign * r.n, "force", system),
        inUnit(r.t === undefined ? undefined : sign * r.t, "force", system),
        r.state,
        inUnit(r.margin, "force", system),
      ];
    }),
    notes: opts.onSupport ? ["Loads on the supports are the reactions with the sign reversed (what an anchor must carry)."] : undefined,
  };
}

/** Every support in every case: the table of the studies. */
export function caseReactionTable(study: StudyResult, system: UnitSystem): Table {
  const f = columnUnit("force", system);
  const m = columnUnit("moment", system);
  const rows: Cell[][] = [];
  for (const run of study.runs) {
    if (!run.ok) {
      rows.push([run.name, "—", null, null, null, null, null, `not solved: ${run.errors.map((e) => `${e.path} ${e.message}`).join("; ")}`, ""]);
      continue;
    }
    for (const [id, r] of Object.entries(run.result.reactions)) {
      const env = study.envelope[id];
      const gov = env?.design.case === run.id ? "design load" : "";
      rows.push([run.name, id, inUnit(r.fx, "force", system), inUnit(r.fy, "force", system), inUnit(Math.hypot(r.fx, r.fy), "force", system), inUnit(r.m, "moment", system), inUnit(r.n, "force", system), r.state, gov]);
    }
  }
  return {
    id: "cases",
    title: "Reactions per case (forces on the body)",
    columns: [
      { key: "case", label: "Case", align: "left" },
      { key: "support", label: "Support", align: "left" },
      { key: "fx", label: "Fx", unit: f },
      { key: "fy", label: "Fy", unit: f },
      { key: "resultant", label: "Resultant", unit: f },
      { key: "m", label: "M", unit: m },
      { key: "n", label: "Normal n", unit: f },
      { key: "state", label: "State", align: "left" },
      { key: "governs", label: "Governs", align: "left" },
    ],
    rows,
  };
}

export function envelopeTable(study: StudyResult, system: UnitSystem): Table {
  const f = columnUnit("force", system);
  const m = columnUnit("moment", system);
  const name = (id: string) => study.runs.find((r) => r.id === id)?.name ?? id;
  const rows: Cell[][] = [];
  for (const [id, env] of Object.entries(study.envelope)) {
    const c = env.components;
    rows.push([
      id,
      inUnit(c.fx?.max.value, "force", system),
      inUnit(c.fx?.min.value, "force", system),
      inUnit(c.fy?.max.value, "force", system),
      inUnit(c.fy?.min.value, "force", system),
      inUnit(c.m?.max.value, "moment", system),
      inUnit(c.m?.min.value, "moment", system),
      inUnit(env.design.resultant, "force", system),
      Number(env.design.angle.toFixed(2)),
      name(env.design.case),
    ]);
  }
  return {
    id: "envelope",
    title: "Envelope and design loads",
    columns: [
      { key: "support", label: "Support", align: "left" },
      { key: "fxMax", label: "Fx max", unit: f },
      { key: "fxMin", label: "Fx min", unit: f },
      { key: "fyMax", label: "Fy max", unit: f },
      { key: "fyMin", label: "Fy min", unit: f },
      { key: "mMax", label: "M max", unit: m },
      { key: "mMin", label: "M min", unit: m },
      { key: "design", label: "Design load", unit: f },
      { key: "angle", label: "at angle", unit: "°" },
      { key: "case", label: "from case", align: "left" },
    ],
    rows,
    notes: ["The design load of a support is its largest resultant over all cases and combinations, with its direction (force on the body)."],
  };
}

export function stabilityTable(study: StudyResult): Table {
  const rows: Cell[][] = [];
  const fmt = (s: BodyStability[keyof BodyStability]) =>
    "notApplicable" in s ? [null, null, s.notApplicable] : [Number(s.factor.toFixed(3)), s.required, s.pass ? "pass" : "FAIL"];
  for (const run of study.runs as CaseRun[]) {
    if (!run.ok) continue;
    for (const [body, st] of Object.entries(run.stability)) {
      const ot = st.overturning;
      rows.push([run.name, body, "overturning", ...fmt(ot), "notApplicable" in ot ? "" : `about ${ot.about}`]);
      rows.push([run.name, body, "sliding", ...fmt(st.sliding), ""]);
    }
  }
  return {
    id: "stability",
    title: "Factors of safety",
    columns: [
      { key: "case", label: "Case", align: "left" },
      { key: "body", label: "Body", align: "left" },
      { key: "check", label: "Against", align: "left" },
      { key: "factor", label: "Factor" },
      { key: "required", label: "Required" },
      { key: "verdict", label: "Verdict", align: "left" },
      { key: "note", label: "", align: "left" },
    ],
    rows,
    notes: [
      "Overturning: restoring over overturning moment of the applied loads about the contact the body would tip about.",
      "Sliding: friction the bearing contacts can give (Σ μ·n) over the tangential force they must resist.",
    ],
  };
}

/** The hand check: every term with its components, point of action and moment about `about`. */
export function handCheckTable(result: SolveResult, bodyId: string, about: Vec2, system: UnitSystem): Table {
  const eq = result.equations[bodyId];
  const f = columnUnit("force", system);
  const m = columnUnit("moment", system);
  const L = columnUnit("length", system);
  const row = (side: string, t: (typeof eq.forces)[number], sign: number): Cell[] => [
    side,
    t.label,
    inUnit(sign * t.fx, "force", system),
    inUnit(sign * t.fy, "force", system),
    t.at ? `(${inUnit(t.at[0], "length", system)!.toPrecision(4)}, ${inUnit(t.at[1], "length", system)!.toPrecision(4)})` : "—",
    inUnit(sign * termMomentAbout(t, about), "moment", system),
  ];
  const sums = handCheckSums(eq, about);
  return {
    id: `hand-check-${bodyId}`,
    title: `Hand check of ${bodyId}: ΣF = Σ(ṁV)out − Σ(ṁV)in, ΣM about (${about[0]}, ${about[1]})`,
    columns: [
      { key: "side", label: "Side", align: "left" },
      { key: "term", label: "Term", align: "left" },
      { key: "fx", label: "Fx", unit: f },
      { key: "fy", label: "Fy", unit: f },
      { key: "at", label: "Acts at", unit: L, align: "left" },
      { key: "m", label: "M about point", unit: m },
    ],
    rows: [
      ...eq.forces.map((t) => row("forces on the control volume", t, 1)),
      ...eq.momentum.map((t) => row("momentum flux", t, 1)),
      ["total", "Σ forces", inUnit(sums.forces.fx, "force", system), inUnit(sums.forces.fy, "force", system), "", inUnit(sums.forces.m, "moment", system)],
      ["total", "Σ(ṁV)out − Σ(ṁV)in", inUnit(sums.momentum.fx, "force", system), inUnit(sums.momentum.fy, "force", system), "", inUnit(sums.momentum.m, "moment", system)],
      ["total", "imbalance (0 when the body holds)", inUnit(sums.imbalance.fx, "force", system), inUnit(sums.imbalance.fy, "force", system), "", inUnit(sums.imbalance.m, "moment", system)],
    ],
    notes: [
      `ΣFx = ${fmt(sums.forces.fx, "force")} and Σ(ṁV)x = ${fmt(sums.momentum.fx, "force")}; ΣFy = ${fmt(sums.forces.fy, "force")} and Σ(ṁV)y = ${fmt(sums.momentum.fy, "force")}; ΣM about (${about[0]}, ${about[1]}) = ${fmt(sums.forces.m, "moment")} and Σ r × ṁV = ${fmt(sums.momentum.m, "moment")}.`,
    ],
  };
  function fmt(v: number, q: Quantity) {
    return `${formatNumber(inUnit(v, q, system) ?? 0, 4)} ${columnUnit(q, system)}`;
  }
}

/** Parameters as typed and as evaluated. */
export function parametersTable(parsed: Extract<ParseResult, { ok: true }>): Table {
  return {
    id: "parameters",
    title: "Parameters",
    columns: [
      { key: "name", label: "Name", align: "left" },
      { key: "typed", label: "Expression", align: "left" },
      { key: "value", label: "Value", align: "left" },
    ],
    rows: Object.entries(parsed.parameterValues).map(([name, v]) => [
      name,
      String(parsed.file.parameters?.[name]),
      "value" in v ? `${Number(v.value.toPrecision(6))}${v.unit ? " " + v.unit : ""}` : v.error,
    ]),
  };
}

/** Every element with its fields: as typed, and (for expressions) the value in SI units. */
export function inputsTable(parsed: Extract<ParseResult, { ok: true }>): Table {
  const rows: Cell[][] = [];
  const groups = ["bodies", "supports", "loads", "ports", "massSources"] as const;
  const show = (raw: unknown, path: string, name: string): string => {
    const v = parsed.fields[path];
    const kind = FIELD_KIND_BY_NAME[name];
    const unit = kind ? FIELD_UNIT_LABELS[kind] : "";
    if (typeof raw === "number") return `${Number(raw.toPrecision(6))}${unit ? " " + unit : ""}`;
    if (typeof raw === "string" && v && "value" in v) return `${raw} = ${Number(v.value.toPrecision(5))}${unit ? " " + unit : ""}`;
    return String(raw);
  };
  const point = (raw: unknown, path: string): string => {
    const pt = raw as unknown[];
    return `(${show(pt[0], `${path}[0]`, "")}, ${show(pt[1], `${path}[1]`, "")}) m`;
  };
  for (const g of groups) {
    (parsed.file[g] as Array<Record<string, unknown>>).forEach((el, i) => {
      const parts: string[] = [];
      for (const [k, raw] of Object.entries(el)) {
        if (["id", "label", "body", "kind"].includes(k)) continue;
        const path = `${g}[${i}].${k}`;
        if (k === "outline") parts.push(`outline ${(raw as unknown[]).map((p, j) => point(p, `${path}[${j}]`).replace(/ m$/, "")).join(" ")} m`);
        else if (Array.isArray(raw)) parts.push(`${k} ${point(raw, path)}`);
        else parts.push(`${k} ${show(raw, path, k)}`);
      }
      rows.push([el.id as string, (el.kind as string | undefined) ?? g.replace(/ies$/, "y").replace(/s$/, ""), (el.label as string | undefined) ?? "", (el.body as string | undefined) ?? "", parts.join("; ")]);
    });
  }
  const gv = parsed.fields.gravity;
  rows.unshift(["gravity", "", "", "", `${gv && "value" in gv ? Number(gv.value.toPrecision(6)) : 9.80665} m/s² (acts in −y)`]);
  return {
    id: "inputs",
    title: "Elements (as typed; expressions with their values in SI units, angles in degrees)",
    columns: [
      { key: "id", label: "Id", align: "left" },
      { key: "kind", label: "Kind", align: "left" },
      { key: "label", label: "Label", align: "left" },
      { key: "body", label: "Body", align: "left" },
      { key: "fields", label: "Fields", align: "left" },
    ],
    rows,
  };
}

/** CSV of a table: a header with units, numbers unformatted (6 significant figures). */
export function tableToCsv(t: Table, unparse: (rows: unknown[][]) => string): string {
  const header = t.columns.map((c) => (c.unit ? `${c.label} (${c.unit})` : c.label || c.key));
  const rows = t.rows.map((r) => r.map((c) => (typeof c === "number" ? Number(c.toPrecision(6)) : (c ?? ""))));
  return unparse([header, ...rows]);
}
