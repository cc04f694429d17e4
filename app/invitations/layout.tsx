// Invitation links from e-mail: the shell with a narrow column.
import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/app-shell";

export default function InvitationsLayout({ children }: { children: ReactNode }) {
  return <AppShell width="narrow">{children}</AppShell>;
}
