// The studies' result tables on screen: a long case or support name wraps in its cell (the table
// fits its panel rather than scrolling sideways) and keeps its full text as the cell's title;
// numbers never wrap; the M column is there only when a fixed support can carry a moment.
import { readFileSync } from "node:fs";
import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { ReportTable } from "@/components/studies/ReportTable";
import { withoutAbsentMoment } from "@/canvas/studies/tables";
import { parseSketch, solveCases } from "@/solver/index";
import { caseReactionTable, envelopeTable, stabilityTable } from "@/solver/report";
import { belowRequired } from "@/components/studies/CaseTables";

const load = (n: string) => JSON.parse(readFileSync(`tests/fixtures/sketches/${n}.json`, "utf8"));
const LONG_CASE = "Run-out with the discharge valve fully open, the strainer clean and the sump at its highest level";

function study(file: unknown) {
  const p = parseSketch(file);
  if (!p.ok) throw new Error(JSON.stringify(p.errors));
  return solveCases(p.file);
}

/** The trailer (contacts only) with a long-named case and a support with a long id (demo data). */
function trailer() {
  const file = load("fire-monitor-trailer");
  for (const s of file.supports) if (s.id === "leg") s.label = s.id = "rearStabiliserLegOnTheOutriggerBeam";
  file.cases = [
    { id: "low", name: "Low throw", parameters: { theta: "15 deg" } },
    { id: "long", name: LONG_CASE, parameters: { theta: "20 deg" } },
  ];
  return file;
}

describe("ReportTable", () => {
  it("keeps a verdict and its mark on one line: FAIL (below 1.5)", () => {
    // the trailer as drawn: 0.55 × Σn over |Σt| on wet asphalt falls short of 1.5 (common practice)
    const s = study(trailer());
    const table = stabilityTable(s, "SI");
    render(<ReportTable table={table} fileName="factors-of-safety" testId="stability" mark={belowRequired(table)} />);
    const failed = within(screen.getByTestId("stability"))
      .getAllByRole("cell")
      .filter((td) => td.getAttribute("data-col") === "verdict" && td.textContent?.startsWith("FAIL"));
    expect(failed.length).toBeGreaterThan(0);
    for (const td of failed) {
      expect(td.textContent).toBe("FAIL(below 1.5)");
      expect(td.className).toContain("whitespace-nowrap");
    }
  });

  it("wraps long names in their cells with the full name as the title; numbers stay on one line", () => {
    const s = study(trailer());
    render(<ReportTable table={withoutAbsentMoment(envelopeTable(s, "SI"), s)} fileName="envelope" testId="envelope" />);
    const table = screen.getByTestId("envelope");
    const named = within(table).getAllByTitle(LONG_CASE);
    expect(named.length).toBeGreaterThan(0);
    for (const cell of named) {
      expect(cell.textContent).toBe(LONG_CASE);
      expect(cell.className).toContain("whitespace-normal");
      expect(cell.className).toContain("max-w-[14rem]");
      expect(cell.className).not.toContain("whitespace-nowrap");
    }
    // an id without spaces may break anywhere rather than widen the table
    const id = within(table).getAllByTitle("rearStabiliserLegOnTheOutriggerBeam")[0];
    expect(id.className).toContain("[overflow-wrap:anywhere]");
    // a word of the trade is never broken inside: the component names wrap only between words
    const component = within(table).getAllByText("Fx")[0].closest("td")!;
    expect(component.className).toContain("[overflow-wrap:break-word]");
    // and a text of several words holds a least width (a cell's own min-width does nothing in a
    // table): a narrow panel scrolls the table sideways instead of squeezing a note to a letter a
    // line; a single word cannot be squeezed and holds none, so short columns stay narrow
    expect(within(component).getByText("Fx").className).toBe("inline-block");
    expect(within(table).getAllByTitle(LONG_CASE)[0].querySelector("span")!.className).toBe("inline-block min-w-[6.5rem]");
    expect(within(table).getAllByTitle("Low throw")[0].querySelector("span")!.className).toBe("inline-block min-w-[4.5rem]");
    for (const cell of table.querySelectorAll("td[data-col=max], td[data-col=min]")) expect(cell.className).toContain("whitespace-nowrap");
  });

  it("shows no M column of zeros when no support is fixed, and keeps it for a fixed support", () => {
    const s = study(trailer());
    const { unmount } = render(<ReportTable table={withoutAbsentMoment(caseReactionTable(s, "SI"), s)} fileName="cases" testId="cases" />);
    const heads = within(screen.getByTestId("cases")).getAllByRole("columnheader").map((h) => h.textContent);
    expect(heads).toContain("Fx(kN)");
    expect(heads.some((h) => h?.startsWith("M"))).toBe(false);
    unmount();

    const bend = study(load("pipe-bend-anchor"));
    render(<ReportTable table={withoutAbsentMoment(caseReactionTable(bend, "SI"), bend)} fileName="cases" testId="cases" />);
    expect(within(screen.getByTestId("cases")).getAllByRole("columnheader").map((h) => h.textContent)).toContain("M(kN·m)");
  });
});
