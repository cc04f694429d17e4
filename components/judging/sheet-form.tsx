"use client";
// One judge's sheet for one entry: the sorting pass and rank where the category's method has
// them, the criteria by section, comments per section and overall (unless the show takes none),
// "discuss for award", conflicts and refusals. Every tap goes straight to the tablet's outbox.
import { useState } from "react";
import { Flag, Split, TriangleAlert, X } from "lucide-react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { cx } from "@/components/ui/cx";
import type { Mark, ScoreSheet } from "@/scoring/score-sheets";
import type { Json } from "@/scoring/sheet-sync";
import { CommentBox } from "./comment-box";
import { bigTarget, chosen, markText, MarkControl } from "./mark-control";
import type { LocalChange, Method, OutboxRow, SheetView } from "./outbox";

type Props = {
  sheet: ScoreSheet | null;
  method: Method;
  view: SheetView;
  commentPolicy: "all" | "placed" | "none";
  quickPhrases: string[];
  onChange: (change: LocalChange) => void;
  onDismiss: (key: string) => void;
};

const FIELD_NAMES: Record<string, string> = { discuss: "Discuss for award", sort: "Sorting pass", rank: "Rank", "comment:overall": "Overall comment" };

function valueText(v: Json): string {
  if (v === null || v === undefined) return "nothing";
  if (typeof v === "boolean") return v ? "yes" : "no";
  if (typeof v === "string") return v === "kept" ? "Keep" : v === "set_aside" ? "Set aside" : `“${v}”`;
  if (typeof v === "number") return String(v);
  return markText(v as Mark);
}

export function SheetForm({ sheet, method, view, commentPolicy, quickPhrases, onChange, onDismiss }: Props) {
  const { values, locked } = view;
  // Quick phrases show under the comment box last focused, not under every box.
  const [activeComment, setActiveComment] = useState<string | null>(null);
  const set = (field: string, value: Json) => onChange({ kind: "set", field, value });
  const hasSort = method === "sort_then_points" || method === "sort_then_rank";
  const hasRank = method === "rank" || method === "sort_then_rank";
  const hasMarks = method === "points" || method === "sort_then_points";
  const comments = commentPolicy !== "none";
  const commentHint = commentPolicy === "placed" ? "Comments go back to the entrant only if the quilt is placed." : undefined;
  const criterionLabel = (field: string) => sheet?.sections.flatMap((s) => s.criteria).find((c) => `mark:${c.id}` === field)?.label;
  const sectionTitle = (field: string) => sheet?.sections.find((s) => `comment:${s.id}` === field)?.title;
  const nameOf = (field: string | null) => (field ? (FIELD_NAMES[field] ?? criterionLabel(field) ?? (sectionTitle(field) ? `Comment on ${sectionTitle(field)}` : field)) : "Submitting");

  return (
    <div className="space-y-6">
      {view.conflicts.map((c) => (
        <div key={c.field} role="alert" className="space-y-3 rounded-card border-2 border-warning-700/40 bg-warning-50 p-4 text-warning-700">
          <p className="flex items-center gap-2 text-lg font-semibold">
            <Split aria-hidden className="size-6" /> Conflict: {nameOf(c.field)}
          </p>
          <p className="text-ink">
            Another device saved {valueText(c.serverValue)}; this change was {valueText(c.clientValue)}. Which should the sheet keep?
          </p>
          <div className="flex flex-wrap gap-3">
            <Button size="lg" onClick={() => onChange({ kind: "resolve", field: c.field, value: c.clientValue })}>
              Keep mine
            </Button>
            <Button size="lg" variant="secondary" onClick={() => onChange({ kind: "resolve", field: c.field, value: c.serverValue })}>
              Keep theirs
            </Button>
          </div>
        </div>
      ))}
      {view.refused.map((r: OutboxRow) => (
        <div key={r.key} role="alert" className="flex items-start gap-3 rounded-card border-2 border-danger-700/30 bg-danger-50 p-4 text-danger-700">
          <TriangleAlert aria-hidden className="mt-1 size-6 shrink-0" />
          <p className="flex-1">
            <span className="font-semibold">Not accepted — {nameOf(r.field)}:</span> {r.text}
          </p>
          <Button variant="ghost" icon={<X aria-hidden className="size-5" />} onClick={() => onDismiss(r.key)}>
            Dismiss
          </Button>
        </div>
      ))}

      {hasSort ? (
        <section aria-labelledby="sort-h" className="rounded-card border border-line bg-surface p-4 shadow-card">
          <h3 id="sort-h" className="text-2xl">Sorting pass</h3>
          <div className="mt-3 grid grid-cols-2 gap-3">
            {(["kept", "set_aside"] as const).map((v) => (
              <button key={v} type="button" disabled={locked} aria-pressed={values.sort === v} onClick={() => set("sort", values.sort === v ? null : v)} className={cx(bigTarget, "min-h-16 text-2xl", chosen(values.sort === v))}>
                {v === "kept" ? "Keep" : "Set aside"}
              </button>
            ))}
          </div>
        </section>
      ) : null}

      {hasRank && values.sort !== "set_aside" ? <RankInput value={typeof values.rank === "number" ? values.rank : null} disabled={locked} onRank={(n) => set("rank", n)} /> : null}

      {hasMarks && values.sort !== "set_aside" && sheet
        ? sheet.sections.map((s) => (
            <section key={s.id} aria-labelledby={`sec-${s.id}`} className="rounded-card border border-line bg-surface p-4 shadow-card">
              <h3 id={`sec-${s.id}`} className="text-2xl">{s.title}</h3>
              {s.criteria.map((c) => (
                <MarkControl key={c.id} criterion={c} mark={(values[`mark:${c.id}`] as Mark | null | undefined) ?? null} disabled={locked} onMark={(m) => set(`mark:${c.id}`, m)} />
              ))}
              {comments ? (
                <div className="border-t border-line pt-4">
                  <CommentBox label={`Comment on ${s.title.toLowerCase()}`} value={typeof values[`comment:${s.id}`] === "string" ? (values[`comment:${s.id}`] as string) : ""} phrases={quickPhrases} disabled={locked} hint={commentHint} onText={(t) => set(`comment:${s.id}`, t)} active={activeComment === `comment:${s.id}`} onActivate={() => setActiveComment(`comment:${s.id}`)} />
                </div>
              ) : null}
            </section>
          ))
        : null}

      <section aria-label="Overall" className="space-y-4 rounded-card border border-line bg-surface p-4 shadow-card">
        {comments ? <CommentBox label="Overall comment" value={typeof values["comment:overall"] === "string" ? (values["comment:overall"] as string) : ""} phrases={quickPhrases} disabled={locked} hint={commentHint} onText={(t) => set("comment:overall", t)} active={activeComment === "comment:overall"} onActivate={() => setActiveComment("comment:overall")} /> : null}
        <button type="button" disabled={locked} aria-pressed={values.discuss === true} onClick={() => set("discuss", values.discuss !== true)} className={cx(bigTarget, "w-full gap-3 text-xl", values.discuss === true ? "border-gold-600 bg-gold-100 text-gold-800" : chosen(false))}>
          <Flag aria-hidden className="size-6" />
          {values.discuss === true ? "Marked to discuss for award" : "Discuss for award"}
        </button>
      </section>
      {!sheet && hasMarks ? <Alert tone="warning" title="This category has no score sheet yet.">Ask the chair to choose one.</Alert> : null}
    </div>
  );
}

function RankInput({ value, disabled, onRank }: { value: number | null; disabled: boolean; onRank: (n: number | null) => void }) {
  return (
    <section aria-labelledby="rank-h" className="rounded-card border border-line bg-surface p-4 shadow-card">
      <h3 id="rank-h" className="text-2xl">Rank in the category</h3>
      <div className="mt-3 flex items-center gap-3">
        <button type="button" aria-label="Rank one higher (smaller number)" disabled={disabled || !value || value <= 1} onClick={() => onRank((value ?? 2) - 1)} className={cx(bigTarget, "text-3xl", chosen(false))}>
          −
        </button>
        <label className="sr-only" htmlFor="rank-input">Rank</label>
        <input
          id="rank-input"
          type="text"
          inputMode="numeric"
          disabled={disabled}
          value={value ?? ""}
          onChange={(e) => {
            const n = Number.parseInt(e.target.value, 10);
            onRank(Number.isInteger(n) && n >= 1 && n <= 1000 ? n : null);
          }}
          className="min-h-14 w-28 rounded-control border-2 border-line-strong bg-white text-center font-display text-3xl font-semibold tabular-nums"
        />
        <button type="button" aria-label="Rank one lower (bigger number)" disabled={disabled || (value ?? 0) >= 1000} onClick={() => onRank((value ?? 0) + 1)} className={cx(bigTarget, "text-3xl", chosen(false))}>
          +
        </button>
      </div>
    </section>
  );
}
