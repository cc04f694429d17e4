"use client";
// A scribe first chooses which judge they write for; the choice stays on the tablet and shows at
// the top of every screen ("Entering for Judge …").
import { UserRound } from "lucide-react";

type Props = { judges: { id: string; name: string }[]; meId: string; onPick: (id: string) => void };

export function JudgePicker({ judges, meId, onPick }: Props) {
  return (
    <section aria-labelledby="pick-h" className="space-y-4">
      <h2 id="pick-h" className="text-3xl">Which judge are you entering for?</h2>
      {judges.length === 0 ? <p className="text-lg">You are not on a judging panel of this show. Ask the chair to add you to one.</p> : null}
      <ul className="grid gap-3 sm:grid-cols-2">
        {judges.map((j) => (
          <li key={j.id}>
            <button type="button" onClick={() => onPick(j.id)} className="flex min-h-20 w-full items-center gap-4 rounded-card border-2 border-line bg-surface p-4 text-left text-2xl font-semibold shadow-card hover:border-plum-400 active:bg-plum-50">
              <UserRound aria-hidden className="size-8 shrink-0 text-plum-600" />
              <span>
                Judge {j.name}
                {j.id === meId ? <span className="block text-base font-normal text-ink-muted">That is you</span> : null}
              </span>
            </button>
          </li>
        ))}
      </ul>
    </section>
  );
}
