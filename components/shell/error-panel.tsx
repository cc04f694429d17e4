"use client";
// The body of every error.tsx: plain words, a reference for support, and a way to retry.
import { House, RotateCcw, TriangleAlert } from "lucide-react";
import { Button, ButtonLink } from "@/components/ui/button";

export function ErrorPanel({ error, retry, title }: { error: unknown; retry: () => void; title?: string }) {
  const digest = (error as { digest?: unknown } | null)?.digest;
  return (
    <div role="alert" className="max-w-prose space-y-4">
      <TriangleAlert aria-hidden className="size-12 text-warning-700" />
      <h1 className="text-3xl sm:text-4xl">{title ?? "Something went wrong on our side"}</h1>
      <p className="text-lg text-ink-muted">
        This page didn’t load. Nothing you typed elsewhere was lost. Try again in a moment; if it keeps happening, tell
        the show committee what you were doing.
      </p>
      {typeof digest === "string" ? (
        <p className="text-sm text-ink-muted">
          Reference for support: <code className="rounded bg-paper-200 px-1.5 py-0.5">{digest}</code>
        </p>
      ) : null}
      <div className="flex flex-wrap gap-3 pt-2">
        <Button onClick={() => retry()} icon={<RotateCcw aria-hidden className="size-5" />}>
          Try again
        </Button>
        <ButtonLink href="/" variant="secondary" icon={<House aria-hidden className="size-5" />}>
          Home
        </ButtonLink>
      </div>
    </div>
  );
}
