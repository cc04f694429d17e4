// "Enter a quilt": resumes the viewer's draft for this show, or starts one, then opens the form.
import { redirect } from "next/navigation";
import type { Metadata } from "next";
import { guardQuery, pageViewer } from "@/components/shell/guard";
import { ButtonLink } from "@/components/ui/button";
import { Alert } from "@/components/ui/alert";
import { createDraft } from "@/db/queries/entries";
import { AppError } from "@/lib/errors";

export const metadata: Metadata = { title: "Enter a quilt" };

// ?new=1 starts another quilt even when an unfinished draft exists.
export default async function EnterPage({ params, searchParams }: { params: Promise<{ slug: string }>; searchParams: Promise<{ new?: string }> }) {
  const [{ slug }, query] = await Promise.all([params, searchParams]);
  const viewer = await pageViewer();
  let entryId: string;
  try {
    entryId = (await guardQuery(createDraft(viewer, slug, { fresh: query.new === "1" }))).entryId;
  } catch (err) {
    if (!(err instanceof AppError) || err.status !== 409) throw err;
    return (
      <div className="max-w-prose space-y-4">
        <Alert tone="warning" title="This show isn't taking entries">
          {err.message}
        </Alert>
        <ButtonLink href={`/shows/${slug}`} variant="secondary">
          Back to the show
        </ButtonLink>
      </div>
    );
  }
  redirect(`/entries/${entryId}?step=quilt`);
}
