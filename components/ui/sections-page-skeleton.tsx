// The loading shape of a page of section links and section cards (settings, judging set-up).
import { LoadingRegion, Skeleton } from "@/components/ui/skeleton";

export function SectionsPageSkeleton({ links, sections, fieldsPerSection = 3 }: { links: number; sections: number; fieldsPerSection?: number }) {
  return (
    <LoadingRegion>
      <Skeleton className="h-4 w-40" />
      <Skeleton className="mt-3 h-10 w-2/3 max-w-md" />
      <div className="mt-8 flex flex-wrap gap-2">
        {Array.from({ length: links }, (_, i) => (
          <Skeleton key={i} className="h-11 w-28" />
        ))}
      </div>
      {Array.from({ length: sections }, (_, i) => (
        <div key={i} className="mt-8 space-y-4 rounded-card border border-line bg-surface p-6">
          <Skeleton className="h-7 w-40" />
          <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
            {Array.from({ length: fieldsPerSection }, (_, j) => (
              <Skeleton key={j} className="h-16" />
            ))}
          </div>
          <Skeleton className="h-11 w-32" />
        </div>
      ))}
    </LoadingRegion>
  );
}
