// Fitting the view when a whole other sketch comes in or goes out (an example opened, a file
// imported, and their undo/redo): the old zoom and pan belong to the other drawing and may show
// nothing of this one. The store only counts the requests; the fit needs the drawn scene.
// Also the one refit when the first result comes in: a view fitted before there were reactions
// (no supports yet, or the first solve still running) kept only a guess of room for their arrows.
import type { SolveResult } from "@/solver/types";
import type { EditorStores } from "./context";
import { drawnInFrame, fitScene, isFitted } from "./geometry/fit";
import { buildScene } from "./scene";

/** A result with reactions to draw (a body on no support solves too, with none). */
const hasReactions = (r: SolveResult | null): boolean => !!r && Object.keys(r.reactions).length > 0;

/**
 * Fit the view to the sketch each time the editor store's `fitRequest` moves on. The fit waits
 * until the analysis has read this very sketch, so that elements placed by expressions ("2*r")
 * have their positions and the reactions' arrows their size. Requests made before this starts
 * are taken as done (the canvas fits once when it first measures itself).
 *
 * And when the first result appears (there were no reactions on screen: no supports yet, or the
 * first solve not back), a view still as a fit left it (`isFitted`: no zoom or pan since) is
 * fitted once more, now with room for the reactions' arrows, if any of what is drawn would
 * otherwise be cut by the edges or lie under the legend (`drawnInFrame`). Only then, never on a later result,
 * so the drawing does not jump while something is dragged; a first result that comes during a
 * drag (`busy`) is fitted for at the next result after it. Returns the stop.
 */
export function followFitRequests(stores: EditorStores, busy: () => boolean = () => false): () => void {
  let done = stores.editor.getState().fitRequest;
  // a first result came in during a drag: fit for it once the drag is over
  let owed = false;
  const fitForFirstResult = () => {
    const s = stores.editor.getState();
    const a = stores.analysis.getState();
    if (!hasReactions(a.shown) || a.sketch !== s.sketch) return;
    if (busy()) {
      owed = true;
      return;
    }
    owed = false;
    if (!isFitted(s.view) || !s.sketch.bodies.length) return;
    const scene = buildScene(s.sketch, a.fieldValues, a);
    const drawn = { result: a.shown, units: s.units };
    // all of it already in view: the drawing stays where it is (a refit right after the first
    // support is placed would move the body from under the pointer placing the next)
    if (drawnInFrame(scene, s.view, s.viewport, drawn)) return;
    s.setView(fitScene(scene, s.viewport.width, s.viewport.height, drawn));
  };
  const tryFit = () => {
    const s = stores.editor.getState();
    if (s.fitRequest === done) return;
    const a = stores.analysis.getState();
    if (a.sketch !== s.sketch) return; // the analysis will call again when it has this sketch
    done = s.fitRequest;
    // built here rather than read from the scene store, which may not have heard of the change yet
    const scene = buildScene(s.sketch, a.fieldValues, a);
    s.setView(fitScene(scene, s.viewport.width, s.viewport.height, { result: a.shown, units: s.units }));
  };
  const stopEditor = stores.editor.subscribe((s, prev) => {
    if (s.fitRequest !== prev.fitRequest) tryFit();
  });
  const stopAnalysis = stores.analysis.subscribe((a, prev) => {
    if (a.sketch !== prev.sketch) tryFit();
    // (a whole other sketch brought its own fit just now, with this result if it had one)
    if ((hasReactions(a.shown) && !hasReactions(prev.shown)) || (owed && a.shown !== prev.shown)) fitForFirstResult();
  });
  return () => {
    stopEditor();
    stopAnalysis();
  };
}
