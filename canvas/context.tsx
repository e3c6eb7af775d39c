"use client";
// The stores of one editor, shared by the canvas and the panels around it. Stores are created
// once per editor; their links (the live solve, the scene) are made in an effect, so a remount
// (React's strict mode does one) tears them down and makes them again cleanly.
import { createContext, useContext, useEffect, useState, type ReactNode } from "react";
import { useStore } from "zustand";
import { createStore, type StoreApi } from "zustand/vanilla";
import type { EditorState, EditorStore } from "./store";
import { createAnalysisStore, linkAnalysis, syncRunner, workerRunner, type Analysis, type AnalysisStore, type Runner } from "./analysis/store";
import { buildScene, type Scene } from "./scene";

export interface EditorStores {
  editor: EditorStore;
  analysis: AnalysisStore;
  scene: StoreApi<Scene>;
}

const Ctx = createContext<EditorStores | null>(null);

export function createSceneStore(editor: EditorStore, analysis: AnalysisStore): StoreApi<Scene> {
  return createStore<Scene>(() => buildScene(editor.getState().sketch, analysis.getState().fieldValues, analysis.getState()));
}

/** The gravity direction the legend says: the shown result's sketch's (null with no result). */
const legendGravity = (a: Analysis) => (a.shown ? a.shownSketch?.gravityAngle : null);

/** Keep a scene store following the sketch, the latest expression values, and the gravity
 *  direction the legend says (the shown result's). */
export function linkScene(editor: EditorStore, analysis: AnalysisStore, scene: StoreApi<Scene>): () => void {
  const update = () => scene.setState(buildScene(editor.getState().sketch, analysis.getState().fieldValues, analysis.getState()), true);
  update();
  const a = editor.subscribe((s, prev) => {
    if (s.sketch !== prev.sketch) update();
  });
  const b = analysis.subscribe((s, prev) => {
    if (s.fieldValues !== prev.fieldValues || legendGravity(s) !== legendGravity(prev)) update();
  });
  return () => {
    a();
    b();
  };
}

function browserRunner(): { runner: Runner; stop: () => void } {
  if (typeof Worker === "undefined" || process.env.NODE_ENV === "test") return { runner: syncRunner, stop: () => {} };
  try {
    const worker = new Worker(new URL("./analysis/analysis.worker.ts", import.meta.url), { type: "module" });
    return { runner: workerRunner(worker), stop: () => worker.terminate() };
  } catch {
    return { runner: syncRunner, stop: () => {} };
  }
}

export function EditorProvider({ editor, children, runner }: { editor: EditorStore; children: ReactNode; runner?: Runner }) {
  const [stores] = useState<EditorStores>(() => {
    const analysis = createAnalysisStore();
    // a first synchronous solve, so the first paint already shows results
    linkAnalysis(editor, analysis, syncRunner)();
    return { editor, analysis, scene: createSceneStore(editor, analysis) };
  });
  useEffect(() => {
    const r = runner ? { runner, stop: () => {} } : browserRunner();
    const stopAnalysis = linkAnalysis(stores.editor, stores.analysis, r.runner);
    const stopScene = linkScene(stores.editor, stores.analysis, stores.scene);
    return () => {
      stopScene();
      stopAnalysis();
      r.stop();
    };
  }, [stores, runner]);
  return <Ctx.Provider value={stores}>{children}</Ctx.Provider>;
}

export function useStores(): EditorStores {
  const s = useContext(Ctx);
  if (!s) throw new Error("useStores needs an <EditorProvider>");
  return s;
}

export function useEditor<T>(selector: (s: EditorState) => T): T {
  return useStore(useStores().editor, selector);
}

export function useAnalysis<T>(selector: (s: Analysis) => T): T {
  return useStore(useStores().analysis, selector);
}

export function useScene<T>(selector: (s: Scene) => T): T {
  return useStore(useStores().scene, selector);
}
