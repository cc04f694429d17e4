// A show address that doesn't exist or isn't public yet.
import { SearchX } from "lucide-react";
import { ButtonLink } from "@/components/ui/button";

export default function PublicNotFound() {
  return (
    <div className="max-w-prose space-y-4">
      <SearchX aria-hidden className="size-12 text-plum-400" />
      <h1 className="text-4xl">We can’t find that show</h1>
      <p className="text-lg text-ink-muted">
        The address may be mistyped, or the committee hasn’t made the show public yet.
      </p>
      <ButtonLink href="/#shows">See public shows</ButtonLink>
    </div>
  );
}
