import { Skeleton } from "@/components/shell/controls";

export default function Loading() {
  return (
    <div className="space-y-6" role="status" aria-label="Loading the workspace">
      <div className="space-y-2">
        <Skeleton className="h-3 w-28" />
        <Skeleton className="h-7 w-72" />
        <Skeleton className="h-4 w-96 max-w-full" />
      </div>
      <div className="grid gap-6 lg:grid-cols-[1fr_20rem]">
        <Skeleton className="h-64 w-full" />
        <Skeleton className="h-40 w-full" />
      </div>
    </div>
  );
}
