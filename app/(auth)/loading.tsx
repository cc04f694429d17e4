// Loading an account page: the mark, a heading and a form-shaped card.
import { CardPageSkeleton } from "@/components/ui/card-page-skeleton";

export default function Loading() {
  return <CardPageSkeleton />;
}
