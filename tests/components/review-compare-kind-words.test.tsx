// A support whose kind changed (a contact bolted down as a pin) lists the fields the old kind had
// in the properties form's words, not by their file names, and what a blank one meant; a kept
// sweep's plotted quantities are named as the chart names them, by the supports' labels.
import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { ChangesTable } from "@/components/review/CompareTables";
import { compareSketches } from "@/lib/review/compare";
import type { SketchFile } from "@/solver/schema";
import { twoReactions } from "../fixtures/one-unit";

const onPad = (): SketchFile =>
  ({
    ...structuredClone(twoReactions),
    supports: [
      { id: "pin", body: "b1", kind: "pin", at: [0, 0], label: "pin" },
      { id: "pad", body: "b1", kind: "contact", at: [2, 0], angle: 90, mu: 0.6, label: "neoprene pad" },
    ],
    parameters: { P: "50 N" },
    loads: twoReactions.loads.map((l) => (l.id === "small" ? { ...l, magnitude: "P" } : l)),
    sweeps: [{ id: "sw", parameter: "P", from: 0, to: 500, points: 11, quantities: [{ support: "pad", component: "frictionMargin" }] }],
  }) as SketchFile;

describe("the comparison's words for a support whose kind changed", () => {
  it("a contact bolted as a roller: its friction under the form's labels, the sweep's lines by label", () => {
    const a = onPad();
    const b = onPad();
    b.supports = [b.supports[0], { id: "pad", body: "b1", kind: "roller", at: [2, 0], angle: 90, label: "bolted foot" }];
    b.sweeps = [{ ...b.sweeps![0], quantities: [{ support: "pad", component: "n" }] }];
    const c = compareSketches(a, b);
    const pad = c.elements.changed.find((e) => e.id === "pad")!;
    expect(pad.kind).toBe("roller");
    expect(pad.kindBefore).toBe("contact");
    expect(pad.fields.map((f) => f.field)).toEqual(["label", "kind", "mu"]);
    // the sweep's plotted quantity, named as its chart's legend names it (describeQuantity)
    expect(c.studies).toEqual([
      { field: "sweep of P", before: "P from 0 to 500 N, 11 points; plots friction margin (μ·n − |t|) at neoprene pad", after: "P from 0 to 500 N, 11 points; plots normal force at bolted foot", change: "changed" },
    ]);
    render(<ChangesTable comparison={c} />);
    const rows = within(screen.getByTestId("field-changes")).getAllByRole("row").map((r) => [...r.querySelectorAll("td")].map((td) => td.textContent));
    // the contact's friction: its label in the form, and a roller has none (the contact's blank would mean "no friction")
    expect(rows).toContainEqual(["Friction μ", "0.6", "→", "—"]);
    expect(rows).toContainEqual(["Kind", "contact", "→", "roller"]);
  });
});
