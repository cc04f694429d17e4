// The chair's results files: results by category, the score matrix and the awards list (.xlsx),
// award cards and the judges' summary (.pdf). Chair only (the queries check the role).
import { PassThrough } from "node:stream";
import { db } from "@/db/client";
import { resultExports } from "@/db/queries/result-exports";
import { resultsReview } from "@/db/queries/results";
import { writeAwardCards } from "@/exports/award-cards";
import { writeAwardsList } from "@/exports/awards-list";
import { writeJudgesSummary } from "@/exports/judges-summary-pdf";
import { writeResultsWorkbook } from "@/exports/results-workbook";
import { matrixRows, sheetsOf, writeScoreMatrix } from "@/exports/score-matrix";
import { defineRoute } from "@/lib/api";
import { notFound } from "@/lib/errors";

const XLSX = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";

async function collect(write: (out: PassThrough) => Promise<unknown>): Promise<Buffer> {
  const out = new PassThrough();
  const chunks: Buffer[] = [];
  out.on("data", (c: Buffer) => chunks.push(c));
  await write(out);
  return Buffer.concat(chunks);
}

export const GET = defineRoute<{ slug: string; kind: string }>({ access: "user" }, async ({ viewer, params }) => {
  const kind = params.kind;
  let body: Buffer;
  let type = XLSX;
  let ext = "xlsx";
  let slug = params.slug;
  if (kind === "score-matrix") {
    const review = await resultsReview(viewer!, params.slug);
    slug = review.show.slug;
    body = await collect(async (out) => writeScoreMatrix(matrixRows(db, review.show.id), await sheetsOf(db, review.show.id), out));
  } else if (["results", "awards", "award-cards", "judges-summary"].includes(kind)) {
    const data = await resultExports(viewer!, params.slug);
    slug = data.show.slug;
    const showName = data.show.name;
    if (kind === "results") body = await collect((out) => writeResultsWorkbook(data.resultRows, { showName }, out));
    else if (kind === "awards") body = await collect((out) => writeAwardsList(data.awardsList, { showName }, out));
    else {
      type = "application/pdf";
      ext = "pdf";
      body = await collect((out) => (kind === "award-cards" ? writeAwardCards({ showName, cards: data.cards }, out) : writeJudgesSummary({ showName, categories: data.summary }, out)));
    }
  } else {
    throw notFound("There is no such export.");
  }
  return new Response(new Uint8Array(body), {
    status: 200,
    headers: { "content-type": type, "content-disposition": `attachment; filename="${slug}-${kind}.${ext}"`, "cache-control": "private, no-store" },
  });
});
