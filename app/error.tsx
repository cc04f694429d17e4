"use client";
// Root error boundary: something failed outside any route group.
import { useEffect } from "react";
import { BareShell } from "@/components/shell/bare-shell";
import { ErrorPanel } from "@/components/shell/error-panel";

export default function RootError({ error, retry }: { error: unknown; retry: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <BareShell>
      <ErrorPanel error={error} retry={retry} />
    </BareShell>
  );
}
