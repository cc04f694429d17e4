// GET: the critique sheet of one of the viewer's own entries as a PDF (one page per judge), only
// once the show's results are published and when the show returns comments for that entry.
import { critiqueData } from "@/db/queries/published-results";
import { critiqueBytes } from "@/exports/critique-pdf";
import { defineRoute } from "@/lib/api";
import { notFound } from "@/lib/errors";
import { isUuid } from "@/lib/ids";

export const GET = defineRoute<{ id: string }>({ access: "user" }, async ({ viewer, params }) => {
  if (!isUuid(params.id)) throw notFound("There is no such entry.");
  const data = await critiqueData(params.id, viewer!);
  const body = await critiqueBytes(data);
  return new Response(new Uint8Array(body), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `inline; filename="critique-${data.entryNumber}.pdf"`,
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
});
