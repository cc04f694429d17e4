// Loading the chair's overview: header, entry counts, dates and the team.
import { LoadingRegion, Skeleton } from "@/components/ui/skeleton";

export default function Loading() {
  return (
    <LoadingRegion>
      <Skeleton className="h-4 w-40" />
      <Skeleton className="mt-3 h-10 w-2/3 max-w-md" />
      <div className="mt-8 grid gap-6 lg:grid-cols-[1fr_22rem]">
        <div className="space-y-3 rounded-card border border-line bg-surface p-6">
          <Skeleton className="h-7 w-32" />
          <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
            {Array.from({ length: 6 }, (_, i) => (
              <Skeleton key={i} className="h-20" />
            ))}
          </div>
        </div>
        <Skeleton className="h-64 rounded-card" />
      </div>
      <Skeleton className="mt-8 h-80 w-full rounded-card" />
    </LoadingRegion>
  );
}
