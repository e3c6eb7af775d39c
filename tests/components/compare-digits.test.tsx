// The comparison's reaction table prints a reaction with the digits of the version's own reaction
// table and the calc sheet (both print `reactionTable` cells through `cellNumberText`).
import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { ReactionsTable } from "@/components/review/CompareTables";
import { compareSketches } from "@/lib/review/compare";
import { parseSketch, solve } from "@/solver";
import { cellNumberText, reactionTable } from "@/solver/report";
import type { SketchFile } from "@/solver/schema";
import type { UnitSystem } from "@/solver/units";
import { fixture } from "../api/sketch-fixtures";

function solved(doc: unknown) {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error("does not parse");
  return solve(p.sketch);
}

describe("compare table digits", () => {
  for (const units of ["SI", "US"] as UnitSystem[]) {
    it(`a resultant before and after reads as the version's reaction table prints it (${units})`, () => {
      const before = fixture("fire-monitor-trailer") as unknown as SketchFile;
      const after = structuredClone(before) as SketchFile & { bodies: Array<{ mass: unknown }> };
      after.bodies[0].mass = 1400;
      const comparison = compareSketches(before, after, units);
      render(<ReactionsTable comparison={comparison} units={units} />);
      const tables = [solved(before), solved(after)].map((r) => reactionTable(r, units));
      const column = (t: ReturnType<typeof reactionTable>) => t.columns.findIndex((c) => c.key === "resultant");
      // one unit for both, so the digits can be held side by side
      const unit = tables[0].columns[column(tables[0])].unit!;
      expect(tables[1].columns[column(tables[1])].unit).toBe(unit);
      expect(screen.getByRole("columnheader", { name: new RegExp(`^After \\(${unit}\\)$`) })).toBeTruthy();
      expect(comparison.reactions.length).toBeGreaterThan(1);
      for (const r of comparison.reactions) {
        const cells = within(screen.getByTestId(`reaction-${r.id}`)).getAllByRole("cell");
        const printed = tables.map((t) => cellNumberText(t, t.rows.find((row) => row[0] === r.id)![column(t)] as number));
        expect([r.id, cells[1].textContent, cells[2].textContent]).toEqual([r.id, ...printed]);
      }
    });
  }
});
