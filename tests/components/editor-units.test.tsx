// Values on screen in the editor and the results: a plain number shows its value with the
// worker's answer too; input errors are named in words; the stale hand check is faded; the
// SI / US switch reaches the hand check's point P, the centroid and the drawing scale.
import { act, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { createEditorStore } from "@/canvas/store";
import { EditorProvider } from "@/canvas/context";
import { analyseCore, expressionFields } from "@/canvas/analysis/core";
import type { Runner } from "@/canvas/analysis/store";
import { setField, type Command } from "@/canvas/commands";
import type { SketchFile } from "@/solver/schema";
import { ElementForm } from "@/components/editor/ElementForm";
import { drawingScale } from "@/components/editor/Toolbar";
import { errorPlace } from "@/components/results/errorPlace";
import { parseLength } from "@/components/results/HandCheckView";
import { beam, mountResultsDock, renderEditor } from "./editor-helpers";

const c = <A,>(cmd: Command<A>) => cmd as unknown as Command<unknown>;


/** What the browser's worker answers: only the fields that are expressions (or errors). */
const workerLike: Runner = (sketch, done) => {
  const core = analyseCore(sketch);
  done({ ...core, fields: expressionFields(sketch, core.fields) });
};

/** The point force's form of a beam sketch, with the worker's answer. */
function mountForm() {
  const editor = createEditorStore({ sketch: beam("F1") });
  render(
    <EditorProvider editor={editor} runner={workerLike}>
      <ElementForm id="l1" />
    </EditorProvider>,
  );
  return editor;
}

describe("numeric fields with the worker's answer", () => {
  it("shows a plain number's value in the field's unit, in SI and in US", async () => {
    const user = userEvent.setup();
    const editor = mountForm();
    const form = screen.getByTestId("element-form");
    const magnitude = within(form).getByLabelText("Magnitude");
    await user.clear(magnitude);
    await user.type(magnitude, "12");
    // the worker left the plain numbers out: the field shows its own number, in newtons
    expect(within(form).getByText("= 12 N")).toBeInTheDocument();
    expect(within(form).getByText("= −90°")).toBeInTheDocument();
    await user.clear(magnitude);
    await user.type(magnitude, "4448.22");
    act(() => editor.getState().setUnits("US"));
    // 1 lbf = 4.448 222 N (NIST SP 811); a plain number is SI, and with US units on screen the field says so
    expect(within(form).getByText("⚠ A plain number is SI: 4.448 kN (= 1,000 lbf). Meant lbf? Type “4448.22 lbf”.")).toBeInTheDocument();
    // a number nobody typed here (placed with the mouse, or from a file) is SI by rule: its value in
    // feet, no note. 2 m / 0.3048 m/ft = 6.562 ft (NIST SP 811)
    expect(within(form).getByTestId("field-at-x")).toHaveAccessibleDescription("= 6.562 ft");
    // the note stays once the entry is done (Enter, which keeps the focus in the field) and once
    // the field is left (Tab), not only while typing
    await user.click(magnitude);
    await user.keyboard("{Enter}");
    expect(magnitude).toHaveFocus();
    expect(magnitude).toHaveAccessibleDescription("⚠ A plain number is SI: 4.448 kN (= 1,000 lbf). Meant lbf? Type “4448.22 lbf”.");
    await user.tab();
    expect(magnitude).not.toHaveFocus();
    expect(magnitude).toHaveAccessibleDescription("⚠ A plain number is SI: 4.448 kN (= 1,000 lbf). Meant lbf? Type “4448.22 lbf”.");
  });

  it("a required value left blank is marked at the field, and the sketch keeps the old one", async () => {
    const user = userEvent.setup();
    mountForm();
    const magnitude = within(screen.getByTestId("element-form")).getByLabelText("Magnitude");
    const before = magnitude.getAttribute("value");
    await user.clear(magnitude);
    await user.tab();
    expect(magnitude).toHaveValue("");
    expect(magnitude).toHaveAttribute("aria-invalid", "true");
    expect(magnitude).toHaveAccessibleDescription(`⚠ Magnitude: required. The sketch keeps ${before} until you give one.`);
    // a value typed in takes the note away
    await user.type(magnitude, "12{Enter}");
    expect(magnitude).not.toHaveAccessibleDescription(/keeps/);
  });
});

describe("input errors in words", () => {
  it("names the element by its label and the field in words, not the file path", async () => {
    const editor = mountResultsDock(beam("F1"));
    act(() => void editor.getState().apply(c(setField({ id: "l1", field: "magnitude", value: "3 * span" }))));
    const stale = screen.getByTestId("stale");
    expect(stale).toHaveTextContent('the input has an error — Point force F1 — magnitude: unknown name "span"');
    expect(stale).not.toHaveTextContent("loads[0]");
    expect(screen.queryByTestId("more-errors")).toBeNull();
  });

  it("lists every error, not only the first, each at its element and field", async () => {
    const editor = mountResultsDock(beam("F1"));
    act(() => void editor.getState().apply(c(setField({ id: "l1", field: "magnitude", value: "3 * span" }))));
    act(() => void editor.getState().apply(c(setField({ id: "l1", field: "angle", value: "1,5" }))));
    const stale = screen.getByTestId("stale");
    expect(stale).toHaveTextContent(/^Showing the last good result \(faded on the drawing\): the input has 2 errors — Point force F1 — /);
    const more = screen.getByTestId("more-errors");
    expect(stale.textContent).toContain('magnitude: unknown name "span"');
    expect(stale.textContent).toContain('cannot read "1,5": write decimals with a point (1.5, not 1,5)');
    expect(more.textContent).toMatch(/^— Point force F1 — /);
  });

  it("words each kind of path", () => {
    const s = beam("F1");
    expect(errorPlace(s, "supports[1].at[0]")).toBe("Contact right pad — position x");
    expect(errorPlace(s, "supports[1].angle")).toBe("Contact right pad — pushes toward");
    expect(errorPlace(s, "bodies[0].outline[2][1]")).toBe("Body Beam — outline corner 3 y");
    expect(errorPlace({ ...s, loads: [{ ...s.loads[0], label: undefined }] } as SketchFile, "loads[0].magnitude")).toBe("Point force l1 — magnitude");
    expect(errorPlace(s, "parameters.span")).toBe("Parameter span");
    expect(errorPlace(s, "cases[0].id")).toBe("cases[0].id");
  });

  it("fades the hand check while the result shown is an earlier one", async () => {
    const user = userEvent.setup();
    const editor = mountResultsDock(beam("F1"));
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    expect(screen.getByTestId("hand-sums")).not.toHaveClass("opacity-60");
    act(() => void editor.getState().apply(c(setField({ id: "l1", field: "magnitude", value: "3 * span" }))));
    expect(screen.getByTestId("hand-sums")).toHaveClass("opacity-60");
    act(() => editor.getState().undo());
    expect(screen.getByTestId("hand-sums")).not.toHaveClass("opacity-60");
  });
});

describe("the unit of the results follows their size", () => {
  it("a 60 N load on the beam: the table and the hand check in N and N·m, a 10 kN one in kN", async () => {
    const user = userEvent.setup();
    const editor = mountResultsDock(beam("F1"));
    act(() => {
      editor.getState().apply(c(setField({ id: "l1", field: "magnitude", value: "60 N" })));
      editor.getState().apply(c(setField({ id: "b1", field: "mass", value: "10 kg" })));
    });
    // the table's headings carry the unit
    const table = screen.getByRole("table");
    expect(within(table).getAllByText("(N)").length).toBeGreaterThan(0);
    expect(within(table).queryByText("(kN)")).toBeNull();
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    // ΣFy: the load −60 N and the weight −10 kg × 9.80665 = −98.07 N, the pin and the pad half of it each
    // (loads at mid-span: statics, common practice); ΣM about the pin: the pad (60 + 98.07)/2 = 79.03 N × 4 m = 316.1 N·m
    const fy = screen.getByTestId("hand-fy");
    expect(fy).toHaveTextContent("−60.00 N");
    expect(fy).toHaveTextContent("−98.07 N");
    expect(screen.getByTestId("hand-m")).toHaveTextContent("316.1 N·m");
    expect(screen.getByTestId("hand-m")).toHaveTextContent("= Σ moments on the control volume");
    expect(screen.getByTestId("hand-fx")).toHaveTextContent("= Σ forces on the control volume");
    expect(fy).not.toHaveTextContent("kN");
    expect(screen.getByTestId("hand-m")).toHaveTextContent(/N·m/);
    expect(screen.getByTestId("hand-m")).not.toHaveTextContent("kN·m");
    act(() => void editor.getState().apply(c(setField({ id: "l1", field: "magnitude", value: "10 kN" }))));
    expect(screen.getByTestId("hand-fy")).toHaveTextContent("−10.00 kN");
  });
});

describe("US units reach every length on screen", () => {
  it("shows and takes the hand check's point P in feet; a typed unit is kept", async () => {
    const user = userEvent.setup();
    const editor = mountResultsDock(beam("F1"));
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    act(() => {
      editor.getState().setUnits("US");
      // 1 ft = 0.3048 m exactly (NIST SP 811)
      editor.getState().setMomentPoint([1.2192, 0]);
    });
    expect(screen.getByTestId("moment-x")).toHaveValue("4");
    expect(screen.getByText("Px (ft)")).toBeInTheDocument();
    const x = screen.getByTestId("moment-x");
    await user.clear(x);
    await user.type(x, "3{Enter}");
    expect(editor.getState().momentPoint![0]).toBeCloseTo(0.9144, 12);
    await user.clear(x);
    await user.type(x, "2 m{Enter}");
    expect(editor.getState().momentPoint![0]).toBeCloseTo(2, 12);
    expect(screen.getByTestId("moment-x")).toHaveValue("6.5617");
    await user.clear(x);
    await user.type(x, "2 kg{Enter}");
    expect(screen.getByText(/Px: .*needs a length/)).toBeInTheDocument();
    expect(editor.getState().momentPoint![0]).toBeCloseTo(2, 12);
  });

  it("keeps a refused entry for P in its field, marked, until it is put right or P is picked elsewhere", async () => {
    const user = userEvent.setup();
    const editor = mountResultsDock(beam("F1"));
    await user.click(screen.getByRole("tab", { name: "Hand check" }));
    act(() => editor.getState().setMomentPoint([2, 0.5]));
    const y = screen.getByTestId("moment-y");
    await user.clear(y);
    await user.type(y, "abc{Enter}");
    // the typo stays to be mended, beside the reason; P keeps its last good value
    expect(screen.getByTestId("moment-y")).toHaveValue("abc");
    expect(screen.getByTestId("moment-y")).toHaveAttribute("aria-invalid", "true");
    expect(screen.getByTestId("moment-x")).not.toHaveAttribute("aria-invalid");
    expect(screen.getByText(/Py: .*"abc"/)).toBeInTheDocument();
    expect(editor.getState().momentPoint).toEqual([2, 0.5]);
    // back into the field: still the typo, not the old value
    await user.click(screen.getByTestId("moment-y"));
    expect(screen.getByTestId("moment-y")).toHaveValue("abc");
    await user.clear(screen.getByTestId("moment-y"));
    await user.type(screen.getByTestId("moment-y"), "0.25{Enter}");
    expect(editor.getState().momentPoint).toEqual([2, 0.25]);
    expect(screen.getByTestId("moment-y")).toHaveValue("0.25");
    expect(screen.queryByText(/Py: /)).toBeNull();
    // a refused entry, then P picked on the drawing: the pick shows, the refusal goes
    await user.clear(screen.getByTestId("moment-x"));
    await user.type(screen.getByTestId("moment-x"), "2 kg{Enter}");
    expect(screen.getByTestId("moment-x")).toHaveValue("2 kg");
    act(() => editor.getState().setMomentPoint([1, 0]));
    expect(screen.getByTestId("moment-x")).toHaveValue("1");
    expect(screen.getByTestId("moment-y")).toHaveValue("0");
    expect(screen.queryByText(/Px: /)).toBeNull();
  });

  it("parses a plain number in the length unit on screen", () => {
    expect(parseLength("10", "US")).toBeCloseTo(3.048, 12);
    expect(parseLength("10", "SI")).toBe(10);
    expect(parseLength("6 in", "SI")).toBeCloseTo(0.1524, 12);
    expect(() => parseLength("2 * span", "SI")).toThrow(/span/);
  });

  it("gives the centroid and the drawing scale in feet", async () => {
    const user = userEvent.setup();
    await renderEditor(beam("F1"));
    await user.click(within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name: /Body b1/ }));
    expect(screen.getByTestId("element-form")).toHaveTextContent("At the outline's centroid (2.000, 0.250) m.");
    await user.click(within(screen.getByTestId("units")).getByRole("radio", { name: "US" }));
    // (2, 0.25) m / 0.3048 m/ft = (6.562, 0.820) ft
    expect(screen.getByTestId("element-form")).toHaveTextContent("At the outline's centroid (6.562, 0.820) ft.");
    expect(screen.getByLabelText("Drawing scale")).toHaveTextContent(/ px\/ft$/);
    expect(drawingScale(100, "US")).toBe("30.5 px/ft");
    expect(drawingScale(1000, "US")).toBe("305 px/ft");
    expect(drawingScale(120, "SI")).toBe("120 px/m");
    // a position's legend says what a plain number is once the echo under it is in feet
    await user.click(within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name: /Pin s1/ }));
    expect(screen.getByTestId("element-form")).toHaveTextContent("Position (plain numbers in m; or type ft)");
    await user.click(within(screen.getByTestId("units")).getByRole("radio", { name: "SI" }));
    expect(screen.getByTestId("element-form")).toHaveTextContent("Position (m)");
  });
});

describe("a port's resolved line", () => {
  it("gives the gauge pressure's force with the momentum flux: 600 kPa × π/4 × (300 mm)² = 42.41 kN, inward", async () => {
    // pressure force on a control surface = p·A, acting inward (common practice)
    const user = userEvent.setup();
    const { readFileSync } = await import("node:fs");
    await renderEditor(JSON.parse(readFileSync("tests/fixtures/sketches/pipe-bend-anchor.json", "utf8")) as SketchFile);
    await user.click(within(screen.getByRole("list", { name: "Elements of the sketch" })).getByRole("button", { name: /DN300 inlet/ }));
    const form = screen.getByTestId("element-form");
    expect(form).toHaveTextContent(/Resolved: ṁ = 119\.8 kg\/s, V = 1\.698 m\/s, momentum flux ṁV = 203\.4 N, pressure force pA = 42\.41 kN inward/);
  });
});
