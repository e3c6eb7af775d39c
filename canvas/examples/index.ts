// The examples the new-sketch page offers: our own invented scenarios, each solving to a clear
// result that the status sentence explains.
import { migrateSketch } from "@/solver/migrations";
import { sketchSchema, type SketchFile } from "@/solver/schema";
import fireMonitor from "./fire-monitor-trailer.json";
import pipeBend from "./pipe-bend-anchor.json";
import washingCart from "./washing-cart.json";
import pumpSkid from "./pump-skid.json";
import exhaustStack from "./exhaust-stack.json";
import roofFan from "./roof-fan.json";

export interface Example {
  id: string;
  title: string;
  /** one line for the menu */
  summary: string;
  sketch: SketchFile;
}

/** An example as the current format version reads it (migrated and validated once). */
function load(json: unknown): SketchFile {
  const m = migrateSketch(json);
  if (!m.ok) throw new Error(`example does not load: ${m.errors[0]?.message}`);
  return sketchSchema.parse(m.doc);
}

export const EXAMPLES: readonly Example[] = [
  { id: "fire-monitor-trailer", title: "Fire-fighting monitor on a trailer", summary: "A jet from 2.4 m unloads the front jack; friction at the foot and the axle.", sketch: load(fireMonitor) },
  { id: "pipe-bend-anchor", title: "Pressure-pipe bend on an anchor", summary: "10 bar in a DN150 bend: pressure thrust, momentum and weight on one anchor.", sketch: load(pipeBend) },
  { id: "washing-cart", title: "Pressure-washing cart with a fixed lance", summary: "Raise the lance and the cart tips back off its front caster; four operating cases and a lance-angle sweep.", sketch: load(washingCart) },
  { id: "pump-skid", title: "Dewatering pump skid", summary: "Suction and discharge on a skid held by friction at two bearers.", sketch: load(pumpSkid) },
  { id: "exhaust-stack", title: "Temporary exhaust stack on a skid", summary: "Wind against the duct's push on an unbolted 8 m stack: the upwind edge lifts at 35.4 m/s with the engine stopped, and at 27.4 m/s in the factored uplift check.", sketch: load(exhaustStack) },
  { id: "roof-fan", title: "Axial ducted fan on a roof frame", summary: "A 1 m fan on unbolted feet, the push of its air against the wind: with the fan stopped, the discharge-end foot lifts at 42.7 m/s; a wind sweep and a flow sweep.", sketch: load(roofFan) },
];

export function exampleById(id: string): Example | undefined {
  return EXAMPLES.find((e) => e.id === id);
}
