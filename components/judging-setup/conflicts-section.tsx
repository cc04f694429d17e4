"use client";
// Judges' conflicts with entries, for the chair only: a judge's own quilt or a declared person's
// in a category they judge, found when a declaration, a submission or a category move made it.
// The chair takes the judge off that category's panel or lets them judge it with a reason; the
// judge is never told. Judging can't start while one is open.
import { useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { Check, UserMinus } from "lucide-react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { resolveConflictAction } from "@/app/(chair)/shows/[slug]/manage/judging/actions";

type Open = { judgeUserId: string; judgeName: string; entryId: string; entryNumber: number | null; category: string; reason: string };
type Decided = { judgeUserId: string; judgeName: string; entryId: string; entryNumber: number | null; reason: string; decision: string | null; decisionReason: string };

export function ConflictsSection({ showSlug, open, decided }: { showSlug: string; open: Open[]; decided: Decided[] }) {
  return (
    <div className="space-y-4">
      {open.length === 0 ? (
        <p className="text-ink-muted">No open conflicts.</p>
      ) : (
        <ul className="divide-y divide-line rounded-control border border-line" aria-label="Open conflicts">
          {open.map((c) => (
            <OpenConflict key={`${c.judgeUserId}|${c.entryId}`} showSlug={showSlug} conflict={c} />
          ))}
        </ul>
      )}
      {decided.length ? (
        <details>
          <summary className="cursor-pointer font-semibold">Decided ({decided.length})</summary>
          <ul className="mt-2 space-y-1 text-ink-muted">
            {decided.map((d) => (
              <li key={`${d.judgeUserId}|${d.entryId}`}>
                Entry {d.entryNumber ?? "?"}, {d.judgeName}: {d.decision === "allowed" ? `allowed (${d.decisionReason})` : `taken off the panel${d.decisionReason ? ` (${d.decisionReason})` : ""}`}
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}

function OpenConflict({ showSlug, conflict }: { showSlug: string; conflict: Open }) {
  const router = useRouter();
  const [reason, setReason] = useState("");
  const [problem, setProblem] = useState<{ text: string; field?: string } | null>(null);
  const [pending, start] = useTransition();
  const decide = (action: "move" | "allow") =>
    start(async () => {
      const r = await resolveConflictAction(null, { showSlug, judgeUserId: conflict.judgeUserId, entryId: conflict.entryId, action, reason });
      if (r.ok) {
        setProblem(null);
        router.refresh();
      } else setProblem({ text: r.fieldErrors?.reason?.[0] ?? r.message, field: r.fieldErrors?.reason ? "reason" : undefined });
    });
  const id = `conflict-${conflict.judgeUserId}-${conflict.entryId}`;

  return (
    <li className="space-y-3 p-3" aria-labelledby={id}>
      <p id={id}>
        <span className="font-semibold">Entry {conflict.entryNumber ?? "?"}</span> · {conflict.reason}
      </p>
      {problem && !problem.field ? <Alert live tone="error" title={problem.text} /> : null}
      <div className="flex flex-wrap items-end gap-3">
        <Button variant="secondary" disabled={pending} icon={<UserMinus aria-hidden className="size-5" />} onClick={() => decide("move")}>
          Take {conflict.judgeName} off {conflict.category}’s panel
        </Button>
        <TextField label="Reason to allow" className="min-w-60 flex-1" value={reason} onChange={(e) => setReason(e.target.value)} error={problem?.field === "reason" ? problem.text : undefined} />
        <Button disabled={pending} icon={<Check aria-hidden className="size-5" />} onClick={() => decide("allow")}>
          Allow
        </Button>
      </div>
    </li>
  );
}
