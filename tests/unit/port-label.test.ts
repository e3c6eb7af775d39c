// The values a port's label gives on the drawing: ṁ and V as resolved, and no "ṁ 0 kg/s" for a
// mass flow that nothing gives.
import { describe, expect, it } from "vitest";
import { buildScene, type SceneItem } from "@/canvas/scene";
import { gaugeWords, itemPrims, portFlowLines } from "@/canvas/render/symbols";
import { emptySketch } from "@/canvas/model/elements";
import { newBody } from "@/canvas/model/factory";
import type { SketchFile } from "@/solver/schema";

/** A 4 m × 0.5 m body with one outlet (demo data). */
function withOutlet(port: Record<string, unknown>): SketchFile {
  return {
    ...emptySketch("Tank"),
    bodies: [newBody("b1", [[0, 0], [4, 0], [4, 0.5], [0, 0.5]], "Tank")],
    ports: [{ id: "p1", body: "b1", kind: "outlet", at: [4, 0.25], angle: 0, label: "jet", ...port }],
  } as SketchFile;
}

/** The texts drawn for the port, its name first. */
function labelTexts(port: Record<string, unknown>): string[] {
  const item = buildScene(withOutlet(port)).byId.get("p1") as SceneItem;
  return itemPrims(item, { units: "SI", scale: 100 }).flatMap((p) => (p.t === "text" ? [p.text] : []));
}

describe("a port's label", () => {
  it("gives the mass flow and velocity given", () => {
    expect(labelTexts({ massFlow: 10, velocity: 5 })).toEqual(["jet", "ṁ 10 kg/s · V 5 m/s"]);
  });

  it("gives the mass flow ρ·Q resolves when the mass flow field is blank: 1000 kg/m³ × 0.01 m³/s = 10 kg/s", () => {
    expect(labelTexts({ density: 1000, volumeFlow: 0.01, area: 0.002 })).toEqual(["jet", "ṁ 10 kg/s · V 5 m/s"]);
  });

  it("leaves the mass flow out when nothing gives it, rather than draw ṁ 0 kg/s", () => {
    // a density typed on a placed port takes its placed mass flow away: ρ and V alone give no ṁ
    expect(labelTexts({ density: 998, velocity: 5 })).toEqual(["jet", "V 5 m/s"]);
    expect(labelTexts({ density: 998 })).toEqual(["jet"]);
    expect(labelTexts({ density: 998, velocity: 5, pressure: 2e5 })).toEqual(["jet", "V 5 m/s", "p 200 kPa(g)"]);
    // with the area, ρ·A·V gives it: 998 kg/m³ × 0.01 m² × 5 m/s = 49.9 kg/s
    expect(labelTexts({ density: 998, velocity: 5, area: 0.01 })).toEqual(["jet", "ṁ 49.9 kg/s · V 5 m/s"]);
  });

  it("keeps a zero flow on a closed end under pressure", () => {
    expect(labelTexts({ massFlow: 0, velocity: 0, pressure: 2e5, area: 0.01 })).toEqual(["jet", "ṁ 0 kg/s · V 0 m/s", "p 200 kPa(g)"]);
    expect(portFlowLines({ massFlow: 0, velocity: 0, pressure: 2e5 }, "SI")).toEqual(["ṁ 0 kg/s · V 0 m/s", "p 200 kPa(g)"]);
  });

  it("keeps a zero mass flow that was typed, beside a speed (the scene says it was given)", () => {
    expect(labelTexts({ massFlow: 0, velocity: 5 })).toEqual(["jet", "ṁ 0 kg/s · V 5 m/s"]);
    expect(portFlowLines({ massFlow: 0, velocity: 5, pressure: 0, massFlowGiven: false }, "SI")).toEqual(["V 5 m/s"]);
  });

  it("says ? for a mass flow whose expression cannot be worked out", () => {
    expect(portFlowLines({ massFlow: Number.NaN, velocity: 5, pressure: 0 }, "SI")).toEqual(["ṁ ? · V 5 m/s"]);
  });
});

describe("a port's pressure on the drawing", () => {
  // port pressures are gauge pressures (the file format's rule, the inputs table's "Gauge
  // pressure"); the trade writes kPa(g) and psig (common practice)
  it("says gauge as the trade writes it, in either unit system", () => {
    expect(portFlowLines({ massFlow: 0, velocity: 0, pressure: 350e3 }, "SI")).toEqual(["ṁ 0 kg/s · V 0 m/s", "p 350 kPa(g)"]);
    // 50 psi = 344.7379 kPa (1 psi = 6894.757 Pa, NIST SP 811)
    expect(portFlowLines({ massFlow: 0, velocity: 0, pressure: 50 * 6894.757293168 }, "US")[1]).toBe("p 50 psig");
  });
  it("leaves an unknown pressure a question mark", () => {
    expect(gaugeWords("?")).toBe("?");
  });
});
