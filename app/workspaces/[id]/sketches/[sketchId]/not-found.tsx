import { NotHere } from "@/components/shell/NotHere";

// A sketch address that leads nowhere: unknown, deleted, in another workspace, or in a workspace the
// reader is not a member of (the same words for all, so nothing leaks).
export default function SketchNotFound() {
  return (
    <NotHere title="No such sketch here">
      It does not exist in this workspace: it may have been deleted, or the link is wrong — or you are not a member of the
      workspace that holds it. If you expected to see it, ask the person who sent the link, or one of the workspace&apos;s owners.
    </NotHere>
  );
}
