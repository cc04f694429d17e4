// Saved settings → the text each settings form starts from (the reverse of lib/schemas/settings).
import { utcToZonedInput } from "@/components/format/zoned-time";
import { formatForInput } from "@/scoring/measure";
import {
  centsToInput,
  DATE_FIELDS,
  type DateField,
  type FeesFormValues,
  type LimitsFormValues,
  type OptionsFormValues,
  type PhotosFormValues,
} from "@/lib/schemas/settings";

type Settings = {
  lateFeeFromAt: Date | null;
  entryFeeCents: number;
  memberEntryFeeCents: number;
  lateFeeCents: number;
  critiqueFeeCents: number;
  memberEmails: string[];
  minQuiltSideUm: number | null;
  feeCapCents: number | null;
  withdrawalRefundPercent: number;
  maxEntriesPerEntrant: number | null;
  maxEntriesPerCategory: number | null;
  capacity: number | null;
  requiredPhotoViews: string[];
  photoMinWidthPx: number;
  photoMinHeightPx: number;
  photoMaxBytes: number;
  statementWordLimit: number;
  techniques: string[];
  juried: boolean;
  publishNames: boolean;
  replyToEmail: string;
};

export function datesFormValues(show: Record<Exclude<DateField, "lateFeeFromAt">, Date | null> & { timeZone: string }, settings: Settings) {
  const out = {} as Record<DateField, string>;
  for (const f of Object.keys(DATE_FIELDS) as DateField[]) {
    out[f] = utcToZonedInput(f === "lateFeeFromAt" ? settings.lateFeeFromAt : show[f], show.timeZone);
  }
  return out;
}

const count = (n: number | null) => (n === null ? "" : String(n));

export function feesFormValues(s: Settings): FeesFormValues {
  return {
    section: "fees",
    entryFeeCents: centsToInput(s.entryFeeCents),
    memberEntryFeeCents: centsToInput(s.memberEntryFeeCents),
    lateFeeCents: centsToInput(s.lateFeeCents),
    critiqueFeeCents: centsToInput(s.critiqueFeeCents),
    feeCapCents: centsToInput(s.feeCapCents),
    withdrawalRefundPercent: String(s.withdrawalRefundPercent),
    memberEmails: s.memberEmails.join("\n"),
  };
}

export function limitsFormValues(s: Settings): LimitsFormValues {
  return {
    section: "limits",
    maxEntriesPerEntrant: count(s.maxEntriesPerEntrant),
    maxEntriesPerCategory: count(s.maxEntriesPerCategory),
    capacity: count(s.capacity),
    minQuiltSideUm: s.minQuiltSideUm === null ? "" : formatForInput(s.minQuiltSideUm, "in"),
  };
}

export function photosFormValues(s: Settings): PhotosFormValues {
  return {
    section: "photos",
    requireFullView: s.requiredPhotoViews.includes("full"),
    requireDetailView: s.requiredPhotoViews.includes("detail"),
    photoMinWidthPx: String(s.photoMinWidthPx),
    photoMinHeightPx: String(s.photoMinHeightPx),
    // Saved sizes are whole tenths of a megabyte; one decimal shows them exactly.
    photoMaxBytes: String(Math.round(s.photoMaxBytes / 100_000) / 10),
    statementWordLimit: String(s.statementWordLimit),
    techniques: s.techniques.join("\n"),
  };
}

export function optionsFormValues(s: Settings): OptionsFormValues {
  return { section: "options", juried: s.juried, publishNames: s.publishNames, replyToEmail: s.replyToEmail };
}
