"use client";
// People a judge must not judge (a household member, a student, a client…): the chair records
// them for any judge, and removes them. A panel that would put the judge on that person's
// category is then refused.
import { useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { Plus, Trash2 } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { declarationSchema, RELATIONS } from "@/lib/schemas/judging";
import { addDeclarationAction, removeDeclarationAction } from "@/app/(chair)/shows/[slug]/manage/judging/actions";
import { RELATION_WORDS } from "./form-bits";
import type { Person } from "./panel-form";

type Declaration = { id: string; judgeUserId: string; personName: string; personEmail: string; relation: string };

export function DeclarationsSection({ showSlug, judges, declarations }: { showSlug: string; judges: Person[]; declarations: Declaration[] }) {
  const router = useRouter();
  const [note, setNote] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const [pending, start] = useTransition();
  const nameOf = new Map(judges.map((j) => [j.userId, j.name]));
  const ctl = useActionForm({
    schema: declarationSchema,
    defaultValues: { judgeUserId: judges[0]?.userId ?? "", personName: "", personEmail: "", relation: "household" as const },
    action: (v) => addDeclarationAction(null, { ...v, showSlug }),
    resetOnSuccess: true,
    onSuccess: () => router.refresh(),
  });
  const { register } = ctl.form;
  const remove = (d: Declaration) =>
    start(async () => {
      const r = await removeDeclarationAction(null, { showSlug, declarationId: d.id });
      setNote(r.ok ? { tone: "success", text: `${d.personName || d.personEmail} is no longer declared for ${nameOf.get(d.judgeUserId) ?? "the judge"}.` } : { tone: "error", text: r.message });
      router.refresh();
    });

  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <section aria-labelledby="declared-list" className="min-w-0 space-y-3">
        <h3 id="declared-list" className="text-lg">
          Declared
        </h3>
        {note ? <Alert live tone={note.tone} title={note.text} /> : null}
        {declarations.length === 0 ? (
          <p className="text-ink-muted">No one declared yet.</p>
        ) : (
          <ul className="divide-y divide-line rounded-control border border-line">
            {declarations.map((d) => (
              <li key={d.id} className="flex flex-wrap items-center justify-between gap-2 p-3">
                <p className="min-w-0">
                  <span className="font-semibold">{nameOf.get(d.judgeUserId) ?? "A judge"}</span> must not judge{" "}
                  <span className="font-semibold break-words">{[d.personName, d.personEmail].filter(Boolean).join(" · ")}</span>{" "}
                  <span className="text-ink-muted">({RELATION_WORDS[d.relation as keyof typeof RELATION_WORDS]?.toLowerCase() ?? d.relation})</span>
                </p>
                <Button variant="ghost" disabled={pending} icon={<Trash2 aria-hidden className="size-5" />} aria-label={`Remove ${d.personName || d.personEmail} for ${nameOf.get(d.judgeUserId) ?? "the judge"}`} onClick={() => remove(d)}>
                  Remove
                </Button>
              </li>
            ))}
          </ul>
        )}
      </section>
      <section aria-labelledby="declare-new" className="min-w-0 space-y-3">
        <h3 id="declare-new" className="text-lg">
          Record a declaration
        </h3>
        {judges.length === 0 ? (
          <p className="text-ink-muted">Invite judges from Overview first.</p>
        ) : (
          <ActionForm controller={ctl} aria-labelledby="declare-new" className="space-y-3">
            <SelectField label="Judge" error={ctl.errorOf("judgeUserId")} {...register("judgeUserId")}>
              {judges.map((j) => (
                <option key={j.userId} value={j.userId}>
                  {j.name}
                </option>
              ))}
            </SelectField>
            <p className="text-sm text-ink-muted">…must not judge this person. Give a name, an e-mail address, or both.</p>
            <div className="grid gap-3 sm:grid-cols-2">
              <TextField label="Name" optional autoComplete="off" error={ctl.errorOf("personName")} {...register("personName")} />
              <TextField label="E-mail" optional type="email" inputMode="email" autoComplete="off" error={ctl.errorOf("personEmail")} {...register("personEmail")} />
            </div>
            <SelectField label="Relation" error={ctl.errorOf("relation")} {...register("relation")}>
              {RELATIONS.map((r) => (
                <option key={r} value={r}>
                  {RELATION_WORDS[r]}
                </option>
              ))}
            </SelectField>
            <Button type="submit" pending={ctl.pending} pendingLabel="Recording…" icon={<Plus aria-hidden className="size-5" />}>
              Record declaration
            </Button>
          </ActionForm>
        )}
      </section>
    </div>
  );
}
