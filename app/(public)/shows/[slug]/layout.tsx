// Answers 404 for an unknown or draft show before the loading skeleton streams (a streamed
// not-found would go out as 200); the page uses the same cached lookup.
import type { ReactNode } from "react";
import { notFound } from "next/navigation";
import { publicShowFor } from "@/components/shows/public-show";

type Props = { children: ReactNode; params: Promise<{ slug: string }> };

export default async function PublicShowLayout({ children, params }: Props) {
  if (!(await publicShowFor((await params).slug))) notFound();
  return children;
}
