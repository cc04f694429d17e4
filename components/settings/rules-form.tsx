"use client";
// Publishing the rules and release text as a new version; earlier versions stay as they were.
import { Send } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import type { ActionResult } from "@/lib/action";
import { Button } from "@/components/ui/button";
import { TextareaField } from "@/components/ui/field";
import { publishRulesSchema } from "@/lib/schemas/settings";
import { publishRulesAction } from "@/app/(chair)/shows/[slug]/manage/settings/actions";

type Props = { showSlug: string; nextVersion: number; rulesText: string; releaseText: string };

export function RulesForm({ showSlug, nextVersion, rulesText, releaseText }: Props) {
  const ctl = useActionForm({
    schema: publishRulesSchema,
    defaultValues: { rulesText, releaseText },
    action: (values): Promise<ActionResult<{ version: number }>> => publishRulesAction(null, { ...values, showSlug }),
  });
  const { register } = ctl.form;
  return (
    <ActionForm controller={ctl} aria-labelledby="rules">
      <p className="text-ink-muted">
        Entrants accept the version current when they enter. Publishing makes a new version; the ones before stay as
        they were, so every entry keeps the words its entrant agreed to.
      </p>
      <TextareaField label="Rules" rows={12} required error={ctl.errorOf("rulesText")} {...register("rulesText")} />
      <TextareaField
        label="Release"
        hint="What the entrant agrees to about handling, display, photographs and liability."
        rows={6}
        required
        error={ctl.errorOf("releaseText")}
        {...register("releaseText")}
      />
      <Button type="submit" pending={ctl.pending} pendingLabel="Publishing…" icon={<Send aria-hidden className="size-5" />}>
        Publish as version {nextVersion}
      </Button>
    </ActionForm>
  );
}
