// What entering costs and asks for, on a show's public page: fees, limits, photo requirements.
import { photoFormatWords } from "@/lib/photo-formats";
import type { ReactNode } from "react";
import { Camera, Coins, ListChecks } from "lucide-react";
import { formatDateTime, type DateInput } from "@/components/format/dates";
import { formatCents } from "./money";

type Fees = {
  currency: string;
  entryFeeCents: number;
  memberEntryFeeCents: number;
  lateFeeCents: number;
  lateFeeFromAt: DateInput;
  critiqueFeeCents: number;
  feeCapCents: number | null;
  withdrawalRefundPercent: number;
};

function Row({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-0.5 py-2.5 sm:flex-row sm:gap-6">
      <dt className="w-48 shrink-0 font-semibold">{label}</dt>
      <dd>{children}</dd>
    </div>
  );
}

export function FeeList({ fees, timeZone }: { fees: Fees; timeZone: string }) {
  const money = (c: number) => formatCents(c, fees.currency);
  const lateFrom = formatDateTime(fees.lateFeeFromAt, timeZone);
  return (
    <div>
      <h3 className="mb-1 flex items-center gap-2 text-lg">
        <Coins aria-hidden className="size-5 text-plum-500" /> Fees
      </h3>
      <dl className="divide-y divide-line">
        <Row label="Entry fee">{fees.entryFeeCents === 0 ? "Free" : `${money(fees.entryFeeCents)} per quilt`}</Row>
        {fees.memberEntryFeeCents !== fees.entryFeeCents ? <Row label="Guild members">{`${money(fees.memberEntryFeeCents)} per quilt`}</Row> : null}
        {fees.lateFeeCents > 0 ? (
          <Row label="Late fee">
            {`${money(fees.lateFeeCents)} more per quilt`}
            {lateFrom ? ` for entries from ${lateFrom}` : ""}
          </Row>
        ) : null}
        {fees.critiqueFeeCents > 0 ? <Row label="Judge’s critique">{`${money(fees.critiqueFeeCents)} per quilt, if you ask for one`}</Row> : null}
        {fees.feeCapCents !== null ? <Row label="Most you pay">{`${money(fees.feeCapCents)} in entry fees, however many quilts (late and critique fees on top)`}</Row> : null}
        <Row label="If you withdraw">
          {fees.withdrawalRefundPercent === 100
            ? "The entry fee is refunded in full before entries close."
            : fees.withdrawalRefundPercent === 0
              ? "Entry fees are not refunded."
              : `${fees.withdrawalRefundPercent} % of the entry fee is refunded before entries close.`}
        </Row>
      </dl>
    </div>
  );
}

type Limits = { maxEntriesPerEntrant: number | null; maxEntriesPerCategory: number | null; capacity: number | null };

export function LimitList({ limits }: { limits: Limits }) {
  const items = [
    limits.maxEntriesPerEntrant !== null ? `Up to ${limits.maxEntriesPerEntrant} ${limits.maxEntriesPerEntrant === 1 ? "quilt" : "quilts"} per entrant.` : null,
    limits.maxEntriesPerCategory !== null ? `Up to ${limits.maxEntriesPerCategory} per entrant in any one category.` : null,
    limits.capacity !== null ? `The show takes ${limits.capacity.toLocaleString("en-US")} entries in all; later ones go on a waiting list.` : null,
  ].filter((x): x is string => x !== null);
  return (
    <div>
      <h3 className="mb-1 flex items-center gap-2 text-lg">
        <ListChecks aria-hidden className="size-5 text-plum-500" /> Limits
      </h3>
      {items.length ? (
        <ul className="list-disc space-y-1 pl-6">
          {items.map((i) => (
            <li key={i}>{i}</li>
          ))}
        </ul>
      ) : (
        <p>No limit on the number of entries.</p>
      )}
    </div>
  );
}

type Photos = {
  requiredPhotoViews: string[];
  photoMinWidthPx: number;
  photoMinHeightPx: number;
  photoMaxBytes: number;
  photoFormats: string[];
  statementWordLimit: number;
  techniques: string[];
};

const VIEW_WORDS: Record<string, string> = { full: "a full view showing all four edges", detail: "a close-up showing the quilting" };

export function PhotoRules({ photos, juried }: { photos: Photos; juried: boolean }) {
  const views = photos.requiredPhotoViews.map((v) => VIEW_WORDS[v] ?? v);
  const mb = Math.round(photos.photoMaxBytes / 100_000) / 10;
  return (
    <div>
      <h3 className="mb-1 flex items-center gap-2 text-lg">
        <Camera aria-hidden className="size-5 text-plum-500" /> Photos and statement
      </h3>
      <ul className="list-disc space-y-1 pl-6">
        {views.length ? <li>Photos needed: {views.join(" and ")}.</li> : <li>Photos are optional.</li>}
        <li>
          Each at least {photos.photoMinWidthPx.toLocaleString("en-US")} × {photos.photoMinHeightPx.toLocaleString("en-US")} pixels, {photoFormatWords(photos.photoFormats)},
          up to {mb} MB.
        </li>
        {juried ? <li>This show is juried: the committee accepts entries from their photos.</li> : null}
        <li>{photos.statementWordLimit > 0 ? `A statement about your quilt of up to ${photos.statementWordLimit} words.` : "No statement is asked for."}</li>
        {photos.techniques.length ? <li>Techniques to choose from: {photos.techniques.join(", ")}.</li> : null}
      </ul>
    </div>
  );
}
