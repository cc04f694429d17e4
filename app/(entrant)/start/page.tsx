// Where signing in leads when no page asked for the sign-in: the place the viewer's role at a
// current show calls for (lib/landing.ts), or "My entries". My entries stays one tap away in
// the menu on every one of those pages.
import { redirect } from "next/navigation";
import { pageViewer } from "@/components/shell/guard";
import { landingForViewer } from "@/db/queries/landing";

export const dynamic = "force-dynamic";

export default async function StartPage() {
  const viewer = await pageViewer();
  redirect(await landingForViewer(viewer));
}
