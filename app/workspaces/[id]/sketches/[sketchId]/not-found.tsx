import { NoSuchSketch } from "@/components/shell/NotHere";

// A sketch address that leads nowhere, met by a page (a move inside the app); an address typed or
// followed from a link is answered by `app/workspaces/not-found.tsx` with a 404.
export default function SketchNotFound() {
  return <NoSuchSketch />;
}
