import { NoSuchWorkspace } from "@/components/shell/NotHere";

export default function WorkspaceNotFound() {
  return <NoSuchWorkspace />;
}
