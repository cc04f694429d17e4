"use client";
// The show's score sheets: each with its total and whether it is the default, and the editor
// for one at a time (a new sheet, or a copy of an existing one to start from).
import { useState } from "react";
import { useRouter } from "next/navigation";
import { ClipboardList, Copy, Pencil, Plus, Star } from "lucide-react";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { formatScore, type ScoreSheet, type SheetCheck } from "@/scoring/score-sheets";
import { blankSheet, sheetToForm, type SheetForm } from "./sheet-model";
import { SheetEditor } from "./sheet-editor";

export type SheetItem = { id: string; name: string; isDefault: boolean; sheet: ScoreSheet; check: SheetCheck };

export function SheetsSection({ showSlug, sheets }: { showSlug: string; sheets: SheetItem[] }) {
  const router = useRouter();
  const [editing, setEditing] = useState<{ key: string; values: SheetForm } | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const open = (key: string, values: SheetForm) => {
    setSaved(null);
    setEditing({ key, values });
  };
  const done = (message?: string) => {
    setEditing(null);
    if (message) {
      setSaved(message);
      router.refresh();
    }
  };
  return (
    <div className="space-y-4">
      {saved ? <Alert live tone="success" title={saved} /> : null}
      {sheets.length === 0 ? (
        <EmptyState icon={ClipboardList} title="No score sheet yet">
          Judges need a sheet for every category judged on points. The first sheet becomes the default.
        </EmptyState>
      ) : (
        <ul className="grid gap-3 md:grid-cols-2">
          {sheets.map((s) => {
            const criteria = s.sheet.sections.reduce((n, x) => n + x.criteria.length, 0);
            return (
              <li key={s.id} className="flex flex-wrap items-start justify-between gap-3 rounded-control border border-line p-4">
                <div className="min-w-0 space-y-1">
                  <p className="flex flex-wrap items-center gap-2 text-lg font-semibold">
                    {s.name}
                    {s.isDefault ? (
                      <Badge tone="gold" icon={Star}>
                        Default
                      </Badge>
                    ) : null}
                  </p>
                  <p className="text-ink-muted">
                    {s.sheet.sections.length} sections, {criteria} criteria · Total {formatScore(s.check.nominalMax)}
                  </p>
                  {s.check.notes.map((n) => (
                    <p key={n} className="text-sm text-warning-700">
                      {n}
                    </p>
                  ))}
                </div>
                <div className="flex flex-wrap gap-2">
                  <Button variant="secondary" icon={<Pencil aria-hidden className="size-5" />} onClick={() => open(s.id, sheetToForm(s))} aria-label={`Edit ${s.name}`}>
                    Edit
                  </Button>
                  <Button
                    variant="ghost"
                    icon={<Copy aria-hidden className="size-5" />}
                    aria-label={`Copy ${s.name} to a new sheet`}
                    onClick={() => {
                      const { id: _id, ...copy } = sheetToForm(s);
                      open(`copy-${s.id}-${Date.now()}`, { ...copy, name: `${s.name} (copy)`, isDefault: false });
                    }}
                  >
                    Copy
                  </Button>
                </div>
              </li>
            );
          })}
        </ul>
      )}
      {editing ? (
        <SheetEditor key={editing.key} showSlug={showSlug} values={editing.values} onDone={done} />
      ) : (
        <Button icon={<Plus aria-hidden className="size-5" />} onClick={() => open(`new-${Date.now()}`, blankSheet())}>
          New score sheet
        </Button>
      )}
    </div>
  );
}
