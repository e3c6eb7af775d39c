// The tables of a comparison: reactions before and after with the change, and every changed input.
import { Fragment } from "react";
import { formatForce } from "@/components/sketches/format";
import type { Comparison, FieldChange } from "@/lib/review/compare";
import { formatNumber } from "@/solver/units";

function signed(newtons: number): string {
  if (Math.abs(newtons) < 0.5) return "±0 N";
  return `${newtons > 0 ? "+" : "−"}${formatForce(Math.abs(newtons))}`;
}

export function ReactionsTable({ comparison }: { comparison: Comparison }) {
  if (!comparison.reactions.length) return <p className="text-sm text-ink-soft">Neither version has a support.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm" data-testid="reaction-changes">
        <caption className="sr-only">Reactions before and after</caption>
        <thead>
          <tr className="border-b border-rule text-left text-xs uppercase tracking-wider text-ink-faint">
            <th scope="col" className="py-1.5 pr-3 font-semibold">Support</th>
            <th scope="col" className="py-1.5 pr-3 text-right font-semibold">Before</th>
            <th scope="col" className="py-1.5 pr-3 text-right font-semibold">After</th>
            <th scope="col" className="py-1.5 pr-3 text-right font-semibold">Change</th>
            <th scope="col" className="py-1.5 pr-3 text-right font-semibold">%</th>
            <th scope="col" className="py-1.5 font-semibold">State</th>
          </tr>
        </thead>
        <tbody>
          {comparison.reactions.map((r) => (
            <tr key={r.id} className="num border-b border-rule-soft last:border-0" data-testid={`reaction-${r.id}`}>
              <td className="py-1.5 pr-3 font-medium">{r.label}</td>
              <td className="py-1.5 pr-3 text-right">{r.before ? formatForce(r.before.resultant) : "— (new)"}</td>
              <td className="py-1.5 pr-3 text-right">{r.after ? formatForce(r.after.resultant) : "— (removed)"}</td>
              <td className="py-1.5 pr-3 text-right font-medium">{r.change ? signed(r.change.abs) : "—"}</td>
              <td className="py-1.5 pr-3 text-right">{r.change?.pct === null || !r.change ? "—" : `${r.change.pct > 0 ? "+" : r.change.pct < 0 ? "−" : ""}${formatNumber(Math.abs(r.change.pct), 3)} %`}</td>
              <td className="py-1.5">{r.stateChange ? <strong className="text-caution">{r.stateChange}</strong> : (r.after?.state ?? r.before?.state ?? "—")}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function Rows({ group, rows }: { group: string; rows: FieldChange[] }) {
  return (
    <>
      {rows.map((f, i) => (
        <tr key={`${group}-${f.field}`} className="border-b border-rule-soft align-top last:border-0">
          <th scope="row" className="py-1.5 pr-3 text-left font-medium">
            {i === 0 ? group : ""}
          </th>
          <td className="py-1.5 pr-3 text-ink-soft">{f.field}</td>
          <td className="num py-1.5 pr-3">{f.before ?? <span className="text-ink-faint">—</span>}</td>
          <td className="py-1.5 pr-1 text-ink-faint" aria-hidden="true">
            →
          </td>
          <td className="num py-1.5 font-medium">{f.after ?? <span className="text-ink-faint">—</span>}</td>
        </tr>
      ))}
    </>
  );
}

export function ChangesTable({ comparison: c }: { comparison: Comparison }) {
  const params = [...c.parameters.changed, ...c.parameters.added, ...c.parameters.removed];
  const nothing = !c.sketch.length && !params.length && !c.elements.added.length && !c.elements.removed.length && !c.elements.changed.length;
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
      <div className="overflow-x-auto">
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
            <Rows group="Sketch" rows={c.sketch} />
            <Rows group="Parameters" rows={params} />
            {c.elements.changed.map((e) => (
              <Fragment key={e.id}>
                <Rows group={`${e.label} (${e.kind})`} rows={e.fields} />
              </Fragment>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
