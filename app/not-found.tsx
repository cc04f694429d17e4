// Root "not found": unknown addresses and notFound() outside a route group.
import { House, SearchX } from "lucide-react";
import { connection } from "next/server";
import { BareShell } from "@/components/shell/bare-shell";
import { ButtonLink } from "@/components/ui/button";

export default async function NotFound() {
  // Rendered per request, not at build time: its scripts need this response's CSP nonce (proxy.ts).
  await connection();
  return (
    <BareShell>
      <div className="max-w-prose space-y-4">
        <SearchX aria-hidden className="size-12 text-plum-400" />
        <h1 className="text-4xl">We can’t find that page</h1>
        <p className="text-lg text-ink-muted">
          The address may be mistyped, or the show may not be public yet. Shows appear here once their committee opens
          them.
        </p>
        <div className="flex flex-wrap gap-3 pt-2">
          <ButtonLink href="/" icon={<House aria-hidden className="size-5" />}>
            Go to the home page
          </ButtonLink>
          <ButtonLink href="/#shows" variant="secondary">
            See public shows
          </ButtonLink>
        </div>
      </div>
    </BareShell>
  );
}
