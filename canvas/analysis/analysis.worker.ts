// The live solve off the main thread: parse and solve each sketch the editor sends.
import { analyseCore } from "./core";
import type { SketchFile } from "@/solver/schema";

interface Request {
  seq: number;
  sketch: SketchFile;
}

const scope = self as unknown as { onmessage: ((e: MessageEvent<Request>) => void) | null; postMessage: (m: unknown) => void };
scope.onmessage = (e) => {
  const { seq, sketch } = e.data;
  scope.postMessage({ seq, core: analyseCore(sketch) });
};
