// Loading the judging list: header, the jump box and big entry rows.
import { LoadingRegion, Skeleton } from "@/components/ui/skeleton";

export default function Loading() {
  return (
    <LoadingRegion>
      <Skeleton className="h-4 w-32" />
      <Skeleton className="mt-3 h-10 w-2/3 max-w-md" />
      <Skeleton className="mt-8 h-16 w-full rounded-card" />
      <Skeleton className="mt-6 h-28 w-full rounded-card" />
      <div className="mt-6 space-y-4">
        {Array.from({ length: 4 }, (_, i) => (
          <div key={i} className="flex gap-6 rounded-card border border-line bg-surface p-5">
            <Skeleton className="h-14 w-24" />
            <div className="flex-1 space-y-3">
              <Skeleton className="h-8 w-2/3" />
              <Skeleton className="h-5 w-1/2" />
            </div>
          </div>
        ))}
      </div>
    </LoadingRegion>
  );
}
