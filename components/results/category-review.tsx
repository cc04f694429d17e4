// One category on the chair's review: entries in rank order with photo, each judge's total, the
// mean, median, spread and severity-adjusted score, the proposed and current placement, awards
// and flags; places not given and why; the tie order form where a tie decides a place.
import { Flag } from "lucide-react";
import { Badge } from "@/components/ui/badge";
import { formatScore } from "@/scoring/score-sheets";
import type { CategoryOutcome, EntryOutcome } from "@/scoring/results";
import { PlacementChange } from "./placement-form";
import { RibbonSwatch } from "./ribbon-swatch";
import { TieOrderForm } from "./tie-order-form";

type Props = { showSlug: string; outcome: CategoryOutcome; photoOf: Record<string, string>; places: number; locked: boolean; chairDecides: boolean };

function outcomeWords(o: EntryOutcome): string {
  const parts = [o.placeLabel ? `${o.placeLabel} place` : o.honorableMention ? "Honorable mention" : "No placement", ...o.awards.map((a) => a.name)];
  return parts.join(" · ");
}

function proposedWords(o: EntryOutcome): string {
  return o.proposed.place ? `${o.proposed.place === 1 ? "1st" : o.proposed.place === 2 ? "2nd" : o.proposed.place === 3 ? "3rd" : `${o.proposed.place}th`} place` : o.proposed.honorableMention ? "Honorable mention" : "No placement";
}

function EntryRow({ o, showSlug, photoId, places, locked, judges }: { o: EntryOutcome; showSlug: string; photoId: string | undefined; places: number; locked: boolean; judges: { id: string; name: string }[] }) {
  const s = o.entry.stats;
  return (
    <li className="grid gap-3 py-4 sm:grid-cols-[6rem_1fr]" aria-label={`Entry ${o.entry.entryNumber}`}>
      {photoId ? (
        // eslint-disable-next-line @next/next/no-img-element -- private bytes through our own route, not the image optimiser
        <img src={`/api/photos/${photoId}/thumb`} alt={`Entry ${o.entry.entryNumber}, full view`} loading="lazy" className="aspect-square w-24 rounded-control border border-line bg-paper-200 object-cover" />
      ) : (
        <div className="flex aspect-square w-24 items-center justify-center rounded-control border border-dashed border-line text-sm text-ink-muted">No photo</div>
      )}
      <div className="min-w-0 space-y-2">
        <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
          <span className="font-display text-2xl font-semibold" title="Rank">{o.ranked.displayRank}</span>
          <span className="text-lg font-semibold">No. {o.entry.entryNumber} · {o.entry.title}</span>
          {o.kept ? null : <Badge tone="neutral">Set aside</Badge>}
        </div>
        <dl className="flex flex-wrap gap-x-5 gap-y-1 text-sm">
          {judges.map((j) => {
            const sheet = o.entry.sheets.find((x) => x.judgeId === j.id);
            return (
              <div key={j.id}>
                <dt className="inline text-ink-muted">{j.name}: </dt>
                <dd className="inline">{sheet?.submitted ? (sheet.rank !== null && sheet.total === null ? `rank ${sheet.rank}` : formatScore(sheet.total)) : "not submitted"}</dd>
              </div>
            );
          })}
          <div><dt className="inline text-ink-muted">Mean: </dt><dd className="inline font-semibold">{formatScore(s?.mean)}</dd></div>
          <div><dt className="inline text-ink-muted">Median: </dt><dd className="inline">{formatScore(s?.median)}</dd></div>
          <div><dt className="inline text-ink-muted">Spread: </dt><dd className="inline">{formatScore(s?.spread)}</dd></div>
          <div><dt className="inline text-ink-muted">Adjusted (z): </dt><dd className="inline">{s?.z == null ? "—" : s.z.toFixed(3)}</dd></div>
        </dl>
        <p className="flex flex-wrap items-center gap-x-3 gap-y-1">
          <span className="font-semibold">{outcomeWords(o)}</span>
          <RibbonSwatch ribbon={o.ribbon} />
          {o.awards.map((a) => <RibbonSwatch key={a.awardId} ribbon={a.ribbon} label={`${a.name} (${a.ribbon.name})`} />)}
          {o.override ? <Badge tone="warning">Changed by the chair (proposed: {proposedWords(o)})</Badge> : null}
        </p>
        <p className="text-sm text-ink-muted">{o.override ? `Reason: ${o.override.reason}` : o.ranked.explanation}</p>
        {o.flags.length ? (
          <ul className="flex flex-wrap gap-2" aria-label="Flags">
            {o.flags.map((f) => <li key={f}><Badge tone="warning" icon={Flag}>{f}</Badge></li>)}
          </ul>
        ) : null}
        <PlacementChange showSlug={showSlug} entryId={o.entry.entryId} entryNumber={o.entry.entryNumber} places={places} current={outcomeWords(o)} overridden={!!o.override} disabled={locked} />
      </div>
    </li>
  );
}

export function CategoryReview({ showSlug, outcome, photoOf, places, locked, chairDecides }: Props) {
  const c = outcome.category;
  const numberOf = new Map(outcome.entries.map((e) => [e.entry.entryId, e.entry.entryNumber]));
  return (
    <section aria-labelledby={`cat-${c.id}`} className="space-y-3 rounded-card border border-line bg-surface p-4 sm:p-6">
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 id={`cat-${c.id}`} className="text-xl">{c.code} · {c.name}</h3>
        <p className="text-sm text-ink-muted">{outcome.entries.length} entries · ranked by {outcome.scoreLabel.toLowerCase()} · judges: {c.judges.map((j) => j.name).join(", ") || "none assigned"}</p>
      </header>
      {outcome.missing.length ? <p className="font-medium text-danger-700">{outcome.missing.length} sheet{outcome.missing.length === 1 ? "" : "s"} not submitted: {outcome.missing.map((m) => `entry ${m.entryNumber} (${m.judge})`).join(", ")}.</p> : null}
      {[...outcome.notAwarded.map((n) => n.text), ...outcome.notes, ...outcome.problems].map((t) => <p key={t} className="text-sm">{t}</p>)}
      {!locked && chairDecides
        ? outcome.tiedForPlace.map((group) => <TieOrderForm key={group.join()} showSlug={showSlug} categoryId={c.id} tied={group.map((id) => ({ entryId: id, entryNumber: numberOf.get(id)! }))} />)
        : null}
      {outcome.entries.length === 0 ? (
        <p className="text-ink-muted">No judged entries in this category.</p>
      ) : (
        <ol className="divide-y divide-line">
          {outcome.entries.map((o) => <EntryRow key={o.entry.entryId} o={o} showSlug={showSlug} photoId={photoOf[o.entry.entryId]} places={places} locked={locked} judges={c.judges} />)}
        </ol>
      )}
    </section>
  );
}
