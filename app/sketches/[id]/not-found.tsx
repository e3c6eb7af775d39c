import { SketchUnavailable } from "@/components/editor/Editor";
import { deletionSentence } from "@/components/sketches/format";
import { SKETCH_NOT_FOUND_MESSAGE } from "@/components/versions/editor/notFound";
import { editorPageDeletion } from "@/lib/page-target";

export default async function SavedSketchNotFound() {
  // a member of the workspace the sketch was deleted from is told who deleted it and when, and led
  // back to that workspace; anyone else reads the words of a sketch that never was
  const gone = await editorPageDeletion();
  // only a signed-in reader is sent here (app/sketches/[id]/page.tsx): signing in again would bring them back
  return (
    <SketchUnavailable
      message={gone ? deletionSentence(gone) : SKETCH_NOT_FOUND_MESSAGE}
      signedOut={false}
      back={gone ? { href: `/workspaces/${gone.workspaceId}`, label: `Back to ${gone.workspaceName}` } : undefined}
    />
  );
}
