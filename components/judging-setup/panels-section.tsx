"use client";
// The show's judging panels: who sits on each, when and where, and which categories it judges;
// edit one at a time, add one, or delete one after a confirmation.
import { useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { CalendarDays, Pencil, Plus, Trash2, Users } from "lucide-react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { deletePanelAction } from "@/app/(chair)/shows/[slug]/manage/judging/actions";
import { PanelForm, type PanelValues, type Person } from "./panel-form";

type Panel = PanelValues & { id: string };
type Cat = { id: string; code: string; name: string };
type Props = { showSlug: string; panels: Panel[]; judges: Person[]; scribes: Person[]; categories: Cat[] };

const BLANK: PanelValues = { name: "", day: "", room: "", judgeIds: [], scribeIds: [], categoryIds: [] };

export function PanelsSection({ showSlug, panels, judges, scribes, categories }: Props) {
  const router = useRouter();
  const [editing, setEditing] = useState<string | null>(null);
  const [note, setNote] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const saved = (message?: string) => {
    setEditing(null);
    setNote(message ? { tone: "success", text: message } : null);
    router.refresh();
  };
  const nameOf = new Map([...judges, ...scribes].map((p) => [p.userId, p.name]));
  const catOf = new Map(categories.map((c) => [c.id, `${c.code} ${c.name}`]));
  const list = (ids: string[], of: Map<string, string>) => (ids.length ? ids.map((i) => of.get(i) ?? "?").join(", ") : "none");
  const formProps = { showSlug, judges, scribes, categories, onSaved: saved, onCancel: () => setEditing(null) };

  return (
    <div className="space-y-4">
      {note ? <Alert live tone={note.tone} title={note.text} /> : null}
      {panels.length === 0 && editing !== "new" ? (
        <EmptyState icon={Users} title="No panels yet">
          A panel is one or more judges, with scribes, judging a set of categories at one table.
        </EmptyState>
      ) : null}
      <ul className="space-y-3">
        {panels.map((p) => (
          <li key={p.id} className="rounded-control border border-line p-4">
            {editing === p.id ? (
              <PanelForm {...formProps} values={p} />
            ) : (
              <div className="flex flex-wrap items-start justify-between gap-3">
                <div className="min-w-0 space-y-1">
                  <h3 className="text-lg">{p.name}</h3>
                  <p className="flex items-center gap-1.5 text-ink-muted">
                    <CalendarDays aria-hidden className="size-4 shrink-0" />
                    {[p.day, p.room].filter(Boolean).join(" · ") || "No session set"}
                  </p>
                  <dl className="grid gap-x-3 gap-y-1 sm:grid-cols-[auto_minmax(0,1fr)]">
                    <dt className="font-medium">Judges</dt>
                    <dd>{list(p.judgeIds, nameOf)}</dd>
                    <dt className="font-medium">Scribes</dt>
                    <dd>{list(p.scribeIds, nameOf)}</dd>
                    <dt className="font-medium">Categories</dt>
                    <dd>{list(p.categoryIds, catOf)}</dd>
                  </dl>
                </div>
                <div className="flex flex-wrap gap-2">
                  <Button variant="secondary" icon={<Pencil aria-hidden className="size-5" />} aria-label={`Edit ${p.name}`} onClick={() => { setNote(null); setEditing(p.id); }}>
                    Edit
                  </Button>
                  <DeletePanel showSlug={showSlug} panel={p} onDone={(t) => { setNote(t); router.refresh(); }} />
                </div>
              </div>
            )}
          </li>
        ))}
      </ul>
      {editing === "new" ? (
        <div className="rounded-card border-2 border-plum-300 p-4">
          <PanelForm {...formProps} values={BLANK} />
        </div>
      ) : (
        <Button icon={<Plus aria-hidden className="size-5" />} onClick={() => { setNote(null); setEditing("new"); }}>
          New panel
        </Button>
      )}
    </div>
  );
}

function DeletePanel({ showSlug, panel, onDone }: { showSlug: string; panel: Panel; onDone: (n: { tone: "success" | "error"; text: string }) => void }) {
  const [asking, setAsking] = useState(false);
  const [pending, start] = useTransition();
  if (!asking) {
    return (
      <Button variant="ghost" icon={<Trash2 aria-hidden className="size-5" />} aria-label={`Delete ${panel.name}`} onClick={() => setAsking(true)}>
        Delete
      </Button>
    );
  }
  return (
    <div role="group" aria-label={`Delete ${panel.name}?`} className="flex flex-wrap items-center gap-2 rounded-control border border-danger-700/30 bg-danger-50 p-2">
      <span className="font-medium text-danger-700">Delete {panel.name}?</span>
      <Button
        variant="danger"
        pending={pending}
        pendingLabel="Deleting…"
        onClick={() =>
          start(async () => {
            const r = await deletePanelAction(null, { showSlug, panelId: panel.id });
            setAsking(false);
            onDone(r.ok ? { tone: "success", text: `${panel.name} deleted.` } : { tone: "error", text: r.message });
          })
        }
      >
        Yes, delete
      </Button>
      <Button variant="ghost" onClick={() => setAsking(false)}>
        Keep it
      </Button>
    </div>
  );
}
