"use client";
// A comment with quick-phrase chips that append to it, shown under the box in use only (the
// sheet has up to one box per section, and a row of chips under each made it very long). A
// plain textarea, so the tablet's own dictation works through its keyboard. Typed text is kept locally while the box has focus, so
// the tablet's store answering back never moves the cursor.
import { useId, useRef, useState } from "react";
import { cx } from "@/components/ui/cx";

type Props = { label: string; value: string; phrases: string[]; disabled: boolean; hint?: string; onText: (text: string) => void; active: boolean; onActivate: () => void };

export function CommentBox({ label, value, phrases, disabled, hint, onText, active, onActivate }: Props) {
  const id = useId();
  const [draft, setDraft] = useState<string | null>(null);
  const focused = useRef(false);
  const box = useRef<HTMLTextAreaElement>(null);
  const text = draft ?? value;
  const change = (next: string) => {
    setDraft(next);
    onText(next);
  };
  return (
    <div className="space-y-2">
      <label htmlFor={id} className="block text-lg font-semibold">
        {label}
      </label>
      {hint ? <p className="text-sm text-ink-muted">{hint}</p> : null}
      <textarea
        id={id}
        ref={box}
        rows={3}
        value={text}
        disabled={disabled}
        maxLength={2000}
        onFocus={() => {
          focused.current = true;
          onActivate();
        }}
        onBlur={() => {
          focused.current = false;
          setDraft(null);
        }}
        onChange={(e) => change(e.target.value)}
        className="block min-h-28 w-full rounded-control border border-line-strong bg-white px-4 py-3 text-lg text-ink disabled:bg-paper-200"
      />
      {active && phrases.length && !disabled ? (
        <ul className="flex flex-wrap gap-2" aria-label={`Quick phrases for ${label.toLowerCase()}`}>
          {phrases.map((p) => (
            <li key={p}>
              <button
                type="button"
                onClick={() => {
                  change(text.trim() ? `${text.trimEnd()} ${p}` : p);
                  box.current?.focus();
                }}
                className={cx("min-h-tap-lg rounded-full border-2 border-plum-300 bg-plum-50 px-4 text-left text-base font-medium text-plum-800 hover:bg-plum-100 active:bg-plum-200")}
              >
                + {p}
              </button>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
