// "In every case" downloads as CSV: the same builder as a version page's table of a kept sweep's
// limits (`limitRowsTable`), so the same columns; each value at full precision, equal to the single
// search on that run, and the words on screen for a run that does not reach the target.
import { screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { mountResultsDock } from "./editor-helpers";
import { UTF8_BOM } from "@/components/studies/csv";

describe("CSV of the limit in every case", () => {
  it("a row per case and combination, the first marked, values equal to the single searches", async () => {
    const { runLimit } = await import("@/canvas/studies/run");
    const { exampleById } = await import("@/canvas/examples");
    const user = userEvent.setup();
    const doc = exampleById("exhaust-stack")!.sketch;
    mountResultsDock(doc);
    await user.click(screen.getByRole("tab", { name: "Sweep" }));
    await user.click(screen.getByRole("button", { name: "Run the sweep" }));
    await screen.findByTestId("crossings");
    await user.selectOptions(screen.getByRole("combobox", { name: "Quantity for the limit" }), "margin at upwind edge");
    await user.click(screen.getByRole("button", { name: "In every case" }));
    await screen.findByTestId("limit-everywhere");
    const blobs: Blob[] = [];
    const names: string[] = [];
    const orig = URL.createObjectURL;
    const click = HTMLAnchorElement.prototype.click;
    URL.createObjectURL = ((b: Blob) => (blobs.push(b), "blob:x")) as typeof URL.createObjectURL;
    HTMLAnchorElement.prototype.click = function (this: HTMLAnchorElement) {
      names.push(this.download);
    };
    try {
      await user.click(screen.getByRole("button", { name: "Download the limit in every case as CSV" }));
    } finally {
      URL.createObjectURL = orig;
      HTMLAnchorElement.prototype.click = click;
    }
    expect(names).toEqual(["limit-in-every-case-v.csv"]);
    const text = await blobs[0].text();
    // the byte order mark first (Excel reads the file as UTF-8), as every result table's CSV
    expect([...new Uint8Array(await blobs[0].arrayBuffer()).slice(0, 3)]).toEqual([...new TextEncoder().encode(UTF8_BOM)]);
    const [header, ...rows] = Papa.parse<string[]>(text.replace(/^\ufeff/, "").trimEnd()).data;
    // the version page's columns, the parameter's unit in the value's header
    expect(header).toEqual(["Limit", "Case or combination", "v where first reached (m/s)", "Note"]);
    const upwind = { support: "upwind", component: "margin" as const };
    const one = (on: { caseId?: string; combinationId?: string }) => runLimit(doc, { parameter: "v", from: 20, to: 45, quantity: upwind, target: 0, ...on });
    const runs = [
      ["Engine running, 30 m/s wind", one({ caseId: "running" })],
      ["Engine stopped, 30 m/s wind", one({ caseId: "stopped" })],
      ["Engine stopped, 38 m/s storm", one({ caseId: "storm" })],
      ["Uplift check: 0.9 × weight + 1.5 × wind", one({ combinationId: "uplift" })],
    ] as const;
    expect(rows.map((r) => r.slice(0, 2))).toEqual(runs.map(([name]) => ["margin at upwind edge reaches 0 kN", name]));
    runs.forEach(([, r], i) => {
      const [, , value, note] = rows[i];
      if (r.found) {
        // full precision, not the 4 figures on screen
        expect(Number(value)).toBeCloseTo(r.value, 9);
        expect(value.replace(/^-?0?\.?/, "").length).toBeGreaterThan(4);
      } else {
        expect(value).toBe("none in 20 … 45 m/s");
        expect(note).toMatch(/^no crossing in this range/);
      }
    });
    // the combination comes first (as the sentence on screen says), and only it
    expect(rows.map((r) => r[3].includes("governs"))).toEqual([false, false, false, true]);
    expect(rows[3][3]).toBe("governs: reached first of all");
    const uplift = runs[3][1];
    if (!uplift.found) throw new Error("expected the uplift combination to lift");
    for (const [, r] of runs.slice(0, 3)) if (r.found) expect(r.value).toBeGreaterThan(uplift.value);
  });
});

describe("everywhereTable", () => {
  it("a run that never reaches the target says so in the words on screen; one not solved says why", async () => {
    const { everywhereTable } = await import("@/components/studies/SweepPanel");
    const { exampleById } = await import("@/canvas/examples");
    const doc = exampleById("exhaust-stack")!.sketch;
    const table = everywhereTable(
      {
        rows: [
          { id: "a", name: "Calm", kind: "case", result: { found: false, reason: "no crossing", min: 1200, max: 5400, unit: "m/s" } },
          { id: "b", name: "Gale", kind: "case", result: { found: true, value: 31.25, crossings: [31.25, 40.5], iterations: 30, unit: "m/s" } },
          { id: "c", name: "Broken", kind: "combination", result: { error: "the wind speed has no unit" } },
        ],
        label: "margin at upwind edge",
        target: "1 kN",
        targetSI: 1000,
        first: ["b"],
        firstValue: 31.25,
        unit: "m/s",
        from: 20,
        to: 45,
        precision: "to 4 significant figures",
        overrides: [],
        pName: "v",
        parameter: "v",
        quantity: { support: "upwind", component: "margin" },
        tolerance: 1e-8,
      },
      doc,
    );
    expect(table.columns.map((c) => c.label)).toEqual(["Limit", "Case or combination", "v where first reached", "Note"]);
    expect(table.title).toBe("Where the margin at upwind edge reaches 1 kN, in each case and combination");
    expect(table.rows).toEqual([
      ["margin at upwind edge reaches 1 kN", "Calm", "none in 20 … 45 m/s", "no crossing in this range: above 1 kN throughout"],
      ["margin at upwind edge reaches 1 kN", "Gale", 31.25, "governs: reached first of all; reached 1 more time in the range"],
      ["margin at upwind edge reaches 1 kN", "Broken", "not solved", "the wind speed has no unit"],
    ]);
  });
});
