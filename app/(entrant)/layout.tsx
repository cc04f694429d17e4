// The signed-in person's own pages: their entries and their account. The sign-in check runs
// here first so a signed-out visit answers 401 before the loading skeleton streams (see
// components/shell/guard.ts); each page checks the viewer again.
import type { ReactNode } from "react";
import { pageViewer } from "@/components/shell/guard";
import { AppShell } from "@/components/shell/app-shell";

export default async function EntrantLayout({ children }: { children: ReactNode }) {
  await pageViewer();
  return <AppShell>{children}</AppShell>;
}
