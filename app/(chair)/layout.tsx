// The show chair's area. Each page checks the chair role itself through its query.
import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/app-shell";

export default function ChairLayout({ children }: { children: ReactNode }) {
  return <AppShell>{children}</AppShell>;
}
