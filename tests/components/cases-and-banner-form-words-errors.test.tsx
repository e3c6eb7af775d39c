// What the editor says of a port without a mass flow (the banner) and of a case's change typed
// without a unit (the Cases tab): the form's words and the unit to write, not the file's field
// names nor what the bare number made of a field elsewhere.
import { readFileSync } from "node:fs";
import { act, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { setField, type Command } from "@/canvas/commands";
import { CaseTables } from "@/components/studies/CaseTables";
import { solveCases } from "@/solver/cases";
import { parseSketch } from "@/solver";
import type { SketchFile } from "@/solver/schema";
import { mountResultsDock } from "./editor-helpers";

const c = <A,>(cmd: Command<A>) => cmd as unknown as Command<unknown>;
const example = (name: string) => JSON.parse(readFileSync(`canvas/examples/${name}.json`, "utf8"));

describe("the banner, a port without a mass flow", () => {
  it("names the form's fields, and the port once", () => {
    const editor = mountResultsDock(example("pump-skid"));
    act(() => void editor.getState().apply(c(setField({ id: "suction", field: "volumeFlow", value: undefined }))));
    const stale = screen.getByTestId("stale");
    expect(stale).toHaveTextContent("the input has an error — Inlet suction: needs a mass flow: give mass flow ṁ, or density ρ and volume flow, or density ρ, area and velocity V");
    expect(stale.textContent).not.toMatch(/massFlow|volumeFlow|port "/);
  });
});

describe("the Cases tab, a change typed without a unit", () => {
  it("v = 30 where the sketch gives v in m/s: says it has no unit and what to write, and nothing changes", async () => {
    const user = userEvent.setup();
    const editor = mountResultsDock(example("exhaust-stack"));
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    const changes = screen.getAllByRole("textbox", { name: /Parameter changes of/ })[0];
    const before = editor.getState().sketch.cases![0].parameters;
    await user.clear(changes);
    await user.type(changes, "v = 30{Enter}");
    expect(within(changes.closest("label")!).getByRole("alert").textContent).toBe("v = 30 has no unit; the sketch gives v in m/s: write 30 m/s");
    expect(editor.getState().sketch.cases![0].parameters).toEqual(before);
  });

  it("a change in a unit of another kind says the kind and the sketch's unit; what a change breaks is said with units as engineers write them", async () => {
    const user = userEvent.setup();
    mountResultsDock(example("exhaust-stack"));
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    const changes = screen.getAllByRole("textbox", { name: /Parameter changes of/ })[0];
    await user.clear(changes);
    await user.type(changes, "v = 30 psi{Enter}");
    expect(within(changes.closest("label")!).getByRole("alert").textContent).toBe("v = 30 psi is a pressure, but the sketch gives v in m/s, a speed");
    // a change that reads as a speed but breaks a field says what it breaks, in the form's words and units as written
    await user.clear(changes);
    // (½ × 1.25 kg/m³ × (30 m/s × 1 kg)² × 0.6 m × 0.7 = 236.25 kg³/s²: q = ½ρv², common practice)
    await user.type(changes, "v = 30 m/s * 1 kg{Enter}");
    expect(within(changes.closest("label")!).getByRole("alert").textContent).toBe(
      "v = 30 m/s * 1 kg breaks Distributed load wind on the stack — w₁ at from: 236.25 kg³/s² is in other units, but this field needs a load per length (N/m)",
    );
  });

  it("a saved case that cannot be solved names its errors' places, not the file's paths", () => {
    const file = example("exhaust-stack");
    file.cases = [{ id: "bare", name: "Bare wind speed", parameters: { v: "30" } }];
    file.combinations = [];
    const parsed = parseSketch(file);
    if (!parsed.ok) throw new Error("the stack does not parse");
    const sketch: SketchFile = parsed.file;
    render(<CaseTables result={solveCases(sketch)} units="SI" sketch={sketch} />);
    const alert = screen.getByRole("alert");
    expect(alert.textContent).toBe(
      "Bare wind speed could not be solved: Distributed load wind on the stack — w₁ at from: 236.25 kg/m² is in other units, but this field needs a load per length (N/m); Distributed load wind on the stack — w₂ at to: 236.25 kg/m² is in other units, but this field needs a load per length (N/m)",
    );
  });

  it("run with an input error in the sketch: the error in the banner's words, not the file's path", async () => {
    const user = userEvent.setup();
    const skid = example("pump-skid");
    delete skid.ports[0].volumeFlow;
    mountResultsDock(skid);
    await user.click(screen.getByRole("tab", { name: "Cases" }));
    // the pump skid has no cases: the sketch as drawn is the one run
    await user.click(screen.getByRole("button", { name: "Run as drawn" }));
    const said = await screen.findByText(/^The sketch has an input error/);
    expect(said.textContent).toBe("The sketch has an input error: Inlet suction: needs a mass flow: give mass flow ṁ, or density ρ and volume flow, or density ρ, area and velocity V.");
  });
});
