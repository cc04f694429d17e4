// Public pages (home, show pages): the app shell, no sign-in needed.
import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/app-shell";

export default function PublicLayout({ children }: { children: ReactNode }) {
  return <AppShell>{children}</AppShell>;
}
