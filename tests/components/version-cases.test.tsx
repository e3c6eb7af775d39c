// A version's review page shows its operating cases as the editor's Cases tab does: every case's
// reactions with the governing case marked, the envelope and the design loads.
import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { VersionCases } from "@/components/review/VersionReview";
import washingCart from "@/canvas/examples/washing-cart.json";
import type { SketchFile } from "@/solver/schema";

const doc = washingCart as unknown as SketchFile;

describe("the operating cases on a version's page", () => {
  it("lists each case's reactions; parked, the wheels carry the cart's weight alone", () => {
    render(<VersionCases document={doc} units="SI" />);
    const section = screen.getByRole("region", { name: "Operating cases" });
    const table = within(section).getByTestId("case-reactions");
    for (const c of doc.cases!) expect(table).toHaveTextContent(c.name);
    // pump off (flow factor 0): no jet, so the two wheels' Fy add up to the weight,
    // 85 kg × 9.80665 m/s² = 833.6 N (statics, common practice; standard gravity: ISO 80000-3)
    // each case heads its group of rows, one a support
    const parked = [...table.querySelectorAll<HTMLElement>("tr[data-group]")].filter((r) => r.dataset.group === "Pump off (parked)");
    expect(parked).toHaveLength(2);
    const fy = parked.map((r) => Number(r.querySelector("td[data-col=fy]")!.textContent!.replace("−", "-").replace(/[^\d.-]/g, "")));
    const header = within(table).getAllByRole("columnheader").map((h) => h.textContent);
    const fyHead = header.find((h) => h?.startsWith("Fy"))!;
    expect(fyHead).toMatch(/Fy.*\((k?N)\)/);
    const inN = fyHead.includes("(kN)") ? 1000 : 1;
    expect((fy[0] + fy[1]) * inN).toBeCloseTo(85 * 9.80665, 0);
    expect(within(section).getByTestId("envelope")).toHaveTextContent("rear");
    expect(within(section).getByTestId("design-loads")).toHaveTextContent("front");
  });

  it("gives no envelope while a case does not solve: it could be the governing one", () => {
    const broken = { ...doc, cases: [...doc.cases!, { id: "typo", name: "Flow typed as a pressure", parameters: { Q: "40 psi" } }] } as SketchFile;
    render(<VersionCases document={broken} units="SI" />);
    const section = screen.getByRole("region", { name: "Operating cases" });
    expect(within(section).getByRole("alert")).toHaveTextContent(/^Flow typed as a pressure could not be solved: /);
    expect(within(section).getByTestId("no-envelope")).toHaveTextContent(
      "No envelope or design loads while Flow typed as a pressure does not solve: without it, they could miss the governing case.",
    );
    expect(within(section).queryByTestId("envelope")).toBeNull();
    expect(within(section).queryByTestId("design-loads")).toBeNull();
    // the cases that did solve still show their reactions
    expect(within(section).getByTestId("case-reactions")).toHaveTextContent(doc.cases![0].name);
  });

  it("says nothing for a version without cases", () => {
    const { container } = render(<VersionCases document={{ ...doc, cases: undefined, combinations: undefined } as SketchFile} units="SI" />);
    expect(container).toBeEmptyDOMElement();
  });
});
