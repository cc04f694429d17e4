// Loading "Account": header, then a section heading and cards. Beside the page, not above the
// entrant area: a loading boundary above a page that answers 404 would stream a 200 first.
import { CardsPageSkeleton } from "@/components/ui/cards-page-skeleton";

export default function Loading() {
  return <CardsPageSkeleton />;
}
