// Loading the categories page: header, the editor with its check beside it, and the queue. The
// manage layout has already checked the role, so streaming this never hides a 401/403/404.
import { LoadingRegion, Skeleton } from "@/components/ui/skeleton";

export default function Loading() {
  return (
    <LoadingRegion>
      <Skeleton className="h-4 w-40" />
      <Skeleton className="mt-3 h-10 w-2/3 max-w-md" />
      <div className="mt-8 grid gap-6 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <div className="space-y-3 rounded-card border border-line bg-surface p-6">
          <Skeleton className="h-7 w-40" />
          {Array.from({ length: 6 }, (_, i) => (
            <Skeleton key={i} className="h-14" />
          ))}
        </div>
        <Skeleton className="h-80 rounded-card" />
      </div>
      <Skeleton className="mt-8 h-64 w-full rounded-card" />
    </LoadingRegion>
  );
}
