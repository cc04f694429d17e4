"use client";
// Publishing: what still blocks it, then Publish (a reason when publishing again); once out,
// Unpublish with a reason. Every publication is listed with its reasons.
import { useState } from "react";
import { Mail, Megaphone, Undo2 } from "lucide-react";
import { ActionForm, useActionForm } from "@/components/forms/action-form";
import { formatDateTime } from "@/components/format/dates";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { TextareaField } from "@/components/ui/field";
import { publishSchema, unpublishSchema } from "@/lib/schemas/results";
import { z } from "zod";
import { publishResultsAction, resendResultMailsAction, unpublishResultsAction } from "@/app/(chair)/shows/[slug]/manage/results/actions";

type Publication = { id: string; version: number; reason: string; publishedAt: Date; unpublishedAt: Date | null; unpublishReason: string };
type MailStatus = { sent: number; failed: number; lastError: string } | null;
type Props = { showSlug: string; timeZone: string; status: string; blockers: string[]; warnings: string[]; publications: Publication[]; current: Publication | null; mailStatus: MailStatus };

export function PublishPanel({ showSlug, timeZone, status, blockers, warnings, publications, current, mailStatus }: Props) {
  // Publishing swaps the publish form for the unpublish form, so the outcome (how many entrants
  // were mailed) is kept here, where it survives the swap.
  const [done, setDone] = useState<string | null>(null);
  const onDone = (r: { message?: string }) => setDone(r.message ?? null);
  return (
    <div className="space-y-4">
      <p role="status" className={done ? "rounded-control border border-success-700/30 bg-success-50 p-3 font-semibold text-success-700" : "sr-only"}>{done}</p>
      {current ? (
        <Alert tone="success" title={`Version ${current.version} is published`}>
          The public results page and each entrant&apos;s results and judges&apos; comments are visible. <a href={`/shows/${showSlug}/results`}>Open the public results page</a>.
        </Alert>
      ) : status !== "judging" ? (
        <Alert tone="info" title="Not yet">Results can be reviewed and published once the show is at judging.</Alert>
      ) : blockers.length ? (
        <Alert tone="warning" title="Before you can publish">
          <ul className="list-disc space-y-1 pl-5">{blockers.map((b) => <li key={b}>{b}</li>)}</ul>
        </Alert>
      ) : (
        <Alert tone="info" title="Ready to publish">Nothing blocks publishing. The public results page shows the ribbons once you publish.</Alert>
      )}
      {warnings.length ? <Alert tone="warning" title="Worth a look"><ul className="list-disc pl-5">{warnings.map((w) => <li key={w}>{w}</li>)}</ul></Alert> : null}
      {current && mailStatus ? <MailLine showSlug={showSlug} status={mailStatus} /> : null}
      {current ? <UnpublishForm showSlug={showSlug} onDone={onDone} /> : status === "judging" ? <PublishForm showSlug={showSlug} again={publications.length > 0} blocked={blockers.length > 0} onDone={onDone} /> : null}
      {publications.length ? (
        <div>
          <h3 className="text-lg">Publications</h3>
          <ul className="mt-1 space-y-1 text-sm">
            {publications.map((p) => (
              <li key={p.id}>
                Version {p.version}: published {formatDateTime(p.publishedAt, timeZone)}{p.reason ? ` (“${p.reason}”)` : ""}
                {p.unpublishedAt ? `; taken down ${formatDateTime(p.unpublishedAt, timeZone)} (“${p.unpublishReason}”)` : "; current"}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}

type Done = (r: { message?: string }) => void;

function PublishForm({ showSlug, again, blocked, onDone }: { showSlug: string; again: boolean; blocked: boolean; onDone: Done }) {
  const ctl = useActionForm({ schema: publishSchema, defaultValues: { reason: "" }, action: (v) => publishResultsAction(null, { ...v, showSlug }), onSuccess: onDone });
  return (
    <ActionForm controller={ctl} aria-label="Publish the results" className="space-y-3">
      {again ? <TextareaField label="Why publish again?" hint="Required; it goes in the audit log and in the mail to entrants whose results changed." rows={2} error={ctl.errorOf("reason")} {...ctl.form.register("reason")} /> : null}
      <Button type="submit" size="lg" disabled={blocked} pending={ctl.pending} pendingLabel="Publishing…" icon={<Megaphone aria-hidden className="size-5" />}>
        {again ? "Publish again" : "Publish the results"}
      </Button>
    </ActionForm>
  );
}

function UnpublishForm({ showSlug, onDone }: { showSlug: string; onDone: Done }) {
  const ctl = useActionForm({ schema: unpublishSchema, defaultValues: { reason: "" }, action: (v) => unpublishResultsAction(null, { ...v, showSlug }), onSuccess: onDone });
  return (
    <ActionForm controller={ctl} aria-label="Unpublish the results" className="space-y-3 rounded-control border border-line bg-paper-50 p-3">
      <TextareaField label="Reason to take the results down" hint="Required and audited. The public page and entrants see nothing until you publish again." rows={2} error={ctl.errorOf("reason")} {...ctl.form.register("reason")} />
      <Button type="submit" variant="danger" pending={ctl.pending} pendingLabel="Taking down…" icon={<Undo2 aria-hidden className="size-5" />}>
        Unpublish
      </Button>
    </ActionForm>
  );
}

function MailLine({ showSlug, status }: { showSlug: string; status: NonNullable<MailStatus> }) {
  const ctl = useActionForm({ schema: z.object({}), defaultValues: {}, action: () => resendResultMailsAction(null, { showSlug }) });
  return (
    <ActionForm controller={ctl} aria-label="Results mails" className="flex flex-wrap items-center gap-3">
      <p className="text-sm">
        Results mail: {status.sent} sent{status.failed ? `, ${status.failed} not sent` : ""}.
        {status.failed && status.lastError ? <span className="block text-ink-muted">Last error: {status.lastError}</span> : null}
      </p>
      {/* Safe to press at any time: only entrants who have not had this version's mail get one. */}
      <Button type="submit" variant="secondary" pending={ctl.pending} pendingLabel="Sending…" icon={<Mail aria-hidden className="size-5" />}>
        Send the mails again
      </Button>
    </ActionForm>
  );
}
