"use client";
// A result table from the solver's report (the rows the CSV and the calc sheet use), with a CSV button.
// Long names wrap in their cell, so the table fits its panel instead of scrolling sideways.
import type { ReactNode } from "react";
import type { Cell, Table } from "@/solver/report";
import { formatNumber } from "@/solver/units";
import { BUTTON } from "@/components/editor/ui";
import { downloadCsv } from "./csv";

/** A name (a case, a support) wraps within a bounded width rather than widening the table past the
 *  panel, a long id without spaces breaking where it must; numbers never wrap. The full text is
 *  also the cell's title. */
// words wrap between words, never inside one ("overturnin g"); only a long id without spaces
// ("rearStabiliserLegOnTheOutriggerBeam") may break anywhere rather than widen the table
const TEXT_CELL = "max-w-[14rem] min-w-[4.5rem] whitespace-normal";
const wrapOf = (text: string) => (text.length > 18 && !/\s/.test(text) ? "[overflow-wrap:anywhere]" : "[overflow-wrap:break-word]");

export function ReportTable({
  table,
  fileName,
  mark,
  caption,
  testId,
}: {
  table: Table;
  fileName: string;
  /** words to show after a cell, by row and column key (the table's own marks show before it) */
  mark?: (row: Cell[], key: string) => ReactNode;
  caption?: string;
  testId?: string;
}) {
  return (
    <div className="min-w-0">
      <div className="mb-1 flex items-center gap-2">
        <h3 className="text-[12.5px] font-semibold text-ink">{table.title}</h3>
        <button type="button" className={`${BUTTON} ml-auto h-6 px-2 text-[11.5px]`} onClick={() => downloadCsv(table, fileName)} aria-label={`Download “${table.title}” as CSV`}>
          CSV
        </button>
      </div>
      <div className="relative overflow-x-auto">
        <table className="num w-full border-collapse text-[12px]" data-testid={testId}>
          {caption && <caption className="caption-top pb-1 text-left text-[11.5px] text-ink-faint">{caption}</caption>}
          <thead>
            <tr className="border-b border-rule text-[11px] text-ink-faint">
              {table.columns.map((c) => (
                <th key={c.key} scope="col" className={`px-1.5 py-1 align-bottom font-medium ${c.align === "left" ? "text-left" : "text-right"}`}>
                  {c.label}
                  {c.unit && <span className="ml-0.5 whitespace-nowrap font-normal">({c.unit})</span>}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {table.rows.map((row, ri) => (
              <tr key={ri} className="border-b border-rule-soft">
                {row.map((cell, i) => {
                  const col = table.columns[i];
                  const extra = mark?.(row, col.key);
                  const cellMark = table.marks?.[ri]?.[col.key];
                  const text = col.align === "left" && typeof cell === "string" && cell !== "";
                  return (
                    <td
                      key={col.key}
                      data-col={col.key}
                      data-mark={cellMark ? cellMark.symbol : undefined}
                      title={cellMark?.text ?? (text ? cell : undefined)}
                      className={`px-1.5 py-[3px] align-top ${text ? `${TEXT_CELL} ${wrapOf(cell)}` : "whitespace-nowrap"} ${col.align === "left" ? "text-left" : "text-right"} ${i === 0 ? "text-ink" : "text-ink-soft"} ${cellMark ? "font-semibold text-ink" : ""}`}
                    >
                      {cellMark && (
                        <span role="img" aria-label={cellMark.text} className="mr-0.5">
                          {cellMark.symbol}
                        </span>
                      )}
                      {cell === null ? "—" : typeof cell === "number" ? formatNumber(cell, 4, { keepZeros: true }) : cell}
                      {extra}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {table.notes?.map((n) => (
        <p key={n} className="mt-1 text-[11.5px] text-ink-faint">
          {n}
        </p>
      ))}
    </div>
  );
}
