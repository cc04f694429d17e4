// The chair's entries spreadsheet (.xlsx) for the treasurer and the hanging committee.
import { entriesForExport } from "@/db/queries/chair-entries";
import { buildEntriesWorkbook } from "@/exports/entries-workbook";
import { defineRoute } from "@/lib/api";

export const GET = defineRoute<{ slug: string }>({ access: "user" }, async ({ viewer, params }) => {
  const { show, rows } = await entriesForExport(viewer!, params.slug);
  const file = await buildEntriesWorkbook(rows, { currency: show.currency, timeZone: show.timeZone, showName: show.name });
  // The date in the file name is the show's own calendar day.
  const day = new Intl.DateTimeFormat("en-CA", { timeZone: show.timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).format(new Date());
  return new Response(new Uint8Array(file), {
    status: 200,
    headers: {
      "content-type": "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
      "content-disposition": `attachment; filename="${show.slug}-entries-${day}.xlsx"`,
      "cache-control": "private, no-store",
    },
  });
});
