"use client";
// The "judge's critique" line on an entry's card on "My entries": ask for one (or stop asking)
// while the show takes entries; after that it only says what was asked for.
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { setCritiqueRequestAction } from "@/app/(entrant)/my/actions";
import { Alert } from "@/components/ui/alert";
import { CheckboxField } from "@/components/ui/field";
import { formatMoney } from "@/scoring/fees";

export type CritiqueState = { critiqueRequested: boolean; critiqueDue: boolean; critiquePaid: boolean; critiqueChangeable: boolean };

export function CritiqueToggle({ entryId, state: s, feeCents, currency }: { entryId: string; state: CritiqueState; feeCents: number; currency: string }) {
  const router = useRouter();
  const [result, setResult] = useState<{ tone: "success" | "error"; message: string } | null>(null);
  const [pending, startTransition] = useTransition();
  const fee = formatMoney(feeCents, currency);
  const status = s.critiqueRequested ? (s.critiquePaid ? "Critique fee paid." : s.critiqueDue ? "Critique fee due: pay it below." : "") : "";

  const change = (requested: boolean) =>
    startTransition(async () => {
      const r = await setCritiqueRequestAction({ entryId, requested });
      setResult({ tone: r.ok ? "success" : "error", message: r.message ?? (r.ok ? "Saved." : "That could not be changed.") });
      if (r.ok) router.refresh();
    });

  if (!s.critiqueChangeable) {
    return <p className="text-sm">{s.critiqueRequested ? `Judge’s critique asked for. ${status}` : "No judge’s critique asked for."}</p>;
  }
  return (
    <div className="space-y-1 text-sm">
      {result ? <Alert live tone={result.tone} title={result.message} /> : null}
      <CheckboxField
        label={`Ask for a judge’s critique (${fee})`}
        hint={status || "You can change this until entries close."}
        checked={s.critiqueRequested}
        disabled={pending}
        onChange={(ev) => change(ev.currentTarget.checked)}
      />
    </div>
  );
}
