// Demo data for the calc sheet's layout tests: the pump set with long support ids and long case
// names, the kind of labels that squeeze a table's columns.
import type { SketchFileInput } from "@/solver";
import { loadFixture } from "../solver/helpers";

export function longLabelFile(): SketchFileInput {
  const file = loadFixture("pump-set-hold-down.json");
  const ids: Record<string, string> = { leftPad: "leftRubberBearingPadUnderEngine", rightPad: "rightRubberBearingPadUnderPump", strap: "holdDownStrapToFloorAnchor" };
  for (const s of file.supports ?? []) s.id = ids[s.id];
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
