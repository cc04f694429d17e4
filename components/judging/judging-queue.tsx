"use client";
// The judging list: big type, by entry number, with "jump to entry number" for the judging
// table. Blind: the data has no maker, quilter or entrant in it, and only the facts the show
// releases (db/queries/judging-scope.ts); a fact not sent is simply not shown.
import { useRef, useState, type FormEvent } from "react";
import { ArrowDown, Hash } from "lucide-react";
import { DIVISION_LABELS, labelOf, QUILTING_METHOD_LABELS } from "@/components/entries/labels";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { controlClasses, FieldError } from "@/components/ui/field";
import { cx } from "@/components/ui/cx";

/** An entry of the viewer's sessions with only the facts the show releases (any may be absent). */
export type QueueEntry = {
  entryNumber: number;
  title?: string;
  size?: string;
  techniques?: string[];
  quiltingMethod?: string;
  pattern?: string;
  division?: string;
};

export function JudgingQueue({ entries }: { entries: QueueEntry[] }) {
  const [number, setNumber] = useState("");
  const [problem, setProblem] = useState<string | null>(null);
  const [highlight, setHighlight] = useState<number | null>(null);
  const listRef = useRef<HTMLOListElement>(null);

  const jump = (e: FormEvent) => {
    e.preventDefault();
    const n = Number.parseInt(number.trim().replace(/^#/, ""), 10);
    if (!Number.isInteger(n)) {
      setProblem("Type an entry number, for example 112.");
      return;
    }
    const el = listRef.current?.querySelector<HTMLElement>(`[data-entry="${n}"]`);
    if (!el) {
      setProblem(`Entry ${n} is not in this list.`);
      return;
    }
    setProblem(null);
    setHighlight(n);
    el.scrollIntoView({ block: "start", behavior: "smooth" });
    el.focus({ preventScroll: true });
  };

  return (
    <div className="space-y-6">
      <form onSubmit={jump} noValidate className="z-10 rounded-card sm:sticky sm:top-18 border border-line bg-surface/95 p-4 shadow-card backdrop-blur" aria-label="Jump to an entry">
        <label htmlFor="jump" className="mb-2 block text-lg font-semibold">
          Jump to entry number
        </label>
        <div className="flex gap-3">
          <div className="relative flex-1">
            <Hash aria-hidden className="pointer-events-none absolute top-1/2 left-3 size-6 -translate-y-1/2 text-ink-muted" />
            <input
              id="jump"
              type="text"
              inputMode="numeric"
              autoComplete="off"
              enterKeyHint="go"
              value={number}
              onChange={(e) => setNumber(e.target.value)}
              aria-invalid={problem ? true : undefined}
              aria-describedby={problem ? "jump-error" : undefined}
              className={cx(controlClasses("lg"), "pl-12 font-semibold tabular-nums")}
            />
          </div>
          <Button type="submit" size="lg" icon={<ArrowDown aria-hidden className="size-6" />}>
            Go
          </Button>
        </div>
        <div aria-live="polite">
          <FieldError id="jump-error" message={problem ?? undefined} />
        </div>
      </form>

      <ol ref={listRef} className="space-y-4" aria-label="Entries by number">
        {entries.map((e) => (
          <li
            key={e.entryNumber}
            id={`entry-${e.entryNumber}`}
            data-entry={e.entryNumber}
            tabIndex={-1}
            className={cx(
              "scroll-mt-24 rounded-card sm:scroll-mt-60 border-2 bg-surface p-5 shadow-card sm:flex sm:gap-6",
              highlight === e.entryNumber ? "border-gold-500 ring-4 ring-gold-200" : "border-line",
            )}
          >
            <p className="font-display text-5xl leading-none font-semibold text-plum-700 tabular-nums sm:w-32 sm:shrink-0 sm:text-6xl">
              <span className="sr-only">Entry </span>
              <span>{e.entryNumber}</span>
            </p>
            <div className="mt-3 min-w-0 space-y-2 sm:mt-0">
              <h2 className="text-2xl sm:text-3xl">{e.title ?? `Entry ${e.entryNumber}`}</h2>
              {e.size ? <p className="text-lg">{e.size}</p> : null}
              {e.quiltingMethod || e.division ? (
                <p className="text-lg text-ink-muted">
                  {[e.quiltingMethod ? labelOf(QUILTING_METHOD_LABELS, e.quiltingMethod) : null, e.division ? `${labelOf(DIVISION_LABELS, e.division)} division` : null].filter(Boolean).join(" · ")}
                </p>
              ) : null}
              {e.pattern ? <p className="text-lg text-ink-muted">{e.pattern}</p> : null}
              {e.techniques?.length ? (
                <ul className="flex flex-wrap gap-2" aria-label="Techniques">
                  {e.techniques.map((t) => (
                    <li key={t}>
                      <Badge tone="neutral">{t}</Badge>
                    </li>
                  ))}
                </ul>
              ) : null}
            </div>
          </li>
        ))}
      </ol>
    </div>
  );
}
