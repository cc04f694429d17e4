// Root loading state: a page-header shaped placeholder.
import { LoadingRegion, Skeleton } from "@/components/ui/skeleton";

export default function Loading() {
  return (
    <main id="main" className="container-page flex-1 py-10">
      <LoadingRegion>
        <Skeleton className="h-4 w-32" />
        <Skeleton className="mt-3 h-10 w-2/3 max-w-md" />
        <Skeleton className="mt-4 h-5 w-full max-w-prose" />
        <Skeleton className="mt-10 h-40 w-full" />
      </LoadingRegion>
    </main>
  );
}
