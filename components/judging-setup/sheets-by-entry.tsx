"use client";
// Every judge's sheet, grouped by entry: its state and total, with "Reopen" (a reason is
// required and audited) for a submitted sheet and "History" (every change: when, who entered it
// for whom, the field, the value and what became of it).
import { useMemo, useState } from "react";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { History, LockOpen } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { formatDateTime, formatTime } from "@/components/format/dates";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { TextareaField } from "@/components/ui/field";
import { reopenSchema } from "@/lib/schemas/judging";
import { formatScore } from "@/scoring/score-sheets";
import { reopenSheetAction, sheetHistoryAction, type SheetHistoryRow } from "@/app/(chair)/shows/[slug]/manage/judging/actions";
import { progressKeys, type BoardSheet } from "./progress-queries";
import { SubmitOrCancel } from "@/components/forms/submit-or-cancel";

type Props = { showSlug: string; sheets: BoardSheet[]; categories: { id: string; name: string }[]; timeZone: string };

export function SheetsByEntry({ showSlug, sheets, categories, timeZone }: Props) {
  const catName = new Map(categories.map((c) => [c.id, c.name]));
  const groups = useMemo(() => {
    const m = new Map<string, BoardSheet[]>();
    for (const s of sheets) m.set(s.entryId, [...(m.get(s.entryId) ?? []), s]);
    return [...m.values()];
  }, [sheets]);
  return (
    <section aria-labelledby="by-entry" className="space-y-3">
      <h2 id="by-entry" className="text-2xl">
        Sheets by entry
      </h2>
      {groups.length === 0 ? (
        <p className="text-ink-muted">No judge has started a sheet yet.</p>
      ) : (
        <ul className="space-y-3">
          {groups.map((g) => {
            const first = g[0]!;
            return (
              <li key={first.entryId} className="rounded-control border border-line bg-surface p-3 sm:p-4">
                <h3 className="text-lg">
                  No. {first.entryNumber ?? "—"} · {first.title}
                  {first.categoryId && catName.get(first.categoryId) ? <span className="ml-2 text-base font-normal text-ink-muted">{catName.get(first.categoryId)}</span> : null}
                </h3>
                <ul className="mt-2 divide-y divide-line">
                  {g.map((s) => (
                    <SheetRow key={s.id} showSlug={showSlug} sheet={s} timeZone={timeZone} />
                  ))}
                </ul>
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}

function SheetRow({ showSlug, sheet, timeZone }: { showSlug: string; sheet: BoardSheet; timeZone: string }) {
  const [open, setOpen] = useState<"reopen" | "history" | null>(null);
  const toggle = (what: "reopen" | "history") => setOpen((o) => (o === what ? null : what));
  const label = `No. ${sheet.entryNumber ?? "—"}, ${sheet.judgeName}`;
  return (
    <li className="space-y-3 py-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <div className="flex min-w-0 flex-wrap items-center gap-x-3 gap-y-1">
          <span className="font-semibold">{sheet.judgeName}</span>
          {sheet.status === "submitted" ? <Badge tone="success">Submitted</Badge> : <Badge tone="neutral">Open</Badge>}
          <span>Total {formatScore(sheet.total)}</span>
          {sheet.submittedAt && sheet.status === "submitted" ? <span className="text-sm text-ink-muted">at {formatTime(sheet.submittedAt, timeZone)}</span> : null}
          {sheet.reopenedAt ? <span className="text-sm text-ink-muted">Reopened {formatDateTime(sheet.reopenedAt, timeZone)}: “{sheet.reopenReason}”</span> : null}
        </div>
        <div className="flex flex-wrap gap-2">
          {sheet.status === "submitted" ? (
            <Button variant="secondary" icon={<LockOpen aria-hidden className="size-5" />} aria-expanded={open === "reopen"} aria-label={`Reopen ${label}`} onClick={() => toggle("reopen")}>
              Reopen
            </Button>
          ) : null}
          <Button variant="ghost" icon={<History aria-hidden className="size-5" />} aria-expanded={open === "history"} aria-label={`History of ${label}`} onClick={() => toggle("history")}>
            History
          </Button>
        </div>
      </div>
      {open === "reopen" ? <ReopenForm showSlug={showSlug} sheet={sheet} onDone={() => setOpen(null)} /> : null}
      {open === "history" ? <SheetHistory showSlug={showSlug} sheetId={sheet.id} timeZone={timeZone} /> : null}
    </li>
  );
}

function ReopenForm({ showSlug, sheet, onDone }: { showSlug: string; sheet: BoardSheet; onDone: () => void }) {
  const queryClient = useQueryClient();
  const ctl = useActionForm({
    schema: reopenSchema,
    defaultValues: { sheetId: sheet.id, reason: "" },
    action: (v) => reopenSheetAction(null, { ...v, showSlug }),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: progressKeys.show(showSlug) });
      onDone();
    },
  });
  return (
    <ActionForm controller={ctl} aria-label={`Reopen the sheet of ${sheet.judgeName}`} className="space-y-3 rounded-control border border-line bg-paper-50 p-3">
      <TextareaField label="Why reopen it?" hint={`${sheet.judgeName} can change the sheet again; the reason goes in the audit log.`} rows={2} error={ctl.errorOf("reason")} {...ctl.form.register("reason")} />
      <SubmitOrCancel pending={ctl.pending} pendingLabel="Reopening…" onCancel={onDone}>
        Reopen the sheet
      </SubmitOrCancel>
    </ActionForm>
  );
}

function describe(v: SheetHistoryRow["value"]): string {
  if (v === null || v === undefined) return "—";
  if (typeof v === "string") return v;
  if (typeof v === "object" && !Array.isArray(v)) {
    const o = v as Record<string, unknown>;
    if (o.kind === "na") return "N/A";
    if (o.kind === "points") return `${String(o.points)} points`;
    if (o.kind === "word") return String(o.level);
  }
  return JSON.stringify(v);
}

const OUTCOME: Record<string, string> = { applied: "Applied", unchanged: "No change", stale: "Already changed elsewhere", conflict: "Conflict", refused: "Refused" };

function SheetHistory({ showSlug, sheetId, timeZone }: { showSlug: string; sheetId: string; timeZone: string }) {
  const { data, error, isPending } = useQuery({
    queryKey: ["sheet-history", showSlug, sheetId],
    queryFn: async () => {
      const r = await sheetHistoryAction(null, { showSlug, sheetId });
      if (!r.ok) throw new Error(r.message);
      return r.data ?? [];
    },
  });
  if (isPending) return <p className="text-ink-muted">Loading the history…</p>;
  if (error) return <p className="text-danger-700">{error.message}</p>;
  if (!data.length) return <p className="text-ink-muted">No changes recorded.</p>;
  return (
    <div className="overflow-x-auto rounded-control border border-line">
      <table className="w-full min-w-[36rem] border-collapse text-left text-sm">
        <caption className="sr-only">Every change to this sheet</caption>
        <thead className="bg-paper-200">
          <tr>
            {["Time", "Entered by", "Field", "Value", "Outcome"].map((h) => (
              <th key={h} scope="col" className="px-3 py-2 font-semibold text-ink-muted">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {data.map((r, i) => {
            const outcome = r.outcome as { kind: string; text?: string };
            return (
              <tr key={i} className="border-t border-line">
                <td className="px-3 py-2 whitespace-nowrap">{formatTime(r.at, timeZone)}</td>
                <td className="px-3 py-2">{r.text}</td>
                <td className="px-3 py-2">{r.fieldName}</td>
                <td className="px-3 py-2 break-words">{r.kind === "submit" ? "—" : describe(r.value)}</td>
                <td className="px-3 py-2">
                  {OUTCOME[outcome.kind] ?? outcome.kind}
                  {outcome.text ? <span className="block text-ink-muted">{outcome.text}</span> : null}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
