// Loading an invitation: the mark, a heading and a card.
import { CardPageSkeleton } from "@/components/ui/card-page-skeleton";

export default function Loading() {
  return <CardPageSkeleton />;
}
