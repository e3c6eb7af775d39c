// The calc sheet's Inputs table: an expression is shown with its value ("p_in = 1 MPa"), but a
// field typed as just its value is shown once ("mass 92 kg", not "mass 92 kg = 92 kg").
import { describe, expect, it } from "vitest";
import { exampleById } from "@/canvas/examples";
import { parseSketch, type SketchFileInput } from "@/solver";
import { inputsTable } from "@/solver/report";

function fields(file: SketchFileInput, id: string, system: "SI" | "US" = "SI"): string {
  const p = parseSketch(file);
  if (!p.ok) throw new Error(JSON.stringify(p));
  return String(inputsTable(p, system).rows.find((r) => r[0] === id)![4]);
}

const bend = () => structuredClone(exampleById("pipe-bend-anchor")!.sketch) as SketchFileInput;

describe("calc sheet inputs", () => {
  it("shows a value typed with its unit once, and an expression with its value", () => {
    const f = fields(bend(), "bend");
    expect(f).toContain("mass 92 kg");
    expect(f).not.toContain("92 kg = 92 kg");
    expect(fields(bend(), "in")).toContain("pressure p_in = 1 MPa");
  });

  it("is the same number and unit after normalising: spaces, a true minus, grouped thousands, deg for °, m^3 for m³", () => {
    const file = bend();
    const body = file.bodies![0] as Record<string, unknown>;
    const port = file.ports![0] as Record<string, unknown>;
    body.mass = "1500kg";
    port.density = "998 kg/m^3";
    port.angle = "-30 deg";
    const f = fields(file, "in");
    expect(fields(file, "bend")).toMatch(/mass 1500kg$/);
    expect(f).toContain("density 998 kg/m^3;");
    expect(f).toContain("angle -30 deg;");
    expect(f).not.toMatch(/ = (1,500 kg|998 kg\/m³|−30°)/);
  });

  it("keeps both when they differ: another unit, more figures than shown, or an expression", () => {
    const file = bend();
    const body = file.bodies![0] as Record<string, unknown>;
    const port = file.ports![0] as Record<string, unknown>;
    port.pressure = "1000 kPa"; // shown as 1 MPa
    port.density = "998.123456 kg/m^3"; // shown to 5 figures
    body.mass = "90 kg + 2 kg";
    expect(fields(file, "in")).toContain("pressure 1000 kPa = 1 MPa");
    expect(fields(file, "in")).toContain("density 998.123456 kg/m^3 = 998.12 kg/m³");
    expect(fields(file, "bend")).toContain("mass 90 kg + 2 kg = 92 kg");
  });

  it("a US sheet keeps the US customary value beside it (92 kg / 0.45359237 kg/lb = 202.8 lb, NIST SP 811)", () => {
    expect(fields(bend(), "bend", "US")).toContain("mass 92 kg (202.8 lb)");
  });
});
