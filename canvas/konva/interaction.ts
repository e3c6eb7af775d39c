// Transient pointer state the canvas draws but the document does not hold: where the pointer
// hovers, what it snaps to, the rubber band, the body being drawn. Kept out of the editor
// store so hovering never touches the undo history or the panels.
import { createStore } from "zustand/vanilla";
import type { Vec2 } from "@/solver/types";
import type { SnapResult } from "../geometry/snap";
import type { Box } from "../geometry/polygon";
import type { ElementKind } from "../model/elements";
import { NO_SHIFTS, type LabelShifts } from "../render/labels";

export interface InteractionState {
  /** pointer in world metres while over the canvas */
  hover: Vec2 | null;
  snap: SnapResult | null;
  band: Box | null;
  /** the rectangle being drawn (world corners) */
  rect: [Vec2, Vec2] | null;
  /** true while the space bar is held (drag pans) */
  spaceHeld: boolean;
  /** true while a drag is in progress (the drawing layer stops hit-testing) */
  dragging: boolean;
  panning: boolean;
  /** elements a drag is changing: drawn on the interaction layer, so the drawing layer (every other element) is not redrawn each frame */
  lifted: ReadonlySet<string>;
  /** element names moved off crowded texts, placed for the whole sketch (kept while a drag lasts) */
  labelShifts: LabelShifts;
}

export const NOTHING_LIFTED: ReadonlySet<string> = new Set();

export const createInteractionStore = () =>
  createStore<InteractionState>(() => ({ hover: null, snap: null, band: null, rect: null, spaceHeld: false, dragging: false, panning: false, lifted: NOTHING_LIFTED, labelShifts: NO_SHIFTS }));

export type InteractionStore = ReturnType<typeof createInteractionStore>;

/** The drag-and-drop type of a tray item (a `TrayDrop` as JSON). */
export const TRAY_MIME = "application/x-counterpoise-element";

/** What a tray item carries when dragged onto the canvas. */
export interface TrayDrop {
  kind: ElementKind;
  /** a contact that carries friction */
  friction?: boolean;
  /** the polygon body (a body without it is the rectangle) */
  polygon?: boolean;
}
