// Loading the judging set-up: header, section links and the five section cards. The manage
// layout has already checked the role, so streaming this never hides a 401/403/404 status.
import { SectionsPageSkeleton } from "@/components/ui/sections-page-skeleton";

export default function Loading() {
  return <SectionsPageSkeleton links={5} sections={5} fieldsPerSection={2} />;
}
