// The points of a sweep where the sketch is invalid (a swept value drives gravity, a mass, an
// area … out of its allowed range), gathered into stretches of neighbouring points that fail for
// the same reasons, so the panel can say "g = −1 to −5 m/s² (5 points): Gravity: must not be
// negative" once rather than once per point.
import type { SweepData } from "@/canvas/studies/run";
import type { FieldError } from "@/solver/types";

export interface InvalidStretch {
  /** the first and last swept value of the stretch, in sweep order */
  from: number;
  to: number;
  count: number;
  errors: FieldError[];
}

export function invalidStretches(data: Pick<SweepData, "statuses" | "errors">): InvalidStretch[] {
  const out: InvalidStretch[] = [];
  let lastKey = "";
  let lastIndex = -2;
  let k = 0;
  data.statuses.forEach((status, i) => {
    if (status !== "error") return;
    const point = data.errors[k++];
    if (!point) return;
    const key = JSON.stringify(point.errors);
    const last = out[out.length - 1];
    if (last && lastIndex === i - 1 && key === lastKey) {
      last.to = point.value;
      last.count++;
    } else out.push({ from: point.value, to: point.value, count: 1, errors: point.errors });
    lastKey = key;
    lastIndex = i;
  });
  return out;
}
