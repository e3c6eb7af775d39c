import { NotHere } from "@/components/shell/NotHere";

export default function WorkspaceNotFound() {
  return (
    <NotHere title="No such workspace here">
      It does not exist, or you are not a member of it (any more). If you expected to see it, ask one of its owners to invite you.
    </NotHere>
  );
}
