// The comparison in US customary units, the design studies' changes, each reaction's components before and after, and the
// overlay's shared frame: two drawings given one world box put an unchanged point on one pixel.
import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { renderSketchSvg, sharedFrame } from "@/canvas/render/svg";
import { ChangesTable, ReactionsTable } from "@/components/review/CompareTables";
import { changeCount, compareSketches } from "@/lib/review/compare";
import { parseSketch, solve } from "@/solver";
import { CURRENT_VERSION, type SketchFile } from "@/solver/schema";
import { fixture } from "../api/sketch-fixtures";

const before = fixture("fire-monitor-trailer") as unknown as SketchFile;
// eslint-disable-next-line @typescript-eslint/no-explicit-any
const after: any = structuredClone(before);
after.bodies[0].mass = 1400;
after.supports[2].at = [3.1, 0.3];
after.parameters.Q = "1250 gpm";

function solved(doc: unknown) {
  const p = parseSketch(doc);
  if (!p.ok) throw new Error("does not parse");
  return solve(p.sketch);
}

describe("compareSketches in US customary units", () => {
  it("writes evaluated values in lb and ft (1 lb = 0.45359237 kg, 1 ft = 0.3048 m: NIST SP 811)", () => {
    const c = compareSketches(before, after, "US");
    const trailer = c.elements.changed.find((e) => e.id === "trailer")!;
    // 1100 kg / 0.45359237 = 2425.08 lb; 1400 kg = 3086.47 lb
    expect(trailer.fields).toEqual([{ field: "mass", before: "2,425 lb", after: "3,086 lb" }]);
    const jack = c.elements.changed.find((e) => e.id === "jack")!;
    // 3.4 m = 11.155 ft, 3.1 m = 10.171 ft, 0.3 m = 0.98425 ft
    expect(jack.fields).toEqual([{ field: "at", before: "(11.15, 0.9843) ft", after: "(10.17, 0.9843) ft" }]);
    // a parameter is shown as written, whatever the units
    expect(c.parameters.changed).toEqual([{ field: "Q", before: "2000 gpm", after: "1250 gpm" }]);
    // SI stays the default
    expect(compareSketches(before, after).elements.changed.find((e) => e.id === "jack")!.fields[0].before).toBe("(3.4, 0.3) m");
  });
});

describe("changes to the design studies", () => {
  const withStudies = (): SketchFile => ({
    ...structuredClone(before),
    version: CURRENT_VERSION,
    cases: [
      { id: "low", name: "Low throw", parameters: { theta: "15 deg" } },
      { id: "dead", name: "Dead", factors: { flow: 0 } },
    ],
    combinations: [{ id: "k", name: "Factored", terms: [{ case: "dead", factor: 1.2 }] }],
    sweeps: [{ id: "sw", parameter: "theta", from: 0, to: 80, points: 41 }],
  });

  it("lists cases, combinations, required factors, sweeps and the underlay added, removed or changed (old → new)", () => {
    const a = withStudies();
    const b = withStudies();
    b.cases = [{ id: "low", name: "Low throw", parameters: { theta: "20 deg" } }, { id: "high", name: "High throw", parameters: { theta: "60 deg" } }];
    b.combinations = [{ id: "k", name: "Factored", terms: [{ case: "low", factor: 1.4 }] }];
    b.stability = { overturning: 2 };
    b.sweeps = [];
    b.underlay = { upload: "u1", width: 800, height: 600, origin: [0, 3], metresPerPixel: 0.005, rotation: 0, opacity: 0.6, locked: true };
    const c = compareSketches(a, b);
    expect(c.studies).toEqual([
      { field: "case “Low throw”", before: "Low throw: theta = 15 deg", after: "Low throw: theta = 20 deg", change: "changed" },
      { field: "case “Dead”", before: "Dead: flow × 0", after: null, change: "removed" },
      { field: "case “High throw”", before: null, after: "High throw: theta = 60 deg", change: "added" },
      { field: "combination “Factored”", before: "Factored: 1.2 × Dead", after: "Factored: 1.4 × Low throw", change: "changed" },
      { field: "required factor against overturning", before: "1.5 (default)", after: "2", change: "changed" },
      { field: "sweep of theta", before: "theta from 0 to 80 deg, 41 points", after: null, change: "removed" },
      { field: "underlay", before: null, after: "upload u1, 0.005 m/px, corner (0, 3) m, turned 0°, opacity 0.6, locked", change: "added" },
    ]);
    expect(changeCount(c)).toBe(7);
  });

  it("names a case turned into a load case, a combination's own required factors and a sweep moved onto a combination", () => {
    const a = withStudies();
    const b = withStudies();
    b.cases = a.cases!.map((c) => (c.id === "dead" ? { ...c, onlyInCombinations: true } : c));
    b.combinations = [{ ...a.combinations![0], stability: { overturning: 1 } }];
    b.sweeps = a.sweeps!.map((sw) => ({ ...sw, combination: "k" }));
    expect(compareSketches(a, b).studies).toEqual([
      { field: "case “Dead”", before: "Dead: flow × 0", after: "Dead: flow × 0, only in combinations", change: "changed" },
      { field: "combination “Factored”", before: "Factored: 1.2 × Dead", after: "Factored: 1.2 × Dead; required 1 against overturning", change: "changed" },
      { field: "sweep of theta", before: "theta from 0 to 80 deg, 41 points", after: "theta from 0 to 80 deg, 41 points, combination “Factored”", change: "changed" },
    ]);
  });

  it("a changed required factor of safety alone is a change, shown in the table", () => {
    const a = withStudies();
    const b = withStudies();
    b.stability = { sliding: 1.3 };
    const c = compareSketches(a, b);
    expect(changeCount(c)).toBe(1);
    // a body's mass and centre of gravity changed: two changes, as two rows of the table
    const moved = withStudies();
    moved.bodies = moved.bodies.map((bd, i) => (i === 0 ? { ...bd, mass: "1250 kg", cg: [2.1, 0.85] } : bd));
    const both = compareSketches(a, moved);
    expect(both.elements.changed.map((e) => e.fields.length)).toEqual([2]);
    expect(changeCount(both)).toBe(2);
    render(<ChangesTable comparison={c} />);
    expect(screen.queryByText("Nothing in the inputs differs.")).toBeNull();
    const row = screen.getByText("required factor against sliding").closest("tr")!;
    expect(row.textContent).toBe("Cases and studiesrequired factor against sliding1.5 (default)→1.3");
  });

  it("the same studies: nothing listed", () => {
    expect(compareSketches(withStudies(), withStudies()).studies).toEqual([]);
  });
});

describe("the reactions table of a comparison", () => {
  it("gives each support's Fx and Fy before and after, as two solves do, in the units asked for", () => {
    const c = compareSketches(before, after);
    const a = solved(before);
    const b = solved(after);
    const { unmount } = render(<ReactionsTable comparison={c} units="SI" />);
    const wheel = screen.getByTestId("reaction-wheel-components").textContent!;
    // the trailer's reactions pass 1 kN, so the whole table is in kN: 4 significant figures, trailing zeros kept
    const f = (n: number) => (n / 1000).toPrecision(Math.abs(n) >= 10000 ? 5 : 4).replace("-", "−");
    expect(wheel).toContain(`Fx ${f(a.reactions.wheel.fx)} → ${f(b.reactions.wheel.fx)} kN`);
    expect(wheel).toContain(`Fy ${f(a.reactions.wheel.fy)} → ${f(b.reactions.wheel.fy)} kN`);
    // contacts carry no moment: M is left out when it is zero on both sides
    expect(wheel).not.toContain("M ");
    unmount();

    render(<ReactionsTable comparison={c} units="US" />);
    const row = screen.getByTestId("reaction-wheel").textContent!;
    // lbf = 4.4482216152605 N (NIST SP 811)
    const lbf = Math.hypot(b.reactions.wheel.fx, b.reactions.wheel.fy) / 4.4482216152605;
    expect(lbf).toBeGreaterThan(1000); // 4 figures: a whole number of lbf (kip only from 10 kip)
    expect(row).toContain(Math.round(lbf).toLocaleString("en-US"));
    expect(screen.getByRole("columnheader", { name: "After (lbf)" })).toBeTruthy();
    expect(row).not.toContain("kN");
  });

  it("writes every figure in one unit family, named in the headers: a change below 1 kN is not written in N beside kN", () => {
    // the demo trailer at the 2000 gpm rating, lifting its front jack (v1 → v2 of the demo): the
    // axle's resultant grows by about 0.66 kN while the foot carries 13 kN
    const low = structuredClone(before) as unknown as typeof after;
    low.parameters.Q = "1250 gpm";
    const c = compareSketches(low, before);
    const small = c.reactions.find((r) => r.change && Math.abs(r.change.abs) < 1000 && Math.abs(r.change.abs) >= 0.5);
    expect(small).toBeTruthy();
    render(<ReactionsTable comparison={c} units="SI" />);
    const headers = screen.getAllByRole("columnheader").map((h) => h.textContent);
    expect(headers).toEqual(["Support", "Resultant before (kN)", "After (kN)", "Change (kN)", "%", "State"]);
    // the headers are set in capitals; a unit is not ("KN" is no unit)
    for (const h of screen.getAllByRole("columnheader").slice(1, 4)) expect(h.querySelector(".normal-case")?.textContent).toBe("(kN)");
    const table = screen.getByTestId("reaction-changes").textContent!;
    // no figure carries its own unit, and none is written in N
    expect(table).not.toMatch(/\d N\b/);
    const cells = screen.getByTestId(`reaction-${small!.id}`).querySelectorAll("td");
    const sign = small!.change!.abs > 0 ? "+" : "−";
    // 4 significant figures in kN, e.g. "+0.6647"
    expect(cells[3].textContent).toBe(`${sign}${(Math.abs(small!.change!.abs) / 1000).toPrecision(4)}`);
  });

  it("a bench rig below a kilonewton stays in N (N·m) throughout", () => {
    const rig = { ...structuredClone(before), bodies: before.bodies.map((bd) => ({ ...bd, mass: 20 })) } as unknown as SketchFile;
    // eslint-disable-next-line @typescript-eslint/no-explicit-any
    (rig as any).parameters.Q = "10 gpm";
    // eslint-disable-next-line @typescript-eslint/no-explicit-any
    const rig2: any = structuredClone(rig);
    rig2.bodies[0].mass = 25;
    const c = compareSketches(rig, rig2);
    const largest = Math.max(...c.reactions.flatMap((r) => [r.before?.resultant ?? 0, r.after?.resultant ?? 0]));
    expect(largest).toBeLessThan(999.95);
    render(<ReactionsTable comparison={c} units="SI" />);
    expect(screen.getByRole("columnheader", { name: "Change (N)" })).toBeTruthy();
    expect(screen.getByTestId("reaction-changes").textContent).not.toContain("kN");
  });
});

describe("a shared frame for the overlaid drawings", () => {
  const origin = (svg: string) => svg.match(/<g transform="translate\(([-\d.]+) ([-\d.]+)\)">/)!.slice(1).map(Number);
  const firstCorner = (svg: string, id: string) => {
    const path = new DOMParser().parseFromString(svg, "image/svg+xml").querySelector(`g[data-id="${id}"] path`)!.getAttribute("d")!;
    return path.match(/M([-\d.]+) ([-\d.]+)/)!.slice(1).map(Number);
  };

  it("puts the unchanged trailer on the same pixels in both drawings, and everything drawn inside the frame, above the legend", async () => {
    const { scenePrims } = await import("@/canvas/render/scenePrims");
    const { primsBox } = await import("@/canvas/render/prims");
    const { buildScene, fieldValuesById } = await import("@/canvas/scene");
    const ra = solved(before);
    const rb = solved(after);
    const frame = sharedFrame([{ file: before, result: ra }, { file: after, result: rb }], 1280, 640)!;
    const A = renderSketchSvg(before, ra, { width: 1280, height: 640, frame });
    const B = renderSketchSvg(after, rb, { width: 1280, height: 640, frame });
    expect(origin(A)).toEqual(origin(B));
    expect(firstCorner(A, "trailer")).toEqual(firstCorner(B, "trailer"));
    // every symbol, label and reaction arrow of both drawings lies inside the frame and above the
    // legend under it (one line across 1280 px, two across 640: 22 and 37 px)
    for (const [width, height, legendRoom] of [[1280, 640, 22], [640, 400, 37]]) {
      const f = sharedFrame([{ file: before, result: ra }, { file: after, result: rb }], width, height)!;
      const legendTop = Math.min(...[...new DOMParser().parseFromString(renderSketchSvg(after, rb, { width, height, frame: f }), "image/svg+xml").querySelectorAll("svg > text")].map((t) => Number(t.getAttribute("y")) - 11));
      expect(legendTop).toBeCloseTo(height - legendRoom + 3, 6);
      for (const [doc, r] of [[before, ra], [after, rb]] as const) {
        const p = parseSketch(doc);
        if (!p.ok) throw new Error("does not parse");
        const scene = buildScene(p.file, fieldValuesById(p.file, p.fields, []));
        const { groups, results } = scenePrims(scene, f.scale, "SI", r);
        const box = primsBox([...groups.flatMap((g) => g.prims), ...results]);
        expect(f.x + box.minX).toBeGreaterThanOrEqual(0);
        expect(f.x + box.maxX).toBeLessThanOrEqual(width);
        expect(f.y + box.minY).toBeGreaterThanOrEqual(0);
        expect(f.y + box.maxY).toBeLessThanOrEqual(legendTop);
      }
    }
    // without the shared frame each drawing centres itself, and the two need not line up
    const ownA = renderSketchSvg(before, ra, { width: 1280, height: 640 });
    const ownB = renderSketchSvg(after, rb, { width: 1280, height: 640 });
    expect(origin(ownA)).not.toEqual(origin(ownB));
  });

  it("has no frame when nothing can be drawn", () => {
    expect(sharedFrame([{ file: { format: "nope" } as never, result: null }], 800, 600)).toBeUndefined();
  });
});

describe("the changed fields in the properties form's words", () => {
  it("names gravity's direction, a port's flow direction and β, the motion and the load group as the form does, not by file key", () => {
    // eslint-disable-next-line @typescript-eslint/no-explicit-any
    const b: any = structuredClone(before);
    b.version = CURRENT_VERSION;
    b.gravityAngle = "-95 deg";
    b.motion = { ax: "0.5 m/s^2", freeX: false };
    const nozzle = b.ports.find((p: { id: string }) => p.id === "nozzle");
    nozzle.angle = "theta + 5 deg";
    nozzle.beta = 1.02;
    nozzle.group = "jet";
    const c = compareSketches(before, b);
    render(<ChangesTable comparison={c} />);
    const rows = [...screen.getByTestId("field-changes").querySelectorAll("tbody tr")].map((r) => [...r.querySelectorAll("td")].map((td) => td.textContent));
    // a field given where it was blank says what blank meant; the motion had no default: a dash
    expect(rows).toContainEqual(["Gravity direction", "blank (−90°, down the page)", "→", "-95 deg (= −95°)"]);
    expect(rows).toContainEqual(["Motion of the body", "—", "→", "ax 0.5 m/s^2 (= 0.5 m/s²)"]);
    expect(rows).toContainEqual(["Flow direction", "theta (= 15°)", "→", "theta + 5 deg (= 20°)"]);
    expect(rows).toContainEqual(["Momentum-flux factor β", "blank (1)", "→", "1.02"]);
    expect(rows).toContainEqual(["Load group", "blank (flow)", "→", "jet"]);
    // no file key is shown
    for (const key of ["gravityAngle", "beta", "motion", "group", "angle"]) expect(rows.map((r) => r[0])).not.toContain(key);
  });
});

describe("a comparison whose only change is an added or removed element", () => {
  it("lists the element and shows no table of fields (no header over nothing)", () => {
    // eslint-disable-next-line @typescript-eslint/no-explicit-any
    const b: any = structuredClone(before);
    b.supports.push({ id: "tie", label: "rear tie-down", body: "trailer", kind: "tie", at: [0.4, 0.3], angle: -90 });
    const c = compareSketches(before, b);
    render(<ChangesTable comparison={c} />);
    expect(screen.getByTestId("added-removed").textContent).toBe("+ added tie rear tie-down");
    expect(screen.queryByTestId("field-changes")).toBeNull();
    expect(screen.queryByText("Nothing in the inputs differs.")).toBeNull();
  });

  it("keeps the table when a field changed as well", () => {
    // eslint-disable-next-line @typescript-eslint/no-explicit-any
    const b: any = structuredClone(before);
    b.supports = b.supports.filter((s: { id: string }) => s.id !== "jack");
    b.bodies[0].mass = 1400;
    const c = compareSketches(before, b);
    render(<ChangesTable comparison={c} />);
    expect(screen.getByTestId("added-removed").textContent).toBe("× removed contact front jack");
    const rows = [...screen.getByTestId("field-changes").querySelectorAll("tbody tr")].map((r) => r.textContent);
    // 1100 kg and 1400 kg, written in tonnes
    expect(rows).toEqual(["Trailer (body)Mass1.1 t→1.4 t"]);
  });
});
