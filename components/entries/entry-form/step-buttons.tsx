"use client";
// The buttons under every step: back, "Save and finish later" and "Save and continue". Both save
// buttons submit the form; `onIntent` tells the form where to go once the step is saved.
import { ArrowLeft, ArrowRight, Save } from "lucide-react";
import { Button, ButtonLink } from "@/components/ui/button";

export type Intent = "next" | "later";

export function StepButtons({ backHref, pending, onIntent, nextLabel = "Save and continue" }: { backHref?: string; pending: boolean; onIntent: (i: Intent) => void; nextLabel?: string }) {
  return (
    <div className="flex flex-col-reverse gap-3 border-t border-line pt-5 sm:flex-row sm:items-center sm:justify-between">
      {backHref ? (
        <ButtonLink href={backHref} variant="ghost" icon={<ArrowLeft aria-hidden className="size-5" />}>
          Back
        </ButtonLink>
      ) : (
        <span />
      )}
      <div className="flex flex-col gap-3 sm:flex-row">
        <Button type="submit" variant="secondary" disabled={pending} onClick={() => onIntent("later")} icon={<Save aria-hidden className="size-5" />}>
          Save and finish later
        </Button>
        <Button type="submit" pending={pending} pendingLabel="Saving…" onClick={() => onIntent("next")} icon={<ArrowRight aria-hidden className="size-5" />}>
          {nextLabel}
        </Button>
      </div>
    </div>
  );
}
