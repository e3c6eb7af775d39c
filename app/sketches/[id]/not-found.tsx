import { SketchUnavailable } from "@/components/editor/Editor";
import { SKETCH_NOT_FOUND_MESSAGE } from "@/components/versions/editor/notFound";

export default function SavedSketchNotFound() {
  // only a signed-in reader is sent here (app/sketches/[id]/page.tsx): signing in again would bring them back
  return <SketchUnavailable message={SKETCH_NOT_FOUND_MESSAGE} signedOut={false} />;
}
