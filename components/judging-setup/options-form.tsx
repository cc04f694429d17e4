"use client";
// Judging options: which entries get written comments, the quick phrases judges can tap (one per
// line), and which of an entry's own facts judges see. Names, contacts and guilds are never offered.
import { Save } from "lucide-react";
import { z } from "zod";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Button } from "@/components/ui/button";
import { CheckboxField, FieldError, TextareaField } from "@/components/ui/field";
import { JUDGE_FIELDS, judgingOptionsSchema, type JudgeField } from "@/lib/schemas/judging";
import { saveJudgingOptionsAction } from "@/app/(chair)/shows/[slug]/manage/judging/actions";
import { COMMENT_POLICY_WORDS, FIELD_WORDS } from "./form-bits";

const lines = (t: string) => t.split("\n").map((l) => l.trim()).filter(Boolean);

const optionsFormSchema = z.object({
  commentPolicy: judgingOptionsSchema.shape.commentPolicy,
  judgeFields: judgingOptionsSchema.shape.judgeFields,
  quickPhrases: z
    .string()
    .superRefine((t, ctx) => {
      const all = lines(t);
      if (all.length > 60) ctx.addIssue({ code: "custom", message: "Keep the list to 60 phrases." });
      const long = all.findIndex((l) => l.length > 120);
      if (long >= 0) ctx.addIssue({ code: "custom", message: `Phrase ${long + 1} is longer than 120 characters.` });
    })
    .transform(lines),
});

type Values = { commentPolicy: "all" | "placed" | "none"; quickPhrases: string[]; judgeFields: string[] };

export function JudgingOptionsForm({ showSlug, values }: { showSlug: string; values: Values }) {
  const ctl = useActionForm({
    schema: optionsFormSchema,
    defaultValues: { commentPolicy: values.commentPolicy, quickPhrases: values.quickPhrases.join("\n"), judgeFields: values.judgeFields.filter((f): f is JudgeField => (JUDGE_FIELDS as readonly string[]).includes(f)) },
    action: (v) => saveJudgingOptionsAction(null, { ...v, showSlug }),
  });
  const { register } = ctl.form;
  return (
    <ActionForm controller={ctl} aria-label="Judging options">
      <div className="grid gap-6 lg:grid-cols-2">
        <div className="space-y-6">
          <fieldset className="space-y-1">
            <legend className="font-medium">Written comments</legend>
            {(Object.keys(COMMENT_POLICY_WORDS) as (keyof typeof COMMENT_POLICY_WORDS)[]).map((p) => (
              <label key={p} className="flex min-h-tap cursor-pointer items-center gap-3">
                <input type="radio" value={p} className="size-5 accent-plum-600" {...register("commentPolicy")} />
                <span>{COMMENT_POLICY_WORDS[p]}</span>
              </label>
            ))}
            <FieldError message={ctl.errorOf("commentPolicy")} />
          </fieldset>
          <fieldset className="space-y-1">
            <legend className="font-medium">What judges see of each entry</legend>
            <p className="text-sm text-ink-muted">Besides the entry number and photos. Names, contact details and guilds are never shown to judges or scribes.</p>
            <div className="grid sm:grid-cols-2">
              {JUDGE_FIELDS.map((f) => (
                <CheckboxField key={f} label={FIELD_WORDS[f]} value={f} {...register("judgeFields")} />
              ))}
            </div>
            <FieldError message={ctl.errorOf("judgeFields")} />
          </fieldset>
        </div>
        <TextareaField
          label="Quick phrases"
          hint="One per line. Judges and scribes tap them into a comment."
          rows={10}
          optional
          error={ctl.errorOf("quickPhrases")}
          {...register("quickPhrases")}
        />
      </div>
      <Button type="submit" pending={ctl.pending} pendingLabel="Saving…" icon={<Save aria-hidden className="size-5" />}>
        Save options
      </Button>
    </ActionForm>
  );
}
