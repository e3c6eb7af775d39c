"use client";
import { useState } from "react";
import { Editor } from "@/components/editor/Editor";
import { ScratchSave, savableScratch } from "@/components/versions/editor/ScratchSave";

export function NewSketchClient({ example }: { example?: string }) {
  // saved to a workspace, the scratch copy in this browser is forgotten (the next "Start a sketch" is empty)
  const [scratch] = useState(() => savableScratch());
  return <Editor persistence={scratch.persistence} example={example} toolbarExtra={<ScratchSave onSaved={scratch.forget} />} />;
}
