// The chair's entrants spreadsheet (.xlsx): contacts, fees due, paid and outstanding per entrant.
import { entrantsForExport } from "@/db/queries/entrants-export";
import { buildEntrantsWorkbook } from "@/exports/entrants-workbook";
import { defineRoute } from "@/lib/api";

export const GET = defineRoute<{ slug: string }>({ access: "user" }, async ({ viewer, params }) => {
  const { show, rows } = await entrantsForExport(viewer!, params.slug);
  const file = await buildEntrantsWorkbook(rows, { currency: show.currency, timeZone: show.timeZone, showName: show.name });
  // The date in the file name is the show's own calendar day.
  const day = new Intl.DateTimeFormat("en-CA", { timeZone: show.timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).format(new Date());
  return new Response(new Uint8Array(file), {
    status: 200,
    headers: {
      "content-type": "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
      "content-disposition": `attachment; filename="${show.slug}-entrants-${day}.xlsx"`,
      "cache-control": "private, no-store",
    },
  });
});
