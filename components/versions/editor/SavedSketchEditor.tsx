"use client";
// The editor on a saved sketch: its persistence over the versions API and, in the toolbar, the
// version, the Save button and the save and conflict dialogs. `?version=N` opens an older
// version; `?restore=1` brings back work kept in this browser after a conflict (`&draft=<tab>`:
// the draft of that tab, `drafts.ts`; without it, the newest).
import { useSearchParams } from "next/navigation";
import { useState } from "react";
import { Editor } from "@/components/editor/Editor";
import { createSaveFlow, savedPersistence } from "./savedPersistence";
import { SavedSketchBar } from "./SavedSketchBar";

export function SavedSketchEditor({ id }: { id: string }) {
  const params = useSearchParams();
  const [flow] = useState(createSaveFlow);
  const [persistence] = useState(() => {
    const version = Number(params.get("version"));
    return savedPersistence(id, flow, { version: Number.isInteger(version) && version > 0 ? version : undefined, restore: params.get("restore") === "1", draft: params.get("draft") ?? undefined });
  });
  return <Editor persistence={persistence} toolbarExtra={<SavedSketchBar flow={flow} />} />;
}
