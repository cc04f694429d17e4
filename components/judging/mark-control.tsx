"use client";
// One criterion's mark: a grid of big point buttons (a stepper when the scale is long), big word
// buttons, and N/A where the sheet allows it. Every target is at least 56 × 56 CSS px, above
// WCAG 2.2 SC 2.5.5's 44 × 44, for gloved hands on a tablet.
import { Minus, Plus } from "lucide-react";
import { cx } from "@/components/ui/cx";
import { formatScore, type Criterion, type Mark } from "@/scoring/score-sheets";

export const bigTarget =
  "inline-flex min-h-14 min-w-14 items-center justify-center rounded-control border-2 px-3 text-xl font-semibold tabular-nums select-none transition-colors disabled:cursor-not-allowed disabled:opacity-60";
export const chosen = (on: boolean) => (on ? "border-plum-700 bg-plum-700 text-white" : "border-line-strong/60 bg-white text-ink hover:bg-plum-50 active:bg-plum-100");

/** A mark in words: "15", "Good", "N/A". */
export function markText(mark: Mark | null | undefined): string {
  if (!mark) return "—";
  if (mark.kind === "na") return "N/A";
  if (mark.kind === "word") return mark.level;
  return formatScore(mark.points);
}

type Props = { criterion: Criterion; mark: Mark | null; disabled: boolean; onMark: (mark: Mark | null) => void };

export function MarkControl({ criterion: c, mark, disabled, onMark }: Props) {
  const labelId = `crit-${c.id}`;
  return (
    <div role="group" aria-labelledby={labelId} className="space-y-3 border-t border-line py-4 first:border-t-0">
      <div className="flex items-baseline justify-between gap-3">
        <h4 id={labelId} className="text-xl font-semibold">
          {c.label} <span className="text-base font-normal text-ink-muted">out of {formatScore(c.maxPoints * (c.weight ?? 1))}</span>
        </h4>
        <p className="font-display text-3xl font-semibold text-plum-700 tabular-nums" aria-live="polite">
          <span className="sr-only">Mark: </span>
          {markText(mark)}
        </p>
      </div>
      <div className="flex flex-wrap gap-2">
        {c.scale.kind === "points" ? <PointsScale criterion={c} mark={mark} disabled={disabled} onMark={onMark} /> : null}
        {c.scale.kind === "words"
          ? c.scale.levels.map((l) => (
              <button key={l.label} type="button" disabled={disabled} aria-pressed={mark?.kind === "word" && mark.level === l.label} onClick={() => onMark({ kind: "word", level: l.label })} className={cx(bigTarget, "px-5", chosen(mark?.kind === "word" && mark.level === l.label))}>
                {l.label}
              </button>
            ))
          : null}
        {c.allowNotApplicable ? (
          <button type="button" disabled={disabled} aria-pressed={mark?.kind === "na"} onClick={() => onMark({ kind: "na" })} className={cx(bigTarget, "px-5", chosen(mark?.kind === "na"))}>
            N/A <span className="sr-only">(not applicable)</span>
          </button>
        ) : null}
        {mark && !disabled ? (
          <button type="button" onClick={() => onMark(null)} className={cx(bigTarget, "border-transparent bg-transparent px-4 text-base text-ink-muted underline hover:bg-paper-200")}>
            Clear<span className="sr-only"> the mark for {c.label}</span>
          </button>
        ) : null}
      </div>
    </div>
  );
}

const LONG_SCALE = 31;

function PointsScale({ criterion: c, mark, disabled, onMark }: Props) {
  const step = c.scale.kind === "points" ? (c.scale.step ?? 1) : 1;
  const count = Math.floor(c.maxPoints / step + 1e-9) + 1;
  const current = mark?.kind === "points" ? mark.points : null;
  const at = (i: number) => Number(formatScore(i * step, 6));
  if (count <= LONG_SCALE) {
    return (
      <div className="grid w-full grid-cols-[repeat(auto-fill,minmax(3.5rem,1fr))] gap-2">
        {Array.from({ length: count }, (_, i) => at(i)).map((p) => (
          <button key={p} type="button" disabled={disabled} aria-pressed={current === p} aria-label={`${formatScore(p)} points`} onClick={() => onMark({ kind: "points", points: p })} className={cx(bigTarget, "px-0", chosen(current === p))}>
            {formatScore(p)}
          </button>
        ))}
      </div>
    );
  }
  const value = current ?? 0;
  const index = Math.round(value / step);
  return (
    <div className="flex items-center gap-3">
      <button type="button" disabled={disabled || index <= 0} aria-label="One step fewer" onClick={() => onMark({ kind: "points", points: at(index - 1) })} className={cx(bigTarget, chosen(false))}>
        <Minus aria-hidden className="size-7" />
      </button>
      <span className="min-w-20 text-center font-display text-4xl font-semibold tabular-nums">{current === null ? "—" : formatScore(current)}</span>
      <button type="button" disabled={disabled || index >= count - 1} aria-label="One step more" onClick={() => onMark({ kind: "points", points: at(Math.min(count - 1, current === null ? 0 : index + 1)) })} className={cx(bigTarget, chosen(false))}>
        <Plus aria-hidden className="size-7" />
      </button>
    </div>
  );
}
