// The editor's stores linked as the editor page links them (canvas/context): the live analysis
// follows the sketch, and the scene follows both. Shared by the tests that drive the stores
// without a page.
import type { EditorStore } from "@/canvas/store";
import { createAnalysisStore, linkAnalysis, type Runner } from "@/canvas/analysis/store";
import { createSceneStore, linkScene, type EditorStores } from "@/canvas/context";

/** The stores around `editor`, and the links' stops (call each when the test ends). */
export function linkStores(editor: EditorStore, runner?: Runner): { stores: EditorStores; stops: Array<() => void> } {
  const analysis = createAnalysisStore();
  const scene = createSceneStore(editor, analysis);
  return { stores: { editor, analysis, scene }, stops: [linkAnalysis(editor, analysis, runner), linkScene(editor, analysis, scene)] };
}
