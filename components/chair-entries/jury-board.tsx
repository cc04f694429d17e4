"use client";
// The jurying round: each quilt by its photos and its own facts only (no entrant, maker or
// quilter), with accept or decline (a reason is required) and the release of decisions.
import { useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { Ban, CircleCheck, ImageOff, Send } from "lucide-react";
import { ActionForm, FormStatusAlert, useActionForm, type FormStatus } from "@/components/forms/action-form";
import { EntryStatusBadge } from "@/components/entries/entry-status";
import { DIVISION_LABELS, QUILTING_METHOD_LABELS, labelOf } from "@/components/entries/labels";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { TextareaField } from "@/components/ui/field";
import { declineEntriesSchema } from "@/lib/schemas/chair-entries";
import { formatSize } from "@/scoring/units";
import { acceptEntriesAction, declineEntriesAction, releaseDecisionsAction } from "@/app/(chair)/shows/[slug]/manage/entries/actions";

export type JuryEntry = {
  id: string;
  entryNumber: number | null;
  title: string;
  widthUm: number;
  lengthUm: number;
  techniques: string[];
  quiltingMethod: string;
  division: string;
  judged: boolean;
  status: string;
  decisionReason: string;
  decisionReleasedAt: Date | null;
  photos: { id: string; view: string }[];
};

type Props = { showSlug: string; entries: JuryEntry[]; progress: { total: number; decided: number; unreleased: number } };

const reasonSchema = declineEntriesSchema.pick({ reason: true });

export function JuryBoard({ showSlug, entries, progress }: Props) {
  const router = useRouter();
  const [status, setStatus] = useState<FormStatus>(null);
  const [releasing, startRelease] = useTransition();
  const release = () =>
    startRelease(async () => {
      const r = await releaseDecisionsAction(null, { showSlug });
      setStatus({ tone: r.ok ? "success" : "error", message: r.message ?? "Released." });
      router.refresh();
    });
  return (
    <div className="space-y-6">
      <section aria-labelledby="progress" className="space-y-3 rounded-card border border-line bg-paper-200 p-4">
        <h2 id="progress" className="text-lg font-semibold">
          {progress.decided} of {progress.total} decided
        </h2>
        <progress className="h-3 w-full accent-plum-600" max={Math.max(progress.total, 1)} value={progress.decided} aria-label="Entries decided" />
        <p className="text-ink-muted">
          {progress.unreleased === 0 ? "Every recorded decision has been sent." : `${progress.unreleased} ${progress.unreleased === 1 ? "decision is" : "decisions are"} recorded but not yet sent to the entrants.`}
        </p>
        <FormStatusAlert status={status} />
        <Button disabled={progress.unreleased === 0} pending={releasing} pendingLabel="Sending…" onClick={release} icon={<Send aria-hidden className="size-5" />}>
          Release decisions
        </Button>
      </section>
      <ul className="space-y-4">
        {entries.map((e) => (
          <JuryCard key={e.id} showSlug={showSlug} entry={e} onDone={() => router.refresh()} />
        ))}
      </ul>
    </div>
  );
}

function JuryCard({ showSlug, entry: e, onDone }: { showSlug: string; entry: JuryEntry; onDone: () => void }) {
  const [declining, setDeclining] = useState(false);
  const [status, setStatus] = useState<FormStatus>(null);
  const [accepting, startAccept] = useTransition();
  const ctl = useActionForm({
    schema: reasonSchema,
    defaultValues: { reason: e.decisionReason },
    action: (values) => declineEntriesAction(null, { ...values, showSlug, entryIds: [e.id] }),
    onSuccess: () => {
      setDeclining(false);
      onDone();
    },
  });
  const accept = () =>
    startAccept(async () => {
      const r = await acceptEntriesAction(null, { showSlug, entryIds: [e.id] });
      setStatus(r.ok ? null : { tone: "error", message: r.message });
      if (r.ok) onDone();
    });
  const headingId = `jury-${e.id}`;
  return (
    <li aria-labelledby={headingId} className="rounded-card border border-line bg-surface p-4 shadow-card sm:p-6">
      <div className="grid gap-4 md:grid-cols-[minmax(0,22rem)_1fr]">
        {e.photos.length ? (
          <div className="grid grid-cols-2 gap-2">
            {e.photos.map((p) => (
              // eslint-disable-next-line @next/next/no-img-element -- served by the authorised photo route, not a static asset
              <img key={p.id} src={`/api/photos/${p.id}/thumb`} alt={`${p.view} view of entry ${e.entryNumber ?? ""}`} loading="lazy" className="aspect-square w-full rounded-control border border-line bg-paper-200 object-cover" />
            ))}
          </div>
        ) : (
          <div className="flex aspect-[2/1] items-center justify-center gap-2 rounded-control bg-paper-200 text-ink-muted">
            <ImageOff aria-hidden className="size-6" /> No photos
          </div>
        )}
        <div className="space-y-3">
          <h3 id={headingId} className="text-xl">
            {e.entryNumber ? `No. ${e.entryNumber} · ` : ""}
            {e.title}
          </h3>
          <p>{formatSize(e.widthUm, e.lengthUm)}</p>
          <p className="text-ink-muted">
            {labelOf(DIVISION_LABELS, e.division)} · {e.judged ? "Judged" : "Display only"} · {labelOf(QUILTING_METHOD_LABELS, e.quiltingMethod)}
            {e.techniques.length ? ` · ${e.techniques.join(", ")}` : ""}
          </p>
          <div className="flex flex-wrap items-center gap-2">
            <EntryStatusBadge status={e.status} />
            {(e.status === "accepted" || e.status === "declined") && !e.decisionReleasedAt ? <Badge tone="warning">Not sent yet</Badge> : null}
          </div>
          {e.status === "declined" && e.decisionReason ? <p className="text-sm">Reason: {e.decisionReason}</p> : null}
          <FormStatusAlert status={status} />
          <div className="flex flex-wrap gap-3">
            <Button disabled={e.status === "accepted"} pending={accepting} pendingLabel="Accepting…" onClick={accept} icon={<CircleCheck aria-hidden className="size-5" />}>
              Accept
            </Button>
            <Button variant="secondary" aria-expanded={declining} onClick={() => setDeclining(!declining)} icon={<Ban aria-hidden className="size-5" />}>
              Decline…
            </Button>
          </div>
          {declining ? (
            <ActionForm controller={ctl} aria-label={`Decline entry ${e.entryNumber ?? e.title}`}>
              <TextareaField label="Reason for declining" hint="The entrant reads this when you release decisions." required error={ctl.errorOf("reason")} {...ctl.form.register("reason")} />
              <Button type="submit" variant="danger" pending={ctl.pending} pendingLabel="Declining…">
                Decline
              </Button>
            </ActionForm>
          ) : null}
        </div>
      </div>
    </li>
  );
}
