// The pushed block (tests/support/pushed-block.ts: 1000 kg, weight midway between feet 1 m apart,
// pushed sideways 1 m up by P) with a third foot under its middle. Rigid block on three equal
// springs (common practice): n = W/3 ± P·h·(x − 0.5)/Σ(x − 0.5)², so the near foot would pull
// once P·h > W/3 = 3268.9 N·m and lifts off; the middle and far feet then hold it alone (moments
// about the far foot: n_mid = W − 2P). Overturning about the far foot is the pushed block's:
// W·0.5 / (P·1). Invented test data.
import type { SketchFile } from "@/solver/schema";
import { pushedBlock } from "./pushed-block";

export function threeFootBlock(P: string): SketchFile {
  const doc = pushedBlock(P);
  return {
    ...doc,
    title: "Three-foot block",
    supports: [...doc.supports, { id: "mid", label: "middle foot", body: "b", kind: "contact", at: [0.5, 0], angle: 90 }],
  } as SketchFile;
}
