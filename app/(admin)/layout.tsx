// The platform administrator's area. The check here only fixes the status (401/403) before the
// loading skeleton streams; the page's query (showsForAdmin) is the real check.
import type { ReactNode } from "react";
import { guardAdmin } from "@/components/shell/guard";
import { AppShell } from "@/components/shell/app-shell";

export default async function AdminLayout({ children }: { children: ReactNode }) {
  await guardAdmin();
  return <AppShell>{children}</AppShell>;
}
