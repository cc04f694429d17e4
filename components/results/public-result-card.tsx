// One awarded quilt on the public results page: its photo, the ribbon (colour always beside the
// words), the entry number and title, and the maker's name only where they agreed to it.
import { RibbonSwatch } from "@/components/results/ribbon-swatch";
import type { PublicCard } from "@/db/queries/published-results";

export function PublicResultCard({ card, showSlug, headingLevel = 3 }: { card: PublicCard; showSlug: string; headingLevel?: 3 | 4 }) {
  const Heading = headingLevel === 3 ? "h3" : "h4";
  const headingId = `card-${card.entryNumber}-${headingLevel}`;
  return (
    <li>
      <article aria-labelledby={headingId} className="flex h-full flex-col overflow-hidden rounded-card border border-line bg-surface shadow-sm">
        {card.photoId ? (
          // eslint-disable-next-line @next/next/no-img-element -- private bytes through our own route, not the image optimiser
          <img src={`/api/shows/${showSlug}/results/photos/${card.photoId}`} alt={`Entry ${card.entryNumber}, ${card.title}`} loading="lazy" className="aspect-[4/3] w-full bg-paper-200 object-contain" />
        ) : (
          <div aria-hidden className="aspect-[4/3] w-full bg-paper-200" />
        )}
        <div className="flex flex-1 flex-col gap-1 p-4">
          <p className="text-lg font-semibold">
            {card.ribbon ? <RibbonSwatch ribbon={card.ribbon} label={card.words} /> : card.words}
          </p>
          <Heading id={headingId} className="text-xl">
            {card.title}
          </Heading>
          <p className="text-sm text-ink-muted">
            Entry {card.entryNumber} · {card.categoryCode} {card.categoryName}
          </p>
          <p className="mt-auto pt-2">{card.entrantName ? `Made by ${card.entrantName}` : <span className="text-ink-muted italic">Maker not named</span>}</p>
        </div>
      </article>
    </li>
  );
}
