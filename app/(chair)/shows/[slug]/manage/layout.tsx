// Checks the role before anything streams, so a refusal answers 401/403/404 rather than 200
// (see components/shell/guard.ts). The page checks again through its own query.
import type { ReactNode } from "react";
import { guardArea } from "@/components/shell/guard";

type Props = { children: ReactNode; params: Promise<{ slug: string }> };

export default async function AreaGuardLayout({ children, params }: Props) {
  await guardArea((await params).slug, "manage");
  return children;
}
