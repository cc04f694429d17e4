// Judges' and scribes' area. Each page checks the role itself through its query.
import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/app-shell";

export default function JudgingLayout({ children }: { children: ReactNode }) {
  return <AppShell>{children}</AppShell>;
}
