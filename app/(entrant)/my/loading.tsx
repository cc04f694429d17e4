// Loading "My entries": header, then a section heading and cards. Kept beside the pages that never
// refuse access: a loading boundary above a page that answers 404 would stream a 200 first.
import { CardsPageSkeleton } from "@/components/ui/cards-page-skeleton";

export default function Loading() {
  return <CardsPageSkeleton />;
}
