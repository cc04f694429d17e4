// The entry form's steps as links, with a tick on each step that has nothing missing.
import Link from "next/link";
import { CircleCheck, Circle } from "lucide-react";
import { cx } from "@/components/ui/cx";
import { ScrollToCurrent } from "./scroll-nav";
import type { EntryStep, Gap } from "@/scoring/entry-completeness";

export const STEP_LABELS: Record<EntryStep, string> = { quilt: "Quilt", makers: "Makers", about: "About", photos: "Photos", review: "Review" };

export function StepNav({ entryId, current, gaps, steps }: { entryId: string; current: EntryStep; gaps: Gap[]; steps: readonly EntryStep[] }) {
  return (
    <ScrollToCurrent label="Entry steps" className="relative -mx-1 overflow-x-auto">
      <ol className="flex min-w-max gap-1 px-1">
        {steps.map((s, i) => {
          const done = s !== "review" && !gaps.some((g) => g.step === s);
          const Icon = done ? CircleCheck : Circle;
          return (
            <li key={s}>
              <Link
                href={`/entries/${entryId}?step=${s}`}
                aria-current={s === current ? "step" : undefined}
                className={cx(
                  "flex min-h-tap items-center gap-1.5 rounded-control px-3 font-semibold no-underline",
                  s === current ? "bg-brand text-white" : "text-brand-strong hover:bg-plum-50",
                )}
              >
                <Icon aria-hidden className="size-4" />
                <span>
                  {i + 1}. {STEP_LABELS[s]}
                </span>
                {done ? <span className="sr-only">(complete)</span> : null}
              </Link>
            </li>
          );
        })}
      </ol>
    </ScrollToCurrent>
  );
}
