"use client";
// The page's persistence (where the sketch is kept), for panels that need more than saving:
// the Underlay section uploads through it. Without a provider (a panel rendered on its own in a
// test) there is nowhere to upload to.
import { createContext, useContext } from "react";
import type { SketchPersistence } from "@/canvas/persistence";

export const PersistenceCtx = createContext<SketchPersistence | null>(null);

/** The page's upload for underlays, or undefined where underlays cannot be uploaded (the scratch sketch). */
export function useUnderlayUpload(): SketchPersistence["uploadUnderlay"] {
  const p = useContext(PersistenceCtx);
  return p?.uploadUnderlay?.bind(p);
}
