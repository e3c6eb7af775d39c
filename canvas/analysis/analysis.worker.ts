// The live solve off the main thread: parse and solve each sketch the editor sends.
import { analyseCore, expressionFields } from "./core";
import type { SketchFile } from "@/solver/schema";

interface Request {
  seq: number;
  /** the sketch as JSON text: copying a string is far cheaper than a structured clone of the tree (a sketch has no ∞) */
  text: string;
}

const scope = self as unknown as { onmessage: ((e: MessageEvent<Request>) => void) | null; postMessage: (m: unknown) => void };
scope.onmessage = (e) => {
  const { seq, text } = e.data;
  try {
    const sketch = JSON.parse(text) as SketchFile;
    const core = analyseCore(sketch);
    // structured clone on the way back: native, and it keeps ∞ (a friction ratio) as it is
    scope.postMessage({ seq, core: { ...core, fields: expressionFields(sketch, core.fields) } });
  } catch (err) {
    // the editor then solves on the main thread instead
    scope.postMessage({ seq, error: (err as Error).message });
  }
};
