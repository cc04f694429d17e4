"use client";
// Saving the draft set: the first try comes back with the moves it would make (nothing written);
// the chair applies them ("Apply N moves", with the moves' fingerprint) or keeps editing. If the
// entries changed in between, the server sends the fresh moves instead.
import { useState } from "react";
import { ArrowRight, Save, Undo2 } from "lucide-react";
import { saveCategoriesAction } from "@/app/(chair)/shows/[slug]/manage/categories/actions";
import { FormStatusAlert, type FormStatus } from "@/components/forms/action-form";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import type { FieldErrors } from "@/lib/errors";
import type { OverlapMode } from "@/scoring/categories";
import type { ShowCategory } from "@/scoring/category-sets";

type Props = {
  showSlug: string;
  set: readonly ShowCategory[];
  overlap: OverlapMode;
  dirty: boolean;
  /** Why saving must wait (a category form is open), if it must. */
  blocked: string | null;
  expectedMoves: number;
  onSaved: () => void;
  onFieldErrors: (errors: FieldErrors) => void;
  onDiscard: () => void;
};

/** As db/queries/categories sends it (a "use client" file never imports db/, even for types). */
type MoveView = { entryId: string; entryNumber: number | null; title: string; from: string; to: string; reasons: string[] };
type Pending = { moves: MoveView[]; digest: string; stale: boolean; draftKey: string };

export function SavePanel({ showSlug, set, overlap, dirty, blocked, expectedMoves, onSaved, onFieldErrors, onDiscard }: Props) {
  const [note, setNote] = useState("");
  const [shown, setPending] = useState<Pending | null>(null);
  const [busy, setBusy] = useState(false);
  const [status, setStatus] = useState<FormStatus>(null);
  // Moves shown for one draft don't hold for another: an edit sends the chair back to saving.
  const draftKey = JSON.stringify([set, overlap]);
  const pending = shown?.draftKey === draftKey ? shown : null;

  async function save(confirmMoves?: string) {
    setBusy(true);
    setStatus(null);
    try {
      const categories = set.map((c) => ({ id: c.id, code: c.code, name: c.name, description: c.description ?? "", precedence: c.precedence, conditions: c.conditions, cap: c.cap ?? null, mergedIntoId: c.mergedIntoId ?? null }));
      const r = await saveCategoriesAction(null, { showSlug, categories, overlap, note, ...(confirmMoves ? { confirmMoves } : {}) });
      if (!r.ok) {
        setPending(null);
        onFieldErrors(r.fieldErrors ?? {});
        setStatus({ tone: "error", message: r.message });
        return;
      }
      const d = r.data;
      if (d && !d.saved) {
        setPending({ moves: d.moves, digest: d.digest, stale: d.stale, draftKey });
        setStatus(d.stale ? { tone: "error", message: r.message ?? "The entries changed since you looked." } : null);
        return;
      }
      setPending(null);
      setNote("");
      onFieldErrors({});
      setStatus({ tone: "success", message: r.message ?? "Saved." });
      onSaved();
    } catch (err) {
      console.error("[categories] save failed", err);
      setStatus({ tone: "error", message: "We could not reach Ribbonry. Check your connection and try again; your draft is kept." });
    } finally {
      setBusy(false);
    }
  }

  if (pending) {
    const n = pending.moves.length;
    return (
      <section aria-labelledby="moves-title" className="space-y-4">
        <FormStatusAlert status={status} />
        <h3 id="moves-title" className="text-xl">
          Saving would move {n} {n === 1 ? "entry" : "entries"}
        </h3>
        <p className="text-ink-muted">Nothing has changed yet. Entrants see their entry’s new category once you apply the moves.</p>
        <ol className="max-h-96 space-y-2 overflow-y-auto rounded-control border border-line bg-white p-3" data-testid="moves">
          {pending.moves.map((m) => (
            <li key={m.entryId} className="break-words">
              <span className="font-semibold">#{m.entryNumber ?? "—"} {m.title}:</span> {m.from} <ArrowRight aria-label="to" className="inline size-4" /> {m.to}
            </li>
          ))}
        </ol>
        <TextField label="Note for the record" optional hint="Why the categories changed; kept in the show’s history." value={note} maxLength={300} onChange={(e) => setNote(e.target.value)} />
        <div className="flex flex-wrap gap-3">
          <Button onClick={() => save(pending.digest)} pending={busy} pendingLabel="Applying…" icon={<Save aria-hidden className="size-5" />}>
            Apply {n} {n === 1 ? "move" : "moves"}
          </Button>
          <Button variant="ghost" onClick={() => { setPending(null); setStatus(null); }} disabled={busy}>
            Keep editing
          </Button>
        </div>
      </section>
    );
  }

  return (
    <section aria-label="Save the categories" className="space-y-3">
      <FormStatusAlert status={status} />
      {dirty ? (
        <Alert tone="info" title="You have changes that aren’t saved yet.">
          {expectedMoves ? `As things stand, saving would move ${expectedMoves} ${expectedMoves === 1 ? "entry" : "entries"}; you’ll see each one before it happens.` : "Saving moves no entry."}
        </Alert>
      ) : null}
      <TextField label="Note for the record" optional hint="Why the categories changed; kept in the show’s history." value={note} maxLength={300} onChange={(e) => setNote(e.target.value)} />
      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={() => save()} pending={busy} pendingLabel="Saving…" disabled={!dirty || Boolean(blocked)} icon={<Save aria-hidden className="size-5" />}>
          Save categories
        </Button>
        {dirty ? (
          <Button variant="ghost" onClick={onDiscard} disabled={busy} icon={<Undo2 aria-hidden className="size-5" />}>
            Discard changes
          </Button>
        ) : null}
        {blocked ? <p className="text-sm text-ink-muted">{blocked}</p> : null}
      </div>
    </section>
  );
}
