// Loading the desk: header, the search box and table rows.
import { LoadingRegion, Skeleton } from "@/components/ui/skeleton";

export default function Loading() {
  return (
    <LoadingRegion>
      <Skeleton className="h-4 w-32" />
      <Skeleton className="mt-3 h-10 w-64" />
      <Skeleton className="mt-8 h-5 w-32" />
      <Skeleton className="mt-2 h-14 w-full max-w-xl" />
      <div className="mt-6 space-y-2">
        {Array.from({ length: 6 }, (_, i) => (
          <Skeleton key={i} className="h-14 w-full" />
        ))}
      </div>
    </LoadingRegion>
  );
}
