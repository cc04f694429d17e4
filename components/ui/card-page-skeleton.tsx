// The loading shape of a centred card page (sign-in, sign-up, an invitation): the mark, a
// heading, a line, and a form-shaped card.
import { LoadingRegion, Skeleton } from "@/components/ui/skeleton";

export function CardPageSkeleton() {
  return (
    <LoadingRegion>
      <Skeleton className="mx-auto size-14 rounded-full" />
      <Skeleton className="mx-auto mt-4 h-9 w-2/3" />
      <Skeleton className="mx-auto mt-3 h-5 w-4/5" />
      <div className="mt-6 space-y-5 rounded-card border border-line bg-surface p-5 sm:p-8">
        <Skeleton className="h-4 w-20" />
        <Skeleton className="h-11 w-full" />
        <Skeleton className="h-4 w-24" />
        <Skeleton className="h-11 w-full" />
        <Skeleton className="h-14 w-40" />
      </div>
    </LoadingRegion>
  );
}
