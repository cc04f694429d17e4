// Loading the judging set-up: header, section links and the five section cards. The manage
// layout has already checked the role, so streaming this never hides a 401/403/404 status.
import { LoadingRegion, Skeleton } from "@/components/ui/skeleton";

export default function Loading() {
  return (
    <LoadingRegion>
      <Skeleton className="h-4 w-40" />
      <Skeleton className="mt-3 h-10 w-2/3 max-w-md" />
      <div className="mt-8 flex flex-wrap gap-2">
        {Array.from({ length: 5 }, (_, i) => (
          <Skeleton key={i} className="h-11 w-28" />
        ))}
      </div>
      {Array.from({ length: 5 }, (_, i) => (
        <div key={i} className="mt-8 space-y-4 rounded-card border border-line bg-surface p-6">
          <Skeleton className="h-7 w-40" />
          <div className="grid gap-3 md:grid-cols-2">
            {Array.from({ length: 2 }, (_, j) => (
              <Skeleton key={j} className="h-24" />
            ))}
          </div>
          <Skeleton className="h-11 w-36" />
        </div>
      ))}
    </LoadingRegion>
  );
}
