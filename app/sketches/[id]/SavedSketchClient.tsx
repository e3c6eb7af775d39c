"use client";
// A saved sketch. Until the versions API plugs its SketchPersistence in here, every id answers
// "not found" with a way to sign in or start a scratch sketch.
import { useState } from "react";
import { Editor } from "@/components/editor/Editor";
import { unavailablePersistence } from "@/canvas/persistence";

export function SavedSketchClient({ id }: { id: string }) {
  const [persistence] = useState(() => unavailablePersistence(id));
  return <Editor persistence={persistence} />;
}
