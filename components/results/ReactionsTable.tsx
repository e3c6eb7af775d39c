"use client";
// Reactions, one row per support: the force on the body (as the free-body diagram draws it) or
// the load on the support (equal and opposite: what an anchor designer wants). The rows come from
// the solver's reaction table, the same rows the CSV and the calc sheet use.
import { useDeferredValue, useMemo } from "react";
import { cellNumberText, reactionTable } from "@/solver/report";
import { useAnalysis, useEditor, useStores } from "@/canvas/context";
import { useResultScale } from "./useHeldScale";
import { withoutEmptyReactionColumns } from "@/canvas/studies/tables";

export type Sense = "body" | "support";

/** Short headings: the table is read beside the drawing, often in a narrow window. */
const SHORT: Record<string, string> = { support: "Support", fx: "Fx", fy: "Fy", resultant: "Resultant", angle: "Direction", m: "M", n: "n", t: "t", state: "State", margin: "Margin" };
const TITLES: Record<string, string> = { n: "Normal force along the support's direction", t: "Tangential (friction) force, positive 90° counter-clockwise from the contact's normal", margin: "Contacts and ties: n while bearing or taut; none (—) once lifted or slack, when it carries nothing", angle: "Direction of the force, degrees counter-clockwise from +x" };

export function ReactionsTable({ sense }: { sense: Sense }) {
  // deferred: a drag's frames come first, the panel catches up when the main thread is free
  const shown = useDeferredValue(useAnalysis((s) => s.shown));
  const numeric = useDeferredValue(useAnalysis((s) => s.shownSketch));
  const stale = useAnalysis((s) => s.stale);
  const units = useEditor((s) => s.units);
  const selection = useEditor((s) => s.selection);
  const { editor } = useStores();
  // the whole result's units, as the hand check and the drawing write it
  const scale = useResultScale();
  const table = useMemo(() => {
    if (!shown) return null;
    // the bodies by their labels, for the note on a body that is not held (the rows keep the supports' ids)
    const names = Object.fromEntries((numeric?.bodies ?? []).map((b) => [b.id, b.label || b.id]));
    const t = reactionTable(shown, units, { onSupport: sense === "support", scale, names });
    // the kind shows in the support's tooltip; the columns keep their keys for tests and CSV
    return { ...withoutEmptyReactionColumns(t), kinds: t.rows.map((r) => String(r[1])) };
  }, [shown, units, sense, scale, numeric]);
  if (!table || !shown) return <p className="p-2 text-[12.5px] text-ink-faint">No reactions yet.</p>;
  if (!table.rows.length) return <p className="p-2 text-[12.5px] text-ink-faint">No supports: add a pin, roller, contact, fixed support or tie to the body.</p>;
  const labelOf = (id: string) => numeric?.supports.find((s) => s.id === id)?.label;
  return (
    <div className={stale ? "opacity-60" : ""}>
      <table className="num w-full border-collapse text-[12px]" data-testid="reactions" aria-describedby="reactions-caption">
        <caption id="reactions-caption" className="caption-top pb-1 text-left text-[11.5px] text-ink-faint">
          {sense === "body" ? "Forces on the body from each support, as drawn (double arrows)." : "Loads on the supports: every reaction reversed, n and t too (a bearing contact's n is negative here) — what each anchor, foot or foundation must carry."}
          {table.columns.some((c) => c.key === "t") ? " t: the friction force along the contact's surface, positive 90° counter-clockwise from its normal n (a contact facing up: positive toward −x)." : ""}
          {table.columns.some((c) => c.key === "margin") ? " Margin: how far a bearing contact's normal force (a taut tie's tension) is from zero, where it lifts off (goes slack); one that has lifted or gone slack carries nothing and has none (—); friction is judged in the words above, not here." : ""}
        </caption>
        <thead>
          <tr className="border-b border-rule text-[11px] text-ink-faint">
            {table.columns.map((c) => (
              <th key={c.key} scope="col" title={TITLES[c.key]} className={`whitespace-nowrap px-1 py-1 align-bottom font-medium ${c.align === "left" ? "text-left" : "text-right"}`}>
                {SHORT[c.key] ?? c.label}
                {/* the unit on its own line: the columns are as wide as their numbers, not their headings */}
                {c.unit && <span className="block font-normal">({c.unit})</span>}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {table.rows.map((row, ri) => {
            const id = String(row[0]);
            const label = labelOf(id);
            const selected = selection.includes(id);
            return (
              <tr
                key={id}
                data-support={id}
                className={`cursor-pointer border-b border-rule-soft ${selected ? "bg-accent-soft/60" : "hover:bg-paper-deep/60"}`}
                onClick={() => editor.getState().select([id])}
              >
                {row.map((cell, i) => {
                  const col = table.columns[i];
                  let text: string;
                  if (i === 0) text = label || id;
                  // the table's own rule for its figures, the hand check's: "0.05000" as its term reads
                  else if (typeof cell === "number") text = cellNumberText(table, cell);
                  else text = cell === null ? "—" : String(cell);
                  const warn = col.key === "state" && text !== "bearing" && text !== "holds" && text !== "taut";
                  return (
                    <td key={col.key} data-col={col.key} title={i === 0 ? `${table.kinds[ri]} ${id}${label ? ` — ${label}` : ""}` : undefined}
                      className={`px-1 py-[3px] ${col.align === "left" ? "text-left" : "text-right"} ${i === 0 ? "max-w-[11rem] truncate text-ink" : "text-ink-soft"} ${warn ? "font-semibold text-caution" : ""}`}>
                      {text}
                    </td>
                  );
                })}
              </tr>
            );
          })}
        </tbody>
      </table>
      {table.notes?.map((n) => (
        <p key={n} className="mt-1 text-[11.5px] text-ink-faint" data-testid="reactions-note">
          {n}
        </p>
      ))}
    </div>
  );
}
