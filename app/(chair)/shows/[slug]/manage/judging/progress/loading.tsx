// Loading the progress board: header, the live line, the panels table and two tally tables.
import { LoadingRegion, Skeleton } from "@/components/ui/skeleton";

export default function Loading() {
  return (
    <LoadingRegion>
      <Skeleton className="h-4 w-40" />
      <Skeleton className="mt-3 h-10 w-2/3 max-w-md" />
      <Skeleton className="mt-8 h-5 w-80" />
      <Skeleton className="mt-6 h-8 w-40" />
      <Skeleton className="mt-3 h-48" />
      <div className="mt-6 grid gap-6 xl:grid-cols-2">
        <Skeleton className="h-56" />
        <Skeleton className="h-56" />
      </div>
    </LoadingRegion>
  );
}
