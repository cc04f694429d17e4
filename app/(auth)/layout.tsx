// Sign-in, sign-up and password pages: the shell with a narrow column.
import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/app-shell";

export default function AuthLayout({ children }: { children: ReactNode }) {
  return <AppShell width="narrow">{children}</AppShell>;
}
