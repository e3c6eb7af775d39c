// Konva redraws a layer on the next animation frame after any change. The interaction layer
// (the elements being dragged, the handles, the pointer overlay) is small, and a drag should show
// on the very next frame whatever else the page does before it: this layer is drawn as soon as
// React has committed the change (a microtask), so its bitmap is ready before the frame, and a
// change landing between commit and frame does not wait in the frame queue.
import type Konva from "konva";

const patched = new WeakSet<Konva.Layer>();

/** Make `layer.batchDraw()` draw at the end of the current task instead of on the next frame. */
export function drawAfterCommit(layer: Konva.Layer): void {
  if (patched.has(layer)) return;
  patched.add(layer);
  let queued = false;
  layer.batchDraw = function batchDrawNow(this: Konva.Layer) {
    if (!queued) {
      queued = true;
      queueMicrotask(() => {
        queued = false;
        // a layer destroyed in the meantime has no stage and nothing to draw on
        if (layer.getStage()) layer.draw();
      });
    }
    return this;
  };
}

/**
 * The stage's own DOM listeners hit-test the canvas on every pointer move to fire Konva's node
 * events; the editor hit-tests itself (pointer.ts) and uses no Konva events, so that work is
 * skipped by letting pointer input fall through to the container that owns the listeners.
 */
export function ignoreStagePointerInput(stage: Konva.Stage): void {
  stage.content.style.pointerEvents = "none";
}
