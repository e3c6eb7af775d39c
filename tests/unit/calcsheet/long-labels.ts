// Demo data for the calc sheet's layout tests: the pump set with long support ids and long case
// names, the kind of labels that squeeze a table's columns.
import type { SketchFileInput } from "@/solver";
import { loadFixture } from "../solver/helpers";

export function longLabelFile(): SketchFileInput {
  const file = loadFixture("pump-set-hold-down.json");
  const ids: Record<string, string> = { leftPad: "leftRubberBearingPadUnderEngine", rightPad: "rightRubberBearingPadUnderPump", strap: "holdDownStrapToFloorAnchor" };
  // long as ids and as labels: the tables name a support by its label
  for (const s of file.supports ?? []) s.label = s.id = ids[s.id];
  file.parameters = { mdot: "40 kg/s" };
  file.ports![0].massFlow = "mdot";
  file.massSources![0].massFlow = "mdot";
  file.cases = [
    { id: "idle", name: "Idling with the discharge valve shut", parameters: { mdot: "0.001 kg/s" } },
    { id: "duty", name: "Duty point", parameters: { mdot: "40 kg/s" } },
    { id: "runout", name: "Run-out at the end of the curve", parameters: { mdot: "55 kg/s" } },
  ];
  return file;
}

/** A case name longer than any column can hold on one line (demo data). */
export const VERY_LONG_CASE = "Run-out with the discharge valve fully open, the strainer clean and the sump at its highest level";

/** The pump set with long labels, a case and a combination with long names, and a sweep (demo data). */
export function longLabelFileWithStudies(): SketchFileInput {
  const file = longLabelFile();
  file.cases!.push({ id: "flood", name: VERY_LONG_CASE, parameters: { mdot: "58 kg/s" } });
  file.combinations = [{ id: "c", name: "Duty point with the dead load factored", terms: [{ case: "duty", factor: 1.2 }] }];
  file.sweeps = [{ id: "s", parameter: "mdot", from: 0, to: 60, points: 31, quantities: [{ support: "holdDownStrapToFloorAnchor", component: "margin" }] }];
  return file;
}
