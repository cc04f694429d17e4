"use client";
// The show-wide awards: each with its ribbon, who may win it, the votes or choices recorded, the
// winner(s) and what still needs deciding; recording a judge's vote or choice, or the chair's
// choice (a reason when it goes against the votes); adding, editing and removing awards.
import { useState } from "react";
import { Plus, Trash2 } from "lucide-react";
import { z } from "zod";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { SelectField, TextField, TextareaField } from "@/components/ui/field";
import { AWARD_KIND_LABELS, type AwardDefinition, type AwardOutcome } from "@/scoring/awards";
import { deleteAwardAction, recordPickAction, removePickAction } from "@/app/(chair)/shows/[slug]/manage/results/actions";
import { AwardForm } from "./award-form";
import { RibbonSwatch } from "./ribbon-swatch";

type Pick = { id: string; awardId: string; entryId: string; judgeId: string | null; kind: string; reason: string };
type Props = {
  showSlug: string;
  awards: AwardDefinition[];
  outcomes: AwardOutcome[];
  picks: Pick[];
  judges: { id: string; name: string }[];
  entries: { entryId: string; entryNumber: number }[];
  locked: boolean;
};

export function AwardsSection({ showSlug, awards, outcomes, picks, judges, entries, locked }: Props) {
  const [adding, setAdding] = useState(false);
  const numberOf = new Map(entries.map((e) => [e.entryId, e.entryNumber]));
  return (
    <div className="space-y-4">
      {awards.length === 0 ? <p className="text-ink-muted">No show-wide awards yet. Add Best of Show, best quilting by method, judge&apos;s choice or a sponsor&apos;s award.</p> : null}
      <ul className="space-y-4">
        {awards.map((a) => (
          <AwardCard key={a.id} {...{ showSlug, award: a, outcome: outcomes.find((o) => o.awardId === a.id), picks: picks.filter((p) => p.awardId === a.id), judges, entries, numberOf, locked }} others={awards.filter((o) => o.id !== a.id)} />
        ))}
      </ul>
      {locked ? null : adding ? (
        <AwardForm showSlug={showSlug} others={awards} onDone={() => setAdding(false)} />
      ) : (
        <Button variant="secondary" icon={<Plus aria-hidden className="size-5" />} onClick={() => setAdding(true)}>Add an award</Button>
      )}
    </div>
  );
}

type CardProps = Omit<Props, "awards" | "outcomes"> & { award: AwardDefinition; outcome: AwardOutcome | undefined; numberOf: Map<string, number>; others: AwardDefinition[] };

function AwardCard({ showSlug, award, outcome, picks, judges, entries, numberOf, locked, others }: CardProps) {
  const [open, setOpen] = useState<"edit" | "pick" | null>(null);
  const judgeName = (id: string | null) => (id ? (judges.find((j) => j.id === id)?.name ?? "a judge") : "The chair");
  return (
    <li className="space-y-3 rounded-control border border-line bg-surface p-3 sm:p-4" aria-label={award.name}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <div className="flex flex-wrap items-center gap-3">
          <h3 className="text-lg">{award.name}</h3>
          <RibbonSwatch ribbon={award.ribbon} />
          <Badge tone="neutral">{AWARD_KIND_LABELS[award.kind]}{award.sponsor ? ` · ${award.sponsor}` : ""}</Badge>
          <span className="text-sm text-ink-muted">{award.kind === "judges_choice" ? "each judge chooses" : award.chooseBy === "judges_vote" ? "judges vote" : "the chair chooses"}</span>
        </div>
        {locked ? null : (
          <div className="flex flex-wrap gap-2">
            <Button variant="secondary" aria-expanded={open === "pick"} onClick={() => setOpen(open === "pick" ? null : "pick")}>Record {award.chooseBy === "judges_vote" ? "a vote" : "a choice"}</Button>
            <Button variant="ghost" aria-expanded={open === "edit"} onClick={() => setOpen(open === "edit" ? null : "edit")}>Edit</Button>
            <DeleteAward showSlug={showSlug} award={award} />
          </div>
        )}
      </div>
      <p>
        <span className="font-medium">Winner{award.kind === "judges_choice" ? "s" : ""}: </span>
        {outcome?.winners.length ? outcome.winners.map((w) => `entry ${numberOf.get(w.entryId) ?? "?"}${w.judgeId ? ` (${judgeName(w.judgeId)})` : ""} — ${w.how}`).join("; ") : "none yet"}
      </p>
      {outcome?.problems.map((p) => <p key={p} className="text-sm text-danger-700">{p}</p>)}
      {picks.length ? (
        <ul className="text-sm">
          {picks.map((p) => <PickRow key={p.id} showSlug={showSlug} pick={p} who={judgeName(p.judgeId)} entryNumber={numberOf.get(p.entryId)} locked={locked} />)}
        </ul>
      ) : null}
      {open === "pick" ? <PickForm showSlug={showSlug} award={award} judges={judges} entries={entries} onDone={() => setOpen(null)} /> : null}
      {open === "edit" ? <AwardForm showSlug={showSlug} award={award} others={others} onDone={() => setOpen(null)} /> : null}
    </li>
  );
}

function PickRow({ showSlug, pick, who, entryNumber, locked }: { showSlug: string; pick: Pick; who: string; entryNumber: number | undefined; locked: boolean }) {
  const [removing, setRemoving] = useState(false);
  const ctl = useActionForm({ schema: z.object({ reason: z.string().trim().min(3, "Give a reason (a few words).") }), defaultValues: { reason: "" }, action: (v) => removePickAction(null, { showSlug, pickId: pick.id, reason: v.reason }) });
  return (
    <li className="py-1">
      {who}: {pick.kind === "vote" ? "votes for" : "chooses"} entry {entryNumber ?? "?"}{pick.reason ? ` (“${pick.reason}”)` : ""}
      {locked ? null : <Button variant="ghost" className="ml-2" aria-label={`Remove ${who}'s ${pick.kind}`} onClick={() => setRemoving(!removing)}>Remove</Button>}
      {removing ? (
        <ActionForm controller={ctl} aria-label="Remove the vote or choice" className="mt-2 flex flex-wrap items-end gap-2">
          <TextField label="Reason" error={ctl.errorOf("reason")} {...ctl.form.register("reason")} />
          <Button type="submit" variant="danger" pending={ctl.pending}>Remove</Button>
        </ActionForm>
      ) : null}
    </li>
  );
}

function PickForm({ showSlug, award, judges, entries, onDone }: { showSlug: string; award: AwardDefinition; judges: { id: string; name: string }[]; entries: { entryId: string; entryNumber: number }[]; onDone: () => void }) {
  const byJudge = award.kind === "judges_choice" || award.chooseBy === "judges_vote";
  const schema = z.object({
    judgeUserId: z.string(),
    entryNumber: z.string().refine((t) => entries.some((e) => String(e.entryNumber) === t.trim()), "Give the number of a judged entry."),
    reason: z.string().trim().max(500),
  });
  const ctl = useActionForm({
    schema,
    defaultValues: { judgeUserId: award.kind === "judges_choice" ? (judges[0]?.id ?? "") : byJudge ? (judges[0]?.id ?? "") : "", entryNumber: "", reason: "" },
    onSuccess: onDone,
    action: (v) => recordPickAction(null, { showSlug, awardId: award.id, entryId: entries.find((e) => String(e.entryNumber) === v.entryNumber.trim())!.entryId, judgeUserId: v.judgeUserId, reason: v.reason }),
  });
  return (
    <ActionForm controller={ctl} aria-label={`Record for ${award.name}`} className="grid gap-3 rounded-control border border-line bg-paper-50 p-3 sm:grid-cols-3">
      <SelectField label="Who" error={ctl.errorOf("judgeUserId")} {...ctl.form.register("judgeUserId")}>
        {byJudge ? judges.map((j) => <option key={j.id} value={j.id}>{j.name}</option>) : null}
        {award.kind === "judges_choice" ? null : <option value="">The chair{byJudge ? " (decides a tie or overrules)" : ""}</option>}
      </SelectField>
      <TextField label="Entry number" inputMode="numeric" error={ctl.errorOf("entryNumber")} {...ctl.form.register("entryNumber")} />
      <TextareaField label="Reason" optional hint="Required when the chair goes against the votes." rows={1} error={ctl.errorOf("reason")} {...ctl.form.register("reason")} />
      <div className="flex gap-2 sm:col-span-3">
        <Button type="submit" pending={ctl.pending} pendingLabel="Saving…">Record</Button>
        <Button variant="ghost" onClick={onDone}>Cancel</Button>
      </div>
    </ActionForm>
  );
}

function DeleteAward({ showSlug, award }: { showSlug: string; award: AwardDefinition }) {
  const ctl = useActionForm({ schema: z.object({}), defaultValues: {}, action: () => deleteAwardAction(null, { showSlug, awardId: award.id }) });
  return (
    <ActionForm controller={ctl} aria-label={`Remove ${award.name}`}>
      <Button type="submit" variant="ghost" pending={ctl.pending} icon={<Trash2 aria-hidden className="size-5" />} aria-label={`Remove ${award.name}`}>Remove</Button>
    </ActionForm>
  );
}
