// Download a result table as CSV (units in the header, numbers unformatted).
import Papa from "papaparse";
import { tableToCsv, type Table } from "@/solver/report";

export function csvOf(table: Table): string {
  return tableToCsv(table, (rows) => Papa.unparse(rows));
}

export function downloadCsv(table: Table, name: string): void {
  const blob = new Blob([csvOf(table)], { type: "text/csv;charset=utf-8" });
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = `${name.replace(/[^\w.-]+/g, "-")}.csv`;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
