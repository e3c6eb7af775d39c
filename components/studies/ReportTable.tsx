"use client";
// A result table from the solver's report (the rows the CSV and the calc sheet use), with a CSV button.
// Long names wrap in their cell, so the table fits its panel instead of scrolling sideways.
import { useEffect, useId, useRef, useState, type ReactNode } from "react";
import { cellNumberText, type Cell, type Table } from "@/solver/report";
import { BUTTON } from "@/components/editor/ui";
import { downloadCsv, useCsvName } from "./csv";

/** A name (a case, a support) wraps within a bounded width rather than widening the table past the
 *  panel, a long id without spaces breaking where it must; numbers never wrap. The full text is
 *  also the cell's title. */
// words wrap between words, never inside one ("overturnin g"); only a long id without spaces
// ("rearStabiliserLegOnTheOutriggerBeam") may break anywhere rather than widen the table
const TEXT_CELL = "max-w-[14rem] whitespace-normal";
// a table cell ignores min-width (CSS leaves it undefined): a block inside it holds the width, so a
// narrow panel scrolls the table rather than squeezing a note to a letter a line. A single word
// ("bearing", "N·m") never wraps and needs none; a long id that may break anywhere does.
const minWidthOf = (text: string) => (!/\s/.test(text) ? (text.length > 18 ? "min-w-[4.5rem]" : "") : text.length > 28 ? "min-w-[6.5rem]" : "min-w-[4.5rem]");

/** Whether a box scrolls sideways with more to see on its right (for the fade that says so). */
function useMoreToTheRight() {
  const ref = useRef<HTMLDivElement>(null);
  const [more, setMore] = useState(false);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const check = () => setMore(el.scrollWidth - el.clientWidth - el.scrollLeft > 2);
    check();
    el.addEventListener("scroll", check, { passive: true });
    const ro = typeof ResizeObserver === "undefined" ? null : new ResizeObserver(check);
    ro?.observe(el);
    if (el.firstElementChild) ro?.observe(el.firstElementChild);
    return () => {
      el.removeEventListener("scroll", check);
      ro?.disconnect();
    };
  }, []);
  return { ref, more };
}
/** A wide table's box: it scrolls sideways, and a fade with › at its right edge says there is more
 *  to see (on a phone, the columns past the edge are often the verdict). */
export function SideScroll({ children }: { children: ReactNode }) {
  const { ref, more } = useMoreToTheRight();
  return (
    <div className="relative">
      <div ref={ref} className="relative overflow-x-auto">
        {children}
      </div>
      {more ? (
        <div className="pointer-events-none absolute inset-y-0 right-0 flex w-10 items-center justify-end bg-gradient-to-l from-paper to-transparent pr-0.5 text-[13px] text-ink-faint" data-testid="more-to-the-right">
          <span aria-hidden="true">›</span>
        </div>
      ) : null}
    </div>
  );
}

const wrapOf = (text: string) => (text.length > 18 && !/\s/.test(text) ? "[overflow-wrap:anywhere]" : "[overflow-wrap:break-word]");

/** Rows in runs that share the values of the `groupBy` columns (a case, a support): each run one group. */
function groupRows(table: Table, groupBy: readonly string[]): Array<{ label: string; rows: number[] }> {
  const at = groupBy.map((k) => table.columns.findIndex((c) => c.key === k)).filter((i) => i >= 0);
  const out: Array<{ label: string; rows: number[] }> = [];
  table.rows.forEach((row, ri) => {
    const label = at.map((i) => (row[i] === null ? "—" : String(row[i]))).filter((t) => t !== "").join(" — ");
    const last = out[out.length - 1];
    if (last && last.label === label) last.rows.push(ri);
    else out.push({ label, rows: [ri] });
  });
  return out;
}

export function ReportTable({
  table,
  fileName,
  mark,
  caption,
  notesAbove,
  groupBy,
  testId,
}: {
  table: Table;
  fileName: string;
  /** words to show after a cell, by row and column key (the table's own marks show before it) */
  mark?: (row: Cell[], key: string) => ReactNode;
  /** words about the table, said above it (outside its sideways scroll, so never cut) and as its caption */
  caption?: string;
  /** the table's notes above it rather than under it (a key to marks in its cells, read first) */
  notesAbove?: boolean;
  /** columns whose values head a group of rows (a case, a support) instead of repeating in each
   *  row: the table is narrower by those columns, so it fits its panel. The CSV keeps them. */
  groupBy?: readonly string[];
  testId?: string;
}) {
  const csvName = useCsvName();
  const headingId = useId();
  const shown = table.columns.map((c, i) => ({ c, i })).filter(({ c }) => !groupBy?.includes(c.key));
  const groups = groupBy?.length ? groupRows(table, groupBy) : [{ label: "", rows: table.rows.map((_, i) => i) }];
  const notes = table.notes?.map((n) => (
    <p key={n} className={`${notesAbove ? "mb-1" : "mt-1"} text-[11.5px] text-ink-faint`}>
      {n}
    </p>
  ));
  const renderRow = (ri: number, group: string) => {
    const row = table.rows[ri];
    return (
      <tr key={ri} className="border-b border-rule-soft" data-group={group || undefined}>
        {shown.map(({ c: col, i }, k) => {
          const cell = row[i];
          // a cell with a mark after it ("FAIL (below 1.5)") is kept on one line: the two read as one
          const extra = mark?.(row, col.key);
          const cellMark = table.marks?.[ri]?.[col.key];
          const text = col.align === "left" && typeof cell === "string" && cell !== "";
          return (
            <td
              key={col.key}
              data-col={col.key}
              data-mark={cellMark ? cellMark.symbol : undefined}
              title={cellMark?.text ?? (text ? cell : undefined)}
              className={`px-1.5 py-[3px] align-top ${text && !extra ? `${TEXT_CELL} ${wrapOf(cell)}` : "whitespace-nowrap"} ${col.align === "left" ? "text-left" : "text-right"} ${k === 0 ? "text-ink" : "text-ink-soft"} ${cellMark ? "font-semibold text-ink" : ""}`}
            >
              {cellMark && (
                <span role="img" aria-label={cellMark.text} className="mr-0.5">
                  {cellMark.symbol}
                </span>
              )}
              {cell === null ? "—" : typeof cell === "number" ? cellNumberText(table, cell) : text ? <span className={`inline-block ${minWidthOf(cell)}`.trim()}>{cell}</span> : cell}
              {extra}
            </td>
          );
        })}
      </tr>
    );
  };
  return (
    <div className="min-w-0">
      <div className="mb-1 flex items-center gap-2">
        <h3 id={headingId} className="text-[12.5px] font-semibold text-ink">{table.title}</h3>
        <button type="button" className={`${BUTTON} ml-auto h-6 px-2 text-[11.5px]`} onClick={() => downloadCsv(table, csvName(fileName))} aria-label={`Download “${table.title}” as CSV`}>
          CSV
        </button>
      </div>
      {/* outside the sideways scroll: a key to the table is read whole, however narrow the panel */}
      {caption && (
        <p aria-hidden="true" className="mb-1 text-[11.5px] text-ink-faint" data-testid={testId ? `${testId}-caption` : undefined}>
          {caption}
        </p>
      )}
      {notesAbove && notes}
      <SideScroll>
          <table className="num w-full border-collapse text-[12px]" data-testid={testId} aria-labelledby={caption ? undefined : headingId}>
            {/* the caption names the table for a screen reader; the same words above are for the eye only, so they are not said twice */}
            {caption && <caption className="sr-only">{caption}</caption>}
            <thead>
              <tr className="border-b border-rule text-[11px] text-ink-faint">
                {shown.map(({ c }) => (
                  <th key={c.key} scope="col" className={`px-1.5 py-1 align-bottom font-medium ${c.align === "left" ? "text-left" : "text-right"}`}>
                    {c.label}
                    {c.unit && <span className="ml-0.5 whitespace-nowrap font-normal">({c.unit})</span>}
                  </th>
                ))}
              </tr>
            </thead>
            {groups.map((g, gi) =>
              g.label ? (
                <tbody key={gi}>
                  <tr className="border-b border-rule-soft">
                    <th colSpan={shown.length} scope="rowgroup" data-group-label={g.label} className={`px-1.5 pb-0.5 ${gi === 0 ? "pt-1" : "pt-2.5"} text-left text-[11.5px] font-semibold text-ink [overflow-wrap:break-word]`}>
                      {g.label}
                    </th>
                  </tr>
                  {g.rows.map((ri) => renderRow(ri, g.label))}
                </tbody>
              ) : (
                <tbody key={gi}>{g.rows.map((ri) => renderRow(ri, ""))}</tbody>
              ),
            )}
          </table>
      </SideScroll>
      {!notesAbove && notes}
    </div>
  );
}
