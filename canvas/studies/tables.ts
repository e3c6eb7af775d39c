// The studies' result tables as shown (on screen, in the CSV and on the calc sheet): only a fixed
// support resists a moment, so with none in the sketch the M column would be a row of zeros that
// reads like a computed result. It is left out then, and kept (zeros included) when a fixed
// support exists.
import type { StudyResult } from "@/solver/cases";
import { withRowUnitsInHeader, type Table } from "@/solver/report";

/** Does any support in the study carry a moment (is any of them a fixed support)? */
export function hasMomentSupport(study: StudyResult): boolean {
  if (Object.values(study.envelope).some((e) => e.kind === "fixed")) return true;
  // a support whose body is left out of the envelope in every case still has its kind in the runs
  return study.runs.some((run) => run.ok && Object.values(run.result.reactions).some((r) => r.kind === "fixed"));
}

/** The table without its support-moment column (key "m"), or the envelope without its M rows,
 *  when no support can carry a moment. */
export function withoutAbsentMoment(table: Table, study: StudyResult): Table {
  if (hasMomentSupport(study)) return table;
  const component = table.columns.findIndex((c) => c.key === "component");
  if (component >= 0) {
    const keep = table.rows.map((r) => r[component] !== "M");
    // without its moment rows, the headings say the force unit alone
    return withRowUnitsInHeader({ ...table, rows: table.rows.filter((_, i) => keep[i]), marks: table.marks?.filter((_, i) => keep[i]) });
  }
  const ci = table.columns.findIndex((c) => c.key === "m");
  if (ci < 0) return table;
  return {
    ...table,
    columns: table.columns.filter((_, i) => i !== ci),
    rows: table.rows.map((r) => r.filter((_, i) => i !== ci)),
    marks: table.marks?.map((m) => {
      if (!m || !("m" in m)) return m;
      const { m: _dropped, ...rest } = m;
      return Object.keys(rest).length ? rest : undefined;
    }),
  };
}

/** One run's reaction table as shown beside a drawing: without the kind (the support's name says
 *  it) and without the columns with nothing to say (no moments without a fixed support, no t
 *  without friction, no n or margin without a one-sided support). */
export function withoutEmptyReactionColumns(table: Table): Table {
  const empty = (i: number) => table.rows.every((r) => r[i] === null || r[i] === 0);
  const keep = table.columns.map((c, i) => (c.key === "kind" || (["m", "n", "t", "margin"].includes(c.key) && empty(i)) ? -1 : i)).filter((i) => i >= 0);
  return { ...table, columns: keep.map((i) => table.columns[i]), rows: table.rows.map((r) => keep.map((i) => r[i])) };
}

/** The table without one column (a sketch's only run needs no "Case" column). */
export function withoutColumn(table: Table, key: string): Table {
  const ci = table.columns.findIndex((c) => c.key === key);
  if (ci < 0) return table;
  return { ...table, columns: table.columns.filter((_, i) => i !== ci), rows: table.rows.map((r) => r.filter((_, i) => i !== ci)) };
}
