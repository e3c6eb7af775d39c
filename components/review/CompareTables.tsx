// The tables of a comparison: reactions before and after with the change, and every changed input.
import { Fragment } from "react";
import { blankWords, fieldLabel } from "@/components/editor/fieldDefs";
import { SideScroll } from "@/components/studies/ReportTable";
import type { Comparison, FieldChange, ReactionChange, ReactionSnapshot } from "@/lib/review/compare";
import { cellNumberText, unitFamily } from "@/solver/report";
import { convert, formatNumber, type UnitSystem } from "@/solver/units";

/** One unit family for the whole table (kN with kN·m, or N with N·m only when all of it stays below
 *  a kilonewton), as every other table: a 0.66 kN change is not written 664.7 N beside 13.02 kN. */
type Family = { system: UnitSystem; force: string; moment: string };

function familyOf(rows: readonly ReactionChange[], system: UnitSystem): Family {
  const forces: number[] = [];
  const moments: number[] = [];
  for (const r of rows) {
    for (const s of [r.before, r.after]) {
      if (!s) continue;
      forces.push(Math.abs(s.fx), Math.abs(s.fy), s.resultant);
      moments.push(Math.abs(s.m));
    }
    if (r.change) forces.push(Math.abs(r.change.abs));
  }
  const finite = (xs: number[]) => Math.max(0, ...xs.filter(Number.isFinite));
  return { system, ...unitFamily(system, { force: finite(forces), moment: finite(moments) }) };
}

/** A figure of the table in its column's unit (the header names it), printed as every result table
 *  and the calc sheet print theirs (`cellNumberText`), so a reaction reads the same digits in both. */
function cell(valueSI: number, q: "force" | "moment", u: Family): string {
  return cellNumberText({}, convert(valueSI, q, u.system, q === "force" ? u.force : u.moment).value);
}

function signed(newtons: number, u: Family): string {
  if (Math.abs(newtons) < 0.5) return "±0";
  return `${newtons > 0 ? "+" : "−"}${cell(Math.abs(newtons), "force", u)}`;
}

const COMPONENTS: Array<{ key: keyof Pick<ReactionSnapshot, "fx" | "fy" | "m">; label: string }> = [
  { key: "fx", label: "Fx" },
  { key: "fy", label: "Fy" },
  { key: "m", label: "M" },
];

/** "Fx 1.200 → 1.400 kN · Fy … · M … kN·m": the components that are not zero on either side, in the table's units. */
function componentsText(r: ReactionChange, u: Family): string {
  // figures keep their zeros, as in the tables (6.240 kN, not 6.24 kN)
  const show = (s: ReactionSnapshot | null, key: "fx" | "fy" | "m") => (s ? cell(s[key], key === "m" ? "moment" : "force", u) : "—");
  return COMPONENTS.filter(({ key }) => Math.abs(r.before?.[key] ?? 0) > 1e-9 || Math.abs(r.after?.[key] ?? 0) > 1e-9 || key !== "m")
    .map(({ key, label }) => `${label} ${show(r.before, key)} → ${show(r.after, key)} ${key === "m" ? u.moment : u.force}`)
    .join(" · ");
}

export function ReactionsTable({ comparison, units = "SI" }: { comparison: Comparison; units?: UnitSystem }) {
  if (!comparison.reactions.length) return <p className="text-sm text-ink-soft">Neither version has a support.</p>;
  const u = familyOf(comparison.reactions, units);
  return (
    <SideScroll>
      <table className="w-full text-sm" data-testid="reaction-changes">
        <caption className="sr-only">Reactions before and after</caption>
        <thead>
          <tr className="border-b border-rule text-left text-xs uppercase tracking-wider text-ink-faint">
            <th scope="col" className="py-1.5 pr-3 font-semibold">Support</th>
            <th scope="col" className="py-1.5 pr-3 text-right font-semibold">Resultant before <span className="normal-case">({u.force})</span></th>
            <th scope="col" className="py-1.5 pr-3 text-right font-semibold">After <span className="normal-case">({u.force})</span></th>
            <th scope="col" className="py-1.5 pr-3 text-right font-semibold">Change <span className="normal-case">({u.force})</span></th>
            <th scope="col" className="py-1.5 pr-3 text-right font-semibold">%</th>
            <th scope="col" className="py-1.5 font-semibold">State</th>
          </tr>
        </thead>
        <tbody>
          {comparison.reactions.map((r) => (
            <Fragment key={r.id}>
              <tr className="num" data-testid={`reaction-${r.id}`}>
                <td className="pt-1.5 pr-3 font-medium">{r.label}</td>
                <td className="pt-1.5 pr-3 text-right">{r.before ? cell(r.before.resultant, "force", u) : "— (new)"}</td>
                <td className="pt-1.5 pr-3 text-right">{r.after ? cell(r.after.resultant, "force", u) : "— (removed)"}</td>
                <td className="pt-1.5 pr-3 text-right font-medium">{r.change ? signed(r.change.abs, u) : "—"}</td>
                <td className="pt-1.5 pr-3 text-right">{r.change?.pct === null || !r.change ? "—" : `${r.change.pct > 0 ? "+" : r.change.pct < 0 ? "−" : ""}${formatNumber(Math.abs(r.change.pct), 3)} %`}</td>
                <td className="pt-1.5">{r.stateChange ? <strong className="text-caution">{r.stateChange}</strong> : (r.after?.word ?? r.before?.word ?? "—")}</td>
              </tr>
              <tr className="num border-b border-rule-soft last:border-0" data-testid={`reaction-${r.id}-components`}>
                <td colSpan={6} className="pb-1.5 pl-3 pt-0.5 text-xs text-ink-soft">
                  {componentsText(r, u)}
                </td>
              </tr>
            </Fragment>
          ))}
        </tbody>
      </table>
    </SideScroll>
  );
}

/** A value not given: what that means where it means something ("blank (−90°, down the page)"), else a dash. */
function Blank({ kind, field }: { kind?: string; field: string }) {
  const words = kind ? blankWords(kind, field) : null;
  return <span className="font-normal text-ink-faint">{words ?? "—"}</span>;
}

/** A field in the properties form's words: the element's kind now, else the kind it was (a
 *  contact's friction on a support now a pin), else the file's name. */
function fieldName(field: string, kind?: string, kindBefore?: string): string {
  if (!kind) return field;
  const now = fieldLabel(kind, field);
  return now === field && kindBefore ? fieldLabel(kindBefore, field) : now;
}

/** Rows of one group; `kind` (an element kind, or "sketch") turns file field names into the properties form's words; `kindBefore`, the kind it was, when that changed. */
function Rows({ group, rows, kind, kindBefore }: { group: string; rows: FieldChange[]; kind?: string; kindBefore?: string }) {
  return (
    <>
      {rows.map((f, i) => (
        <tr key={`${group}-${f.field}`} className="border-b border-rule-soft align-top last:border-0">
          <th scope="row" className="py-1.5 pr-3 text-left font-medium">
            {/* the group is written once on screen, and read as the header of every row in it */}
            {i === 0 ? group : <span className="sr-only">{group}</span>}
          </th>
          <td className="py-1.5 pr-3 text-ink-soft">{fieldName(f.field, kind, kindBefore)}</td>
          <td className="num py-1.5 pr-3">{f.before ?? <Blank kind={kindBefore ?? kind} field={f.field} />}</td>
          <td className="py-1.5 pr-1 text-ink-faint" aria-hidden="true">
            →
          </td>
          <td className="num py-1.5 font-medium">{f.after ?? <Blank kind={kind} field={f.field} />}</td>
        </tr>
      ))}
    </>
  );
}

export function ChangesTable({ comparison: c }: { comparison: Comparison }) {
  const params = [...c.parameters.changed, ...c.parameters.added, ...c.parameters.removed];
  // a change of a case or a required factor of safety is a change in the inputs: never "nothing"
  const studies = (c.studies ?? []).map((s) => ({ ...s, field: s.change === "changed" ? s.field : `${s.field} (${s.change})` }));
  const nothing = !c.sketch.length && !params.length && !studies.length && !c.elements.added.length && !c.elements.removed.length && !c.elements.changed.length;
  if (nothing) return <p className="text-sm text-ink-soft">Nothing in the inputs differs.</p>;
  return (
    <div className="space-y-4">
      {c.elements.added.length || c.elements.removed.length ? (
        <ul className="space-y-1 text-sm" data-testid="added-removed">
          {c.elements.added.map((e) => (
            <li key={`a-${e.id}`}>
              <span className="font-semibold text-reaction">+ added</span> {e.kind} <strong>{e.label}</strong>
            </li>
          ))}
          {c.elements.removed.map((e) => (
            <li key={`r-${e.id}`}>
              <span className="font-semibold text-accent-deep">× removed</span> {e.kind} <strong>{e.label}</strong>
            </li>
          ))}
        </ul>
      ) : null}
      {/* only additions or removals: no table of fields, not a header over nothing */}
      {!c.sketch.length && !params.length && !studies.length && !c.elements.changed.length ? null : (
      <SideScroll>
        <table className="w-full text-sm" data-testid="field-changes">
          <caption className="sr-only">Inputs that changed, before and after</caption>
          <thead>
            <tr className="border-b border-rule text-left text-xs uppercase tracking-wider text-ink-faint">
              <th scope="col" className="py-1.5 pr-3 font-semibold">Element</th>
              <th scope="col" className="py-1.5 pr-3 font-semibold">Field</th>
              <th scope="col" className="py-1.5 pr-3 font-semibold">Before</th>
              <th scope="col" className="py-1.5 pr-1">
                <span className="sr-only">to</span>
              </th>
              <th scope="col" className="py-1.5 font-semibold">After</th>
            </tr>
          </thead>
          <tbody>
            <Rows group="Sketch" rows={c.sketch} kind="sketch" />
            <Rows group="Parameters" rows={params} />
            <Rows group="Cases and studies" rows={studies} />
            {c.elements.changed.map((e) => (
              <Fragment key={e.id}>
                <Rows group={`${e.label} (${e.kind})`} rows={e.fields} kind={e.kind} kindBefore={e.kindBefore} />
              </Fragment>
            ))}
          </tbody>
        </table>
      </SideScroll>
      )}
    </div>
  );
}
