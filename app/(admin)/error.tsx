"use client";
import { useEffect } from "react";
import { ErrorPanel } from "@/components/shell/error-panel";

export default function AdminError({ error, retry }: { error: unknown; retry: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return <ErrorPanel error={error} retry={retry} />;
}
