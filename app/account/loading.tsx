import { Skeleton } from "@/components/shell/controls";

export default function Loading() {
  return (
    <div className="mx-auto max-w-3xl space-y-6 px-6 py-8" role="status" aria-label="Loading your account">
      <Skeleton className="h-7 w-64" />
      <Skeleton className="h-44 w-full" />
      <Skeleton className="h-56 w-full" />
    </div>
  );
}
