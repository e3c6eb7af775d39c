import { NotHere } from "@/components/shell/NotHere";
import type { WorkspaceDeletion } from "@/db/queries/workspace-deletion";
import { workspaceDeletionSentence } from "./format";

/** A deleted workspace's address, opened by someone who was a member of it: who deleted it and when. */
export function WorkspaceDeleted({ deleted }: { deleted: Pick<WorkspaceDeletion, "name" | "deletedBy" | "deletedAt"> }) {
  return (
    <NotHere title="This workspace was deleted">
      <span data-testid="workspace-deleted">{workspaceDeletionSentence(deleted)}</span> Exported sketch files and calc sheets kept elsewhere are the only copies left.
    </NotHere>
  );
}
