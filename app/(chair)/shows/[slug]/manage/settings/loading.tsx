// Loading the settings page: header, section links and the section cards. The manage layout has
// already checked the role, so streaming this skeleton never hides a 401/403/404 status.
import { SectionsPageSkeleton } from "@/components/ui/sections-page-skeleton";

export default function Loading() {
  return <SectionsPageSkeleton links={7} sections={4} />;
}
