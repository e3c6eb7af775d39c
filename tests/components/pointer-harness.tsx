// The canvas's pointer controller without Konva (jsdom): the editor, analysis and scene stores
// linked as the editor page links them, a controller whose hit test answers what the test sets in
// `hit`, and pointer events at world points (screen = view.x + x·scale, view.y − y·scale). Shared by
// the component tests that drive the canvas with pointer events.
import { useCallback } from "react";
import { afterEach, beforeEach } from "vitest";
import type { SketchFile } from "@/solver/schema";
import { createEditorStore } from "@/canvas/store";
import type { EditorStores } from "@/canvas/context";
import { createInteractionStore, type InteractionStore } from "@/canvas/konva/interaction";
import { createPointerController, type HitInfo, type PointerController } from "@/canvas/konva/pointer";
import { findElement } from "@/canvas/model/elements";
import type { ActionContext } from "@/canvas/actions";
import { useShortcuts } from "@/components/editor/useShortcuts";
import { linkStores } from "../support/linked-stores";

/** 100 px per metre, the world origin at screen (100, 500). */
export const POINTER_VIEW = { scale: 100, x: 100, y: 500 };

type ClientPoint = { clientX: number; clientY: number };
type Keys = { shiftKey?: boolean; altKey?: boolean };

export interface PointerHarness {
  /** this test's stores, controller and interaction store (made afresh before each test) */
  readonly stores: EditorStores;
  readonly controller: PointerController;
  readonly interaction: InteractionStore;
  /** what the controller's hit test finds under the pointer (null before each test) */
  hit: HitInfo | null;
  ed(): ReturnType<EditorStores["editor"]["getState"]>;
  /** an element of the sketch, by id, as a plain record */
  el(id: string): Record<string, unknown>;
  /** the screen point of a world point */
  screenOf(x: number, y: number): ClientPoint;
  /** a left-button press at a world point */
  down(x: number, y: number, keys?: Keys): void;
  /** a mouse move or release at a world point, sent to the window as the browser does during a drag */
  pointer(type: "pointermove" | "pointerup", x: number, y: number, extra?: Partial<PointerEventInit>): void;
  /** a finger (pointer `id`) put down at a screen point */
  fingerDown(id: number, at: ClientPoint): void;
  /** a finger's move, lift or cancel at a screen point */
  finger(type: "pointermove" | "pointerup" | "pointercancel", id: number, at: ClientPoint): void;
}

/** Registers the set-up (beforeEach) and tear-down (afterEach) of the file's tests; returns their harness. */
export function pointerHarness(sketch: () => SketchFile, view = POINTER_VIEW): PointerHarness {
  let stores: EditorStores;
  let controller: PointerController;
  let interaction: InteractionStore;
  let stops: Array<() => void> = [];
  const h: PointerHarness = {
    get stores() {
      return stores;
    },
    get controller() {
      return controller;
    },
    get interaction() {
      return interaction;
    },
    hit: null,
    ed: () => stores.editor.getState(),
    el: (id) => findElement(h.ed().sketch, id)?.el as unknown as Record<string, unknown>,
    screenOf: (x, y) => ({ clientX: view.x + x * view.scale, clientY: view.y - y * view.scale }),
    down(x, y, keys = {}) {
      controller.down({ ...h.screenOf(x, y), button: 0, shiftKey: false, altKey: false, ctrlKey: false, metaKey: false, timeStamp: performance.now(), preventDefault() {}, ...keys } as unknown as PointerEvent);
    },
    pointer(type, x, y, extra = {}) {
      window.dispatchEvent(new MouseEvent(type, { ...h.screenOf(x, y), bubbles: true, ...extra }));
    },
    fingerDown(id, at) {
      controller.down({ ...at, button: 0, pointerType: "touch", pointerId: id, shiftKey: false, altKey: false, ctrlKey: false, metaKey: false, timeStamp: 0, preventDefault() {} } as unknown as PointerEvent);
    },
    finger(type, id, at) {
      window.dispatchEvent(Object.assign(new MouseEvent(type, at), { pointerType: "touch", pointerId: id }));
    },
  };
  beforeEach(() => {
    ({ stores, stops } = linkStores(createEditorStore({ sketch: sketch(), view })));
    h.hit = null;
    interaction = createInteractionStore();
    controller = createPointerController({ stores, interaction, container: () => null, hitTest: () => h.hit });
  });
  afterEach(() => {
    controller.dispose();
    stops.forEach((s) => s());
  });
  return h;
}

/** The editor's keyboard shortcuts wired to the harness's stores and controller, as the editor page wires them. */
export function HarnessKeys({ harness, interaction }: { harness: PointerHarness; interaction: InteractionStore }) {
  const getCtx = useCallback((): ActionContext => ({ stores: harness.stores, controller: harness.controller, ui: {} as ActionContext["ui"] }), [harness]);
  useShortcuts(getCtx, interaction);
  return null;
}
