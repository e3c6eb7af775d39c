"use client";
import { useState } from "react";
import { Editor } from "@/components/editor/Editor";
import { scratchPersistence } from "@/canvas/persistence";
import { ScratchSave } from "@/components/versions/editor/ScratchSave";

export function NewSketchClient({ example }: { example?: string }) {
  const [persistence] = useState(() => scratchPersistence());
  return <Editor persistence={persistence} example={example} toolbarExtra={<ScratchSave />} />;
}
