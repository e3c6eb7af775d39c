// A report table on a page (a version's reactions, the Cases tab) prints each figure as the results
// panel and the calc sheet do: a table that asks for significant figures (`figures`: the reactions,
// 4 with zeros kept) gets them, so a 50 N reaction beside a 5 kN one reads 0.05000 kN everywhere.
import { render, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { ReportTable } from "@/components/studies/ReportTable";
import { parseSketch, solve } from "@/solver";
import { reactionTable } from "@/solver/report";
import { twoReactions } from "../fixtures/one-unit";

describe("a report table's figures", () => {
  // a 2 m beam without mass on a pin and a pad, 5 kN down over the pin and 50 N over the pad: each
  // support carries the load over it (statics, common practice)
  it("a reaction table's cells keep 4 significant figures with their zeros: 5.000 and 0.05000 kN", () => {
    const parsed = parseSketch(twoReactions);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    const result = solve(parsed.sketch);
    const table = reactionTable(result, "SI", { names: { pin: "pin", pad: "pad" } });
    const { getByTestId } = render(<ReportTable table={table} fileName="reactions" testId="t" />);
    const fy = (support: string) => {
      const row = within(getByTestId("t")).getAllByRole("row").find((r) => r.textContent?.startsWith(support))!;
      return row.querySelector('[data-col="fy"]')!.textContent;
    };
    expect(fy("pin")).toBe("5.000");
    expect(fy("pad")).toBe("0.05000");
  });
});
