// The intake desk's area (intake volunteers and the chair). Pages check the role via queries.
import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/app-shell";

export default function DeskLayout({ children }: { children: ReactNode }) {
  return <AppShell>{children}</AppShell>;
}
