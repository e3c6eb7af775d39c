// Fitting the view when a whole other sketch comes in or goes out (an example opened, a file
// imported, and their undo/redo): the old zoom and pan belong to the other drawing and may show
// nothing of this one. The store only counts the requests; the fit needs the drawn scene.
import type { EditorStores } from "./context";
import { fitScene } from "./geometry/fit";
import { buildScene } from "./scene";

/**
 * Fit the view to the sketch each time the editor store's `fitRequest` moves on. The fit waits
 * until the analysis has read this very sketch, so that elements placed by expressions ("2*r")
 * have their positions and the reactions' arrows their size. Requests made before this starts
 * are taken as done (the canvas fits once when it first measures itself). Returns the stop.
 */
export function followFitRequests(stores: EditorStores): () => void {
  let done = stores.editor.getState().fitRequest;
  const tryFit = () => {
    const s = stores.editor.getState();
    if (s.fitRequest === done) return;
    const a = stores.analysis.getState();
    if (a.sketch !== s.sketch) return; // the analysis will call again when it has this sketch
    done = s.fitRequest;
    // built here rather than read from the scene store, which may not have heard of the change yet
    const scene = buildScene(s.sketch, a.fieldValues);
    s.setView(fitScene(scene, s.viewport.width, s.viewport.height, { result: a.shown, units: s.units }));
  };
  const stopEditor = stores.editor.subscribe((s, prev) => {
    if (s.fitRequest !== prev.fitRequest) tryFit();
  });
  const stopAnalysis = stores.analysis.subscribe((a, prev) => {
    if (a.sketch !== prev.sketch) tryFit();
  });
  return () => {
    stopEditor();
    stopAnalysis();
  };
}
