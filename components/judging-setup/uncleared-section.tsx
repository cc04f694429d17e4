"use client";
// Entries sent for judging that are not paid (at a juried show, not accepted): they stay off the
// judges' lists unless the chair records a reason to judge them anyway, which can be taken back.
import { useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { judgeAnywayAction } from "@/app/(chair)/shows/[slug]/manage/judging/actions";

export type UnclearedEntry = { id: string; entryNumber: number | null; title: string; judgeAnywayAt: Date | null; judgeAnywayReason: string };

export function UnclearedSection({ showSlug, entries }: { showSlug: string; entries: UnclearedEntry[] }) {
  if (entries.length === 0) return <p className="text-ink-muted">Every entry sent for judging is cleared.</p>;
  return (
    <ul className="divide-y divide-line rounded-control border border-line" aria-label="Entries not cleared for judging">
      {entries.map((e) => (
        <UnclearedRow key={e.id} showSlug={showSlug} entry={e} />
      ))}
    </ul>
  );
}

function UnclearedRow({ showSlug, entry }: { showSlug: string; entry: UnclearedEntry }) {
  const router = useRouter();
  const [reason, setReason] = useState("");
  const [problem, setProblem] = useState<{ text: string; field?: string } | null>(null);
  const [pending, start] = useTransition();
  const excepted = entry.judgeAnywayAt !== null;
  const decide = (judge: boolean) =>
    start(async () => {
      const r = await judgeAnywayAction(null, { showSlug, entryId: entry.id, judge, reason: judge ? reason : "" });
      if (r.ok) {
        setProblem(null);
        setReason("");
        router.refresh();
      } else setProblem({ text: r.fieldErrors?.reason?.[0] ?? r.message, field: r.fieldErrors?.reason ? "reason" : undefined });
    });
  const id = `uncleared-${entry.id}`;

  return (
    <li className="space-y-3 p-3" aria-labelledby={id}>
      <p id={id}>
        <span className="font-semibold">Entry {entry.entryNumber ?? "?"}</span> · {entry.title || "Untitled"} ·{" "}
        {excepted ? `judged anyway: ${entry.judgeAnywayReason}` : "not on the judges’ lists"}
      </p>
      {problem && !problem.field ? <Alert live tone="error" title={problem.text} /> : null}
      {excepted ? (
        <Button variant="secondary" disabled={pending} onClick={() => decide(false)}>
          Judge only once paid
        </Button>
      ) : (
        <div className="flex flex-wrap items-end gap-3">
          <TextField label="Reason to judge it anyway" className="min-w-60 flex-1" value={reason} onChange={(e) => setReason(e.target.value)} error={problem?.field === "reason" ? problem.text : undefined} />
          <Button disabled={pending} onClick={() => decide(true)}>
            Judge it anyway
          </Button>
        </div>
      )}
    </li>
  );
}
