// The body of the not-found pages inside the shell.
import type { ReactNode } from "react";
import { SearchX } from "lucide-react";
import { ButtonLink } from "@/components/ui/button";

export function NotFoundPanel({ title = "We can’t find that page", children }: { title?: string; children?: ReactNode }) {
  return (
    <div className="max-w-prose space-y-4">
      <SearchX aria-hidden className="size-12 text-plum-400" />
      <h1 className="text-3xl sm:text-4xl">{title}</h1>
      <p className="text-lg text-ink-muted">{children ?? "The address may be mistyped, or the page has moved."}</p>
      <div className="flex flex-wrap gap-3 pt-2">
        <ButtonLink href="/my">My entries</ButtonLink>
        <ButtonLink href="/" variant="secondary">
          Home
        </ButtonLink>
      </div>
    </div>
  );
}
