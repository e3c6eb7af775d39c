// Download a result table as CSV (units in the header, numbers unformatted).
import Papa from "papaparse";
import { createContext, useContext } from "react";
import { tableToCsv, type Table } from "@/solver/report";

/** The UTF-8 byte order mark: without it Excel opens a CSV in the system's code page, and −, °, ·,
 *  μ and ▲ come out as mojibake (common practice for CSV meant for Excel). */
export const UTF8_BOM = "\ufeff";

/** The file's text: the byte order mark, then the table (units in its header, full-precision numbers). */
export function csvOf(table: Table): string {
  return UTF8_BOM + tableToCsv(table, (rows) => Papa.unparse(rows));
}

/** What the downloads are of ("DN150 bend v2"): the page says, and each file name starts with it. */
export const CsvSubject = createContext("");

/** A download's file name: the subject, then what the table is ("DN150-bend-v2-reactions.csv"). */
export function useCsvName(): (what: string) => string {
  const subject = useContext(CsvSubject).trim();
  return (what) => (subject ? `${subject} ${what}` : what);
}

export function downloadCsv(table: Table, name: string): void {
  const blob = new Blob([csvOf(table)], { type: "text/csv;charset=utf-8" });
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = `${name.replace(/[^\w.-]+/g, "-").replace(/^-+|-+$/g, "")}.csv`;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
