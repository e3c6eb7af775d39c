// A per-case "slips" whose body as a whole holds: one contact needs more friction than its own μ
// gives, while the body's contacts together give what it needs (no `SLIP` on the body itself). The
// Cases tab, a version's page and the calc sheet mark such a state and say why in one note, so
// "slips" is not read as the body sliding — whether its factor against sliding also meets the
// required one (1.5, say) is the stability table's check, said beside it. Plain functions: the server's calc sheet uses them too.
import type { StudyResult } from "@/solver/cases";
import { type Cell, type Table, nameIn, stateWord } from "@/solver/report";

/** The footnote mark on a per-case "slips" whose body as a whole holds. */
export const SLIP_NOTE_MARK = "*";

/** The note under the table, after the mark. */
export const SLIP_NOTE =
  "slips: that contact needs more friction than its own μ gives (|t| more than μ·n), but its body as a whole holds: all its contacts together give the friction it needs (Σ μ·n at least |Σ t|, a factor of 1 or more against sliding; the factors of safety say whether that meets the required one). Statics does not say how friction is shared between contacts; the others can take up what this one cannot, so the body need not slide, though this contact may slip a little until they do (common practice).";

export const slipRowKey = (caseName: Cell, support: Cell) => `${caseName}\u0000${support}`;

/**
 * The rows (case name, support name) whose state says "slips" — that one contact needs more than
 * its own μ gives — while its body as a whole holds: all its contacts together (Σ μ·n at least
 * |Σ t|) give the friction it needs.
 */
export function slipsWithFrictionToSpare(result: StudyResult): Set<string> {
  const out = new Set<string>();
  for (const run of result.runs) {
    if (!run.ok) continue;
    for (const [id, r] of Object.entries(run.result.reactions)) {
      if (stateWord(r, run.result.bodies[r.body]?.status) !== "slips") continue;
      // the body as a whole holds where the solve does not warn SLIP on the body itself (ids
      // [body]: Σ μ·n short of |Σ t|), as the sweep's words and the limit finder read it — a
      // factor against sliding of 1 or more, whether or not it meets the required one
      if (!run.result.warnings.some((w) => w.code === "SLIP" && w.ids.includes(r.body))) out.add(slipRowKey(run.name, nameIn(result, id)));
    }
  }
  return out;
}

/**
 * The reactions-per-case table as printed (the calc sheet): each such state written "slips *" and
 * the note added under the table. The table's rows name the case and the support as the screen's do.
 */
export function withSlipNote(table: Table, result: StudyResult): Table {
  const spare = slipsWithFrictionToSpare(result);
  if (!spare.size) return table;
  const col = (key: string) => table.columns.findIndex((c) => c.key === key);
  const [caseCol, supportCol, stateCol] = [col("case"), col("support"), col("state")];
  if (caseCol < 0 || supportCol < 0 || stateCol < 0) return table;
  const rows = table.rows.map((row) =>
    spare.has(slipRowKey(row[caseCol], row[supportCol])) ? row.map((cell, i) => (i === stateCol ? `${cell} ${SLIP_NOTE_MARK}` : cell)) : row,
  );
  return { ...table, rows, notes: [...(table.notes ?? []), `${SLIP_NOTE_MARK} ${SLIP_NOTE}`] };
}
