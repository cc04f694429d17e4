// The loading shape of a page of cards ("My entries", "Account"): header, a line, a section
// heading and a grid of cards.
import { LoadingRegion, Skeleton } from "@/components/ui/skeleton";

export function CardsPageSkeleton() {
  return (
    <LoadingRegion>
      <Skeleton className="h-10 w-56" />
      <Skeleton className="mt-3 h-5 w-full max-w-prose" />
      <Skeleton className="mt-10 h-7 w-48" />
      <div className="mt-4 grid gap-4 md:grid-cols-2">
        {Array.from({ length: 4 }, (_, i) => (
          <Skeleton key={i} className="h-36 rounded-card" />
        ))}
      </div>
    </LoadingRegion>
  );
}
