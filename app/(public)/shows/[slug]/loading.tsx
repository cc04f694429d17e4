// Loading a public page: header, a dates card and the side panel.
import { LoadingRegion, Skeleton } from "@/components/ui/skeleton";

export default function Loading() {
  return (
    <LoadingRegion>
      <Skeleton className="h-4 w-40" />
      <Skeleton className="mt-3 h-10 w-3/4 max-w-lg" />
      <Skeleton className="mt-3 h-6 w-32 rounded-full" />
      <div className="mt-8 grid gap-6 lg:grid-cols-[1fr_22rem]">
        <Skeleton className="h-72 rounded-card" />
        <Skeleton className="h-48 rounded-card" />
      </div>
    </LoadingRegion>
  );
}
