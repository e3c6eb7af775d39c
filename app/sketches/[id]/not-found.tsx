import { SketchUnavailable } from "@/components/editor/Editor";
import { SKETCH_NOT_FOUND_MESSAGE } from "@/components/versions/editor/notFound";

export default function SavedSketchNotFound() {
  return <SketchUnavailable message={SKETCH_NOT_FOUND_MESSAGE} />;
}
