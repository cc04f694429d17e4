"use client";
// Step 3: the artist statement (word limit counted live), declared value, sale, judging, division.
import { useMemo } from "react";
import Link from "next/link";
import { ActionForm } from "@/components/forms/action-form";
import { Alert } from "@/components/ui/alert";
import { CheckboxField, TextareaField, TextField } from "@/components/ui/field";
import { DIVISION_LABELS } from "@/components/entries/labels";
import { WordCount } from "@/components/entries/word-count";
import { saveAboutAction } from "@/app/(entrant)/entries/[id]/actions";
import { aboutStepSchemaFor, type AboutStepInput } from "@/lib/schemas/entry";
import { formatMoney } from "@/scoring/fees";
import { Choice } from "./choice";
import { StepButtons } from "./step-buttons";
import { useStepForm } from "./use-step-form";

type Critique = { feeCents: number; currency: string; changeHere: boolean } | null;

export function AboutStep({ entryId, defaults, wordLimit, critique, backHref, nextHref }: { entryId: string; defaults: AboutStepInput; wordLimit: number; critique: Critique; backHref: string; nextHref: string }) {
  const schema = useMemo(() => aboutStepSchemaFor(wordLimit), [wordLimit]);
  const { ctl, setIntent } = useStepForm({
    schema,
    defaultValues: defaults,
    action: (values) => saveAboutAction(null, { ...values, entryId }),
    nextHref,
  });
  const { register, watch } = ctl.form;
  const statement = watch("statement") ?? "";

  return (
    <ActionForm controller={ctl} aria-label="About the quilt">
      <div className="space-y-1">
        <TextareaField
          label="Artist statement"
          rows={6}
          hint={`What inspired the quilt, or anything you'd like the judges and visitors to know. Up to ${wordLimit} words.`}
          error={ctl.errorOf("statement")}
          {...register("statement")}
        />
        <WordCount text={statement} limit={wordLimit} />
      </div>

      <div className="space-y-3">
        <TextField label="Declared value (US dollars)" inputMode="decimal" autoComplete="off" hint="e.g. 1200 or 1,250.50" error={ctl.errorOf("declaredValue")} {...register("declaredValue")} />
        <Alert tone="info" title="About insurance">
          Many shows do not insure the quilts they hang. The value you declare is what the show&apos;s release refers to; read the release on the last step.
        </Alert>
      </div>

      <div className="space-y-2">
        <CheckboxField label="This quilt is for sale" {...register("forSale")} />
        {watch("forSale") ? <TextField label="Price (US dollars)" optional inputMode="decimal" autoComplete="off" error={ctl.errorOf("price")} {...register("price")} /> : null}
      </div>

      <Choice legend="Judging" error={ctl.errorOf("judged")} options={[["judged", "Enter it to be judged"], ["display", "Display only (not judged)"]]} register={register("judged")} />

      <Choice legend="Division" error={ctl.errorOf("division")} options={Object.entries(DIVISION_LABELS)} register={register("division")} />
      {watch("division") === "youth" ? <TextField label="Age of the youth entrant" inputMode="numeric" autoComplete="off" error={ctl.errorOf("youthAge")} {...register("youthAge")} /> : null}

      {critique ? (
        critique.changeHere ? (
          <CheckboxField
            label={`Ask for a judge’s critique (${formatMoney(critique.feeCents, critique.currency)}, added to your entry fee)`}
            hint="Written comments from the judges, sent with your results. You can change this on My entries until entries close."
            {...register("critiqueRequested")}
          />
        ) : (
          <p className="text-sm">
            {defaults.critiqueRequested ? "A judge’s critique is asked for." : "No judge’s critique is asked for."} Change it on <Link href="/my">My entries</Link> until entries close.
          </p>
        )
      ) : null}

      <StepButtons backHref={backHref} pending={ctl.pending} onIntent={setIntent} />
    </ActionForm>
  );
}
