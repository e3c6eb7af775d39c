"use client";
// A saved sketch: the versions work's persistence and toolbar (components/versions/editor).
import { SavedSketchEditor } from "@/components/versions/editor/SavedSketchEditor";

export function SavedSketchClient({ id }: { id: string }) {
  return <SavedSketchEditor id={id} />;
}
